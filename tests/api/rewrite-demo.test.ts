import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import demo from '../../data/demo/recipes.json';
import { createTestApp, type TestApp } from '../helpers/test-app';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(async () => {
  await t.close();
});

describe('worked demo: the invented baked ziti', () => {
  it("is rewritten by cook's swaps for +30 % protein and −20 % kcal per serving with ≤ 3 swaps, volume within 10 %", async () => {
    const recipe = demo.recipes.find((r) => r.title === 'Weeknight baked ziti')!;
    const text = recipe.ingredients.join('\n');
    const before = (await request(t.app).post('/api/analyze').send({ text, servings: recipe.servings }).expect(200)).body;
    expect(before.lines.every((l: { food: unknown }) => l.food !== null)).toBe(true);
    // The product's default targets; +40 % / −25 % is out of reach of the substitution rules (a 422), by design.
    const targets = { proteinMinG: before.perServing.proteinG * 1.3, kcalMax: before.perServing.kcal * 0.8 };
    const res = await request(t.app).post('/api/rewrite').send({ text, servings: recipe.servings, targets, maxSwaps: 3, volumeTolerancePct: 10 }).expect(200);
    const { after, changes } = res.body;
    expect(after.perServing.proteinG / before.perServing.proteinG).toBeGreaterThanOrEqual(1.3 - 1e-9);
    expect(after.perServing.kcal / before.perServing.kcal).toBeLessThanOrEqual(0.8 + 1e-9);
    // every swap names the substitution rule (or coach approval) behind it
    for (const c of changes.filter((x: { swapped: boolean }) => x.swapped)) expect(c.rule?.id ?? c.approvedBy).toBeDefined();
    expect(changes.filter((c: { swapped: boolean }) => c.swapped).length).toBeLessThanOrEqual(3);
    expect(Math.abs(after.volumeMl / res.body.before.volumeMl - 1)).toBeLessThanOrEqual(0.1 + 1e-9);
    // The analysed totals and the rewrite's "before" are the same dish.
    expect(res.body.before.perServing.kcal).toBeCloseTo(before.perServing.kcal, 6);
  });
});
