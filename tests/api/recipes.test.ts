import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import sharp from 'sharp';
import type { Recipe as SchemaRecipe, NutritionInformation } from 'schema-dts';
import { binaryBody, createTestApp, signUp, type TestApp } from '../helpers/test-app';

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
2 tbsp butter`;

async function cookWithRecipe() {
  const cook = await signUp(t.app);
  const res = await cook.agent.post('/api/recipes').set('X-CSRF-Token', cook.csrf).send({ title: 'Stovetop mac', servings: 4, text: TEXT }).expect(201);
  return { ...cook, recipe: res.body };
}

describe('recipes', () => {
  it('creates a recipe whose version 1 is the original, and lists it', async () => {
    const { agent, recipe } = await cookWithRecipe();
    expect(recipe.revision).toBe(1);
    expect(recipe.versions).toHaveLength(1);
    expect(recipe.versions[0]).toMatchObject({ number: 1, kind: 'original' });
    expect(recipe.latest.perServing.kcal).toBeGreaterThan(300);
    const list = await agent.get('/api/recipes').expect(200);
    expect(list.body.recipes.map((r: { id: number }) => r.id)).toContain(recipe.id);
    const v1 = await agent.get(`/api/recipes/${recipe.id}/versions/1`).expect(200);
    expect(v1.body.lines).toHaveLength(4);
    expect(v1.body.lines[0].foodId).toBeGreaterThan(0);
  });

  it('saves a rewrite as version 2 from the rewrite answer, and restores version 1 as version 3', async () => {
    const { agent, csrf, recipe } = await cookWithRecipe();
    const v1 = (await agent.get(`/api/recipes/${recipe.id}/versions/1`)).body;
    const rewrite = await request(t.app)
      .post('/api/rewrite')
      .send({ text: TEXT, servings: 4, targets: { proteinMinG: v1.perServing.proteinG * 1.2, kcalMax: v1.perServing.kcal * 0.85 } })
      .expect(200);
    const saved = await agent
      .post(`/api/recipes/${recipe.id}/versions`)
      .set('X-CSRF-Token', csrf)
      .send({ kind: 'rewrite', lines: rewrite.body.after.lines, targets: { proteinMinG: 20, kcalMax: 500 }, note: 'lighter' })
      .expect(201);
    expect(saved.body).toMatchObject({ number: 2, kind: 'rewrite', parentNumber: 1, note: 'lighter' });
    // Stored totals are recomputed on the server and equal the rewrite's own.
    expect(saved.body.perServing.kcal).toBeCloseTo(rewrite.body.after.perServing.kcal, 6);
    const restored = await agent.post(`/api/recipes/${recipe.id}/restore/1`).set('X-CSRF-Token', csrf).expect(201);
    expect(restored.body).toMatchObject({ number: 3, kind: 'edit', parentNumber: 1 });
    expect(restored.body.perServing.kcal).toBeCloseTo(v1.perServing.kcal, 6);
    const versions = await agent.get(`/api/recipes/${recipe.id}/versions`).expect(200);
    expect(versions.body.versions.map((v: { number: number }) => v.number)).toEqual([1, 2, 3]);
  });

  it('refuses a stale revision with 409 and changes nothing', async () => {
    const { agent, csrf, recipe } = await cookWithRecipe();
    const ok = await agent.patch(`/api/recipes/${recipe.id}`).set('X-CSRF-Token', csrf).send({ revision: 1, title: 'Renamed' }).expect(200);
    expect(ok.body.revision).toBe(2);
    const stale = await agent.patch(`/api/recipes/${recipe.id}`).set('X-CSRF-Token', csrf).send({ revision: 1, title: 'Clobbered' }).expect(409);
    expect(stale.body.error.details.currentRevision).toBe(2);
    await agent.delete(`/api/recipes/${recipe.id}`).set('X-CSRF-Token', csrf).send({ revision: 1 }).expect(409);
    const now = await agent.get(`/api/recipes/${recipe.id}`).expect(200);
    expect(now.body.title).toBe('Renamed');
    expect(now.body.revision).toBe(2);
  });

  it('deletes softly with the current revision, and undoes the delete', async () => {
    const { agent, csrf, recipe } = await cookWithRecipe();
    await agent.delete(`/api/recipes/${recipe.id}`).set('X-CSRF-Token', csrf).send({ revision: 1 }).expect(200);
    await agent.get(`/api/recipes/${recipe.id}`).expect(404);
    const back = await agent.post(`/api/recipes/${recipe.id}/undelete`).set('X-CSRF-Token', csrf).expect(200);
    expect(back.body.versions).toHaveLength(1);
  });

  it('hides another cook’s recipe (404) and refuses the signed-out (401)', async () => {
    const { recipe } = await cookWithRecipe();
    const other = await signUp(t.app);
    await other.agent.get(`/api/recipes/${recipe.id}`).expect(404);
    await other.agent.patch(`/api/recipes/${recipe.id}`).set('X-CSRF-Token', other.csrf).send({ revision: 1, title: 'x' }).expect(404);
    await other.agent
      .post(`/api/recipes/${recipe.id}/versions`)
      .set('X-CSRF-Token', other.csrf)
      .send({ kind: 'edit', lines: [{ input: '1 egg' }] })
      .expect(404);
    await request(t.app).get('/api/recipes').expect(401);
    await request(t.app).get(`/api/recipes/${recipe.id}/versions/1`).expect(401);
  });

  it('answers bad input with 400 naming the field', async () => {
    const { agent, csrf, recipe } = await cookWithRecipe();
    const res = await agent.post('/api/recipes').set('X-CSRF-Token', csrf).send({ servings: 0, text: '1 egg' }).expect(400);
    expect(Object.keys(res.body.error.details.fieldErrors).sort()).toEqual(['servings', 'title']);
    const noRevision = await agent.patch(`/api/recipes/${recipe.id}`).set('X-CSRF-Token', csrf).send({ title: 'x' }).expect(400);
    expect(noRevision.body.error.message).toMatch(/revision/);
    const badKind = await agent
      .post(`/api/recipes/${recipe.id}/versions`)
      .set('X-CSRF-Token', csrf)
      .send({ kind: 'draft', lines: [{ input: '1 egg' }] })
      .expect(400);
    expect(badKind.body.error.details.fieldErrors.kind).toBeDefined();
    await agent.get(`/api/recipes/${recipe.id}/versions/9`).expect(404);
  });

  it('duplicates a recipe with its latest version', async () => {
    const { agent, csrf, recipe } = await cookWithRecipe();
    const copy = await agent.post(`/api/recipes/${recipe.id}/duplicate`).set('X-CSRF-Token', csrf).expect(201);
    expect(copy.body.id).not.toBe(recipe.id);
    expect(copy.body.title).toContain('(copy)');
    expect(copy.body.latest.perServing.kcal).toBeCloseTo(recipe.latest.perServing.kcal, 6);
  });
});

describe('export and import', () => {
  it('exports a schema.org Recipe with NutritionInformation per serving', async () => {
    const { agent, recipe } = await cookWithRecipe();
    const res = await agent.get(`/api/recipes/${recipe.id}/export.jsonld`).expect(200);
    expect(res.headers['content-type']).toMatch(/application\/ld\+json/);
    const doc = JSON.parse(res.text) as SchemaRecipe & { '@context': unknown[] };
    // schema.org first; Hearthswap's own terms (every version) under a prefix of their own
    expect(doc['@context']).toEqual(['https://schema.org', { hearthswap: 'urn:hearthswap:terms#' }]);
    expect(doc['@type']).toBe('Recipe');
    // Property names from schema.org (typed by schema-dts): Recipe and NutritionInformation.
    const keys: (keyof SchemaRecipe & string)[] = ['name', 'recipeYield', 'recipeIngredient', 'nutrition'];
    for (const k of keys) expect(doc).toHaveProperty(k);
    const nutrition = doc.nutrition as Exclude<NutritionInformation, string> & Record<string, unknown>;
    const nKeys: (keyof Exclude<NutritionInformation, string> & string)[] = [
      'calories',
      'proteinContent',
      'fatContent',
      'saturatedFatContent',
      'carbohydrateContent',
      'fiberContent',
      'sugarContent',
      'sodiumContent',
    ];
    for (const k of nKeys) expect(nutrition).toHaveProperty(k);
    expect(nutrition['@type']).toBe('NutritionInformation');
    expect(String(nutrition.calories)).toBe(`${Math.round(recipe.latest.perServing.kcal)} kcal`);
  });

  it('round-trips export → import with the same ingredients and servings', async () => {
    const { agent, csrf, recipe } = await cookWithRecipe();
    const exported = await agent.get(`/api/recipes/${recipe.id}/export.jsonld`).expect(200);
    const imported = await agent
      .post('/api/recipes/import')
      .set('X-CSRF-Token', csrf)
      .attach('file', Buffer.from(exported.text), { filename: 'anything.bin', contentType: 'application/octet-stream' })
      .expect(201);
    expect(imported.body.importedFrom).toBe('json-ld');
    expect(imported.body.servings).toBe(4);
    // The cook already has "Stovetop mac": the import says it is the imported one, and a second does too.
    expect(imported.body.title).toBe('Stovetop mac (imported)');
    const again = await agent.post('/api/recipes/import').set('X-CSRF-Token', csrf).attach('file', Buffer.from(exported.text), 'again.jsonld').expect(201);
    expect(again.body.title).toBe('Stovetop mac (imported 2)');
    const v1 = await agent.get(`/api/recipes/${imported.body.id}/versions/1`).expect(200);
    expect(v1.body.lines.map((l: { input: string }) => l.input)).toEqual(TEXT.split('\n'));
  });

  it('imports a Markdown recipe and a plain text one', async () => {
    const { agent, csrf } = await signUp(t.app);
    const md = `# Skillet chili\n\nServes 6\n\n## Ingredients\n- 1 lb ground beef\n- 1 (15 oz) can kidney beans\n- 1 onion, diced\n\n## Method\n1. Brown the beef.\n2. Simmer everything 20 minutes.\n`;
    const res = await agent.post('/api/recipes/import').set('X-CSRF-Token', csrf).attach('file', Buffer.from(md), 'chili.md').expect(201);
    expect(res.body).toMatchObject({ title: 'Skillet chili', servings: 6, importedFrom: 'text' });
    expect(res.body.method).toContain('Brown the beef.');
    const txt = 'Oat pancakes\nMakes 2\n1 cup rolled oats\n2 large eggs\n1 banana';
    const res2 = await agent.post('/api/recipes/import').set('X-CSRF-Token', csrf).attach('file', Buffer.from(txt), 'x.txt').expect(201);
    expect(res2.body.servings).toBe(2);
    const v1 = await agent.get(`/api/recipes/${res2.body.id}/versions/1`).expect(200);
    expect(v1.body.lines).toHaveLength(3);
  });

  it('refuses binary, recipe-less JSON and missing files with 400, and files over 1 MB with 413', async () => {
    const { agent, csrf } = await signUp(t.app);
    const png = await sharp({ create: { width: 4, height: 4, channels: 3, background: '#c05a2b' } })
      .png()
      .toBuffer();
    const binary = await agent.post('/api/recipes/import').set('X-CSRF-Token', csrf).attach('file', png, 'recipe.txt').expect(400);
    expect(binary.body.error.message).toMatch(/binary/);
    const noRecipe = await agent
      .post('/api/recipes/import')
      .set('X-CSRF-Token', csrf)
      .attach('file', Buffer.from('{"@type":"Person","name":"x"}'), 'r.json')
      .expect(400);
    expect(noRecipe.body.error.message).toMatch(/schema\.org Recipe/);
    await agent.post('/api/recipes/import').set('X-CSRF-Token', csrf).field('other', 'x').expect(400);
    const big = Buffer.alloc(1024 * 1024 + 10, 'a');
    await agent.post('/api/recipes/import').set('X-CSRF-Token', csrf).attach('file', big, 'big.txt').expect(413);
  });
});

describe('photos', () => {
  it('re-encodes an upload as WebP without metadata, resized, and serves it to the owner only', async () => {
    const { agent, csrf, recipe } = await cookWithRecipe();
    const jpeg = await sharp({ create: { width: 2400, height: 1200, channels: 3, background: '#e9b44c' } })
      .jpeg()
      .withMetadata({ exif: { IFD0: { Copyright: 'secret-camera-owner' } } })
      .toBuffer();
    const up = await agent.post(`/api/recipes/${recipe.id}/photo`).set('X-CSRF-Token', csrf).attach('file', jpeg, 'photo.png').expect(201);
    expect(up.body.photoUrl).toMatch(/\/photo/);
    const got = await agent.get(`/api/recipes/${recipe.id}/photo`).buffer(true).parse(binaryBody).expect(200);
    const meta = await sharp(got.body as Buffer).metadata();
    expect(meta.format).toBe('webp');
    expect(Math.max(meta.width!, meta.height!)).toBe(1600);
    expect(meta.exif).toBeUndefined();
    expect((got.body as Buffer).includes(Buffer.from('secret-camera-owner'))).toBe(false);
    const other = await signUp(t.app);
    await other.agent.get(`/api/recipes/${recipe.id}/photo`).expect(404);
  });

  it('refuses a non-image (400) and a photo over 5 MB (413)', async () => {
    const { agent, csrf, recipe } = await cookWithRecipe();
    const res = await agent
      .post(`/api/recipes/${recipe.id}/photo`)
      .set('X-CSRF-Token', csrf)
      .attach('file', Buffer.from('not an image at all'), 'a.jpg')
      .expect(400);
    expect(res.body.error.message).toMatch(/JPEG, PNG or WebP/);
    await agent
      .post(`/api/recipes/${recipe.id}/photo`)
      .set('X-CSRF-Token', csrf)
      .attach('file', Buffer.alloc(5 * 1024 * 1024 + 1), 'big.jpg')
      .expect(413);
  });
});
