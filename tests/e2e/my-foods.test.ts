import { describe, expect, it } from 'vitest';
import sharp from 'sharp';
import { screenshot } from '../helpers/browser';
import { useLiveBrowser } from '../helpers/e2e-harness';
import { PANELS, panelHtml } from '../helpers/label-panels';
import { uniqueEmail } from '../helpers/test-app';

const live = useLiveBrowser();

describe('my foods in the browser', () => {
  it('a cook scans a label, confirms it, and sees it matched in a pasted recipe', { timeout: 300_000 }, async () => {
    // the photo: an invented tortilla's panel rendered and photographed as a JPEG
    const shooter = await live.browser.newPage({ deviceScaleFactor: 2, viewport: { width: 1100, height: 900 } });
    await shooter.setContent(panelHtml(PANELS[0]));
    const photo = await sharp(await shooter.locator('body').screenshot())
      .jpeg({ quality: 88 })
      .toBuffer();
    await shooter.close();

    const page = await live.browser.newPage({ viewport: { width: 1280, height: 900 } });
    await page.goto(`${live.server.url}/sign-up`);
    await page.getByRole('textbox', { name: 'Display name' }).fill('Wren Calloway');
    await page.getByRole('textbox', { name: 'E-mail' }).fill(uniqueEmail('e2e-my-foods'));
    await page.getByLabel('Password', { exact: true }).fill('a sturdy kitchen password');
    await page.getByText('I cook for myself or my household').click();
    await page.getByRole('button', { name: /create/i }).click();
    await expect.poll(() => page.getByRole('button', { name: /account menu/i }).isVisible(), { timeout: 15_000 }).toBe(true);

    await page.getByRole('link', { name: 'My foods' }).first().click();
    await expect.poll(() => page.getByRole('heading', { name: 'My foods' }).isVisible(), { timeout: 10_000 }).toBe(true);
    await page.getByRole('button', { name: 'Add a food from its label' }).click();
    const fileInput = page.locator('input[type="file"][capture="environment"]');
    expect(await fileInput.getAttribute('accept')).toBe('image/*');
    await fileInput.setInputFiles({ name: 'tortilla-label.jpg', mimeType: 'image/jpeg', buffer: photo });
    await expect.poll(() => page.getByText('Check every number against the package before you save').isVisible(), { timeout: 120_000 }).toBe(true);
    // the photo filled the form; nothing is saved yet
    expect(await page.getByRole('textbox', { name: 'Grams' }).inputValue()).toBe('45');
    expect(await page.getByRole('textbox', { name: /^Calories/ }).inputValue()).toBe('70');
    expect(await page.getByRole('textbox', { name: /Household measure/ }).inputValue()).toBe('1 tortilla');
    expect(await page.getByRole('textbox', { name: /Total sugars/ }).inputValue()).toBe('0.5');
    expect(await page.getByRole('list', { name: 'My foods' }).count()).toBe(0);
    await screenshot(page, 'my-foods-scanned');

    await page.getByRole('textbox', { name: /^Name/ }).fill('Cloudmeadow carb-smart tortilla');
    await page.getByRole('combobox', { name: /Part it plays/ }).selectOption('flatbread-wrap');
    await page.getByRole('button', { name: 'Save the food' }).click();
    await expect.poll(() => page.getByRole('link', { name: 'Cloudmeadow carb-smart tortilla' }).isVisible(), { timeout: 15_000 }).toBe(true);
    await screenshot(page, 'my-foods-list');

    // a pasted recipe naming the product is matched to it, weighed by "1 tortilla" = 45 g
    await page.goto(`${live.server.url}/`);
    await page.getByRole('textbox', { name: /ingredients/i }).fill('2 Cloudmeadow carb-smart tortillas\n1 cup shredded cheddar cheese');
    await page.getByRole('button', { name: /analyse/i }).click();
    await expect.poll(() => page.getByText('Energy per serving').first().isVisible(), { timeout: 30_000 }).toBe(true);
    await expect.poll(() => page.getByText('Cloudmeadow carb-smart tortilla').first().isVisible(), { timeout: 10_000 }).toBe(true);
    expect(
      await page
        .getByText(/from a label/i)
        .first()
        .isVisible(),
    ).toBe(true);
    expect(
      await page
        .getByText(/\b90 g\b/)
        .first()
        .isVisible(),
    ).toBe(true);
    await screenshot(page, 'my-foods-matched');

    await page.close();
  });

  it("the rewrite of a flour-tortilla recipe swaps in the cook's own tortilla", { timeout: 300_000 }, async () => {
    // setup: a cook of its own with the tortilla the first test scanned and confirmed (PANELS[0]'s values)
    const context = await live.browser.newContext({ viewport: { width: 1280, height: 900 } });
    const page = await context.newPage();
    const { token } = (await (await page.request.get(`${live.server.url}/api/auth/csrf`)).json()) as { token: string };
    const email = uniqueEmail('e2e-my-foods-swap');
    const password = 'a sturdy kitchen password';
    const registered = await page.request.post(`${live.server.url}/api/auth/register`, {
      headers: { 'X-CSRF-Token': token },
      data: { email, password, displayName: 'Wren Calloway', role: 'cook' },
    });
    expect(registered.status()).toBe(201);
    const fresh = (await (await page.request.get(`${live.server.url}/api/auth/csrf`)).json()) as { token: string };
    const { expected } = PANELS[0];
    const added = await page.request.post(`${live.server.url}/api/foods`, {
      headers: { 'X-CSRF-Token': fresh.token },
      data: { ...expected, name: 'Cloudmeadow carb-smart tortilla', roles: ['flatbread-wrap'] },
    });
    expect(added.status()).toBe(201);
    await page.goto(`${live.server.url}/`);
    // a recipe with plain flour tortillas: the rewrite swaps in the cook's own tortilla
    await page.getByRole('textbox', { name: /ingredients/i }).fill('6 large flour tortillas\n1/2 cup salsa');
    await page.getByRole('button', { name: /analyse/i }).click();
    await expect.poll(() => page.getByText('6 large flour tortillas').first().isVisible(), { timeout: 30_000 }).toBe(true);
    // the salsa stays as written, so the solver has one line to work on
    await page.getByRole('checkbox', { name: /1\/2 cup salsa/ }).check();
    await page.getByRole('button', { name: 'Rewrite', exact: true }).click();
    // a busy machine can stop the solver at its time limit: the page then offers to try again
    for (let attempt = 0; attempt < 4; attempt++) {
      await expect
        .poll(async () => (await page.getByText('What changes, and why').isVisible()) || (await page.getByText(/The rewrite didn.t finish/).isVisible()), {
          timeout: 60_000,
        })
        .toBe(true);
      if (await page.getByText('What changes, and why').isVisible()) break;
      await page.getByRole('button', { name: 'Try again' }).click();
    }
    expect(await page.getByText('What changes, and why').isVisible()).toBe(true);
    const changes = page.getByText('What changes, and why').locator('xpath=ancestor::section[1]');
    await expect.poll(async () => (await changes.innerText()).includes('Cloudmeadow carb-smart tortilla'), { timeout: 10_000 }).toBe(true);
    await screenshot(page, 'my-foods-swap');
    await context.close();
  });
});
