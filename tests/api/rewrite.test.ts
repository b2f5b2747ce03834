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
    const targets = { proteinMinG: before.perServing.proteinG * 1.2, kcalMax: before.perServing.kcal * 0.85 };
    const res = await request(t.app).post('/api/rewrite').send({ text: LASAGNA, servings: 8, targets, lockedLines: [1, 2] }).expect(200);
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
    const negative = await request(t.app).post('/api/rewrite').send({ text: LASAGNA, servings: 8, targets: { proteinMinG: -1, kcalMax: 500 } }).expect(400);
    expect(negative.body.error.message).toMatch(/targets\.proteinMinG/);
  });

  it('answers a recipe with nothing to rewrite with 422', async () => {
    const res = await request(t.app).post('/api/rewrite').send({ text: 'salt to taste', servings: 1, targets: { proteinMinG: 10, kcalMax: 500 } }).expect(422);
    expect(res.body.error.code).toBe('nothing_to_rewrite');
  });
});
