import { existsSync } from 'node:fs';
import path from 'node:path';
import { randomUUID } from 'node:crypto';
import express, { type Express } from 'express';
import session from 'express-session';
import connectPgSimple from 'connect-pg-simple';
import helmet from 'helmet';
import { pinoHttp } from 'pino-http';
import pg from 'pg';
import type { Logger } from 'pino';
import type { DataSource } from 'typeorm';
import type { Env } from './config/env';
import { apiNotFound, errorMiddleware } from './shared/error-middleware';
import { csrfGuard } from './shared/csrf-guard';
import { sessionCookieOptions } from './shared/session-cookie';
import { signInRateLimit } from './shared/sign-in-rate-limit';
import { healthRoutes } from './modules/health/health.routes';
import { authRoutes } from './modules/auth/auth.routes';
import { configurePassport } from './modules/auth/auth.service';
import { usersRoutes } from './modules/users/users.routes';
import { entriesRoutes } from './modules/entries/entries.routes';
import { entriesCsvRoutes } from './modules/entries/entries-csv.routes';
import { structureSearchRoutes } from './modules/structure-search/structure-search.routes';
import { overviewRoutes } from './modules/overview/overview.routes';
import { reviewsRoutes } from './modules/reviews/reviews.routes';
import { editionsRoutes } from './modules/editions/editions.routes';
import { uploadsRoutes } from './modules/uploads/uploads.routes';
import { structuresRoutes } from './modules/structures/structures.routes';
import { importsRoutes } from './modules/imports/imports.routes';
import { adminRoutes } from './modules/admin/admin.routes';
import { accessKeyAuth } from './modules/access-keys/access-key-auth';
import { accessKeysRoutes } from './modules/access-keys/access-keys.routes';
import { identifyRoutes } from './modules/identify/identify.routes';
import { rateLimit } from './modules/identify/rate-limit';
import { createSearchService, type SearchService } from './modules/identify/search-service';
import { formulasRoutes } from './modules/formulas/formulas.routes';
import { openapiRoutes } from './modules/openapi/openapi.routes';

export interface AppDeps {
  env: Env;
  dataSource: DataSource;
  logger: Logger;
  sessionPool: pg.Pool;
  /** The library index, its listener and batch runner; made here when not given (tests). main.ts starts it. */
  search?: SearchService;
}

/** The search service of an app built by createApp (to start and stop it). */
export const searchServiceOf = (app: Express): SearchService => app.locals.search as SearchService;

/** Builds the Express app. It never listens: main.ts and the tests do that. */
export function createApp({ env, dataSource, logger, sessionPool, search: givenSearch }: AppDeps): Express {
  const app = express();
  const search = givenSearch ?? createSearchService({ ds: dataSource, databaseUrl: env.DATABASE_URL, logger, searchWorkers: env.IONFOLIO_SEARCH_WORKERS });
  app.locals.search = search;
  const identifyLimit = rateLimit({ perMinute: env.IDENTIFY_RATE_PER_MINUTE, burst: env.IDENTIFY_RATE_BURST });
  app.disable('x-powered-by');
  app.set('trust proxy', 'loopback');

  app.use(
    pinoHttp({
      logger,
      genReqId: (req, res) => {
        const id = randomUUID();
        res.setHeader('X-Request-Id', id);
        return id;
      },
      autoLogging: { ignore: (req) => req.url === '/api/health' },
      // One short line per request: method, path, status, time; never headers or cookies.
      serializers: {
        req: (req: { id: unknown; method: string; url: string }) => ({ id: req.id, method: req.method, url: req.url }),
        res: (res: { statusCode: number }) => ({ status: res.statusCode }),
      },
    }),
  );
  app.use(
    helmet({
      contentSecurityPolicy: {
        directives: {
          defaultSrc: ["'self'"],
          scriptSrc: ["'self'"],
          styleSrc: ["'self'", "'unsafe-inline'"],
          imgSrc: ["'self'", 'data:'],
          fontSrc: ["'self'", 'data:'],
          connectSrc: ["'self'"],
          formAction: ["'self'", new URL(env.GITHUB_AUTHORIZATION_URL).origin],
          upgradeInsecureRequests: null,
        },
      },
    }),
  );
  app.use(express.json({ limit: '2mb' }));

  const PgStore = connectPgSimple(session);
  app.use(
    session({
      name: 'ionfolio.sid',
      store: new PgStore({ pool: sessionPool, tableName: 'session', createTableIfMissing: false }),
      secret: env.SESSION_SECRET,
      resave: false,
      saveUninitialized: false,
      rolling: true,
      cookie: sessionCookieOptions(env.PUBLIC_URL),
    }),
  );
  const passport = configurePassport(dataSource, env);
  app.use(passport.initialize());
  app.use(passport.session());

  app.use('/api', healthRoutes(dataSource));
  app.use(authRoutes(passport, { localStandIn: env.AUTH_LOCAL_STAND_IN, signInLimit: signInRateLimit({ perMinute: env.SIGN_IN_RATE_PER_MINUTE }) }));
  app.use(
    '/api/v1',
    openapiRoutes(),
    accessKeyAuth(dataSource),
    csrfGuard,
    usersRoutes(dataSource),
    entriesRoutes(dataSource),
    entriesCsvRoutes(dataSource),
    structureSearchRoutes(dataSource),
    overviewRoutes(dataSource),
    reviewsRoutes(dataSource),
    editionsRoutes(dataSource),
    uploadsRoutes(),
    structuresRoutes(),
    importsRoutes(dataSource, logger),
    adminRoutes(dataSource),
    accessKeysRoutes(dataSource),
    identifyRoutes(search, { limit: identifyLimit, maxBatchSpectra: env.IDENTIFY_BATCH_MAX_SPECTRA }),
    formulasRoutes({ limit: identifyLimit }),
  );
  app.use(['/api', '/auth'], apiNotFound);

  // The built web app, with history fallback for client-side routes.
  const webDist = path.resolve(env.WEB_DIST);
  if (existsSync(path.join(webDist, 'index.html'))) {
    app.use(express.static(webDist, { index: false, maxAge: '1h' }));
    app.get(/.*/, (_req, res) => {
      res.sendFile(path.join(webDist, 'index.html'));
    });
  }
  app.use(apiNotFound);
  app.use(errorMiddleware);
  return app;
}
