import { DEMO_IDENTITIES } from '@ionfolio/fakes';
import { loadDatabaseUrl } from '../config/env';
import { createDataSource } from './data-source';
import { seedDemoLibrary } from './seed-demo-library';

/**
 * Loads the demo: the invented people of the invented QC laboratory with their roles, then the
 * invented library. Existing rows are left alone, so a role an admin changed survives the next
 * `npm start`.
 */
const ds = createDataSource(loadDatabaseUrl());
await ds.initialize();
let added = 0;
await ds.transaction(async (m) => {
  for (const p of DEMO_IDENTITIES) {
    const rows: unknown[] = await m.query(
      `INSERT INTO users (github_id, login, display_name, email, role) VALUES ($1, $2, $3, $4, $5)
       ON CONFLICT (github_id) DO NOTHING RETURNING id`,
      [String(p.id), p.login, p.name, p.email, p.demoRole],
    );
    added += rows.length;
  }
});
console.log(`ionfolio: demo users ${added ? `added: ${added}` : 'already present'}`);
const started = Date.now();
const entries = await seedDemoLibrary(ds);
console.log(
  entries
    ? `ionfolio: demo library loaded: ${entries} simulated entries in ${((Date.now() - started) / 1000).toFixed(1)} s`
    : 'ionfolio: library already has entries; demo library not loaded again',
);
await ds.destroy();
