import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { agentWithCsrf, createTestApp, signUp, uniqueEmail, type TestApp } from '../helpers/test-app';
import { DEMO_ACCOUNTS } from '../../server/seeders/demo-accounts';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(async () => {
  await t.close();
});

describe('health', () => {
  it('reports the database up', async () => {
    const res = await request(t.app).get('/api/health').expect(200);
    expect(res.body).toEqual({ ok: true, db: 'up' });
  });
});

describe('sign-up', () => {
  it('names every invalid field in a 400', async () => {
    const { agent, csrf } = await agentWithCsrf(t.app);
    const res = await agent.post('/api/auth/register').set('X-CSRF-Token', csrf).send({ email: 'not-an-email', password: 'short', role: 'chef' }).expect(400);
    expect(res.body.error.code).toBe('validation_failed');
    const fields = Object.keys(res.body.error.details.fieldErrors).sort();
    expect(fields).toEqual(['displayName', 'email', 'password', 'role']);
    expect(res.body.error.message).toContain('email');
  });

  it('creates a cook, signs them in and hides the password hash', async () => {
    const { agent, user, email } = await signUp(t.app, 'cook');
    expect(user).toMatchObject({ email, role: 'cook', coachId: null });
    expect(user.passwordHash).toBeUndefined();
    const me = await agent.get('/api/auth/me').expect(200);
    expect(me.body.id).toBe(user.id);
  });

  it('refuses a duplicate e-mail with 409', async () => {
    const { email } = await signUp(t.app, 'coach');
    const { agent, csrf } = await agentWithCsrf(t.app);
    const res = await agent
      .post('/api/auth/register')
      .set('X-CSRF-Token', csrf)
      .send({ email: email.toUpperCase(), password: 'another long password', displayName: 'Dup', role: 'cook' })
      .expect(409);
    expect(res.body.error.message).toMatch(/already exists/);
  });

  it('cannot register as admin', async () => {
    const { agent, csrf } = await agentWithCsrf(t.app);
    const res = await agent
      .post('/api/auth/register')
      .set('X-CSRF-Token', csrf)
      .send({ email: uniqueEmail(), password: 'long enough password', displayName: 'X', role: 'admin' })
      .expect(400);
    expect(res.body.error.details.fieldErrors.role).toBeDefined();
  });
});

describe('sign-in and sign-out', () => {
  it('rejects a wrong password with 401', async () => {
    const { email } = await signUp(t.app);
    const { agent, csrf } = await agentWithCsrf(t.app);
    const res = await agent.post('/api/auth/login').set('X-CSRF-Token', csrf).send({ email, password: 'wrong password!' }).expect(401);
    expect(res.body.error.code).toBe('invalid_credentials');
    await agent.get('/api/auth/me').expect(401);
  });

  it('signs in the demo cook with an HttpOnly, SameSite=Lax cookie and a new session id', async () => {
    const demo = DEMO_ACCOUNTS.find((a) => a.role === 'cook')!;
    const { agent, csrf } = await agentWithCsrf(t.app);
    const before = await agent.get('/api/auth/csrf');
    const res = await agent.post('/api/auth/login').set('X-CSRF-Token', csrf).send({ email: demo.email, password: demo.password }).expect(200);
    expect(res.body).toMatchObject({ email: demo.email, role: 'cook' });
    const cookie = String(res.headers['set-cookie']);
    expect(cookie).toMatch(/hearthswap\.sid=/);
    expect(cookie).toMatch(/HttpOnly/i);
    expect(cookie).toMatch(/SameSite=Lax/i);
    expect(cookie).not.toBe(String(before.headers['set-cookie']));
    const me = await agent.get('/api/auth/me').expect(200);
    expect(me.body.email).toBe(demo.email);
  });

  it('logs out and forgets the session', async () => {
    const { agent, csrf } = await signUp(t.app);
    await agent.post('/api/auth/logout').set('X-CSRF-Token', csrf).expect(204);
    await agent.get('/api/auth/me').expect(401);
  });

  it('keeps a session across an app restart (sessions live in PostgreSQL)', async () => {
    const { agent, user } = await signUp(t.app);
    const cookie = (await agent.get('/api/auth/me')).request.cookies;
    const restarted = await createTestApp();
    try {
      const res = await request(restarted.app).get('/api/auth/me').set('Cookie', cookie).expect(200);
      expect(res.body.id).toBe(user.id);
    } finally {
      await restarted.close();
    }
  });

  it('updates the display name and unit system on the account', async () => {
    const { agent, csrf } = await signUp(t.app);
    const res = await agent.patch('/api/auth/me').set('X-CSRF-Token', csrf).send({ unitSystem: 'metric', displayName: 'Renamed' }).expect(200);
    expect(res.body).toMatchObject({ unitSystem: 'metric', displayName: 'Renamed' });
    const bad = await agent.patch('/api/auth/me').set('X-CSRF-Token', csrf).send({ unitSystem: 'imperial' }).expect(400);
    expect(bad.body.error.details.fieldErrors.unitSystem).toBeDefined();
  });
});

describe('CSRF', () => {
  it('refuses a state-changing request without the token (403)', async () => {
    const res = await request(t.app)
      .post('/api/auth/register')
      .send({ email: uniqueEmail(), password: 'long enough password', displayName: 'X', role: 'cook' })
      .expect(403);
    expect(res.body.error.code).toBe('csrf_invalid');
  });

  it('refuses a wrong token (403)', async () => {
    const { agent } = await agentWithCsrf(t.app);
    await agent.post('/api/auth/logout').set('X-CSRF-Token', 'forged').expect(403);
  });
});

describe('roles', () => {
  it('refuses a cook on the admin routes (403) and a signed-out visitor (401)', async () => {
    const { agent, csrf } = await signUp(t.app);
    await agent.get('/api/admin/users').expect(403);
    await agent.patch('/api/admin/users/1').set('X-CSRF-Token', csrf).send({ role: 'admin' }).expect(403);
    await request(t.app).get('/api/admin/users').expect(401);
  });

  it('lets the admin list users and change a role', async () => {
    const admin = DEMO_ACCOUNTS.find((a) => a.role === 'admin')!;
    const { user } = await signUp(t.app);
    const { agent, csrf } = await agentWithCsrf(t.app);
    await agent.post('/api/auth/login').set('X-CSRF-Token', csrf).send({ email: admin.email, password: admin.password }).expect(200);
    const list = await agent.get('/api/admin/users').expect(200);
    expect(list.body.users.some((u: { id: number }) => u.id === user.id)).toBe(true);
    const changed = await agent.patch(`/api/admin/users/${user.id}`).set('X-CSRF-Token', csrf).send({ role: 'coach' }).expect(200);
    expect(changed.body.role).toBe('coach');
    const bad = await agent.patch(`/api/admin/users/${user.id}`).set('X-CSRF-Token', csrf).send({ role: 'owner' }).expect(400);
    expect(bad.body.error.details.fieldErrors.role).toBeDefined();
    await agent.patch('/api/admin/users/abc').set('X-CSRF-Token', csrf).send({ role: 'cook' }).expect(400);
  });
});

describe('malformed input', () => {
  it('answers malformed JSON with 400', async () => {
    const { agent, csrf } = await agentWithCsrf(t.app);
    const res = await agent.post('/api/auth/login').set('X-CSRF-Token', csrf).set('Content-Type', 'application/json').send('{"email": ').expect(400);
    expect(res.body.error.code).toBe('malformed_json');
  });

  it('answers a body over 1 MB with 413', async () => {
    const { agent, csrf } = await agentWithCsrf(t.app);
    const res = await agent
      .post('/api/auth/login')
      .set('X-CSRF-Token', csrf)
      .send({ email: 'a@b.test', password: 'x'.repeat(1_100_000) })
      .expect(413);
    expect(res.body.error.code).toBe('payload_too_large');
  });

  it('answers an unknown API route with 404 JSON', async () => {
    const res = await request(t.app).get('/api/no-such-thing').expect(404);
    expect(res.body.error.code).toBe('not_found');
  });

  it('never sends a stack trace', async () => {
    const res = await request(t.app).get('/api/no-such-thing');
    expect(JSON.stringify(res.body)).not.toMatch(/at .*\.ts:\d+/);
  });
});

describe('rate limits', () => {
  it('answers 429 after 10 failed sign-ins in 15 minutes', async () => {
    const limited = await createTestApp({ loginFailuresPer15Min: 10 });
    try {
      const { email } = await signUp(limited.app);
      const { agent, csrf } = await agentWithCsrf(limited.app);
      for (let i = 0; i < 10; i++) {
        await agent
          .post('/api/auth/login')
          .set('X-CSRF-Token', csrf)
          .send({ email, password: `wrong-${i}-password` })
          .expect(401);
      }
      const res = await agent.post('/api/auth/login').set('X-CSRF-Token', csrf).send({ email, password: 'correct horse battery' }).expect(429);
      expect(res.body.error.code).toBe('rate_limited');
    } finally {
      await limited.close();
    }
  });

  it('limits sign-ups per address', async () => {
    const limited = await createTestApp({ signupsPerHour: 2 });
    try {
      const { agent, csrf } = await agentWithCsrf(limited.app);
      const body = () => ({ email: uniqueEmail(), password: 'long enough password', displayName: 'X', role: 'cook' });
      await agent.post('/api/auth/register').set('X-CSRF-Token', csrf).send(body()).expect(201);
      await agent.post('/api/auth/register').set('X-CSRF-Token', csrf).send(body()).expect(201);
      await agent.post('/api/auth/register').set('X-CSRF-Token', csrf).send(body()).expect(429);
    } finally {
      await limited.close();
    }
  });
});
