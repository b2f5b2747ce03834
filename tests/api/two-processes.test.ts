/**
 * Two app processes on one database, as behind a load balancer: the compiled server
 * (dist/server-style bundle, run with plain node) twice, each on its own port. Sessions, rate-limit
 * counters and the development outbox must be shared; a rewrite runs in the compiled worker.
 */
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { rm } from 'node:fs/promises';
import path from 'node:path';
import { buildServer } from '../../scripts/build-server';
import { CookieJar, startServerProcess, type ServerProcess } from '../helpers/server-process';
import { uniqueEmail } from '../helpers/test-app';
import { DEMO_ACCOUNTS } from '../../server/seeders/demo-accounts';

// inside the project, so the bundle finds node_modules the way dist/server does
const outdir = path.resolve(`.data/server-build-${process.pid}`);
let a: ServerProcess;
let b: ServerProcess;

beforeAll(async () => {
  await buildServer(outdir);
  const env = { NODE_ENV: 'test', DATABASE_URL: inject('databaseUrl'), ...inject('s3Env') };
  [a, b] = await Promise.all([startServerProcess(path.join(outdir, 'index.js'), env), startServerProcess(path.join(outdir, 'index.js'), env)]);
}, 180_000);

afterAll(async () => {
  await Promise.all([a?.stop(), b?.stop()]);
  await rm(outdir, { recursive: true, force: true });
});

async function csrf(jar: CookieJar, server: ServerProcess) {
  const res = await jar.json(`${server.url}/api/auth/csrf`);
  expect(res.status).toBe(200);
  return res.body.token as string;
}

describe('two app processes on one database', () => {
  it('run as separate processes', () => {
    expect(a.pid).not.toBe(b.pid);
    expect(a.url).not.toBe(b.url);
  });

  it('share sessions: signed up on one, the cookie works on the other, signed out everywhere', async () => {
    const jar = new CookieJar();
    const email = uniqueEmail('twoproc');
    const created = await jar.json(
      `${a.url}/api/auth/register`,
      'POST',
      { email, password: 'correct horse battery', displayName: 'Two Rooms', role: 'cook' },
      await csrf(jar, a),
    );
    expect(created.status).toBe(201);
    const me = await jar.json(`${b.url}/api/auth/me`);
    expect(me.status).toBe(200);
    expect(me.body.email).toBe(email);
    const recipe = await jar.json(`${b.url}/api/recipes`);
    expect(recipe.status).toBe(200);
    // the CSRF token lives in the session too: one from A is good on B
    const out = await jar.fetch(`${b.url}/api/auth/logout`, { method: 'POST', headers: { 'X-CSRF-Token': await csrf(jar, a) } });
    expect(out.status).toBe(204);
    expect((await jar.json(`${a.url}/api/auth/me`)).status).toBe(401);
  });

  it('share rate-limit counters: failed sign-ins on both add up', async () => {
    const owner = new CookieJar();
    const email = uniqueEmail('twoproc-limit');
    expect(
      (
        await owner.json(
          `${a.url}/api/auth/register`,
          'POST',
          { email, password: 'correct horse battery', displayName: 'Limit', role: 'cook' },
          await csrf(owner, a),
        )
      ).status,
    ).toBe(201);
    const guesser = new CookieJar();
    // default limit: 10 failures per account and address in 15 minutes; 5 on each process
    for (let i = 0; i < 10; i++) {
      const server = i % 2 === 0 ? a : b;
      const res = await guesser.json(`${server.url}/api/auth/login`, 'POST', { email, password: `wrong-guess-${i}` }, await csrf(guesser, server));
      expect(res.status).toBe(401);
    }
    for (const server of [a, b]) {
      const res = await guesser.json(`${server.url}/api/auth/login`, 'POST', { email, password: 'correct horse battery' }, await csrf(guesser, server));
      expect(res.status).toBe(429);
    }
  });

  it('share the development outbox: mail sent through one is read through the other', async () => {
    const jar = new CookieJar();
    const email = uniqueEmail('twoproc-mail');
    expect(
      (
        await jar.json(
          `${a.url}/api/auth/register`,
          'POST',
          { email, password: 'correct horse battery', displayName: 'Mail', role: 'cook' },
          await csrf(jar, a),
        )
      ).status,
    ).toBe(201);
    const anon = new CookieJar();
    expect((await anon.json(`${a.url}/api/auth/password-reset`, 'POST', { email }, await csrf(anon, a))).status).toBe(202);
    const admin = new CookieJar();
    const demo = DEMO_ACCOUNTS.find((d) => d.role === 'admin')!;
    expect((await admin.json(`${b.url}/api/auth/login`, 'POST', { email: demo.email, password: demo.password }, await csrf(admin, b))).status).toBe(200);
    let found: { to: string[]; subject: string } | undefined;
    // the reset mail may leave after the answer; give it a few seconds
    for (let i = 0; i < 50 && !found; i++) {
      const res = await admin.json(`${b.url}/api/dev/outbox?limit=50`);
      expect(res.status).toBe(200);
      found = (res.body.messages as { to: string[]; subject: string }[]).find((m) => m.to.includes(email));
      if (!found) await new Promise((r) => setTimeout(r, 200));
    }
    expect(found, 'reset mail in the outbox read through the other process').toBeDefined();
    expect(found!.subject).toMatch(/password/i);
  });

  it('solve a rewrite in the compiled worker', async () => {
    const res = await new CookieJar().json(`${b.url}/api/rewrite`, 'POST', {
      text: '2 cups shredded sharp cheddar\n1 lb ground beef\n12 oz elbow macaroni',
      servings: 4,
      targets: { proteinMinG: 40, kcalMax: 700 },
    });
    expect(res.status, b.output()).toBe(200);
    expect(['optimal', 'infeasible']).toContain(res.body.status);
  });
});
