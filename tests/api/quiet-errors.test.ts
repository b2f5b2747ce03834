import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { createTestApp, signUp, type TestApp } from '../helpers/test-app';
import { errorHandler } from '../../server/middleware/errors';

let t: TestApp;
const logged: unknown[] = [];
beforeAll(async () => {
  t = await createTestApp({}, { logError: (error) => logged.push(error) });
});
afterAll(async () => {
  await t.close();
});

describe('expected answers are not errors', () => {
  it('GET /api/auth/session answers 200 with null signed out and the user signed in; /me keeps its 401', async () => {
    const anon = await request(t.app).get('/api/auth/session').expect(200);
    expect(anon.body).toEqual({ user: null });
    // asking creates no stored session for an anonymous visitor
    expect(anon.headers['set-cookie']).toBeUndefined();
    await request(t.app).get('/api/auth/me').expect(401);
    const cook = await signUp(t.app);
    const mine = await cook.agent.get('/api/auth/session').expect(200);
    expect(mine.body.user).toMatchObject({ id: cook.user.id, email: cook.email, role: 'cook' });
    expect(mine.body.user.passwordHash).toBeUndefined();
  });

  it('400, 401, 404, 409 and the 422 of targets out of reach reach the client but never the server error log', async () => {
    const cook = await signUp(t.app);
    await request(t.app).post('/api/analyze').send({ text: '', servings: 0 }).expect(400);
    await request(t.app).get('/api/recipes').expect(401);
    await cook.agent.get('/api/recipes/999999').expect(404);
    const recipe = await cook.agent
      .post('/api/recipes')
      .set('X-CSRF-Token', cook.csrf)
      .send({ title: 'Mac', servings: 4, text: '8 oz elbow macaroni' })
      .expect(201);
    await cook.agent.patch(`/api/recipes/${recipe.body.id}`).set('X-CSRF-Token', cook.csrf).send({ revision: 7, title: 'x' }).expect(409);
    const infeasible = await request(t.app)
      .post('/api/rewrite')
      .send({ text: '8 oz elbow macaroni\n2 cups shredded sharp cheddar', servings: 4, targets: { proteinMinG: 200, kcalMax: 150 } })
      .expect(422);
    expect(infeasible.body.error.code).toBe('infeasible');
    expect(logged).toEqual([]);
  });
});

describe('the error handler', () => {
  it('logs what it answers with 500, and only that', () => {
    const seen: unknown[] = [];
    const handle = errorHandler((error) => seen.push(error));
    const res = {
      headersSent: false,
      statusCode: 0,
      status(code: number) {
        this.statusCode = code;
        return this;
      },
      json() {
        return this;
      },
      setHeader() {},
    };
    const boom = new Error('a bug');
    handle(boom, {} as never, res as never, () => {});
    expect([res.statusCode, seen]).toEqual([500, [boom]]);
  });
});
