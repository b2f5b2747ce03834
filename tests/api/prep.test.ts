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

const TEXT = `1 lb lean ground turkey
2 cups shredded part-skim mozzarella
6 (8-inch) flour tortillas
1 (15 oz) can black beans
3 large eggs`;

async function cookWithVersion(method = 'Roll, wrap each in foil and bake at 375 °F for 20 minutes.') {
  const cook = await signUp(t.app);
  const recipe = (
    await cook.agent.post('/api/recipes').set('X-CSRF-Token', cook.csrf).send({ title: 'Turkey bean wraps', servings: 6, text: TEXT, method }).expect(201)
  ).body;
  return { ...cook, recipe };
}

describe('GET /api/recipes/:id/versions/:number/prep', () => {
  it('scales a version into portions, batch and shopping, line for line', async () => {
    const { agent, recipe } = await cookWithVersion();
    const res = await agent.get(`/api/recipes/${recipe.id}/versions/1/prep`).query({ portions: 10 }).expect(200);
    const body = res.body;
    expect(body.portions).toBe(10);
    expect(body.perPortion).toHaveLength(5);
    expect(body.batch).toHaveLength(5);
    const v1 = (await agent.get(`/api/recipes/${recipe.id}/versions/1`)).body;
    v1.lines.forEach((line: { grams: number }, i: number) => {
      // batch = portions ÷ servings × recipe (within the 1 g / 0.1 g display rounding)
      expect(Math.abs(body.batch[i].grams - (line.grams * 10) / 6)).toBeLessThanOrEqual(0.5);
      expect(Math.abs(body.batch[i].grams - body.perPortion[i].grams * 10)).toBeLessThanOrEqual(0.5 * 10 + 0.5);
    });
    expect(body.shopping.length).toBeGreaterThan(0);
    expect(body.shopping.find((s: { food: { name: string } }) => /egg/i.test(s.food.name)).purchase).toMatch(/egg/);
    expect(body.shoppingText).toContain('[ ]');
  });

  it('gives USDA FSIS storage and reheating, the foil caution, allergens and an FDA-rounded label', async () => {
    const { agent, recipe } = await cookWithVersion();
    const { body } = await agent.get(`/api/recipes/${recipe.id}/versions/1/prep`).query({ portions: 6 }).expect(200);
    // USDA FSIS "Leftovers and Food Safety": 165 °F (74 °C); 3–4 days refrigerated; freezer 2–3 months for quality.
    expect(body.storage.reheatF).toBe(165);
    expect(body.storage.reheatC).toBe(74);
    expect([3, 4]).toContain(body.storage.fridgeDays);
    expect([2, 3]).toContain(body.storage.freezerMonths);
    expect(body.storage.notes.join(' ')).toMatch(/foil/i);
    expect(body.storage.notes.join(' ')).toMatch(/microwave/i);
    for (const allergen of ['milk', 'egg', 'wheat']) expect(body.allergens).toContain(allergen);
    expect(body.allergens).not.toContain('peanuts');
    // FDA 21 CFR 101.9(c): calories above 50 are declared to the nearest 10.
    expect(body.label.calories.amount % 10).toBe(0);
    expect(Math.abs(body.label.calories.amount - body.perServing.kcal)).toBeLessThanOrEqual(5);
    expect(body.label.sodiumMg.amount % 10).toBe(0);
  });

  it('leaves out the foil caution when the method has no foil', async () => {
    const { agent, recipe } = await cookWithVersion('Bake uncovered at 375 °F for 20 minutes.');
    const { body } = await agent.get(`/api/recipes/${recipe.id}/versions/1/prep`).query({ portions: 2 }).expect(200);
    expect(body.storage.notes.join(' ')).not.toMatch(/foil/i);
  });

  it('refuses bad portions with 400 naming the field, and other people’s recipes with 404', async () => {
    const { agent, recipe } = await cookWithVersion();
    for (const portions of ['0', '101', '2.5', 'many']) {
      const res = await agent.get(`/api/recipes/${recipe.id}/versions/1/prep`).query({ portions }).expect(400);
      expect(res.body.error.message).toMatch(/portions/);
    }
    const other = await signUp(t.app);
    await other.agent.get(`/api/recipes/${recipe.id}/versions/1/prep`).query({ portions: 2 }).expect(404);
    await request(t.app).get(`/api/recipes/${recipe.id}/versions/1/prep`).query({ portions: 2 }).expect(401);
  });
});

describe('POST /api/shopping-lists', () => {
  it('merges grams by food across versions and batches', async () => {
    const { agent, csrf, recipe } = await cookWithVersion();
    const single = (await agent.get(`/api/recipes/${recipe.id}/versions/1/prep`).query({ portions: 6 })).body;
    const res = await agent
      .post('/api/shopping-lists')
      .set('X-CSRF-Token', csrf)
      .send({
        items: [
          { recipeId: recipe.id, versionNumber: 1, portions: 6 },
          { recipeId: recipe.id, versionNumber: 1, portions: 6 },
        ],
      })
      .expect(201);
    expect(res.body.items).toHaveLength(single.shopping.length);
    res.body.items.forEach((item: { grams: number }, i: number) => expect(Math.abs(item.grams - 2 * single.shopping[i].grams)).toBeLessThanOrEqual(1));
    const bad = await agent.post('/api/shopping-lists').set('X-CSRF-Token', csrf).send({ items: [] }).expect(400);
    expect(bad.body.error.message).toMatch(/items/);
  });
});

describe('shopping lines in the measure the recipe named', () => {
  const SAUCE = `1 cup heavy cream
1 tsp dried oregano
1 (14.5 oz) can diced tomatoes
2 (6 oz) cans tomato paste
3 cups milk`;

  it('scales cups, spoons and cans honestly and never switches a cup measure to pounds', async () => {
    const cook = await signUp(t.app);
    const recipe = (
      await cook.agent.post('/api/recipes').set('X-CSRF-Token', cook.csrf).send({ title: 'Creamy tomato sauce', servings: 4, text: SAUCE }).expect(201)
    ).body;
    const purchases = async (portions: number) => {
      const body = (await cook.agent.get(`/api/recipes/${recipe.id}/versions/1/prep`).query({ portions }).expect(200)).body;
      return body.shopping.map((s: { purchase: string }) => s.purchase) as string[];
    };
    expect(await purchases(4)).toEqual(['1 cup', '1 tsp', '1 can (14.5 oz)', '2 cans (6 oz)', '3 cups']);
    expect(await purchases(6)).toEqual(['1 1/2 cups', '1 1/2 tsp', '2 cans (14.5 oz); uses 1 1/2', '3 cans (6 oz)', '4 1/2 cups']);
    expect(await purchases(10)).toEqual(['2 1/2 cups', '2 1/2 tsp', '3 cans (14.5 oz); uses 2 1/2', '5 cans (6 oz)', '7 1/2 cups']);
  });
});
