import express from 'express';
import session from 'express-session';
import cookieParser from 'cookie-parser';
import helmet from 'helmet';
import compression from 'compression';
import expressStaticGzip from 'express-static-gzip';
import { existsSync } from 'node:fs';
import path from 'node:path';
import type { Sequelize } from 'sequelize';
import pg from 'pg';
import type { AppConfig } from './config';
import { initModels, User } from './models';
import { configurePassport } from './middleware/auth';
import { createRateLimits } from './middleware/rate-limits';
import { SessionStore } from './middleware/session-store';
import { apiNotFound, errorHandler } from './middleware/errors';
import { authRouter } from './routes/auth';
import { healthRouter } from './routes/health';
import { adminRouter } from './routes/admin';
import { analyzeRouter } from './routes/analyze';
import { foodsRouter } from './routes/foods';
import { rewriteRouter } from './routes/rewrite';
import { recipesRouter } from './routes/recipes';
import { swapsRouter } from './routes/swaps';
import { clientsRouter } from './routes/clients';
import { invitationsRouter } from './routes/invitations';
import { myCoachRouter } from './routes/my-coach';
import { targetsRouter } from './routes/targets';
import { commentsRouter, unreadCommentsRouter } from './routes/comments';
import { outboxRouter } from './routes/outbox';
import { prepRouter, shoppingListsRouter } from './routes/prep';
import { rejectUnsafeText } from './middleware/text-safety';
import { createCsrf, isComputeRoute, readCookie } from './middleware/csrf';
import { compressJsonAnswers } from './middleware/compress-json';
import { HttpError } from './lib/http-error';
import type { Mailer, StoredMail } from './mail';
import { createClientShell, fillShell } from './lib/client-shell';
import { createPageRenderer } from './render/page-renderer';

export interface AppContext {
  config: AppConfig;
  sequelize: Sequelize;
  /** pg pool for the session store, the rate-limit counters and the development outbox */
  sessionPool: pg.Pool;
  /** outgoing mail; the development outbox (newest first) is readable when `outbox` is given */
  mail?: { mailer: Mailer; appUrl: string; outbox?: (limit: number) => Promise<StoredMail[]> };
  /** where unexpected errors (500s) are logged; console.error unless given. 4xx answers are never logged. */
  logError?: (error: unknown) => void;
}

/** Without SMTP settings mail is refused with a clear 503 rather than silently dropped. */
const NO_MAILER: Mailer = {
  send: async () => {
    throw new HttpError(503, 'mail_unavailable', 'E-mail is not configured on this server (set SMTP_HOST and SMTP_PORT).');
  },
};

const SESSION_COOKIE = 'hearthswap.sid';

export function createApp(context: AppContext) {
  const { config, sequelize, sessionPool } = context;
  const mail = { mailer: context.mail?.mailer ?? NO_MAILER, appUrl: context.mail?.appUrl ?? `http://${config.host}:${config.port}` };
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
  // gzip, or brotli when the browser offers it; small answers (< 1 KB) go as they are
  app.use(compression({ threshold: 1024 }));

  const clientDir = config.clientDir && existsSync(path.join(config.clientDir, 'index.html')) ? config.clientDir : null;
  if (clientDir) {
    // Before the body parsers and the session: a page's scripts, style sheets and fonts need neither,
    // and a signed-in visit would otherwise read (and, rolling, rewrite) its session once per file.
    // Vite names every file under assets/ by its content hash: a changed file gets a new name. The
    // build leaves .br and .gz copies beside them (vite.config.ts); those go out as they are.
    app.use(
      '/assets',
      expressStaticGzip(path.join(clientDir, 'assets'), {
        enableBrotli: true,
        orderPreference: ['br', 'gz'],
        serveStatic: { index: false, immutable: true, maxAge: '1y' },
      }),
    );
    // a chunk an old page asks for after a deploy: a 404, not index.html served as JavaScript
    app.use('/assets', (_req, res) => {
      res.status(404).type('text/plain').send('Not found');
    });
  }

  app.use(compressJsonAnswers());
  app.use(express.json({ limit: '1mb' }));
  app.use(rejectUnsafeText);
  // Before the session: a probe never needs one, and must answer { db: 'down' } even when the
  // session store cannot be read.
  app.use('/api/health', healthRouter(sequelize));

  // signed cookies (the known-browser cookie of sign-in limits) use the session secret
  app.use(cookieParser(config.sessionSecret));
  const sessions = session({
    name: SESSION_COOKIE,
    secret: config.sessionSecret,
    store: new SessionStore({ pool: sessionPool, tableName: 'session', usersTable: User.getTableName() as string, createTableIfMissing: false }),
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
  });
  const signedIn = [sessions, passport.initialize(), passport.session()];
  // An anonymous call of a compute route (no session cookie) has no one to find and starts no
  // session: express-session would make one only to drop it unsaved, and passport would find no user.
  const anonymousCompute = (req: express.Request) => isComputeRoute(req) && readCookie(req, SESSION_COOKIE) === undefined;
  for (const handler of signedIn) app.use((req, res, next) => (anonymousCompute(req) ? next() : handler(req, res, next)));

  const csrf = createCsrf(config);

  const limits = createRateLimits(sessionPool, config.limits, config.secureCookies);
  const api = express.Router();
  api.use(csrf.protect);
  api.use('/auth', authRouter({ sequelize, limits, csrf, mail, s3: config.s3 }));
  api.use('/admin', adminRouter());
  api.use('/analyze', analyzeRouter(sequelize, limits.compute));
  api.use('/foods', foodsRouter(sequelize));
  api.use('/rewrite', rewriteRouter(sequelize, limits.compute));
  api.use('/recipes/:id/versions/:number/comments', commentsRouter(mail));
  api.use('/comments', unreadCommentsRouter());
  api.use('/recipes/:id/versions/:number/prep', prepRouter(sequelize));
  api.use('/shopping-lists', shoppingListsRouter(sequelize));
  api.use('/recipes', recipesRouter(sequelize, config, limits));
  api.use('/swaps', swapsRouter(sequelize));
  api.use('/clients', clientsRouter(sequelize, mail));
  api.use('/invitations', invitationsRouter(sequelize));
  api.use('/coach', myCoachRouter(sequelize));
  api.use('/targets', targetsRouter());
  if (config.env !== 'production' && context.mail?.outbox) api.use('/dev/outbox', outboxRouter(context.mail.outbox));
  api.use(apiNotFound);
  app.use('/api', api);

  if (clientDir) {
    const shell = createClientShell(clientDir);
    app.use(express.static(clientDir, { index: false, setHeaders: (res) => res.setHeader('Cache-Control', 'no-cache') }));
    const pages = createPageRenderer(config.renderDir);
    const logError = context.logError ?? ((error: unknown) => console.error(error));
    app.get(/^(?!\/api\/).*/, async (req, res) => {
      let html = shell.html(req.path);
      if (pages.available) {
        try {
          html = fillShell(html, await pages.render(req.originalUrl, req.user ?? null));
        } catch (error) {
          // the page still works, drawn in the browser; a failed server render is a bug to see in the log
          logError(error);
        }
      }
      // the page carries who is signed in: no shared cache may keep it
      res.setHeader('Cache-Control', 'private, no-cache');
      res.type('html').send(html);
    });
  }

  app.use(errorHandler(context.logError));
  return app;
}
