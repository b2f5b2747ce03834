/**
 * Two app processes on one database (child processes on free loopback ports): a food added, changed
 * or deleted through one is seen by the other, through PostgreSQL LISTEN/NOTIFY (services/food-sync.ts).
 */
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import request from 'supertest';
import { spawn, type ChildProcess } from 'node:child_process';
import { createServer } from 'node:net';
import pg from 'pg';

interface AppProcess {
  url: string;
  child: ChildProcess;
  output: string[];
}

function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const s = createServer();
    s.once('error', reject);
    s.listen(0, '127.0.0.1', () => {
      const { port } = s.address() as { port: number };
      s.close(() => resolve(port));
    });
  });
}

async function startApp(): Promise<AppProcess> {
  const port = await freePort();
  const child = spawn(process.execPath, ['--import', 'tsx', 'server/index.ts'], {
    env: { ...process.env, NODE_ENV: 'test', DATABASE_URL: inject('databaseUrl'), HOST: '127.0.0.1', PORT: String(port), SMTP_HOST: '', ...inject('s3Env') },
    stdio: ['ignore', 'pipe', 'pipe'],
    detached: false,
  });
  const output: string[] = [];
  await new Promise<void>((resolve, reject) => {
    const timer = setTimeout(() => reject(new Error(`app did not start:\n${output.join('')}`)), 90_000);
    child.stdout!.on('data', (d: Buffer) => {
      output.push(d.toString());
      if (d.toString().includes('Hearthswap is serving')) {
        clearTimeout(timer);
        resolve();
      }
    });
    child.stderr!.on('data', (d: Buffer) => output.push(d.toString()));
    child.once('exit', (code) => reject(new Error(`app exited with ${code}:\n${output.join('')}`)));
  });
  return { url: `http://127.0.0.1:${port}`, child, output };
}

async function stopApp(app: AppProcess | undefined) {
  if (!app || app.child.exitCode !== null) return;
  const exited = new Promise((resolve) => app.child.once('exit', resolve));
  app.child.kill('SIGTERM');
  await exited;
}

async function signIn(url: string, email: string, password: string, register: boolean) {
  const agent = request.agent(url);
  const csrf = (await agent.get('/api/auth/csrf').expect(200)).body.token as string;
  if (register)
    await agent.post('/api/auth/register').set('X-CSRF-Token', csrf).send({ email, password, displayName: 'Two-process cook', role: 'cook' }).expect(201);
  else await agent.post('/api/auth/login').set('X-CSRF-Token', csrf).send({ email, password }).expect(200);
  return { agent, csrf };
}

const FOOD = {
  name: 'Brightfield protein tortilla',
  servingSizeG: 45,
  servingLabel: '1 tortilla',
  kcal: 70,
  fatG: 2.5,
  carbsG: 19,
  fiberG: 14,
  proteinG: 6,
  sodiumMg: 450,
  roles: ['flatbread-wrap'],
};

let a: AppProcess;
let b: AppProcess;
beforeAll(async () => {
  [a, b] = await Promise.all([startApp(), startApp()]);
}, 180_000);
afterAll(async () => {
  await Promise.all([stopApp(a), stopApp(b)]);
});

describe('two app processes on one database', () => {
  it("B sees what A adds, changes and deletes, and B analyses A's saved version with its kcal", { timeout: 120_000 }, async () => {
    const email = `sync-${Date.now().toString(36)}@example.test`;
    const onA = await signIn(a.url, email, 'correct horse battery', true);
    const onB = await signIn(b.url, email, 'correct horse battery', false);

    const food = (await onA.agent.post('/api/foods').set('X-CSRF-Token', onA.csrf).send(FOOD).expect(201)).body;
    await expect.poll(async () => (await onB.agent.get(`/api/foods/${food.id}`)).status, { timeout: 15_000 }).toBe(200);
    const onBList = await onB.agent.get('/api/foods/mine').expect(200);
    expect(onBList.body.foods.map((f: { id: number }) => f.id)).toEqual([food.id]);

    const recipe = (
      await onA.agent
        .post('/api/recipes')
        .set('X-CSRF-Token', onA.csrf)
        .send({ title: 'Two-process wraps', servings: 2, text: '2 Brightfield protein tortillas' })
        .expect(201)
    ).body;
    const version = await onB.agent.get(`/api/recipes/${recipe.id}/versions/1`).expect(200);
    expect(version.body.lines[0].foodId).toBe(food.id);
    expect(version.body.lines[0].nutrients.kcal).toBeCloseTo(140, 9);
    const analysis = await onB.agent
      .post('/api/analyze')
      .send({ lines: version.body.lines.map((l: { input: string }) => ({ input: l.input })), servings: 2 })
      .expect(200);
    expect(analysis.body.lines[0].food.id).toBe(food.id);
    expect(analysis.body.perServing.kcal).toBeCloseTo(70, 9);

    // an unused food changed in place on A: B follows
    const other = (
      await onA.agent
        .post('/api/foods')
        .set('X-CSRF-Token', onA.csrf)
        .send({ ...FOOD, name: 'Brightfield spinach wrap' })
        .expect(201)
    ).body;
    await onA.agent.patch(`/api/foods/${other.id}`).set('X-CSRF-Token', onA.csrf).send({ kcal: 90 }).expect(200);
    await expect.poll(async () => (await onB.agent.get(`/api/foods/${other.id}`)).body.per100g?.kcal, { timeout: 15_000 }).toBeCloseTo(200, 9);
    await onA.agent.delete(`/api/foods/${other.id}`).set('X-CSRF-Token', onA.csrf).expect(200);
    await expect.poll(async () => (await onB.agent.get(`/api/foods/${other.id}`)).status, { timeout: 15_000 }).toBe(404);

    // the used food deleted on A: hidden on B too, and the version keeps its kcal there
    await onA.agent.delete(`/api/foods/${food.id}`).set('X-CSRF-Token', onA.csrf).expect(200);
    await expect.poll(async () => (await onB.agent.get('/api/foods/mine')).body.foods.length, { timeout: 15_000 }).toBe(0);
    const kept = await onB.agent.get(`/api/recipes/${recipe.id}/versions/1`).expect(200);
    expect(kept.body.lines[0].nutrients.kcal).toBeCloseTo(140, 9);
  });

  it('after its listening connection is cut, a process reconnects and catches up', { timeout: 120_000 }, async () => {
    const email = `sync-cut-${Date.now().toString(36)}@example.test`;
    const onA = await signIn(a.url, email, 'correct horse battery', true);
    const onB = await signIn(b.url, email, 'correct horse battery', false);
    const admin = new pg.Client({ connectionString: inject('databaseUrl') });
    await admin.connect();
    try {
      const cut = await admin.query("SELECT pg_terminate_backend(pid) FROM pg_stat_activity WHERE application_name = 'hearthswap-food-sync'");
      expect(cut.rowCount).toBeGreaterThanOrEqual(2);
    } finally {
      await admin.end();
    }
    const food = (
      await onA.agent
        .post('/api/foods')
        .set('X-CSRF-Token', onA.csrf)
        .send({ ...FOOD, name: 'Brightfield after the cut' })
        .expect(201)
    ).body;
    await expect.poll(async () => (await onB.agent.get(`/api/foods/${food.id}`)).status, { timeout: 20_000 }).toBe(200);
    expect(b.output.join('')).toMatch(/Food sync lost its database connection/);
  });
});
