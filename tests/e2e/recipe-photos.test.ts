import { describe, expect, it } from 'vitest';
import sharp from 'sharp';
import { screenshot } from '../helpers/browser';
import { useLiveBrowser } from '../helpers/e2e-harness';
import { uniqueEmail } from '../helpers/test-app';

const live = useLiveBrowser();

describe('recipe photos in the browser', () => {
  it('says plainly when a file is not a photo, sends the revision, shows a thumbnail in the book, and removes the photo', { timeout: 180_000 }, async () => {
    const context = await live.browser.newContext({ viewport: { width: 1280, height: 900 } });
    const page = await context.newPage();
    const base = live.server.url;
    const csrf = async () => ((await (await page.request.get(`${base}/api/auth/csrf`)).json()) as { token: string }).token;
    const registered = await page.request.post(`${base}/api/auth/register`, {
      headers: { 'X-CSRF-Token': await csrf() },
      data: { email: uniqueEmail('e2e-photos'), password: 'a sturdy kitchen password', displayName: 'Tamsin Reed', role: 'cook' },
    });
    expect(registered.status()).toBe(201);
    const created = await page.request.post(`${base}/api/recipes`, {
      headers: { 'X-CSRF-Token': await csrf() },
      data: { title: 'Green chile bake', servings: 4, text: '1 lb chicken thighs\n1 cup shredded monterey jack' },
    });
    const recipe = (await created.json()) as { id: number };

    await page.goto(`${base}/recipes/${recipe.id}`);
    const input = page.locator('input[type="file"]');
    await expect.poll(() => input.count(), { timeout: 15_000 }).toBe(1);
    // a file that calls itself a JPEG but is not one: the server's words, under the file field
    await input.setInputFiles({ name: 'notes.jpg', mimeType: 'image/jpeg', buffer: Buffer.from('shopping: onions, garlic') });
    await expect.poll(() => page.getByText('This file is not a photo. Upload a JPEG, PNG or WebP picture.').isVisible(), { timeout: 15_000 }).toBe(true);
    // a document the browser already knows is not a picture never leaves the page
    await input.setInputFiles({ name: 'notes.pdf', mimeType: 'application/pdf', buffer: Buffer.from('%PDF-1.4') });
    await expect.poll(() => page.getByText('This file is not a photo Hearthswap can read.').isVisible()).toBe(true);

    // the recipe changes elsewhere: the upload names the revision this page read and is refused
    const edited = await page.request.patch(`${base}/api/recipes/${recipe.id}`, {
      headers: { 'X-CSRF-Token': await csrf() },
      data: { revision: 1, title: 'Green chile bake' },
    });
    expect(edited.status()).toBe(200);
    const jpeg = await sharp({ create: { width: 1200, height: 800, channels: 3, background: '#5d8a3a' } })
      .jpeg()
      .toBuffer();
    await input.setInputFiles({ name: 'bake.jpg', mimeType: 'image/jpeg', buffer: jpeg });
    await expect.poll(() => page.getByText(/changed since you opened it/).isVisible(), { timeout: 15_000 }).toBe(true);
    expect(await page.getByRole('img', { name: /The dish/ }).count()).toBe(0);

    await page.reload();
    await page.locator('input[type="file"]').setInputFiles({ name: 'bake.jpg', mimeType: 'image/jpeg', buffer: jpeg });
    await expect.poll(() => page.getByRole('img', { name: 'The dish: Green chile bake' }).isVisible(), { timeout: 15_000 }).toBe(true);

    await page.goto(`${base}/recipes`);
    const thumb = page.locator(`img[src^="/api/recipes/${recipe.id}/photo?size=thumb"]`).first();
    await expect.poll(() => thumb.isVisible(), { timeout: 15_000 }).toBe(true);
    expect(await thumb.evaluate((img: HTMLImageElement) => img.naturalWidth)).toBe(240);
    await screenshot(page, 'recipe-book-thumbnails');

    await page.goto(`${base}/recipes/${recipe.id}`);
    await page.getByRole('button', { name: 'Remove the photo' }).click();
    await expect.poll(() => page.getByText('No photo yet').isVisible(), { timeout: 15_000 }).toBe(true);
    const after = (await (await page.request.get(`${base}/api/recipes/${recipe.id}`)).json()) as { photoUrl: string | null; revision: number };
    expect(after).toMatchObject({ photoUrl: null, revision: 4 });
    await context.close();
  });
});
