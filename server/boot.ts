import pg from 'pg';
import type { Sequelize } from 'sequelize';
import type { Server } from 'node:http';
import { createSequelize } from './db';
import { createApp } from './app';
import type { AppConfig } from './config';
import { migrate } from './migrations';
import { seed } from './seeders';
import { getFoodEngine } from './services/food-engine';
import { closeSolverPool } from './services/solver-pool';
import { startFoodSync, type FoodSync } from './services/food-sync';
import { closeLabelReader } from './services/label-reader';
import { createMailContext } from './mail-context';
import { onFallback } from '../shared/fallbacks';

// Sequelize models are bound to one instance per process, so apps in one process (tests) share it.
const shared = new Map<string, { sequelize: Sequelize; users: number; foodSync: FoodSync }>();

/**
 * A promise nobody awaited (a background mail, a store callback) must not take every signed-in
 * cook's request down with it: log it and keep serving. Route errors never get here; Express 5
 * hands them to the error handler.
 */
export function keepServingOnStrayRejections(log: (message: string, reason: unknown) => void = console.error) {
  process.on('unhandledRejection', (reason) => log('Unhandled promise rejection (still serving):', reason));
}

/** Everything a running server holds, so that tests and scripts can start and stop it cleanly. */
export async function openServices(config: AppConfig) {
  let entry = shared.get(config.databaseUrl);
  if (!entry) {
    const sequelize = createSequelize(config.databaseUrl);
    entry = { sequelize, users: 0, foodSync: startFoodSync(sequelize, config.databaseUrl) };
    shared.set(config.databaseUrl, entry);
  }
  entry.users++;
  const { sequelize } = entry;
  await sequelize.authenticate();
  const sessionPool = new pg.Pool({ connectionString: config.databaseUrl, ...SESSION_POOL_OPTIONS });
  // An idle client losing its connection (PostgreSQL restarting) emits 'error' on the pool; without a
  // listener Node would exit. The pool drops that client and the next request connects afresh.
  sessionPool.on('error', (error) => console.warn(`Session store: lost a database connection (${error.message}).`));
  let closed = false;
  const close = async () => {
    if (closed) return;
    closed = true;
    await sessionPool.end().catch(() => {});
    if (--entry.users === 0) {
      shared.delete(config.databaseUrl);
      await entry.foodSync.stop();
      await closeSolverPool().catch(() => {});
      await closeLabelReader().catch(() => {});
      await sequelize.close().catch(() => {});
    }
  };
  return { sequelize, sessionPool, foodSync: entry.foodSync, close };
}

/**
 * The session store, the rate-limit counters and the outbox share this pool. Two connections stay
 * open however long the server is idle (pg-pool closes the others after 10 s idle): every signed-in
 * request and an anonymous analysis's rate-limit lease start with a query here, and a fresh
 * connection costs tens of milliseconds (about 60 ms measured on the busy 2-core development machine,
 * against under 1 ms for a query on an open one), so a cook's first analysis after a pause paid it.
 */
export const SESSION_POOL_OPTIONS = { max: 5, min: 2, connectionTimeoutMillis: 5_000 } satisfies pg.PoolConfig;

export async function prepareDatabase(config: AppConfig, services: Awaited<ReturnType<typeof openServices>>) {
  await migrate(services.sequelize);
  return seed(services.sequelize, { demo: config.env !== 'production' });
}

export async function startServer(config: AppConfig) {
  const services = await openServices(config);
  const mail = await createMailContext(config, process.env, services.sessionPool);
  const app = createApp({ config, ...services, mail: mail.mail });
  await getFoodEngine(services.sequelize);
  // A fallback means a bug was caught on a user's line: say where, so it gets fixed.
  const stopFallbackLog = onFallback((site, error) => console.warn(`fallback taken at ${site}:`, error));
  await services.foodSync.ready;
  const server = await new Promise<Server>((resolve) => {
    const s = app.listen(config.port, config.host, () => resolve(s));
  });
  return {
    app,
    server,
    services,
    mail,
    close: async () => {
      stopFallbackLog();
      await new Promise<void>((resolve) => server.close(() => resolve()));
      await mail.close();
      await services.close();
    },
  };
}
