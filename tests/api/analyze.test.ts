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

const MAC_AND_CHEESE = `12 oz elbow macaroni
2 cups shredded sharp cheddar
1 cup shredded mozzarella
2 1/2 cups whole milk
3 tbsp butter
3 tbsp all-purpose flour
1/2 tsp salt
1/4 tsp black pepper
1/2 cup panko breadcrumbs`;

describe('POST /api/analyze', () => {
  it('weighs, matches and totals a pasted recipe, anonymously and without a CSRF token', async () => {
    const res = await request(t.app).post('/api/analyze').send({ text: MAC_AND_CHEESE, servings: 6 }).expect(200);
    expect(res.body.lines).toHaveLength(9);
    for (const line of res.body.lines) {
      expect(line.food, line.input).not.toBeNull();
      expect(line.food.source).toBe('usda-sr28');
      expect(line.food.sourceId).toMatch(/^\d{5}$/);
      expect(line.grams, line.input).toBeGreaterThan(0);
      expect(Number.isFinite(line.volumeMl)).toBe(true);
    }
    // NIST Handbook 44: 12 oz = 12 × 28.349523125 g exactly.
    expect(res.body.lines[0].grams).toBeCloseTo(12 * 28.349523125, 6);
    const sum = res.body.lines.reduce((s: number, l: { nutrients: { kcal: number } }) => s + l.nutrients.kcal, 0);
    expect(res.body.totals.kcal).toBeCloseTo(sum, 6);
    expect(res.body.perServing.kcal).toBeCloseTo(res.body.totals.kcal / 6, 6);
    expect(Object.keys(res.body.perServing).sort()).toEqual(['carbsG', 'fatG', 'fiberG', 'kcal', 'proteinG', 'satFatG', 'sodiumMg', 'sugarG']);
  });

  it('computes each line from the catalogue exactly as USDA SR28 NUT_DATA gives it per 100 g', async () => {
    const res = await request(t.app).post('/api/analyze').send({ text: '200 g shredded mozzarella\n1 lb lean ground beef', servings: 2 }).expect(200);
    const nut = nutDataByFood();
    for (const line of res.body.lines) {
      const usda = nut.get(line.food.sourceId)!; // USDA SR28 NUT_DATA.macros.txt
      expect(usda, line.food.sourceId).toBeDefined();
      expect(line.nutrients.kcal).toBeCloseTo((usda.get('208')! * line.grams) / 100, 6);
      expect(line.nutrients.proteinG).toBeCloseTo((usda.get('203')! * line.grams) / 100, 6);
      expect(line.nutrients.fatG).toBeCloseTo((usda.get('204')! * line.grams) / 100, 6);
    }
  });

  it('keeps a line with no match as food: null with a warning', async () => {
    const res = await request(t.app).post('/api/analyze').send({ text: '2 cups zzqxv blorp\n1 cup whole milk', servings: 1 }).expect(200);
    expect(res.body.lines[0].food).toBeNull();
    expect(res.body.lines[0].grams).toBe(0);
    expect(res.body.lines[0].warnings.join(' ')).toMatch(/match/i);
    expect(res.body.lines[1].food).not.toBeNull();
  });

  it('flags "to taste" lines and weighs them 0 g until the cook sets an amount', async () => {
    const res = await request(t.app).post('/api/analyze').send({ text: 'salt and pepper to taste', servings: 1 }).expect(200);
    expect(res.body.lines[0].grams).toBe(0);
    expect(res.body.lines[0].warnings.length).toBeGreaterThan(0);
  });

  it('honours a pinned food and pinned grams', async () => {
    const first = await request(t.app).post('/api/analyze').send({ text: '1 cup shredded mozzarella', servings: 1 }).expect(200);
    const alt = first.body.lines[0].alternatives[0];
    expect(alt).toBeDefined();
    const res = await request(t.app)
      .post('/api/analyze')
      .send({ lines: [{ input: '1 cup shredded mozzarella', foodId: alt.id, grams: 80 }], servings: 1 })
      .expect(200);
    expect(res.body.lines[0].food.id).toBe(alt.id);
    expect(res.body.lines[0].grams).toBe(80);
    expect(res.body.lines[0].pinned).toEqual({ food: true, grams: true });
  });

  it('reads a whole pasted recipe page: only the ingredient lines are weighed, the rest is named and set aside', async () => {
    const text = [
      'Weeknight mac and cheese',
      'Serves 6',
      'Ingredients',
      MAC_AND_CHEESE,
      'For the topping:',
      'Method',
      '1. Boil the macaroni.',
      '2. Make the sauce.',
    ].join('\n');
    const res = await request(t.app).post('/api/analyze').send({ text, servings: 6 }).expect(200);
    expect(res.body.lines.map((l: { input: string }) => l.input)).toEqual(MAC_AND_CHEESE.split('\n'));
    expect(res.body.fromText.title).toBe('Weeknight mac and cheese');
    expect(res.body.fromText.servings).toBe(6);
    expect(res.body.fromText.setAside.filter((l: { why: string }) => l.why === 'method')).toHaveLength(2);
    const onlyHeadings = await request(t.app).post('/api/analyze').send({ text: 'Ingredients\nMethod\nStir.', servings: 2 }).expect(400);
    expect(onlyHeadings.body.error.details.fieldErrors.text).toBeDefined();
  });

  it('answers bad input with 400 naming the field', async () => {
    const noServings = await request(t.app).post('/api/analyze').send({ text: '1 egg' }).expect(400);
    expect(noServings.body.error.details.fieldErrors.servings).toBeDefined();
    const zero = await request(t.app).post('/api/analyze').send({ text: '1 egg', servings: 0 }).expect(400);
    expect(zero.body.error.message).toMatch(/servings/);
    const nothing = await request(t.app).post('/api/analyze').send({ servings: 2 }).expect(400);
    expect(nothing.body.error.details.fieldErrors.text).toBeDefined();
    const negative = await request(t.app)
      .post('/api/analyze')
      .send({ lines: [{ input: 'egg', grams: -5 }], servings: 1 })
      .expect(400);
    expect(negative.body.error.message).toMatch(/lines\.0\.grams/);
    const tooMany = await request(t.app)
      .post('/api/analyze')
      .send({ text: Array(101).fill('1 egg').join('\n'), servings: 1 })
      .expect(400);
    expect(tooMany.body.error.message).toMatch(/at most 100/);
  });

  it('rate-limits anonymous use per address (429 beyond the limit)', async () => {
    const limited = await createTestApp({ anonymousComputePerMin: 3 });
    try {
      for (let i = 0; i < 3; i++) await request(limited.app).post('/api/analyze').send({ text: '1 egg', servings: 1 }).expect(200);
      const res = await request(limited.app).post('/api/analyze').send({ text: '1 egg', servings: 1 }).expect(429);
      expect(res.body.error.code).toBe('rate_limited');
    } finally {
      await limited.close();
    }
  });
});

describe('foods', () => {
  it('searches the catalogue fuzzily and returns plain foods first', async () => {
    const res = await request(t.app).get('/api/foods/search').query({ q: 'mozarella part skim', limit: 5 }).expect(200);
    expect(res.body.results.length).toBeGreaterThan(0);
    expect(res.body.results[0].name.toLowerCase()).toContain('mozzarella');
    expect(res.body.results.every((r: { branded: boolean }) => !r.branded)).toBe(true);
  });

  it('shows a food with its portions and per-100 g values equal to SR28', async () => {
    const search = await request(t.app).get('/api/foods/search').query({ q: 'egg whole raw fresh' }).expect(200);
    const id = search.body.results[0].id;
    const res = await request(t.app).get(`/api/foods/${id}`).expect(200);
    const usda = nutDataByFood().get(res.body.sourceId)!; // USDA SR28 NUT_DATA.macros.txt
    expect(res.body.per100g.proteinG).toBe(usda.get('203'));
    expect(res.body.portions.length).toBeGreaterThan(0);
  });

  it('answers a bad id with 400 and an unknown one with 404', async () => {
    await request(t.app).get('/api/foods/abc').expect(400);
    await request(t.app).get('/api/foods/99999999').expect(404);
    const empty = await request(t.app).get('/api/foods/search').query({ q: '' }).expect(400);
    expect(empty.body.error.details.fieldErrors.q).toBeDefined();
  });
});
