/**
 * Sign-in limits slow guessing without handing out lockouts. Addresses are set with
 * X-Forwarded-For behind one trusted proxy hop, as a load balancer would.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { agentWithCsrf, createTestApp, signUp, type TestApp } from '../helpers/test-app';

const PASSWORD = 'correct horse battery';
let t: TestApp;

beforeAll(async () => {
  t = await createTestApp({ loginFailuresPer15Min: 5, loginFailuresPerAccountPerDay: 12, loginFailuresPerAddressPerHour: 20 }, { config: { trustProxy: 1 } });
});
afterAll(() => t.close());

async function attempt(from: string, email: string, password: string, agent = request.agent(t.app)) {
  const csrf = (await agent.get('/api/auth/csrf').set('X-Forwarded-For', from).expect(200)).body.token as string;
  return agent.post('/api/auth/login').set('X-Forwarded-For', from).set('X-CSRF-Token', csrf).send({ email, password });
}

describe('sign-in limits', () => {
  it('stops guessing on one account from one address, and only that pair', async () => {
    const victim = await signUp(t.app);
    const other = await signUp(t.app);
    for (let i = 0; i < 5; i++) expect((await attempt('203.0.113.10', victim.email, `guess-${i}-wrong`)).status).toBe(401);
    const refused = await attempt('203.0.113.10', victim.email, PASSWORD);
    expect(refused.status).toBe(429);
    expect(refused.body.error.code).toBe('rate_limited');
    expect(Number(refused.headers['retry-after'])).toBeGreaterThan(0);
    // the owner elsewhere, and another account from the guessing address, are not locked out
    expect((await attempt('198.51.100.7', victim.email, PASSWORD)).status).toBe(200);
    expect((await attempt('203.0.113.10', other.email, PASSWORD)).status).toBe(200);
  });

  it('lets a whole gym behind one address sign in with correct passwords after a few typos', async () => {
    const members = await Promise.all(Array.from({ length: 8 }, () => signUp(t.app)));
    for (const m of members) {
      expect((await attempt('192.0.2.50', m.email, 'fat-fingered-password')).status).toBe(401);
      expect((await attempt('192.0.2.50', m.email, 'fat-fingered-password-2')).status).toBe(401);
    }
    for (const m of members) expect((await attempt('192.0.2.50', m.email, PASSWORD)).status).toBe(200);
  });

  it('after guesses from many addresses, still lets the owner in from a browser used before', async () => {
    const owner = await signUp(t.app);
    const device = request.agent(t.app);
    expect((await attempt('198.51.100.20', owner.email, PASSWORD, device)).status).toBe(200);
    // 12 wrong passwords from 12 addresses: the per-account daily limit is used up
    for (let i = 0; i < 12; i++) expect((await attempt(`203.0.113.${100 + i}`, owner.email, `spray-${i}-wrong`)).status).toBe(401);
    // a new browser, even with the right password, waits; the refusal comes before the password check
    expect((await attempt('198.51.100.21', owner.email, PASSWORD)).status).toBe(429);
    expect((await attempt('198.51.100.21', owner.email, 'still-a-wrong-guess')).status).toBe(429);
    // the browser that signed in before passes, from its usual address or a new one
    expect((await attempt('198.51.100.99', owner.email, PASSWORD, device)).status).toBe(200);
  });

  it('counts the browser an account was created in as one it signed in from', async () => {
    const owner = await signUp(t.app);
    for (let i = 0; i < 12; i++) expect((await attempt(`203.0.113.${120 + i}`, owner.email, `spray-${i}-wrong`)).status).toBe(401);
    expect((await attempt('198.51.100.40', owner.email, PASSWORD)).status).toBe(429);
    expect((await attempt('198.51.100.41', owner.email, PASSWORD, owner.agent)).status).toBe(200);
  });

  it('a known-browser cookie cannot be forged', async () => {
    const owner = await signUp(t.app);
    for (let i = 0; i < 12; i++) await attempt(`203.0.113.${150 + i}`, owner.email, `spray-${i}-wrong`);
    const { agent, csrf } = await agentWithCsrf(t.app);
    const forged = await agent
      .post('/api/auth/login')
      .set('X-Forwarded-For', '198.51.100.30')
      .set('X-CSRF-Token', csrf)
      .set('Cookie', `hearthswap.device=${'a'.repeat(32)}~${'b'.repeat(16)}`)
      .send({ email: owner.email, password: PASSWORD });
    expect(forged.status).toBe(429);
  });

  it('slows password spraying from one address across many accounts, except for known browsers', async () => {
    const regular = await signUp(t.app);
    const device = request.agent(t.app);
    expect((await attempt('192.0.2.77', regular.email, PASSWORD, device)).status).toBe(200);
    for (let i = 0; i < 20; i++) expect((await attempt('192.0.2.77', `nobody-${i}@example.test`, 'spray-password')).status).toBe(401);
    const stranger = await signUp(t.app);
    expect((await attempt('192.0.2.77', stranger.email, PASSWORD)).status).toBe(429);
    expect((await attempt('192.0.2.77', regular.email, PASSWORD, device)).status).toBe(200);
  });

  it('counts in PostgreSQL: a second app on the same database sees the failures', async () => {
    const victim = await signUp(t.app);
    for (let i = 0; i < 5; i++) await attempt('203.0.113.200', victim.email, `guess-${i}-wrong`);
    const second = await createTestApp(
      { loginFailuresPer15Min: 5, loginFailuresPerAccountPerDay: 12, loginFailuresPerAddressPerHour: 20, scope: sharedScope(t) },
      { config: { trustProxy: 1 } },
    );
    try {
      const agent = request.agent(second.app);
      const csrf = (await agent.get('/api/auth/csrf').set('X-Forwarded-For', '203.0.113.200')).body.token as string;
      const res = await agent
        .post('/api/auth/login')
        .set('X-Forwarded-For', '203.0.113.200')
        .set('X-CSRF-Token', csrf)
        .send({ email: victim.email, password: PASSWORD });
      expect(res.status).toBe(429);
    } finally {
      await second.close();
    }
  });
});

function sharedScope(app: TestApp) {
  return app.config.limits.scope;
}
