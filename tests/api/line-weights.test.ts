/**
 * One weight per line everywhere: the analysis, the saved version, the rewrite's "before" plan and
 * the shopping list all weigh "4 hamburger buns" as four USDA SR28 rolls (WEIGHT.txt 18350 "1 roll",
 * 44 g), and a line that cannot be weighed keeps its warning in the saved version.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { createTestApp, signUp, type TestApp } from '../helpers/test-app';
import { readWeights } from '../helpers/reference-data';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(async () => {
  await t.close();
});

const TEXT = `4 hamburger buns
1 lb lean ground beef
1 (15 oz) can black beans, drained
6 capers`;

describe('the same weights in every view of a recipe', () => {
  it('analysis, saved version, rewrite and shopping list agree line for line', async () => {
    const roll = readWeights().find((w) => w.ndbNo === '18350' && /^roll/.test(w.msreDesc));
    expect(roll).toBeDefined();
    const analysed = (await request(t.app).post('/api/analyze').send({ text: TEXT, servings: 4 }).expect(200)).body;
    // USDA SR28 WEIGHT.txt 18350 "roll 1 serving"
    expect(analysed.lines[0].grams).toBeCloseTo(4 * roll!.gmWgt, 6);

    const cook = await signUp(t.app);
    const recipe = (await cook.agent.post('/api/recipes').set('X-CSRF-Token', cook.csrf).send({ title: 'Burger night', servings: 4, text: TEXT }).expect(201))
      .body;
    const version = (await cook.agent.get(`/api/recipes/${recipe.id}/versions/1`).expect(200)).body;
    version.lines.forEach((line: { grams: number }, i: number) => expect(line.grams).toBeCloseTo(analysed.lines[i].grams, 9));

    const rewrite = await request(t.app)
      .post('/api/rewrite')
      .send({ text: TEXT, servings: 4, targets: { proteinMinG: 1, kcalMax: 5000 } });
    if (rewrite.status === 200) {
      rewrite.body.before.lines.forEach((line: { grams: number }, i: number) => expect(line.grams).toBeCloseTo(analysed.lines[i].grams, 9));
    } else expect(rewrite.status).toBe(422);

    const shopping = (
      await cook.agent
        .post('/api/shopping-lists')
        .set('X-CSRF-Token', cook.csrf)
        .send({ items: [{ recipeId: recipe.id, versionNumber: 1, portions: 4 }] })
        .expect(201)
    ).body;
    const buns = shopping.items.find((i: { food: { id: number } }) => i.food.id === analysed.lines[0].food.id);
    expect(Math.abs(buns.grams - analysed.lines[0].grams)).toBeLessThanOrEqual(1);
  });

  it('a saved line that weighs 0 g keeps its warning and marks the version incomplete', async () => {
    const cook = await signUp(t.app);
    const recipe = (await cook.agent.post('/api/recipes').set('X-CSRF-Token', cook.csrf).send({ title: 'Greens', servings: 2, text: TEXT }).expect(201)).body;
    const version = (await cook.agent.get(`/api/recipes/${recipe.id}/versions/1`).expect(200)).body;
    const capers = version.lines[3];
    expect(capers.grams).toBe(0);
    expect(capers.incomplete).toBe(true);
    expect(capers.warnings.length).toBeGreaterThan(0);
    expect(version.lines[0].incomplete).toBe(false);
  });
});
