import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { createTestApp, type TestApp } from '../helpers/test-app';
import { nutDataByFood } from '../helpers/reference-data';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(async () => {
  await t.close();
});

const LASAGNA = `9 oz lasagna noodles
1 lb ground beef
2 cups shredded mozzarella
15 oz ricotta cheese
24 oz marinara sauce
1/2 cup grated parmesan
1 large egg
1 tbsp olive oil`;

async function analyze(text: string, servings: number) {
  return (await request(t.app).post('/api/analyze').send({ text, servings }).expect(200)).body;
}

describe('POST /api/rewrite', () => {
  it('meets a protein floor and calorie ceiling per serving, within volume, explained, equal to SR28', async () => {
    const before = await analyze(LASAGNA, 8);
    const targets = { proteinMinG: before.perServing.proteinG * 1.3, kcalMax: before.perServing.kcal * 0.8 };
    const res = await request(t.app).post('/api/rewrite').send({ text: LASAGNA, servings: 8, targets, maxSwaps: 4 }).expect(200);
    const body = res.body;
    expect(body.status).toBe('optimal');
    expect(body.after.perServing.proteinG).toBeGreaterThanOrEqual(targets.proteinMinG - 1e-6);
    expect(body.after.perServing.kcal).toBeLessThanOrEqual(targets.kcalMax + 1e-6);
    expect(Math.abs(body.after.volumeMl - body.before.volumeMl)).toBeLessThanOrEqual(0.1 * body.before.volumeMl + 1e-6);
    const swaps = body.changes.filter((c: { swapped: boolean }) => c.swapped);
    expect(swaps.length).toBeGreaterThan(0);
    expect(swaps.length).toBeLessThanOrEqual(4);
    for (const change of body.changes) {
      expect(change.reason.length).toBeGreaterThan(0);
      expect(change.to.source).toBe('usda-sr28');
    }
    // USDA SR28 NUT_DATA.macros.txt: every planned line's nutrients are catalogue × grams.
    const nut = nutDataByFood();
    for (const line of body.after.lines) {
      const usda = nut.get(line.food.sourceId)!;
      expect(line.nutrients.kcal).toBeCloseTo((usda.get('208')! * line.grams) / 100, 6);
      expect(line.nutrients.proteinG).toBeCloseTo((usda.get('203')! * line.grams) / 100, 6);
    }
    expect(body.solver.objective).toBe('closest');
    expect(body.solver.model).toBeUndefined();
  });

  it('returns the exact model as CPLEX LP text with ?explain=1', async () => {
    const before = await analyze(LASAGNA, 8);
    const targets = { proteinMinG: before.perServing.proteinG, kcalMax: before.perServing.kcal };
    const res = await request(t.app).post('/api/rewrite?explain=1').send({ text: LASAGNA, servings: 8, targets }).expect(200);
    expect(res.body.solver.model).toMatch(/^(Minimize|Maximize)/m);
    expect(res.body.solver.model).toMatch(/^Subject To/m);
    expect(res.body.solver.model).toMatch(/^End/m);
  });

  it('keeps locked lines exactly as written', async () => {
    const before = await analyze(LASAGNA, 8);
    // With the beef and the mozzarella locked, the other lines' rules reach +10 % protein and −10 % kcal.
    const targets = { proteinMinG: before.perServing.proteinG * 1.1, kcalMax: before.perServing.kcal * 0.9 };
    const res = await request(t.app)
      .post('/api/rewrite')
      .send({ text: LASAGNA, servings: 8, targets, lockedLines: [1, 2] })
      .expect(200);
    expect(res.body.changes.length).toBeGreaterThan(0);
    for (const i of [1, 2]) {
      const planned = res.body.after.lines.find((l: { index: number }) => l.index === i);
      expect(planned.food.id).toBe(before.lines[i].food.id);
      expect(planned.grams).toBeCloseTo(before.lines[i].grams, 6);
    }
  });

  it('answers unreachable targets with 422, the best reachable values and the binding target', async () => {
    const res = await request(t.app)
      .post('/api/rewrite')
      .send({ text: LASAGNA, servings: 8, targets: { proteinMinG: 400, kcalMax: 150 } })
      .expect(422);
    expect(res.body.error.code).toBe('infeasible');
    expect(res.body.error.message).toMatch(/best reachable/i);
    expect(res.body.error.details.bestReachable.proteinG).toBeGreaterThan(0);
    expect(res.body.error.details.binding.length).toBeGreaterThan(0);
  });

  it('answers bad input with 400 naming the field', async () => {
    const noTargets = await request(t.app).post('/api/rewrite').send({ text: LASAGNA, servings: 8 }).expect(400);
    expect(noTargets.body.error.details.fieldErrors.targets).toBeDefined();
    const badObjective = await request(t.app)
      .post('/api/rewrite')
      .send({ text: LASAGNA, servings: 8, targets: { proteinMinG: 20, kcalMax: 500 }, objective: 'tastiest' })
      .expect(400);
    expect(badObjective.body.error.details.fieldErrors.objective).toBeDefined();
    const badLock = await request(t.app)
      .post('/api/rewrite')
      .send({ text: LASAGNA, servings: 8, targets: { proteinMinG: 20, kcalMax: 500 }, lockedLines: [40] })
      .expect(400);
    expect(badLock.body.error.message).toMatch(/lockedLines/);
    const negative = await request(t.app)
      .post('/api/rewrite')
      .send({ text: LASAGNA, servings: 8, targets: { proteinMinG: -1, kcalMax: 500 } })
      .expect(400);
    expect(negative.body.error.message).toMatch(/targets\.proteinMinG/);
  });

  it('answers bad lineRoles or allowAllergens with 400 naming the field', async () => {
    const targets = { proteinMinG: 20, kcalMax: 500 };
    const badRole = await request(t.app)
      .post('/api/rewrite')
      .send({ text: LASAGNA, servings: 8, targets, lineRoles: { 1: 'garnish-ish' } })
      .expect(400);
    expect(badRole.body.error.message).toMatch(/lineRoles/);
    const badKey = await request(t.app)
      .post('/api/rewrite')
      .send({ text: LASAGNA, servings: 8, targets, lineRoles: { first: 'vegetable' } })
      .expect(400);
    expect(badKey.body.error.message).toMatch(/lineRoles/);
    const outOfRange = await request(t.app)
      .post('/api/rewrite')
      .send({ text: LASAGNA, servings: 8, targets, lineRoles: { 40: 'vegetable' } })
      .expect(400);
    expect(outOfRange.body.error.details.fieldErrors.lineRoles).toBeDefined();
    const badAllergen = await request(t.app)
      .post('/api/rewrite')
      .send({ text: LASAGNA, servings: 8, targets, allowAllergens: ['gluten'] })
      .expect(400);
    expect(badAllergen.body.error.message).toMatch(/allowAllergens/);
  });

  it("analyze reads the dish type and each line's function; the rewrite keeps held lines as written", async () => {
    const text = `${LASAGNA}\n1 teaspoon salt\n2 cloves garlic, minced`;
    const before = await analyze(text, 8);
    expect(before.dishType).toBe('assembled-bake');
    const roles = before.lines.map((l: { role: string }) => l.role);
    expect(roles.slice(0, 8)).toEqual(['starch', 'main-protein', 'melting-cheese', 'fresh-cheese', 'sauce', 'hard-cheese', 'binder', 'cooking-fat']);
    expect(roles.slice(8)).toEqual(['salt', 'aromatic']);
    const targets = { proteinMinG: before.perServing.proteinG * 1.1, kcalMax: before.perServing.kcal * 0.9 };
    for (const objective of ['closest', 'max-protein', 'min-kcal']) {
      const res = await request(t.app)
        .post('/api/rewrite')
        .send({ text, servings: 8, targets, objective, lineRoles: { 4: 'sauce' } })
        .expect(200);
      expect(res.body.dishType).toBe('assembled-bake');
      for (const i of [8, 9]) {
        const planned = res.body.after.lines.filter((l: { index: number }) => l.index === i);
        expect(planned).toHaveLength(1);
        expect(planned[0].food.id).toBe(before.lines[i].food.id);
        expect(planned[0].grams).toBeCloseTo(before.lines[i].grams, 6);
      }
    }
  });

  it('answers a recipe with nothing to rewrite with 422', async () => {
    const res = await request(t.app)
      .post('/api/rewrite')
      .send({ text: 'salt to taste', servings: 1, targets: { proteinMinG: 10, kcalMax: 500 } })
      .expect(422);
    expect(res.body.error.code).toBe('nothing_to_rewrite');
  });
});
