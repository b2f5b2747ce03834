import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, signUp, type TestApp } from '../helpers/test-app';
import { MAX_LINES } from '../../shared/schemas/analyze';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(async () => {
  await t.close();
});

function jsonLd(recipe: Record<string, unknown>) {
  return Buffer.from(JSON.stringify({ '@context': 'https://schema.org', '@type': 'Recipe', name: 'Imported bake', recipeYield: '4', ...recipe }));
}

async function countRecipes(agent: Awaited<ReturnType<typeof signUp>>['agent']) {
  return (await agent.get('/api/recipes').expect(200)).body.recipes.length as number;
}

describe('recipe import takes the same limits as a typed recipe', () => {
  it('refuses 100,000 ingredient lines with a 400 naming the lines, and stores nothing', async () => {
    const { agent, csrf } = await signUp(t.app);
    const lines = Array.from({ length: 100_000 }, (_, i) => `${(i % 9) + 1} egg`);
    const res = await agent
      .post('/api/recipes/import')
      .set('X-CSRF-Token', csrf)
      .attach('file', jsonLd({ recipeIngredient: lines }), 'huge.jsonld')
      .expect(400);
    expect(res.body.error.message).toMatch(/^file: /);
    expect(res.body.error.details.fieldErrors.lines[0]).toContain(`at most ${MAX_LINES} lines`);
    expect(await countRecipes(agent)).toBe(0);
  });

  it('refuses a 900 KB description with a 400 naming notes', async () => {
    const { agent, csrf } = await signUp(t.app);
    const file = jsonLd({ recipeIngredient: ['2 cups flour'], description: 'a'.repeat(900 * 1024) });
    const res = await agent.post('/api/recipes/import').set('X-CSRF-Token', csrf).attach('file', file, 'long.jsonld').expect(400);
    expect(Object.keys(res.body.error.details.fieldErrors)).toEqual(['notes']);
    expect(await countRecipes(agent)).toBe(0);
  });

  it('refuses an over-long line and over-long instructions the way the form does', async () => {
    const { agent, csrf } = await signUp(t.app);
    const longLine = await agent
      .post('/api/recipes/import')
      .set('X-CSRF-Token', csrf)
      .attach('file', jsonLd({ recipeIngredient: ['1 egg', `2 cups ${'very '.repeat(300)}fine flour`] }), 'line.jsonld')
      .expect(400);
    expect(Object.keys(longLine.body.error.details.fieldErrors)[0]).toMatch(/^lines\.1\./);
    const longMethod = await agent
      .post('/api/recipes/import')
      .set('X-CSRF-Token', csrf)
      .attach('file', jsonLd({ recipeIngredient: ['1 egg'], recipeInstructions: ['Stir. '.repeat(5_000)] }), 'method.jsonld')
      .expect(400);
    expect(Object.keys(longMethod.body.error.details.fieldErrors)).toEqual(['method']);
  });

  it('answers a file nested 10,000 arrays deep with a 400, not a stack overflow', async () => {
    const { agent, csrf } = await signUp(t.app);
    const deep = `${'['.repeat(10_000)}{"@type":"Recipe","name":"x","recipeIngredient":["1 egg"]}${']'.repeat(10_000)}`;
    const res = await agent.post('/api/recipes/import').set('X-CSRF-Token', csrf).attach('file', Buffer.from(deep), 'deep.json').expect(400);
    expect(res.body.error.message).toMatch(/nested/);
    // A bracket inside a string is not nesting: an ordinary file with "[" in its text still imports.
    await agent
      .post('/api/recipes/import')
      .set('X-CSRF-Token', csrf)
      .attach('file', jsonLd({ recipeIngredient: ['1 egg [large]', '2 cups flour'], description: '['.repeat(200) }), 'ok.jsonld')
      .expect(201);
  });

  it('limits imports per cook per hour with a 429', async () => {
    const limited = await createTestApp({ recipeImportsPerHour: 2 });
    try {
      const { agent, csrf } = await signUp(limited.app);
      const file = jsonLd({ recipeIngredient: ['1 egg', '2 cups flour'] });
      await agent.post('/api/recipes/import').set('X-CSRF-Token', csrf).attach('file', file, 'a.jsonld').expect(201);
      await agent.post('/api/recipes/import').set('X-CSRF-Token', csrf).attach('file', file, 'b.jsonld').expect(201);
      const third = await agent.post('/api/recipes/import').set('X-CSRF-Token', csrf).attach('file', file, 'c.jsonld').expect(429);
      expect(third.body.error.code).toBe('rate_limited');
      expect(await countRecipes(agent)).toBe(2);
    } finally {
      await limited.close();
    }
  });
});
