/**
 * Keeps every app process's custom foods current. A trigger on `foods` (migration 0005) sends
 * NOTIFY hearthswap_foods '<id>' when a custom food is added, changed or deleted; each process holds
 * one dedicated connection that LISTENs, re-reads that food and puts it into (or drops it from) its
 * engine. A lost connection is re-opened with a growing delay, and then every custom food is re-read,
 * since notifications sent while it was down are gone.
 */
import pg from 'pg';
import type { Sequelize } from 'sequelize';
import { readCustomFood, readCustomFoods } from './catalogue';
import { dropCustomFood, existingFoodEngine, putCustomFood, replaceCustomFoods } from './food-engine';

export const FOOD_CHANNEL = 'hearthswap_foods';

export interface FoodSync {
  /** resolves once the first LISTEN is in place */
  ready: Promise<void>;
  /** resolves when every change received so far is applied */
  settled: () => Promise<void>;
  stop: () => Promise<void>;
}

export function startFoodSync(sequelize: Sequelize, connectionString: string, log: (message: string) => void = (m) => console.warn(m)): FoodSync {
  let client: pg.Client | null = null;
  let stopped = false;
  let delay = 250;
  let timer: NodeJS.Timeout | null = null;
  let connectedOnce = false;
  // Changes are applied one after another, so an older read never overwrites a newer one.
  let queue: Promise<void> = Promise.resolve();
  const enqueue = (work: () => Promise<void>) => {
    queue = queue.then(work).catch((error: unknown) => log(`Food sync could not apply a change: ${(error as Error).message}`));
    return queue;
  };

  const applyOne = (id: number) =>
    enqueue(async () => {
      const building = existingFoodEngine(sequelize);
      if (!building) return; // the engine, once built, reads the database as it is then
      const engine = await building;
      const food = await readCustomFood(sequelize, id);
      if (food) putCustomFood(engine, food);
      else dropCustomFood(engine, id);
    });

  const applyAll = () =>
    enqueue(async () => {
      const building = existingFoodEngine(sequelize);
      if (!building) return;
      const engine = await building;
      replaceCustomFoods(engine, await readCustomFoods(sequelize));
    });

  let markReady: () => void = () => {};
  const ready = new Promise<void>((resolve) => (markReady = resolve));

  const scheduleReconnect = () => {
    if (stopped || timer) return;
    timer = setTimeout(() => {
      timer = null;
      void connect();
    }, delay);
    delay = Math.min(delay * 2, 10_000);
  };

  const connect = async () => {
    if (stopped) return;
    const c = new pg.Client({ connectionString, application_name: 'hearthswap-food-sync' });
    client = c;
    let failed = false;
    const fail = (error?: Error) => {
      if (failed) return;
      failed = true;
      if (client === c) client = null;
      c.removeAllListeners('notification');
      c.end().catch(() => {});
      if (!stopped) {
        log(`Food sync lost its database connection${error ? ` (${error.message})` : ''}; reconnecting.`);
        scheduleReconnect();
      }
    };
    c.on('error', fail);
    c.on('end', () => fail());
    c.on('notification', (message) => {
      if (message.channel !== FOOD_CHANNEL) return;
      const id = Number(message.payload);
      if (Number.isInteger(id) && id > 0) void applyOne(id);
    });
    try {
      await c.connect();
      await c.query(`LISTEN ${FOOD_CHANNEL}`);
    } catch (error) {
      fail(error as Error);
      return;
    }
    if (stopped) {
      await c.end().catch(() => {});
      return;
    }
    delay = 250;
    if (connectedOnce) void applyAll();
    connectedOnce = true;
    markReady();
  };

  void connect();
  return {
    ready,
    settled: () => queue,
    stop: async () => {
      stopped = true;
      markReady();
      if (timer) clearTimeout(timer);
      const c = client;
      client = null;
      if (c) await c.end().catch(() => {});
      await queue;
    },
  };
}
