import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import request from 'supertest';
import { QueryTypes } from 'sequelize';
import { agentWithCsrf, createTestApp, signUp, type TestApp } from '../helpers/test-app';
import { Invitation, PasswordReset } from '../../server/models';
import type { Mailer } from '../../server/mail';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(async () => {
  await t.close();
});

async function mailTo(app: TestApp, address: string, pattern: RegExp) {
  return vi.waitFor(
    () => {
      const found = app
        .outbox()
        .filter((m) => m.to.includes(address) && pattern.test(m.text))
        .at(-1);
      if (!found) throw new Error(`no mail to ${address} yet`);
      return found;
    },
    { timeout: 10_000 },
  );
}

/** The reset tokens mailed to `address`, once at least `count` have arrived (oldest first). */
async function resetTokens(address: string, count = 1) {
  return vi.waitFor(
    () => {
      const tokens = t
        .outbox()
        .filter((m) => m.to.includes(address))
        .map((m) => m.text.match(/\/reset-password\/([A-Za-z0-9_-]+)/)?.[1])
        .filter((token): token is string => Boolean(token));
      if (tokens.length < count) throw new Error(`${tokens.length} of ${count} reset mails to ${address} so far`);
      return tokens;
    },
    { timeout: 10_000 },
  );
}

async function sessionRows() {
  const [row] = await Invitation.sequelize!.query<{ n: string }>('SELECT count(*) AS n FROM "session"', { type: QueryTypes.SELECT });
  return Number(row.n);
}

describe('password reset', () => {
  it('ends every other session of the account and voids its other reset links', async () => {
    const cook = await signUp(t.app);
    const phone = await agentWithCsrf(t.app);
    await phone.agent.post('/api/auth/login').set('X-CSRF-Token', phone.csrf).send({ email: cook.email, password: cook.password }).expect(200);
    await cook.agent.get('/api/auth/me').expect(200);
    await phone.agent.get('/api/auth/me').expect(200);

    const visitor = await agentWithCsrf(t.app);
    await visitor.agent.post('/api/auth/password-reset').set('X-CSRF-Token', visitor.csrf).send({ email: cook.email }).expect(202);
    await visitor.agent.post('/api/auth/password-reset').set('X-CSRF-Token', visitor.csrf).send({ email: cook.email }).expect(202);
    const [first, second] = await resetTokens(cook.email, 2);
    expect(second).not.toBe(first);
    expect(await PasswordReset.count({ where: { userId: cook.user.id, usedAt: null } })).toBe(2);

    await visitor.agent
      .post('/api/auth/password-reset/confirm')
      .set('X-CSRF-Token', visitor.csrf)
      .send({ token: second, password: 'a fresh kitchen password' })
      .expect(200);
    // Both devices signed in before the reset are signed out; the older link no longer works.
    await cook.agent.get('/api/auth/me').expect(401);
    await phone.agent.get('/api/auth/me').expect(401);
    const old = await visitor.agent
      .post('/api/auth/password-reset/confirm')
      .set('X-CSRF-Token', visitor.csrf)
      .send({ token: first, password: 'an attacker password!' })
      .expect(410);
    expect(old.body.error.code).toBe('reset_used');
    await visitor.agent.post('/api/auth/login').set('X-CSRF-Token', visitor.csrf).send({ email: cook.email, password: 'a fresh kitchen password' }).expect(200);
  });

  it('keeps the session that confirms the reset when it is the account’s own', async () => {
    const cook = await signUp(t.app);
    const other = await agentWithCsrf(t.app);
    await other.agent.post('/api/auth/login').set('X-CSRF-Token', other.csrf).send({ email: cook.email, password: cook.password }).expect(200);
    await cook.agent.post('/api/auth/password-reset').set('X-CSRF-Token', cook.csrf).send({ email: cook.email }).expect(202);
    const [token] = await resetTokens(cook.email);
    await cook.agent.post('/api/auth/password-reset/confirm').set('X-CSRF-Token', cook.csrf).send({ token, password: 'a fresh kitchen password' }).expect(200);
    await cook.agent.get('/api/auth/me').expect(200);
    await other.agent.get('/api/auth/me').expect(401);
  });

  it('answers a known and an unknown address alike, without waiting for the mail', async () => {
    // A mail server that never answers: if the request waited for it, the known address would hang.
    let release: () => void = () => {};
    const held = new Promise<void>((resolve) => (release = resolve));
    const sent: string[] = [];
    const slowMailer: Mailer = {
      send: async (mail) => {
        await held;
        sent.push(String(mail.to));
        return { messageId: 'held' };
      },
    };
    const slow = await createTestApp({}, { mailer: slowMailer });
    try {
      const cook = await signUp(slow.app);
      const { agent, csrf } = await agentWithCsrf(slow.app);
      const known = await agent.post('/api/auth/password-reset').set('X-CSRF-Token', csrf).send({ email: cook.email }).timeout(5_000);
      const unknown = await agent.post('/api/auth/password-reset').set('X-CSRF-Token', csrf).send({ email: 'nobody-here@example.test' }).timeout(5_000);
      expect(known.status).toBe(202);
      expect(unknown.status).toBe(202);
      expect(known.body).toEqual(unknown.body);
      expect(sent).toEqual([]);
      release();
      await vi.waitFor(() => expect(sent).toEqual([cook.email]), { timeout: 10_000 });
    } finally {
      release();
      await slow.close();
    }
  });
});

describe('invitations are tied to the invited address', () => {
  it('refuses another signed-in cook with a 403 that says why, and still lets the invited cook accept', async () => {
    const coach = await signUp(t.app, 'coach');
    const invited = await signUp(t.app, 'cook');
    const stranger = await signUp(t.app, 'cook');
    await coach.agent.post('/api/clients/invitations').set('X-CSRF-Token', coach.csrf).send({ email: invited.email }).expect(201);
    const token = (await mailTo(t, invited.email, /invitations/)).text.match(/\/invitations\/([A-Za-z0-9_-]+)/)![1];
    const refused = await stranger.agent.post(`/api/invitations/${token}/accept`).set('X-CSRF-Token', stranger.csrf).expect(403);
    expect(refused.body.error.code).toBe('invitation_other_address');
    expect(refused.body.error.message).toMatch(/different e-mail address/);
    expect((await stranger.agent.get('/api/auth/me')).body.coachId).toBeNull();
    await invited.agent.post(`/api/invitations/${token}/accept`).set('X-CSRF-Token', invited.csrf).expect(200);
    expect((await invited.agent.get('/api/auth/me')).body.coachId).toBe(coach.user.id);
  });
});

describe('anonymous CSRF tokens', () => {
  it('do not store a session per call, and still guard every state-changing route', async () => {
    const before = await sessionRows();
    for (let i = 0; i < 40; i++) {
      const res = await request(t.app).get('/api/auth/csrf').expect(200);
      expect(typeof res.body.token).toBe('string');
      expect(String(res.headers['set-cookie'] ?? '')).not.toContain('hearthswap.sid');
    }
    // Other suites may sign someone in meanwhile; 40 anonymous calls used to add 40 rows.
    expect((await sessionRows()) - before).toBeLessThan(5);

    const cook = await signUp(t.app);
    const { agent, csrf } = await agentWithCsrf(t.app);
    await agent.post('/api/auth/login').send({ email: cook.email, password: cook.password }).expect(403);
    await agent.post('/api/auth/login').set('X-CSRF-Token', 'not-the-token').send({ email: cook.email, password: cook.password }).expect(403);
    // A token from another visitor's cookie is not this visitor's token.
    const other = await agentWithCsrf(t.app);
    await agent.post('/api/auth/login').set('X-CSRF-Token', other.csrf).send({ email: cook.email, password: cook.password }).expect(403);
    // A forged cookie without the server's signature is ignored.
    await request(t.app)
      .post('/api/auth/login')
      .set('Cookie', 'hearthswap.csrf=abc.def')
      .set('X-CSRF-Token', 'abc')
      .send({ email: cook.email, password: cook.password })
      .expect(403);
    // The token fetched before signing in keeps working after it, now from the session.
    await agent.post('/api/auth/login').set('X-CSRF-Token', csrf).send({ email: cook.email, password: cook.password }).expect(200);
    await agent.post('/api/recipes').set('X-CSRF-Token', csrf).send({ title: 'Oats', servings: 1, text: '1 cup oats' }).expect(201);
    await agent.post('/api/recipes').send({ title: 'Oats', servings: 1, text: '1 cup oats' }).expect(403);
    expect((await agent.get('/api/auth/csrf').expect(200)).body.token).toBe(csrf);
  });
});
