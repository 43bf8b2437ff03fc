import pg from 'pg';
import { loadEnv } from './config/env';
import { createLogger } from './shared/logger';
import { createDataSource } from './db/data-source';
import { createApp } from './app';
import { createMailDispatcher } from './modules/mail/mail.service';
import { createSearchService } from './modules/identify/search-service';

const env = loadEnv();
const logger = createLogger(env.LOG_LEVEL);
const dataSource = createDataSource(env.DATABASE_URL);
await dataSource.initialize();
const pending = await dataSource.showMigrations();
if (pending) {
  logger.fatal('the database has migrations that were not run; run `npm run db:migrate`');
  process.exit(1);
}
const sessionPool = new pg.Pool({ connectionString: env.DATABASE_URL, max: 4 });
// When PostgreSQL restarts, idle clients die and the pool says so here before replacing them; an
// 'error' event without a listener would end the process.
sessionPool.on('error', (err) => logger.warn({ err }, 'session pool lost a connection; it reconnects on the next request'));
const search = createSearchService({ ds: dataSource, databaseUrl: env.DATABASE_URL, logger, searchWorkers: env.IONFOLIO_SEARCH_WORKERS });
// The search workers boot while the library loads; they are sent the index once it is loaded.
search.pool.warm();
// The library index is loaded (and LISTEN in place) before the first request is accepted.
await search.start();
const app = createApp({ env, dataSource, logger, sessionPool, search });
const mail = createMailDispatcher(
  dataSource,
  { host: env.SMTP_HOST, port: env.SMTP_PORT, secure: env.SMTP_SECURE, user: env.SMTP_USER, password: env.SMTP_PASSWORD, from: env.MAIL_FROM },
  logger,
);
mail.start();

const server = app.listen(env.PORT, env.HOST, () => {
  logger.info(`Ionfolio API listening on http://${env.HOST}:${env.PORT}`);
});

let stopping = false;
async function shutdown(signal: string) {
  if (stopping) return;
  stopping = true;
  logger.info({ signal }, 'shutting down');
  mail.stop();
  server.close();
  await search.stop().catch(() => undefined);
  await sessionPool.end().catch(() => undefined);
  await dataSource.destroy().catch(() => undefined);
  process.exit(0);
}
process.on('SIGINT', () => void shutdown('SIGINT'));
process.on('SIGTERM', () => void shutdown('SIGTERM'));
