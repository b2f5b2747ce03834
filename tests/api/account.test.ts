import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import request from 'supertest';
import { QueryTypes } from 'sequelize';
import { agentWithCsrf, createTestApp, signUp, type TestApp } from '../helpers/test-app';
import { User } from '../../server/models';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(async () => {
  await t.close();
});

async function count(sql: string, userId: number) {
  const rows = await User.sequelize!.query<{ n: string }>(sql, { replacements: { userId, userIdText: String(userId) }, type: QueryTypes.SELECT });
  return Number(rows[0].n);
}

async function signInAgain(email: string, password: string) {
  const second = await agentWithCsrf(t.app);
  await second.agent.post('/api/auth/login').set('X-CSRF-Token', second.csrf).send({ email, password }).expect(200);
  return second;
}

async function coachWithClient() {
  const coach = await signUp(t.app, 'coach');
  const client = await signUp(t.app, 'cook');
  await coach.agent.post('/api/clients/invitations').set('X-CSRF-Token', coach.csrf).send({ email: client.email }).expect(201);
  const mail = await vi.waitFor(() => {
    const found = t
      .outbox()
      .filter((m) => m.to.includes(client.email))
      .at(-1);
    if (!found) throw new Error('no invitation yet');
    return found;
  });
  const token = mail.text.match(/\/invitations\/([A-Za-z0-9_-]+)/)![1];
  await client.agent.post(`/api/invitations/${token}/accept`).set('X-CSRF-Token', client.csrf).expect(200);
  return { coach, client };
}

describe('changing the password', () => {
  it('needs the current password, ends the other sessions and keeps this one', async () => {
    const cook = await signUp(t.app);
    const other = await signInAgain(cook.email, cook.password);
    await other.agent.get('/api/auth/me').expect(200);

    const wrong = await cook.agent
      .post('/api/auth/password')
      .set('X-CSRF-Token', cook.csrf)
      .send({ currentPassword: 'not my password', newPassword: 'a brand new password' })
      .expect(400);
    expect(wrong.body.error.message).toMatch(/^currentPassword/);
    const short = await cook.agent
      .post('/api/auth/password')
      .set('X-CSRF-Token', cook.csrf)
      .send({ currentPassword: cook.password, newPassword: 'short' })
      .expect(400);
    expect(JSON.stringify(short.body.error)).toMatch(/newPassword/);
    // neither refusal changed anything
    await other.agent.get('/api/auth/me').expect(200);

    await cook.agent
      .post('/api/auth/password')
      .set('X-CSRF-Token', cook.csrf)
      .send({ currentPassword: cook.password, newPassword: 'a brand new password' })
      .expect(200);
    await cook.agent.get('/api/auth/me').expect(200);
    await other.agent.get('/api/auth/me').expect(401);
    expect(await count(`SELECT count(*) AS n FROM "session" WHERE "sess"->'passport'->>'user' = :userIdText`, cook.user.id)).toBe(1);

    const old = await agentWithCsrf(t.app);
    await old.agent.post('/api/auth/login').set('X-CSRF-Token', old.csrf).send({ email: cook.email, password: cook.password }).expect(401);
    await signInAgain(cook.email, 'a brand new password');
  });

  it('is refused signed out', async () => {
    const anon = await agentWithCsrf(t.app);
    await anon.agent.post('/api/auth/password').set('X-CSRF-Token', anon.csrf).send({ currentPassword: 'x', newPassword: 'a brand new password' }).expect(401);
  });
});

describe('deleting the account', () => {
  it('needs the password, then removes its recipes, versions, foods and every session', async () => {
    const cook = await signUp(t.app);
    const other = await signInAgain(cook.email, cook.password);
    const recipe = await cook.agent
      .post('/api/recipes')
      .set('X-CSRF-Token', cook.csrf)
      .send({ title: 'Weeknight chili', servings: 4, text: '1 lb ground beef\n1 can kidney beans' })
      .expect(201);
    await cook.agent
      .post('/api/foods')
      .set('X-CSRF-Token', cook.csrf)
      .send({ name: 'Brightfield light bread', servingSizeG: 28, servingLabel: '1 slice', kcal: 45, fatG: 0.5, carbsG: 9, proteinG: 2.5 })
      .expect(201);

    const wrong = await cook.agent.delete('/api/auth/me').set('X-CSRF-Token', cook.csrf).send({ password: 'not my password' }).expect(400);
    expect(wrong.body.error.message).toMatch(/^password/);
    await cook.agent.get(`/api/recipes/${recipe.body.id}`).expect(200);

    await cook.agent.delete('/api/auth/me').set('X-CSRF-Token', cook.csrf).send({ password: cook.password }).expect(204);

    const id = cook.user.id;
    expect(await count('SELECT count(*) AS n FROM users WHERE id = :userId', id)).toBe(0);
    expect(await count('SELECT count(*) AS n FROM recipes WHERE owner_id = :userId', id)).toBe(0);
    expect(await count('SELECT count(*) AS n FROM recipe_versions WHERE recipe_id = ' + Number(recipe.body.id), id)).toBe(0);
    expect(await count('SELECT count(*) AS n FROM foods WHERE owner_id = :userId', id)).toBe(0);
    expect(await count(`SELECT count(*) AS n FROM "session" WHERE "sess"->'passport'->>'user' = :userIdText`, id)).toBe(0);
    await cook.agent.get('/api/auth/me').expect(401);
    await other.agent.get('/api/auth/me').expect(401);
    const again = await agentWithCsrf(t.app);
    await again.agent.post('/api/auth/login').set('X-CSRF-Token', again.csrf).send({ email: cook.email, password: cook.password }).expect(401);
  });

  it("a coach's deletion ends the client link cleanly: the client keeps their recipes, has no coach and no coach targets", async () => {
    const { coach, client } = await coachWithClient();
    await coach.agent
      .put(`/api/clients/${client.user.id}/targets`)
      .set('X-CSRF-Token', coach.csrf)
      .send({ perMeal: { kcal: 550, proteinG: 35 } })
      .expect(200);
    const recipe = await client.agent
      .post('/api/recipes')
      .set('X-CSRF-Token', client.csrf)
      .send({ title: 'Oat bake', servings: 2, text: '1 cup rolled oats\n2 large eggs' })
      .expect(201);

    await coach.agent.delete('/api/auth/me').set('X-CSRF-Token', coach.csrf).send({ password: coach.password }).expect(204);

    const me = await client.agent.get('/api/auth/me').expect(200);
    expect(me.body.coachId).toBeNull();
    const mine = await client.agent.get('/api/coach').expect(200);
    expect(mine.body).toMatchObject({ coach: null, targets: null, swaps: [] });
    await client.agent.get(`/api/recipes/${recipe.body.id}`).expect(200);
    expect(await count('SELECT count(*) AS n FROM client_targets WHERE coach_id = :userId OR client_id = :userId', coach.user.id)).toBe(0);
  });

  it("a client's deletion leaves the coach's client list without them", async () => {
    const { coach, client } = await coachWithClient();
    const before = await coach.agent.get('/api/clients').expect(200);
    expect(before.body.clients.map((c: { id: number }) => c.id)).toContain(client.user.id);
    await client.agent.delete('/api/auth/me').set('X-CSRF-Token', client.csrf).send({ password: client.password }).expect(204);
    const after = await coach.agent.get('/api/clients').expect(200);
    expect(after.body.clients.map((c: { id: number }) => c.id)).not.toContain(client.user.id);
    await coach.agent.get(`/api/clients/${client.user.id}/versions`).expect(404);
  });

  it('is refused signed out', async () => {
    await request(t.app).delete('/api/auth/me').send({ password: 'x' }).expect(403);
  });
});
