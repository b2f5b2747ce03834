import { afterAll, beforeAll, describe, expect, inject, it, vi } from 'vitest';
import { randomUUID } from 'node:crypto';
import pg from 'pg';
import request from 'supertest';
import type { SessionData } from 'express-session';
import { SessionStore, userRowReadWithSession } from '../../server/middleware/session-store';
import { userFromRow } from '../../server/middleware/auth';
import { User } from '../../server/models';
import { SESSION_POOL_OPTIONS } from '../../server/boot';
import { createTestApp, signUp, type TestApp } from '../helpers/test-app';
import { RECIPE_20 } from '../bench/server-bench';

const DAY = 24 * 60 * 60 * 1000;
const TEN_MINUTES = 10 * 60 * 1000;

let pool: pg.Pool;
let t: TestApp;
beforeAll(async () => {
  pool = new pg.Pool({ connectionString: inject('databaseUrl'), max: 2 });
  t = await createTestApp();
});
afterAll(async () => {
  await t.close();
  await pool.end();
});

/** A store on the test database with a clock the test moves. */
function storeAt(clock: { ms: number }, usersTable?: string) {
  return new SessionStore({ pool, tableName: 'session', usersTable, createTableIfMissing: false, pruneSessionInterval: false }, TEN_MINUTES, () => clock.ms);
}

function sessionExpiring(at: number): SessionData {
  return { cookie: { originalMaxAge: 30 * DAY, expires: new Date(at), httpOnly: true, path: '/' } } as SessionData;
}

async function storedExpiry(sid: string): Promise<number | null> {
  const { rows } = await pool.query<{ expire: Date }>('SELECT expire FROM "session" WHERE sid = $1', [sid]);
  return rows[0] ? rows[0].expire.getTime() : null;
}

const call = <T>(fn: (cb: (err?: unknown, value?: T) => void) => void) =>
  new Promise<T | undefined>((resolve, reject) => fn((err, value) => (err ? reject(err) : resolve(value))));

describe('the session store writes a session in use at most once per ten minutes', () => {
  it('skips touches within the interval, writes the next one after it, and forgets a destroyed session', async () => {
    const clock = { ms: Date.now() };
    const store = storeAt(clock);
    const sid = `test-${randomUUID()}`;
    const savedUntil = clock.ms + 30 * DAY;
    await call((cb) => store.set(sid, sessionExpiring(savedUntil), cb));
    // connect-pg-simple keeps whole seconds
    expect(Math.abs((await storedExpiry(sid))! - savedUntil)).toBeLessThan(1000);

    // five minutes on, the cookie rolled: the stored expiry stays as saved
    clock.ms += 5 * 60 * 1000;
    await call((cb) => store.touch(sid, sessionExpiring(clock.ms + 30 * DAY), cb));
    expect(Math.abs((await storedExpiry(sid))! - savedUntil)).toBeLessThan(1000);

    // eleven minutes after the save: written again
    clock.ms += 6 * 60 * 1000;
    const touchedUntil = clock.ms + 30 * DAY;
    await call((cb) => store.touch(sid, sessionExpiring(touchedUntil), cb));
    expect(Math.abs((await storedExpiry(sid))! - touchedUntil)).toBeLessThan(1000);

    // and not again until ten minutes after that touch
    clock.ms += 9 * 60 * 1000;
    await call((cb) => store.touch(sid, sessionExpiring(clock.ms + 30 * DAY), cb));
    expect(Math.abs((await storedExpiry(sid))! - touchedUntil)).toBeLessThan(1000);

    // reads always ask the database: a destroyed session is gone at once, and a touch does not bring it back
    expect(await call<SessionData | null>((cb) => store.get(sid, cb))).toMatchObject({ cookie: { originalMaxAge: 30 * DAY } });
    await call((cb) => store.destroy(sid, cb));
    // connect-pg-simple answers an unknown sid with no session at all
    expect((await call<SessionData | null>((cb) => store.get(sid, cb))) ?? null).toBeNull();
    clock.ms += 11 * 60 * 1000;
    await call((cb) => store.touch(sid, sessionExpiring(clock.ms + 30 * DAY), cb));
    expect(await storedExpiry(sid)).toBeNull();
  });

  it('a session another process saved is touched on its first use here', async () => {
    const clock = { ms: Date.now() };
    const sid = `test-${randomUUID()}`;
    await call((cb) => storeAt(clock).set(sid, sessionExpiring(clock.ms + 29 * DAY), cb));
    const elsewhere = storeAt(clock);
    clock.ms += 1000;
    await call((cb) => elsewhere.touch(sid, sessionExpiring(clock.ms + 30 * DAY), cb));
    expect(Math.abs((await storedExpiry(sid))! - (clock.ms + 30 * DAY))).toBeLessThan(1000);
    await call((cb) => elsewhere.destroy(sid, cb));
  });

  it('through the app: a signed-in cook analyses and is still known; after signing out the same cookie is anonymous', async () => {
    const cook = await signUp(t.app);
    let sidCookie = '';
    for (let i = 0; i < 3; i++) {
      const res = await cook.agent.post('/api/analyze').send({ text: RECIPE_20, servings: 8 }).expect(200);
      expect(res.body.lines).toHaveLength(20);
      // the cookie rolls with every answer
      sidCookie = [res.headers['set-cookie'] ?? []]
        .flat()
        .find((c: string) => c.startsWith('hearthswap.sid='))!
        .split(';')[0];
      expect((await cook.agent.get('/api/auth/me').expect(200)).body.id).toBe(cook.user.id);
    }
    expect((await request(t.app).get('/api/auth/me').set('Cookie', sidCookie).expect(200)).body.id).toBe(cook.user.id);
    await cook.agent.post('/api/auth/logout').set('X-CSRF-Token', cook.csrf).expect(204);
    await request(t.app).get('/api/auth/me').set('Cookie', sidCookie).expect(401);
  });

  it('an anonymous analysis neither stores a session nor sets its cookie, and counts against the anonymous limit', async () => {
    const res = await request(t.app).post('/api/analyze').send({ text: RECIPE_20, servings: 8 }).expect(200);
    expect(String(res.headers['set-cookie'] ?? '')).not.toContain('hearthswap.sid');
    expect(res.headers['ratelimit-limit']).toBe(String(t.config.limits.anonymousComputePerMin));
    // a cookie naming no stored session is anonymous too
    const stale = await request(t.app)
      .post('/api/analyze')
      .set('Cookie', 'hearthswap.sid=s%3Anot-a-session.x')
      .send({ text: RECIPE_20, servings: 8 })
      .expect(200);
    expect(stale.headers['ratelimit-limit']).toBe(String(t.config.limits.anonymousComputePerMin));
  });

  it('a signed-in cook computing is known: the signed-in limit, their session rolled', async () => {
    expect(t.config.limits.userComputePerMin).not.toBe(t.config.limits.anonymousComputePerMin);
    const cook = await signUp(t.app);
    const res = await cook.agent.post('/api/analyze').send({ text: RECIPE_20, servings: 8 }).expect(200);
    expect(String(res.headers['set-cookie'] ?? '')).toContain('hearthswap.sid');
    expect(res.headers['ratelimit-limit']).toBe(String(t.config.limits.userComputePerMin));
  });
});

describe('a signed-in session is read with its user in one query', () => {
  it('gives the users row findByPk would: same values, an unchanged saved instance', async () => {
    const cook = await signUp(t.app);
    const store = storeAt({ ms: Date.now() }, 'users');
    const sid = `test-${randomUUID()}`;
    await call((cb) => store.set(sid, { ...sessionExpiring(Date.now() + DAY), passport: { user: cook.user.id } } as SessionData, cb));
    const sess = await call<SessionData | null>((cb) => store.get(sid, cb));
    const row = userRowReadWithSession(sess, cook.user.id);
    expect(row).toBeDefined();
    const user = userFromRow(row!);
    const found = (await User.findByPk(cook.user.id))!;
    expect(user.get({ plain: true })).toEqual(found.get({ plain: true }));
    expect(user.get({ plain: true })).toMatchObject({ id: cook.user.id, email: cook.email, role: 'cook' });
    expect(user.createdAt).toBeInstanceOf(Date);
    expect(user.isNewRecord).toBe(false);
    expect(user.changed()).toBe(false);
    // another id than the session names gets nothing
    expect(userRowReadWithSession(sess, cook.user.id + 1)).toBeUndefined();
    await call((cb) => store.destroy(sid, cb));
  });

  it('a session naming no user, an unknown one or a malformed id reads as the session alone', async () => {
    const store = storeAt({ ms: Date.now() }, 'users');
    for (const passport of [undefined, { user: 2_000_000_000 }, { user: 'not-a-number' }, { user: '12; DROP TABLE users' }]) {
      const sid = `test-${randomUUID()}`;
      await call((cb) => store.set(sid, { ...sessionExpiring(Date.now() + DAY), ...(passport ? { passport } : {}) } as SessionData, cb));
      const sess = await call<SessionData | null>((cb) => store.get(sid, cb));
      expect(sess).toMatchObject(passport ? { passport } : { cookie: { originalMaxAge: 30 * DAY } });
      expect(userRowReadWithSession(sess, passport?.user)).toBeUndefined();
      await call((cb) => store.destroy(sid, cb));
    }
  });

  it('through the app: a signed-in request finds its user without a separate users query', async () => {
    const cook = await signUp(t.app);
    const findByPk = vi.spyOn(User, 'findByPk');
    try {
      expect((await cook.agent.get('/api/auth/me').expect(200)).body).toMatchObject({ id: cook.user.id, email: cook.email });
      expect(findByPk).not.toHaveBeenCalled();
    } finally {
      findByPk.mockRestore();
    }
  });
});

describe('the session pool', () => {
  it('keeps two connections open through an idle spell and closes the rest', async () => {
    // pg-pool's idle timeout shortened from 10 s so the test need not wait for it
    const idle = new pg.Pool({ connectionString: inject('databaseUrl'), ...SESSION_POOL_OPTIONS, idleTimeoutMillis: 50 });
    try {
      const clients = await Promise.all([idle.connect(), idle.connect(), idle.connect()]);
      for (const client of clients) client.release();
      expect(idle.totalCount).toBe(3);
      await new Promise((resolve) => setTimeout(resolve, 500));
      expect(idle.totalCount).toBe(2);
      expect((await idle.query<{ one: number }>('SELECT 1 AS one')).rows[0].one).toBe(1);
      expect(idle.totalCount).toBe(2);
    } finally {
      await idle.end();
    }
  });
});
