/**
 * Fault test: the real server process keeps running through a PostgreSQL restart under steady saves.
 * It uses a private cluster of its own (own data folder, own free port) so the shared test database
 * is never disturbed, and stops it with `pg_ctl stop -m fast` as an operator would.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { execFile, spawn, type ChildProcess } from 'node:child_process';
import { createServer } from 'node:net';
import { promisify } from 'node:util';
import request from 'supertest';
import pg from 'pg';
import { startPrivatePostgres, type PrivatePostgres } from '../../scripts/postgres';

const run = promisify(execFile);

function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const probe = createServer();
    probe.once('error', reject);
    probe.listen(0, '127.0.0.1', () => {
      const address = probe.address();
      const port = typeof address === 'object' && address ? address.port : 0;
      probe.close(() => resolve(port));
    });
  });
}

const sleep = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));

async function until(what: string, check: () => Promise<boolean>, timeoutMs: number) {
  const started = Date.now();
  while (Date.now() - started < timeoutMs) {
    if (await check().catch(() => false)) return Date.now() - started;
    await sleep(50);
  }
  throw new Error(`Timed out waiting for ${what}`);
}

let cluster: PrivatePostgres;
let server: ChildProcess;
let baseUrl: string;
let serverLog = '';

beforeAll(async () => {
  const pgPort = await freePort();
  cluster = await startPrivatePostgres({ dataDir: '.data/postgres-fault', port: pgPort, database: 'postgres', durable: true, log: () => {} });
  const admin = new pg.Client({ connectionString: cluster.url });
  admin.on('error', () => {});
  await admin.connect();
  await admin.query('DROP DATABASE IF EXISTS hearthswap_fault WITH (FORCE)');
  await admin.query('CREATE DATABASE hearthswap_fault');
  await admin.end();
  const databaseUrl = cluster.url.replace(/\/postgres$/, '/hearthswap_fault');
  const env = { ...process.env, NODE_ENV: 'test', DATABASE_URL: databaseUrl, HOST: '127.0.0.1', S3_BUCKET: '' };
  await run(process.execPath, ['--import', 'tsx', 'scripts/db.ts', 'migrate'], { env });

  const port = await freePort();
  baseUrl = `http://127.0.0.1:${port}`;
  server = spawn(process.execPath, ['--import', 'tsx', 'server/index.ts'], { env: { ...env, PORT: String(port) }, stdio: ['ignore', 'pipe', 'pipe'] });
  server.stdout!.on('data', (chunk) => (serverLog += chunk));
  server.stderr!.on('data', (chunk) => (serverLog += chunk));
  await until('the server to answer', async () => (await request(baseUrl).get('/api/health')).status === 200, 90_000);
}, 180_000);

afterAll(async () => {
  if (server && server.exitCode === null) {
    server.kill('SIGTERM');
    await new Promise((resolve) => server.once('exit', resolve));
  }
  cluster?.stop();
});

describe('PostgreSQL restarts under steady saves', () => {
  it('keeps the process alive, answers 503 while the database is away, serves again, and loses no acknowledged save', async () => {
    const agent = request.agent(baseUrl);
    const csrf = (await agent.get('/api/auth/csrf').expect(200)).body.token as string;
    await agent
      .post('/api/auth/register')
      .set('X-CSRF-Token', csrf)
      .send({ email: `fault-${Date.now()}@example.test`, password: 'correct horse battery', displayName: 'Fault cook', role: 'cook' })
      .expect(201);

    const acknowledged: number[] = [];
    const failures: { status: number; code: string | undefined }[] = [];
    let saving = true;
    let n = 0;
    const saver = async () => {
      while (saving) {
        n++;
        try {
          const res = await agent
            .post('/api/recipes')
            .set('X-CSRF-Token', csrf)
            .send({ title: `Steady save ${n}`, servings: 2, lines: [{ input: '200 g cooked rice' }] });
          if (res.status === 201) acknowledged.push(res.body.id);
          else failures.push({ status: res.status, code: res.body?.error?.code });
        } catch (error) {
          failures.push({ status: 0, code: (error as Error).message });
        }
        await sleep(20);
      }
    };
    const savers = [saver(), saver()];
    let beforeStop = 0;
    try {
      await until('some saves before the stop', async () => acknowledged.length >= 5, 30_000);
      beforeStop = acknowledged.length;
      cluster.pause();

      // While PostgreSQL is away: health says so, data routes answer a clear 503, the process lives on.
      const health = await agent.get('/api/health');
      expect(health.status).toBe(503);
      expect(health.body).toEqual({ ok: false, db: 'down' });
      const list = await agent.get('/api/recipes');
      expect(list.status).toBe(503);
      expect(list.body.error.code).toBe('database_unavailable');
      expect(list.body.error.message).toMatch(/database/i);
      await sleep(3_000);
      expect(server.exitCode).toBeNull();
      const failuresWhileDown = failures.length;
      expect(failuresWhileDown).toBeGreaterThan(0);

      cluster.resume();
      const recoveryMs = await until('health to come back', async () => (await request(baseUrl).get('/api/health')).status === 200, 30_000);
      console.log(`Health answered 200 again ${recoveryMs} ms after pg_ctl start returned.`);
      const ackedAtRestart = acknowledged.length;
      await until('saves to succeed again', async () => acknowledged.length >= ackedAtRestart + 5, 30_000);
    } finally {
      saving = false;
      await Promise.allSettled(savers);
    }

    expect(server.exitCode).toBeNull();
    expect(acknowledged.length).toBeGreaterThan(beforeStop);
    // Every refused save was a 503 naming the database, never a 500.
    expect(failures.length).toBeGreaterThan(0);
    for (const f of failures) expect(f).toEqual({ status: 503, code: 'database_unavailable' });
    // The session lived in PostgreSQL and survived the restart: the same agent still reads its list
    // (a save whose answer was lost may also be there, so at least every acknowledged one).
    const after = await agent.get('/api/recipes').expect(200);
    const listed = new Set(after.body.recipes.map((r: { id: number }) => r.id));
    expect(acknowledged.filter((id) => !listed.has(id))).toEqual([]);

    const db = new pg.Client({ connectionString: cluster.url.replace(/\/postgres$/, '/hearthswap_fault') });
    db.on('error', () => {});
    await db.connect();
    try {
      const found = await db.query('SELECT id FROM recipes WHERE id = ANY($1::int[])', [acknowledged]);
      expect(found.rowCount).toBe(acknowledged.length);
    } finally {
      await db.end();
    }
    expect(serverLog).not.toMatch(/Unhandled|uncaught/i);
  }, 120_000);
});
