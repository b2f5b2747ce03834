import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import sharp from 'sharp';
import { binaryBody, createTestApp, signUp, type TestApp } from '../helpers/test-app';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(async () => {
  await t.close();
});

async function cookWithRecipe() {
  const cook = await signUp(t.app);
  const res = await cook.agent.post('/api/recipes').set('X-CSRF-Token', cook.csrf).send({ title: 'Baked ziti', servings: 4, text: '1 lb ziti' }).expect(201);
  return { ...cook, recipe: res.body as { id: number; revision: number } };
}

/** A real photo-sized PNG with noise, so decoding it takes a moment and its tail matters. */
function noisyPng() {
  return sharp({ create: { width: 1200, height: 900, channels: 3, background: '#c8553d', noise: { type: 'gaussian', mean: 128, sigma: 40 } } })
    .png()
    .toBuffer();
}

describe('photo uploads and the recipe revision', () => {
  it('refuses an upload that names a stale revision with 409 and keeps the recipe as it was', async () => {
    const { agent, csrf, recipe } = await cookWithRecipe();
    await agent.patch(`/api/recipes/${recipe.id}`).set('X-CSRF-Token', csrf).send({ revision: 1, title: 'Baked ziti, lighter' }).expect(200);
    const png = await noisyPng();
    const stale = await agent
      .post(`/api/recipes/${recipe.id}/photo`)
      .set('X-CSRF-Token', csrf)
      .field('revision', '1')
      .attach('file', png, 'ziti.png')
      .expect(409);
    expect(stale.body.error.details.currentRevision).toBe(2);
    const now = await agent.get(`/api/recipes/${recipe.id}`).expect(200);
    expect(now.body).toMatchObject({ revision: 2, photoUrl: null });
    const fresh = await agent
      .post(`/api/recipes/${recipe.id}/photo`)
      .set('X-CSRF-Token', csrf)
      .field('revision', '2')
      .attach('file', png, 'ziti.png')
      .expect(201);
    expect(fresh.body.revision).toBe(3);
  });

  it('never acknowledges a photo and a concurrent edit as the same revision', async () => {
    const { agent, csrf, recipe } = await cookWithRecipe();
    const png = await noisyPng();
    const [photo, edit] = await Promise.all([
      agent.post(`/api/recipes/${recipe.id}/photo`).set('X-CSRF-Token', csrf).attach('file', png, 'ziti.png'),
      new Promise((resolve) => setTimeout(resolve, 30)).then(() =>
        agent.patch(`/api/recipes/${recipe.id}`).set('X-CSRF-Token', csrf).send({ revision: 1, notes: 'Bake covered for 20 minutes.' }),
      ),
    ]);
    expect(photo.status).toBe(201);
    const acknowledged = [photo.body.revision];
    if (edit.status === 200) acknowledged.push(edit.body.revision);
    else expect(edit.status).toBe(409); // the photo won the race; the edit was told to reload
    expect(new Set(acknowledged).size).toBe(acknowledged.length);
    const now = await agent.get(`/api/recipes/${recipe.id}`).expect(200);
    expect(now.body.revision).toBe(1 + acknowledged.length);
  });

  it('answers a truncated PNG with a clear 400', async () => {
    const { agent, csrf, recipe } = await cookWithRecipe();
    const png = await noisyPng();
    const truncated = png.subarray(0, Math.floor(png.length / 2));
    const res = await agent.post(`/api/recipes/${recipe.id}/photo`).set('X-CSRF-Token', csrf).attach('file', truncated, 'ziti.png').expect(400);
    expect(res.body.error.message).toContain('This file is not a readable photo');
    expect((await agent.get(`/api/recipes/${recipe.id}`).expect(200)).body).toMatchObject({ revision: 1, photoUrl: null });
  });
});

describe('photo words, removal and thumbnails', () => {
  it('says "This file is not a photo" under the file field, naming a format it cannot use', async () => {
    const { agent, csrf, recipe } = await cookWithRecipe();
    const text = await agent
      .post(`/api/recipes/${recipe.id}/photo`)
      .set('X-CSRF-Token', csrf)
      .attach('file', Buffer.from('just some words'), 'a.jpg')
      .expect(400);
    expect(text.body.error.message).toBe('file: This file is not a photo. Upload a JPEG, PNG or WebP picture.');
    expect(text.body.error.details.fieldErrors.file).toEqual(['This file is not a photo. Upload a JPEG, PNG or WebP picture.']);
    const gif = await sharp({ create: { width: 20, height: 20, channels: 3, background: '#ffffff' } })
      .gif()
      .toBuffer();
    const res = await agent.post(`/api/recipes/${recipe.id}/photo`).set('X-CSRF-Token', csrf).attach('file', gif, 'a.gif').expect(400);
    expect(res.body.error.details.fieldErrors.file[0]).toBe('This file is not a photo Hearthswap can read (GIF). Upload a JPEG, PNG or WebP picture.');
  });

  it('keeps a square thumbnail for the recipe book list and removes the photo with the current revision', async () => {
    const { agent, csrf, recipe } = await cookWithRecipe();
    const jpeg = await sharp({ create: { width: 1800, height: 1200, channels: 3, background: '#7a9e3f' } })
      .jpeg()
      .toBuffer();
    const up = await agent
      .post(`/api/recipes/${recipe.id}/photo`)
      .set('X-CSRF-Token', csrf)
      .field('revision', '1')
      .attach('file', jpeg, 'ziti.jpg')
      .expect(201);
    expect(up.body.revision).toBe(2);
    const listed = (await agent.get('/api/recipes').expect(200)).body.recipes.find((r: { id: number }) => r.id === recipe.id);
    expect(listed.thumbnailUrl).toMatch(new RegExp(`^/api/recipes/${recipe.id}/photo\\?size=thumb&v=`));
    const thumb = await agent.get(listed.thumbnailUrl).buffer(true).parse(binaryBody).expect(200);
    const meta = await sharp(thumb.body as Buffer).metadata();
    expect([meta.format, meta.width, meta.height]).toEqual(['webp', 240, 240]);
    await agent.get(`/api/recipes/${recipe.id}/photo?size=huge`).expect(400);

    // a stale revision changes nothing
    await agent.delete(`/api/recipes/${recipe.id}/photo`).set('X-CSRF-Token', csrf).send({ revision: 1 }).expect(409);
    expect((await agent.get(`/api/recipes/${recipe.id}`).expect(200)).body.photoUrl).not.toBeNull();
    const removed = await agent.delete(`/api/recipes/${recipe.id}/photo`).set('X-CSRF-Token', csrf).send({ revision: 2 }).expect(200);
    expect(removed.body).toMatchObject({ photoUrl: null, hasPhoto: false, thumbnailUrl: null, revision: 3 });
    await agent.get(`/api/recipes/${recipe.id}/photo`).expect(404);
    await agent.get(`/api/recipes/${recipe.id}/photo?size=thumb`).expect(404);
    const other = await signUp(t.app);
    await other.agent.delete(`/api/recipes/${recipe.id}/photo`).set('X-CSRF-Token', other.csrf).send({ revision: 3 }).expect(404);
  });
});
