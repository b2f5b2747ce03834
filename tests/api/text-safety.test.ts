import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { createTestApp, signUp, type TestApp } from '../helpers/test-app';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(async () => {
  await t.close();
});

const NUL = 'butter\u0000';
const LONE = 'cheddar \ud800 sharp';

function expectNamed(res: request.Response, field: string) {
  expect(res.status).toBe(400);
  expect(res.body.error.code).toBe('validation_failed');
  expect(res.body.error.message.startsWith(`${field}: `)).toBe(true);
  expect(res.body.error.details.fieldErrors[field]).toHaveLength(1);
}

async function linkedCoachAndClient() {
  const coach = await signUp(t.app, 'coach');
  const client = await signUp(t.app, 'cook');
  await coach.agent.post('/api/clients/invitations').set('X-CSRF-Token', coach.csrf).send({ email: client.email }).expect(201);
  const token = t
    .outbox()
    .filter((m) => m.to.includes(client.email))
    .at(-1)!
    .text.match(/\/invitations\/([A-Za-z0-9_-]+)/)![1];
  await client.agent.post(`/api/invitations/${token}/accept`).set('X-CSRF-Token', client.csrf).expect(200);
  return { coach, client };
}

describe('null bytes and lone surrogates are refused with a 400 naming the field', () => {
  it('in recipe lines, titles and the list search', async () => {
    const { agent, csrf } = await signUp(t.app);
    expectNamed(
      await agent
        .post('/api/recipes')
        .set('X-CSRF-Token', csrf)
        .send({ title: 'Mac', servings: 2, lines: [{ input: '1 egg' }, { input: NUL }] }),
      'lines.1.input',
    );
    expectNamed(await agent.post('/api/recipes').set('X-CSRF-Token', csrf).send({ title: LONE, servings: 2, text: '1 egg' }), 'title');
    expectNamed(await agent.get('/api/recipes').query({ q: NUL }), 'q');
    expectNamed(
      await request(t.app)
        .post('/api/analyze')
        .send({ servings: 1, text: `1 cup ${LONE}` }),
      'text',
    );
    expect((await agent.get('/api/recipes').expect(200)).body.recipes).toHaveLength(0);
  });

  it('in comments, target notes and swap tags', async () => {
    const { coach, client } = await linkedCoachAndClient();
    const recipe = (
      await client.agent.post('/api/recipes').set('X-CSRF-Token', client.csrf).send({ title: 'Chili', servings: 4, text: '1 lb ground beef' }).expect(201)
    ).body;
    expectNamed(
      await coach.agent
        .post(`/api/recipes/${recipe.id}/versions/1/comments`)
        .set('X-CSRF-Token', coach.csrf)
        .send({ body: `Nice ${LONE}` }),
      'body',
    );
    expectNamed(
      await coach.agent
        .put(`/api/clients/${client.user.id}/targets`)
        .set('X-CSRF-Token', coach.csrf)
        .send({ perMeal: { kcal: 600, proteinG: 40 }, note: NUL }),
      'note',
    );
    const foods = (await request(t.app).get('/api/foods/search').query({ q: 'cheddar', limit: 2 }).expect(200)).body.results;
    expectNamed(
      await coach.agent
        .post('/api/swaps')
        .set('X-CSRF-Token', coach.csrf)
        .send({ fromFoodId: foods[0].id, toFoodId: foods[1].id, tags: ['melt', NUL] }),
      'tags.1',
    );
    expect((await coach.agent.get('/api/swaps').expect(200)).body.swaps).toHaveLength(0);
  });

  it('in imported files, whether the JSON escapes them or not', async () => {
    const { agent, csrf } = await signUp(t.app);
    const escapedNul = Buffer.from('{"@type":"Recipe","name":"Bake","recipeIngredient":["1 egg","2 cups flour\\u0000"]}');
    const nul = await agent.post('/api/recipes/import').set('X-CSRF-Token', csrf).attach('file', escapedNul, 'r.jsonld').expect(400);
    expect(Object.keys(nul.body.error.details.fieldErrors)).toEqual(['lines.1.input']);
    const escapedSurrogate = Buffer.from('{"@type":"Recipe","name":"Bake","description":"crisp \\udc00 top","recipeIngredient":["1 egg"]}');
    const lone = await agent.post('/api/recipes/import').set('X-CSRF-Token', csrf).attach('file', escapedSurrogate, 'r.jsonld').expect(400);
    expect(Object.keys(lone.body.error.details.fieldErrors)).toEqual(['notes']);
    expect((await agent.get('/api/recipes').expect(200)).body.recipes).toHaveLength(0);
  });

  it('keeps well-formed text, emoji and accents included', async () => {
    const { agent, csrf } = await signUp(t.app);
    const res = await agent.post('/api/recipes').set('X-CSRF-Token', csrf).send({ title: 'Crème brûlée 🍮', servings: 2, text: '2 cups cream' }).expect(201);
    expect(res.body.title).toBe('Crème brûlée 🍮');
  });
});
