import { describe, expect, it } from 'vitest';
import { screenshot } from '../helpers/browser';
import { useLiveBrowser } from '../helpers/e2e-harness';
import { signInAs } from '../helpers/e2e-session';

const live = useLiveBrowser();

describe('batch prep in the browser', () => {
  it('opens prep for a saved version, changes portions, and shows the print view', async () => {
    const page = await live.browser.newPage({ viewport: { width: 1280, height: 900 } });
    await signInAs(page, live.server.url, 'cook');
    await page.goto(`${live.server.url}/recipes`);
    await page.getByRole('link', { name: 'Weeknight baked ziti' }).first().click();
    await page.getByRole('link', { name: /Batch prep/ }).click();
    await expect.poll(() => page.url()).toMatch(/\/versions\/\d+\/prep/);
    await expect
      .poll(
        () =>
          page
            .getByText(/Check every package label/i)
            .first()
            .isVisible(),
        { timeout: 15_000 },
      )
      .toBe(true);
    // The seeded ziti is baked under foil: USDA FSIS reheating and the foil caution are shown.
    expect(
      await page
        .getByText(/165 °F/)
        .first()
        .isVisible(),
    ).toBe(true);
    expect(
      await page
        .getByText(/metal foil in a microwave/i)
        .first()
        .isVisible(),
    ).toBe(true);

    const portions = page.getByRole('spinbutton').first();
    const firstBatchCell = async () => (await page.locator('table').first().locator('tbody tr').first().innerText()).replace(/\s+/g, ' ');
    const before = await firstBatchCell();
    await page
      .getByRole('button', { name: /increase|more|\+/i })
      .first()
      .click();
    await expect.poll(() => page.url()).toMatch(/portions=7/);
    await expect.poll(async () => (await firstBatchCell()) !== before, { timeout: 10_000 }).toBe(true);
    expect(await portions.inputValue()).toBe('7');
    await screenshot(page, 'prep-page');

    await page.emulateMedia({ media: 'print' });
    expect(await page.getByRole('navigation', { name: 'Main' }).first().isVisible()).toBe(false);
    await screenshot(page, 'prep-print-view');
    await page.close();
  });
});
