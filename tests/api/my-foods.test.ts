import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import sharp from 'sharp';
import { createTestApp, linkedCoachAndClient, signUp, type TestApp } from '../helpers/test-app';
import { openServices } from '../../server/boot';
import { loadConfig } from '../../server/config';
import { inject } from 'vitest';
import { HIDE_IMPOSSIBLE_FOODS } from '../../server/migrations/0006-my-foods';
import { DEMO_ACCOUNTS } from '../../server/seeders/demo-accounts';
import { TORTILLA_LABEL } from '../helpers/label-panels';

let t: TestApp;
let services: Awaited<ReturnType<typeof openServices>>;
beforeAll(async () => {
  t = await createTestApp();
  services = await openServices(loadConfig({ NODE_ENV: 'test', DATABASE_URL: inject('databaseUrl') }));
});
afterAll(async () => {
  await services.close();
  await t.close();
});

const coachWithClient = () => linkedCoachAndClient(t);

type Agent = Awaited<ReturnType<typeof signUp>>;

/** An invented low-carb tortilla: 45 g = "1 tortilla". */
const TORTILLA = { name: 'Cloudmeadow carb-smart tortilla', ...TORTILLA_LABEL, roles: ['flatbread-wrap'] };

async function addFood(who: Agent, body: object = TORTILLA, status = 201) {
  return who.agent.post('/api/foods').set('X-CSRF-Token', who.csrf).send(body).expect(status);
}

describe('adding a food from its label', () => {
  it('stores per 100 g, keeps the panel, and weighs count lines by the household measure', async () => {
    const cook = await signUp(t.app, 'cook');
    const res = await addFood(cook);
    expect(res.body.source).toBe('custom');
    expect(res.body.owner).toBe('you');
    expect(res.body.per100g.kcal).toBeCloseTo((70 * 100) / 45, 9);
    expect(res.body.per100g.fiberG).toBeCloseTo((14 * 100) / 45, 9);
    expect(res.body.per100g.sodiumMg).toBeCloseTo(1000, 9);
    expect(res.body.label).toMatchObject({ servingSizeG: 45, servingLabel: '1 tortilla', kcal: 70 });
    expect(res.body.portions[0]).toMatchObject({ label: '1 tortilla', amount: 1, measure: 'tortilla', grams: 45 });
    // 70 kcal is within the fiber-aware 4/4/9 range (66.5–122.5 kcal), so no warning
    expect(res.body.warnings).toEqual([]);

    const analysis = await cook.agent
      .post('/api/analyze')
      .send({ text: '2 Cloudmeadow carb-smart tortillas, warmed\n1 cup shredded mozzarella', servings: 2 })
      .expect(200);
    expect(analysis.body.lines[0].food.id).toBe(res.body.id);
    expect(analysis.body.lines[0].grams).toBeCloseTo(90, 9);
    expect(analysis.body.lines[0].nutrients.kcal).toBeCloseTo(140, 9);
    expect(analysis.body.lines[1].food.source).toBe('usda-sr28');
    const shorter = await cook.agent.post('/api/analyze').send({ text: '1 carb-smart tortilla', servings: 1 }).expect(200);
    expect(shorter.body.lines[0].food.id).toBe(res.body.id);
    // nobody else's analysis sees it
    const anon = await request(t.app).post('/api/analyze').send({ text: '2 Cloudmeadow carb-smart tortillas', servings: 2 }).expect(200);
    expect(anon.body.lines[0].food?.id).not.toBe(res.body.id);

    const search = await cook.agent.get('/api/foods/search').query({ q: 'tortilla' }).expect(200);
    expect(search.body.results[0]).toMatchObject({ id: res.body.id, owner: 'you' });
    expect(search.body.results.slice(1).every((r: { owner: unknown }) => r.owner === null)).toBe(true);
  });

  it('counts slices by the label ("17 slices" = 30 g) and takes energy from 4/4/9 when the label has none', async () => {
    const cook = await signUp(t.app, 'cook');
    const res = await addFood(cook, {
      name: 'Ridgeline turkey pepperoni',
      servingSizeG: 30,
      servingLabel: '17 slices',
      proteinG: 9,
      fatG: 3,
      carbsG: 0,
      sodiumMg: 480,
    });
    // general Atwater factors 4/4/9 (USDA Handbook 74): 4·9 + 4·0 + 9·3 = 63 kcal per 30 g
    expect(res.body.per100g.kcal).toBeCloseTo((63 * 100) / 30, 9);
    expect(res.body.energyFromAtwater).toBe(true);
    const analysis = await cook.agent.post('/api/analyze').send({ text: '10 slices Ridgeline turkey pepperoni', servings: 1 }).expect(200);
    expect(analysis.body.lines[0].food.id).toBe(res.body.id);
    expect(analysis.body.lines[0].grams).toBeCloseTo((10 * 30) / 17, 9);
  });

  it('accepts energy far from 4/4/9 with a warning', async () => {
    const cook = await signUp(t.app, 'cook');
    const res = await addFood(cook, { name: 'Odd numbers bar', servingSizeG: 40, kcal: 300, proteinG: 10, fatG: 2, carbsG: 10 });
    expect(res.body.warnings).toHaveLength(1);
    expect(res.body.warnings[0]).toMatch(/4\/4\/9/);
  });
});

describe('impossible values are refused with 400 naming the field', () => {
  const base = { name: 'Test panel', servingSizeG: 100, proteinG: 10, fatG: 10, carbsG: 10 };
  const cases: [string, Record<string, unknown>, string][] = [
    ['a serving of 4.9e-324 g', { servingSizeG: 4.9e-324 }, 'servingSizeG'],
    ['a serving under 1 g', { servingSizeG: 0.5 }, 'servingSizeG'],
    ['a serving of 0.2 mL', { servingSizeG: undefined, servingSizeMl: 0.2 }, 'servingSizeMl'],
    ['no serving at all', { servingSizeG: undefined }, 'servingSizeG'],
    ['901 kcal per 100 g', { kcal: 960 }, 'kcal'],
    ['110 g protein per 100 g', { proteinG: 110, fatG: 0, carbsG: 0 }, 'proteinG'],
    ['macros adding to 120 g per 100 g', { proteinG: 40, fatG: 40, carbsG: 40 }, 'carbsG'],
    ['50,000 mg sodium per 100 g', { sodiumMg: 50_000 }, 'sodiumMg'],
    ['negative fat', { fatG: -1 }, 'fatG'],
    ['text for protein', { proteinG: 'ten' }, 'proteinG'],
    ['saturated fat above total fat', { satFatG: 12 }, 'satFatG'],
    ['sugars above carbohydrate', { sugarG: 15 }, 'sugarG'],
    ['an unknown role', { roles: ['spaceship'] }, 'roles.0'],
    ['a barcode with letters', { barcode: 'ABC123' }, 'barcode'],
  ];
  it.each(cases)('%s', async (_what, change, field) => {
    const cook = await signUp(t.app, 'cook');
    const res = await addFood(cook, { ...base, ...change }, 400);
    expect(res.body.error.code).toBe('validation_failed');
    expect(Object.keys(res.body.error.details.fieldErrors)).toContain(field);
    expect(res.body.error.message).toContain(field);
  });

  it('refuses Infinity sent as 1e999 in raw JSON', async () => {
    const cook = await signUp(t.app, 'cook');
    const res = await cook.agent
      .post('/api/foods')
      .set('X-CSRF-Token', cook.csrf)
      .set('Content-Type', 'application/json')
      .send('{"name":"Overflow","servingSizeG":1e999,"proteinG":1,"fatG":1,"carbsG":1}')
      .expect(400);
    expect(res.body.error.details.fieldErrors.servingSizeG).toBeDefined();
  });

  it('allows label rounding: 1 g of carbohydrate in a 1 g packet, and a panel that adds to 101 g per 100 g', async () => {
    const cook = await signUp(t.app, 'cook');
    await addFood(cook, { name: 'Sweetener packet', servingSizeG: 1, carbsG: 1, proteinG: 0, fatG: 0, kcal: 0 });
    await addFood(cook, { name: 'Rounded powder', servingSizeG: 100, proteinG: 80, fatG: 6, carbsG: 15, kcal: 435 });
  });

  it('checks a PATCH against the whole panel', async () => {
    const cook = await signUp(t.app, 'cook');
    const food = await addFood(cook);
    const res = await cook.agent.patch(`/api/foods/${food.body.id}`).set('X-CSRF-Token', cook.csrf).send({ servingSizeG: 2 }).expect(400);
    expect(res.body.error.details.fieldErrors.carbsG ?? res.body.error.details.fieldErrors.fiberG).toBeDefined();
  });
});

describe('who may do what with a food', () => {
  it('follows the role and ownership matrix', async () => {
    const { coach, client } = await coachWithClient();
    const stranger = await signUp(t.app, 'cook');
    const coachFood = (await addFood(coach, { ...TORTILLA, name: 'Coach test wrap' })).body;
    const clientFood = (await addFood(client, { ...TORTILLA, name: 'Client test wrap' })).body;

    // signed out: 401 to read the list, 403 (no CSRF token) or 401 to change
    await request(t.app).get('/api/foods/mine').expect(401);
    await request(t.app).get(`/api/foods/${coachFood.id}`).expect(404);
    await request(t.app).post('/api/foods').send(TORTILLA).expect(403);

    // an admin is neither cook nor coach
    const admin = DEMO_ACCOUNTS.find((a) => a.role === 'admin')!;
    const adminAgent = request.agent(t.app);
    const csrf = (await adminAgent.get('/api/auth/csrf')).body.token;
    await adminAgent.post('/api/auth/login').set('X-CSRF-Token', csrf).send({ email: admin.email, password: admin.password }).expect(200);
    await adminAgent.post('/api/foods').set('X-CSRF-Token', csrf).send(TORTILLA).expect(403);

    // the coach's food: seen by the coach and the client, changed only by the coach
    const mine = await client.agent.get('/api/foods/mine').expect(200);
    const owners = Object.fromEntries(mine.body.foods.map((f: { id: number; owner: string }) => [f.id, f.owner]));
    expect(owners).toEqual({ [clientFood.id]: 'you', [coachFood.id]: 'coach' });
    await client.agent.get(`/api/foods/${coachFood.id}`).expect(200);
    await client.agent.patch(`/api/foods/${coachFood.id}`).set('X-CSRF-Token', client.csrf).send({ name: 'Mine now' }).expect(403);
    await client.agent.delete(`/api/foods/${coachFood.id}`).set('X-CSRF-Token', client.csrf).expect(403);

    // the client's food is the client's alone
    const coachList = await coach.agent.get('/api/foods/mine').expect(200);
    expect(coachList.body.foods.map((f: { id: number }) => f.id)).toEqual([coachFood.id]);
    await coach.agent.get(`/api/foods/${clientFood.id}`).expect(404);
    await coach.agent.patch(`/api/foods/${clientFood.id}`).set('X-CSRF-Token', coach.csrf).send({ name: 'x y' }).expect(404);

    // a stranger sees nothing of either
    for (const id of [coachFood.id, clientFood.id]) {
      await stranger.agent.get(`/api/foods/${id}`).expect(404);
      await stranger.agent.patch(`/api/foods/${id}`).set('X-CSRF-Token', stranger.csrf).send({ name: 'x y' }).expect(404);
      await stranger.agent.delete(`/api/foods/${id}`).set('X-CSRF-Token', stranger.csrf).expect(404);
    }
    expect((await stranger.agent.get('/api/foods/mine').expect(200)).body.foods).toEqual([]);

    // owners change and delete their own
    const renamed = await client.agent
      .patch(`/api/foods/${clientFood.id}`)
      .set('X-CSRF-Token', client.csrf)
      .send({ name: 'Client wrap, renamed', kcal: 80 })
      .expect(200);
    expect(renamed.body).toMatchObject({ id: clientFood.id, name: 'Client wrap, renamed' });
    expect(renamed.body.per100g.kcal).toBeCloseTo((80 * 100) / 45, 9);
    const gone = await client.agent.delete(`/api/foods/${clientFood.id}`).set('X-CSRF-Token', client.csrf).expect(200);
    expect(gone.body).toEqual({ deleted: true, hidden: false });
    await client.agent.get(`/api/foods/${clientFood.id}`).expect(404);
    await coach.agent.delete(`/api/foods/${coachFood.id}`).set('X-CSRF-Token', coach.csrf).expect(200);
  });
});

describe('saved versions keep their numbers', () => {
  async function recipeWithFood(cook: Agent, foodId: number) {
    const recipe = await cook.agent
      .post('/api/recipes')
      .set('X-CSRF-Token', cook.csrf)
      .send({ title: 'Wrap night', servings: 2, text: '2 Cloudmeadow carb-smart tortillas\n4 oz cooked chicken breast' })
      .expect(201);
    const v1 = await cook.agent.get(`/api/recipes/${recipe.body.id}/versions/1`).expect(200);
    expect(v1.body.lines[0].foodId).toBe(foodId);
    return { recipe: recipe.body, v1: v1.body };
  }

  it('after the food is deleted: it is hidden, and the version, its prep and its rewrite still compute', async () => {
    const cook = await signUp(t.app, 'cook');
    const food = (await addFood(cook)).body;
    const { recipe, v1 } = await recipeWithFood(cook, food.id);
    expect(v1.lines[0].nutrients.kcal).toBeCloseTo(140, 9);

    const del = await cook.agent.delete(`/api/foods/${food.id}`).set('X-CSRF-Token', cook.csrf).expect(200);
    expect(del.body).toEqual({ deleted: true, hidden: true });
    const after = await cook.agent.get(`/api/recipes/${recipe.id}/versions/1`).expect(200);
    expect(after.body.lines[0].nutrients).toEqual(v1.lines[0].nutrients);
    expect(after.body.perServing).toEqual(v1.perServing);
    await cook.agent.get(`/api/recipes/${recipe.id}/versions/1/prep`).query({ portions: 4 }).expect(200);
    // hidden: not listed, not matched, not searched
    expect((await cook.agent.get('/api/foods/mine').expect(200)).body.foods).toEqual([]);
    const analysis = await cook.agent.post('/api/analyze').send({ text: '2 Cloudmeadow carb-smart tortillas', servings: 1 }).expect(200);
    expect(analysis.body.lines[0].food?.id).not.toBe(food.id);
    await cook.agent.patch(`/api/foods/${food.id}`).set('X-CSRF-Token', cook.csrf).send({ kcal: 60 }).expect(404);
  });

  it('after the food is edited: the version keeps the old values, the list shows the new food', async () => {
    const cook = await signUp(t.app, 'cook');
    const food = (await addFood(cook)).body;
    const { recipe, v1 } = await recipeWithFood(cook, food.id);
    const edited = await cook.agent.patch(`/api/foods/${food.id}`).set('X-CSRF-Token', cook.csrf).send({ kcal: 90 }).expect(200);
    expect(edited.body.id).not.toBe(food.id);
    expect(edited.body.per100g.kcal).toBeCloseTo(200, 9);
    const after = await cook.agent.get(`/api/recipes/${recipe.id}/versions/1`).expect(200);
    expect(after.body.lines[0].nutrients.kcal).toBeCloseTo(v1.lines[0].nutrients.kcal, 9);
    const list = (await cook.agent.get('/api/foods/mine').expect(200)).body.foods;
    expect(list.map((f: { id: number }) => f.id)).toEqual([edited.body.id]);
  });

  it('old rows with impossible values are hidden by the migration and refused by the engine; nothing answers 500', async () => {
    const cook = await signUp(t.app, 'cook');
    const food = (await addFood(cook)).body;
    const { recipe } = await recipeWithFood(cook, food.id);
    // what a 4.9e-324 g serving left behind before the limits: every value per 100 g Infinity
    await services.sequelize.query(
      "UPDATE foods SET kcal = 'Infinity', protein_g = 'Infinity', fat_g = 'Infinity', carbs_g = 'Infinity', sodium_mg = 'Infinity', label = NULL WHERE id = $1",
      { bind: [food.id] },
    );
    await services.sequelize.query('UPDATE food_portions SET grams = 4.9e-324 WHERE food_id = $1', { bind: [food.id] });
    await services.sequelize.query(HIDE_IMPOSSIBLE_FOODS);
    const [rows] = (await services.sequelize.query('SELECT hidden_reason FROM foods WHERE id = $1', { bind: [food.id] })) as [
      { hidden_reason: string }[],
      unknown,
    ];
    expect(rows[0].hidden_reason).toBe('impossible values');
    // the test app's engine hears of it through NOTIFY and refuses the row
    await expect.poll(async () => (await cook.agent.get(`/api/foods/${food.id}`)).status, { timeout: 10_000 }).toBe(404);
    const version = await cook.agent.get(`/api/recipes/${recipe.id}/versions/1`).expect(200);
    expect(Number.isFinite(version.body.lines[0].nutrients.kcal)).toBe(true);
    await cook.agent.get(`/api/recipes/${recipe.id}/versions/1/prep`).query({ portions: 4 }).expect(200);
    const rewrite = await cook.agent.post('/api/rewrite').send({
      lines: version.body.lines.map((l: { input: string }) => ({ input: l.input })),
      servings: 2,
      targets: { proteinMinG: 10, kcalMax: 2000 },
      candidatesPerLine: 3,
    });
    // 200, or an honest 422/503 (a busy machine can time the solver out) — never the 500 of a crash
    expect(rewrite.status, JSON.stringify(rewrite.body).slice(0, 400)).not.toBe(500);
    expect(rewrite.body.error?.code ?? 'ok').not.toBe('internal');
  });
});

describe('own foods as swaps', () => {
  it("offers a cook's food for lines whose food plays one of its roles, and not for others", async () => {
    const cook = await signUp(t.app, 'cook');
    const food = (await addFood(cook, { ...TORTILLA, name: 'Lakeshore fiber wrap' })).body;
    const body = {
      text: '4 large flour tortillas\n8 oz cheddar cheese, shredded',
      servings: 4,
      targets: { proteinMinG: 5, kcalMax: 2000 },
      objective: 'min-kcal',
      candidatesPerLine: 4,
    };
    const res = await cook.agent.post('/api/rewrite').send(body).expect(200);
    const toIds = res.body.changes.filter((c: { swapped: boolean }) => c.swapped).map((c: { line: number; to: { id: number } }) => [c.line, c.to.id]);
    expect(toIds).toContainEqual([0, food.id]);
    expect(toIds.some(([line, id]: [number, number]) => line === 1 && id === food.id)).toBe(false);
    // anonymous rewrites never see it
    const anon = await request(t.app).post('/api/rewrite').send(body).expect(200);
    expect(anon.body.changes.some((c: { to: { id: number } }) => c.to.id === food.id)).toBe(false);
  });
});

describe('label photos', () => {
  it('answers 400 "This file is not a photo" for a file that is not an image, and 400 without a file', async () => {
    const cook = await signUp(t.app, 'cook');
    const res = await cook.agent
      .post('/api/foods/label-scan')
      .set('X-CSRF-Token', cook.csrf)
      .attach('image', Buffer.from('%PDF-1.4 not a photo'), 'label.pdf')
      .expect(400);
    expect(res.body.error.message).toMatch(/This file is not a photo/);
    await cook.agent.post('/api/foods/label-scan').set('X-CSRF-Token', cook.csrf).field('note', 'x').expect(400);
    await request(t.app).post('/api/foods/label-scan').attach('image', Buffer.from('x'), 'x.png').expect(403);
  });

  it('answers 422 with a clear message for a photo with no Nutrition Facts panel', async () => {
    const cook = await signUp(t.app, 'cook');
    const sky = await sharp({ create: { width: 640, height: 480, channels: 3, background: { r: 120, g: 170, b: 230 } } })
      .jpeg()
      .toBuffer();
    const res = await cook.agent.post('/api/foods/label-scan').set('X-CSRF-Token', cook.csrf).attach('image', sky, 'sky.jpg').expect(422);
    expect(res.body.error.code).toBe('no_label_found');
    expect(res.body.error.message).toMatch(/No Nutrition Facts panel/);
  });
});
