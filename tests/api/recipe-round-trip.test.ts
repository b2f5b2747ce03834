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

type Cook = Awaited<ReturnType<typeof signUp>>;
interface Line {
  input: string;
  foodId: number | null;
  foodName: string | null;
  grams: number;
  warnings: string[];
  checkMatch?: boolean;
}
interface Version {
  number: number;
  kind: string;
  parentNumber: number | null;
  servings: number;
  note: string;
  targets: unknown;
  perServing: Record<string, number>;
  lines: Line[];
}

const TEXT = '8 oz elbow macaroni\n2 cups shredded sharp cheddar\n2 cups whole milk\n2 tbsp butter\n1 pinch of moon dust';

async function searchFood(q: string) {
  const res = await request(t.app).get('/api/foods/search').query({ q, limit: 1 }).expect(200);
  return res.body.results[0] as { id: number; name: string };
}

async function allVersions(cook: Cook, recipeId: number): Promise<Version[]> {
  const list = await cook.agent.get(`/api/recipes/${recipeId}/versions`).expect(200);
  const out: Version[] = [];
  for (const v of list.body.versions as { number: number }[])
    out.push((await cook.agent.get(`/api/recipes/${recipeId}/versions/${v.number}`).expect(200)).body);
  return out;
}

/** A recipe with the cook's corrections in every kind of version: a pinned food and grams, their own label food, a rewrite, a restore. */
async function correctedRecipe(cook: Cook) {
  const own = await cook.agent
    .post('/api/foods')
    .set('X-CSRF-Token', cook.csrf)
    .send({
      name: 'Hollowbrook protein elbows',
      servingSizeG: 56,
      servingLabel: '2 oz',
      kcal: 190,
      fatG: 1.5,
      carbsG: 32,
      fiberG: 6,
      proteinG: 13,
      roles: ['pasta'],
    })
    .expect(201);
  const created = await cook.agent.post('/api/recipes').set('X-CSRF-Token', cook.csrf).send({ title: 'Stovetop mac', servings: 4, text: TEXT }).expect(201);
  const id = created.body.id as number;
  const lowfat = await searchFood('cheddar cheese low fat');
  const v1 = (await cook.agent.get(`/api/recipes/${id}/versions/1`).expect(200)).body as Version;
  // the cook's edit: their own pasta pinned at 200 g, another cheese pinned with its grams, the rest as matched
  await cook.agent
    .post(`/api/recipes/${id}/versions`)
    .set('X-CSRF-Token', cook.csrf)
    .send({
      kind: 'edit',
      servings: 5,
      note: 'my corrections',
      lines: [
        { input: '7 oz protein elbows', foodId: own.body.id, grams: 200 },
        { input: '2 cups shredded reduced-fat cheddar', foodId: lowfat.id, grams: 201.5 },
        ...v1.lines.slice(2).map((l) => ({ input: l.input, foodId: l.foodId, grams: l.grams })),
      ],
    })
    .expect(201);
  await cook.agent
    .post(`/api/recipes/${id}/versions`)
    .set('X-CSRF-Token', cook.csrf)
    .send({
      kind: 'rewrite',
      targets: { proteinMinG: 30, kcalMax: 500 },
      note: 'lighter',
      lines: [
        { food: { id: own.body.id }, grams: 180, input: '6 1/3 oz protein elbows' },
        { food: { id: lowfat.id }, grams: 150 },
        ...v1.lines.slice(2).map((l) => ({ input: l.input, foodId: l.foodId, grams: l.grams })),
      ],
    })
    .expect(201);
  await cook.agent.post(`/api/recipes/${id}/restore/1`).set('X-CSRF-Token', cook.csrf).expect(201);
  return { id, own: own.body as { id: number; name: string } };
}

/** A new cook's book of two recipes: the corrected "Stovetop mac" (four versions) and a plain "Oat bake". */
async function bookOfTwo() {
  const cook = await signUp(t.app);
  const { id } = await correctedRecipe(cook);
  await cook.agent
    .post('/api/recipes')
    .set('X-CSRF-Token', cook.csrf)
    .send({ title: 'Oat bake', servings: 2, text: '1 cup rolled oats\n2 large eggs' })
    .expect(201);
  return { cook, id };
}

function comparable(v: Version) {
  return { number: v.number, kind: v.kind, parentNumber: v.parentNumber, servings: v.servings, note: v.note, targets: v.targets, perServing: v.perServing };
}

describe('export then import (JSON-LD with hearthswap:versions)', () => {
  it('round-trips every version line by line: text, pinned food, grams, warnings, kind, note, targets and numbers', async () => {
    const cook = await signUp(t.app);
    const { id, own } = await correctedRecipe(cook);
    const before = await allVersions(cook, id);
    expect(before.map((v) => v.kind)).toEqual(['original', 'edit', 'rewrite', 'edit']);
    // the unknown line has no food and says so: that must survive too
    expect(before[0].lines[4].foodId).toBeNull();

    const exported = await cook.agent.get(`/api/recipes/${id}/export.jsonld`).expect(200);
    const doc = JSON.parse(exported.text);
    expect(doc['hearthswap:versions']).toHaveLength(4);
    expect(doc['hearthswap:versions'][1]['hearthswap:lines'][0]['hearthswap:food']).toMatchObject({ 'hearthswap:source': 'custom', name: own.name });
    expect(doc['hearthswap:versions'][1]['hearthswap:lines'][0]['hearthswap:food']['hearthswap:sourceId']).toMatch(/\S/);
    expect(doc['hearthswap:versions'][1]['hearthswap:lines'][1]['hearthswap:food']['hearthswap:source']).toBe('usda-sr28');
    expect(doc['hearthswap:versions'][1]['hearthswap:lines'][1]['hearthswap:food']['hearthswap:sourceId']).toMatch(/^\d{5}$/);

    const imported = await cook.agent
      .post('/api/recipes/import')
      .set('X-CSRF-Token', cook.csrf)
      .attach('file', Buffer.from(exported.text), 'mac.jsonld')
      .expect(201);
    expect(imported.body.title).toBe('Stovetop mac (imported)');
    const after = await allVersions(cook, imported.body.id);
    expect(after).toHaveLength(before.length);
    for (let i = 0; i < before.length; i++) {
      expect(comparable(after[i])).toEqual(comparable(before[i]));
      expect(after[i].lines).toHaveLength(before[i].lines.length);
      for (let j = 0; j < before[i].lines.length; j++) {
        const [a, b] = [after[i].lines[j], before[i].lines[j]];
        expect({ input: a.input, foodId: a.foodId, foodName: a.foodName, grams: a.grams, warnings: a.warnings, checkMatch: a.checkMatch }).toEqual({
          input: b.input,
          foodId: b.foodId,
          foodName: b.foodName,
          grams: b.grams,
          warnings: b.warnings,
          checkMatch: b.checkMatch,
        });
      }
    }
  });

  it("the whole book exports as one @graph; another cook's import keeps the SR28 foods and grams and rematches a label food they lack, saying so", async () => {
    const { cook, id } = await bookOfTwo();
    const book = await cook.agent.get('/api/recipes/export.jsonld').expect(200);
    expect(book.headers['content-disposition']).toMatch(/hearthswap-recipes\.jsonld/);
    const graph = JSON.parse(book.text)['@graph'] as { name: string; 'hearthswap:versions': unknown[] }[];
    expect(graph.map((r) => [r.name, r['hearthswap:versions'].length])).toEqual([
      ['Stovetop mac', 4],
      ['Oat bake', 1],
    ]);

    const single = await cook.agent.get(`/api/recipes/${id}/export.jsonld`).expect(200);
    const other = await signUp(t.app);
    const imported = await other.agent
      .post('/api/recipes/import')
      .set('X-CSRF-Token', other.csrf)
      .attach('file', Buffer.from(single.text), 'mac.jsonld')
      .expect(201);
    const [before, after] = [await allVersions(cook, id), await allVersions(other, imported.body.id)];
    const edit = [before[1].lines, after[1].lines];
    // the SR28 cheese and its grams come across exactly
    expect(edit[1][1]).toMatchObject({ foodId: edit[0][1].foodId, grams: 201.5, input: '2 cups shredded reduced-fat cheddar' });
    // the label food is not theirs: the text is matched instead, the grams kept, and the line says so
    expect(edit[1][0].foodId).not.toBe(edit[0][0].foodId);
    expect(edit[1][0].grams).toBe(200);
    expect(edit[1][0].warnings.join(' ')).toMatch(/Hollowbrook protein elbows/);
  });

  it('the whole-book file imports whole: every recipe with every version, titles kept apart from the cook’s own', async () => {
    const { cook, id } = await bookOfTwo();
    const book = await cook.agent.get('/api/recipes/export.jsonld').expect(200);
    const res = await cook.agent.post('/api/recipes/import').set('X-CSRF-Token', cook.csrf).attach('file', Buffer.from(book.text), 'book.jsonld').expect(201);
    expect(res.body.importedCount).toBe(2);
    expect([res.body.title, ...res.body.alsoImported.map((r: { title: string }) => r.title)]).toEqual(['Stovetop mac (imported)', 'Oat bake (imported)']);
    const [before, after] = [await allVersions(cook, id), await allVersions(cook, res.body.id)];
    expect(after.map((v) => v.lines.map((l: { grams: number }) => l.grams))).toEqual(before.map((v) => v.lines.map((l: { grams: number }) => l.grams)));
  });

  it('a whole-book file with one damaged recipe saves none of its recipes', async () => {
    const { cook } = await bookOfTwo();
    const doc = JSON.parse((await cook.agent.get('/api/recipes/export.jsonld').expect(200)).text);
    doc['@graph'][1].recipeIngredient = [];
    const before = (await cook.agent.get('/api/recipes').expect(200)).body.recipes.length;
    const res = await cook.agent
      .post('/api/recipes/import')
      .set('X-CSRF-Token', cook.csrf)
      .attach('file', Buffer.from(JSON.stringify(doc)), 'book.jsonld')
      .expect(400);
    expect(res.body.error.message).toMatch(/recipeIngredient/);
    expect((await cook.agent.get('/api/recipes').expect(200)).body.recipes.length).toBe(before);
  });

  it('refuses a damaged version history naming the field in the file, and saves nothing', async () => {
    const cook = await signUp(t.app);
    const { id } = await correctedRecipe(cook);
    const doc = JSON.parse((await cook.agent.get(`/api/recipes/${id}/export.jsonld`).expect(200)).text);
    doc['hearthswap:versions'][2]['hearthswap:lines'][1]['hearthswap:grams'] = -5;
    const before = (await cook.agent.get('/api/recipes').expect(200)).body.recipes.length;
    const res = await cook.agent
      .post('/api/recipes/import')
      .set('X-CSRF-Token', cook.csrf)
      .attach('file', Buffer.from(JSON.stringify(doc)), 'bad.jsonld')
      .expect(400);
    expect(res.body.error.message).toContain('hearthswap:versions.2.hearthswap:lines.1.hearthswap:grams');
    expect((await cook.agent.get('/api/recipes').expect(200)).body.recipes.length).toBe(before);
  });
});

describe('a rewrite line saved with its readable text', () => {
  it("keeps the rewrite's food and grams; the text is not matched again", async () => {
    const cook = await signUp(t.app);
    const created = await cook.agent
      .post('/api/recipes')
      .set('X-CSRF-Token', cook.csrf)
      .send({ title: 'Mac', servings: 4, text: '2 cups shredded sharp cheddar' })
      .expect(201);
    const lowfat = await searchFood('cheddar cheese low fat');
    const saved = await cook.agent
      .post(`/api/recipes/${created.body.id}/versions`)
      .set('X-CSRF-Token', cook.csrf)
      // a partial swap's kept part reads like the original line; its food must still be the one sent
      .send({ kind: 'rewrite', lines: [{ food: { id: lowfat.id }, grams: 113, input: '1 cup shredded sharp cheddar' }] })
      .expect(201);
    expect(saved.body.lines[0]).toMatchObject({ input: '1 cup shredded sharp cheddar', foodId: lowfat.id, grams: 113 });
  });
});
