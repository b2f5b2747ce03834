import express, { type RequestHandler } from 'express';
import session from 'express-session';
import connectPgSimple from 'connect-pg-simple';
import helmet from 'helmet';
import { csrfSync } from 'csrf-sync';
import { existsSync } from 'node:fs';
import path from 'node:path';
import type { Sequelize } from 'sequelize';
import pg from 'pg';
import type { AppConfig } from './config';
import { initModels } from './models';
import { configurePassport } from './middleware/auth';
import { createRateLimits } from './middleware/rate-limits';
import { apiNotFound, errorHandler } from './middleware/errors';
import { authRouter } from './routes/auth';
import { healthRouter } from './routes/health';
import { adminRouter } from './routes/admin';

export interface AppContext {
  config: AppConfig;
  sequelize: Sequelize;
  /** pg pool for the session store */
  sessionPool: pg.Pool;
}

/** Routes that compute and change nothing: callable without a CSRF token (anonymous API use). */
const CSRF_EXEMPT = new Set(['/api/analyze', '/api/rewrite', '/api/targets/estimate']);

export function createApp(context: AppContext) {
  const { config, sequelize, sessionPool } = context;
  initModels(sequelize);
  const passport = configurePassport();
  const app = express();
  app.disable('x-powered-by');
  app.set('trust proxy', config.trustProxy);

  app.use(
    helmet({
      contentSecurityPolicy: {
        directives: {
          'img-src': ["'self'", 'data:', 'blob:'],
          'upgrade-insecure-requests': null,
        },
      },
    }),
  );
  app.use(express.json({ limit: '1mb' }));

  const PgStore = connectPgSimple(session);
  app.use(
    session({
      name: 'hearthswap.sid',
      secret: config.sessionSecret,
      store: new PgStore({ pool: sessionPool, tableName: 'session', createTableIfMissing: false }),
      resave: false,
      saveUninitialized: false,
      rolling: true,
      proxy: config.trustProxy !== false,
      cookie: {
        httpOnly: true,
        sameSite: 'lax',
        secure: config.secureCookies,
        maxAge: 30 * 24 * 60 * 60 * 1000,
      },
    }),
  );
  app.use(passport.initialize());
  app.use(passport.session());

  const { generateToken, csrfSynchronisedProtection } = csrfSync({
    getTokenFromRequest: (req) => req.headers['x-csrf-token'] as string | undefined,
  });
  const csrf: RequestHandler = (req, res, next) =>
    CSRF_EXEMPT.has(req.path) ? next() : csrfSynchronisedProtection(req, res, next);

  const limits = createRateLimits(config.limits);
  const api = express.Router();
  api.use(csrf);
  api.use('/health', healthRouter(sequelize));
  api.use('/auth', authRouter(limits, (req) => generateToken(req)));
  api.use('/admin', adminRouter());
  api.use(apiNotFound);
  app.use('/api', api);

  if (config.clientDir && existsSync(path.join(config.clientDir, 'index.html'))) {
    const clientDir = config.clientDir;
    app.use(express.static(clientDir, { index: false, maxAge: '1h' }));
    app.get(/^(?!\/api\/).*/, (_req, res) => res.sendFile(path.join(clientDir, 'index.html')));
  }

  app.use(errorHandler());
  return app;
}
