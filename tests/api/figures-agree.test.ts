import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { servingVolumeMl } from '../../shared/shown-figures';
import { createTestApp, signUp, type TestApp } from '../helpers/test-app';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(async () => {
  await t.close();
});

const TEXT = `8 oz elbow macaroni
2 cups shredded sharp cheddar
2 cups whole milk
2 tbsp butter
1 (14.5 oz) can diced tomatoes`;

describe('one volume per serving on every screen', () => {
  it('the Kitchen (analysis), the saved version (Compare) and a pinned-grams analysis agree', async () => {
    const cook = await signUp(t.app);
    const analysis = (await cook.agent.post('/api/analyze').send({ text: TEXT, servings: 4 }).expect(200)).body;
    const recipe = (await cook.agent.post('/api/recipes').set('X-CSRF-Token', cook.csrf).send({ title: 'Tomato mac', servings: 4, text: TEXT }).expect(201))
      .body;
    const version = (await cook.agent.get(`/api/recipes/${recipe.id}/versions/1`).expect(200)).body;
    expect(servingVolumeMl(version.volumeMl, version.servings)).toBe(servingVolumeMl(analysis.volumeMl, 4));
    // The Kitchen with every line pinned to its food and grams (as a saved version opens there)
    const pinned = version.lines.map((l: { input: string; foodId: number; grams: number }) => ({ input: l.input, foodId: l.foodId, grams: l.grams }));
    const again = (await cook.agent.post('/api/analyze').send({ lines: pinned, servings: 4 }).expect(200)).body;
    expect(servingVolumeMl(again.volumeMl, 4)).toBe(servingVolumeMl(analysis.volumeMl, 4));
  });
});
