import { loadDatabaseUrl } from '../config/env';
import { createDataSource } from './data-source';

const ds = createDataSource(loadDatabaseUrl());
await ds.initialize();
const ran = await ds.runMigrations({ transaction: 'each' });
console.log(`ionfolio: migrations ${ran.length ? `applied: ${ran.map((m) => m.name).join(', ')}` : 'up to date'}`);
await ds.destroy();
