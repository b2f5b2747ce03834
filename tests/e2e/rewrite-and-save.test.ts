import { describe, expect, it } from 'vitest';
import { screenshot } from '../helpers/browser';
import { useLiveBrowser } from '../helpers/e2e-harness';
import { uniqueEmail } from '../helpers/test-app';
import { signUpCook } from '../helpers/e2e-session';

const live = useLiveBrowser();

const LASAGNA = `9 oz lasagna noodles
1 lb ground beef
2 cups shredded mozzarella
15 oz ricotta cheese
24 oz marinara sauce
1/2 cup grated parmesan
1 large egg
1 tbsp olive oil`;

describe('paste, rewrite, save, compare', () => {
  it('takes a pasted lasagna through a rewrite into the recipe book and compares the two versions', async () => {
    const page = await live.browser.newPage({ viewport: { width: 1280, height: 900 } });
    // A fresh cook with no coach, so the defaults are +30 % protein and −20 % kcal.
    const email = uniqueEmail('e2e-rewrite');
    await page.goto(`${live.server.url}/sign-up`);
    await page.getByRole('textbox', { name: 'Display name' }).fill('Tamsin Oakley');
    await page.getByRole('textbox', { name: 'E-mail' }).fill(email);
    await page.getByLabel('Password', { exact: true }).fill('a sturdy kitchen password');
    await page.getByText('I cook for myself or my household').click();
    await page.getByRole('button', { name: /create/i }).click();
    await expect.poll(() => page.getByRole('button', { name: /account menu/i }).isVisible(), { timeout: 15_000 }).toBe(true);

    await page.goto(`${live.server.url}/`);
    await page.getByRole('textbox', { name: /ingredients/i }).fill(LASAGNA);
    await page.getByRole('spinbutton').first().fill('8');
    await page.getByRole('button', { name: /analyse/i }).click();
    await expect.poll(() => page.getByText('Energy per serving').first().isVisible(), { timeout: 15_000 }).toBe(true);
    // The food's catalogue details are one click away; reference numbers are not in the cook's way.
    expect(
      await page
        .getByRole('link', { name: /About this food/ })
        .first()
        .isVisible(),
    ).toBe(true);
    expect(await page.getByText(/NDB \d{5}/).count()).toBe(0);

    await page.getByRole('button', { name: 'Rewrite', exact: true }).click();
    await expect.poll(() => page.getByText('What changes, and why').isVisible(), { timeout: 20_000 }).toBe(true);
    expect(
      await page
        .getByText(/target at least .* met/i)
        .first()
        .isVisible(),
    ).toBe(true);
    await screenshot(page, 'rewrite-result');

    await page.getByRole('textbox', { name: 'Recipe title' }).fill('Lighter lasagna');
    await page.getByRole('button', { name: 'Save to my recipe book' }).click();
    await expect.poll(() => page.url(), { timeout: 15_000 }).toMatch(/\/recipes\/\d+/);
    // the rewrite is saved in the cook's words: their measures, the new foods' common names
    const id = Number(/\/recipes\/(\d+)/.exec(page.url())![1]);
    type SavedLine = { input: string; foodId: number | null; foodName: string | null };
    const version = async (n: number) =>
      ((await (await page.request.get(`${live.server.url}/api/recipes/${id}/versions/${n}`)).json()) as { lines: SavedLine[] }).lines;
    const [written, rewritten] = [await version(1), await version(2)];
    expect(written.map((l) => l.input)).toEqual(LASAGNA.split('\n'));
    for (const line of rewritten) {
      expect(line.input, line.input).not.toMatch(/^\d+(?:\.\d+)? g [A-Z]/);
      expect(line.input).not.toBe(line.foodName);
    }
    const swapped = rewritten.filter((l) => !written.some((w) => w.foodId === l.foodId));
    expect(swapped.length).toBeGreaterThan(0);
    for (const line of swapped) expect(line.input).toMatch(/^\d[\d\s/]* (?:cups?|oz|lb|tbsp|g) /);
    // the recipe page shows the line as written with the matched food beneath
    await page.goto(`${live.server.url}/recipes/${id}?version=2`);
    await expect.poll(() => page.getByText(swapped[0].input).first().isVisible(), { timeout: 10_000 }).toBe(true);
    expect(await page.getByText(`matched: ${swapped[0].foodName}`).first().isVisible()).toBe(true);
    await screenshot(page, 'rewrite-saved-lines');

    await page.goto(`${live.server.url}/recipes`);
    await expect.poll(() => page.getByRole('link', { name: 'Lighter lasagna' }).first().isVisible(), { timeout: 10_000 }).toBe(true);
    await page.getByRole('link', { name: 'Lighter lasagna' }).first().click();
    await page
      .getByRole('link', { name: /Compare/ })
      .first()
      .click();
    await expect.poll(() => page.url()).toMatch(/compare\?a=\d&b=\d/);
    await expect
      .poll(
        () =>
          page
            .getByText(/Swapped/)
            .first()
            .isVisible(),
        { timeout: 10_000 },
      )
      .toBe(true);
    await screenshot(page, 'compare-versions');
    await page.close();
  });

  it('reads a whole pasted recipe page: only its ingredients are weighed, its servings offered, its title and method kept', async () => {
    const page = await live.browser.newPage({ viewport: { width: 390, height: 844 } });
    await signUpCook(page, live.server.url, 'Odile Fenn', uniqueEmail('e2e-page-paste'));

    const recipePage = ['Sunday lasagna', 'Serves 8', '', 'Ingredients', LASAGNA, '', 'Method', '1. Brown the beef.', '2. Layer and bake 45 minutes.'].join(
      '\n',
    );
    await page.goto(`${live.server.url}/`);
    await page.getByRole('textbox', { name: /ingredients/i }).fill(recipePage);
    expect(await page.getByText('8 ingredient lines.').isVisible()).toBe(true);
    await page.getByRole('button', { name: /analyse/i }).click();
    await expect.poll(() => page.getByText('Only the ingredients were weighed').isVisible(), { timeout: 15_000 }).toBe(true);
    expect(await page.getByText(/the title “Sunday lasagna”, “serves 8”, 2 headings, 2 method steps/).isVisible()).toBe(true);
    expect(await page.getByRole('row').filter({ hasText: 'Brown the beef' }).count()).toBe(0);
    await page.getByRole('button', { name: 'Use 8 servings' }).click();
    await expect.poll(() => page.getByRole('button', { name: 'Use 8 servings' }).count(), { timeout: 10_000 }).toBe(0);

    await page.getByRole('button', { name: 'Rewrite', exact: true }).click();
    await expect.poll(() => page.getByText('What changes, and why').isVisible(), { timeout: 20_000 }).toBe(true);
    expect(await page.getByRole('textbox', { name: 'Recipe title' }).inputValue()).toBe('Sunday lasagna');
    await page.getByRole('button', { name: 'Save to my recipe book' }).click();
    await expect.poll(() => page.url(), { timeout: 15_000 }).toMatch(/\/recipes\/\d+/);
    const id = Number(/\/recipes\/(\d+)/.exec(page.url())![1]);
    const saved = (await (await page.request.get(`${live.server.url}/api/recipes/${id}`)).json()) as { title: string; servings: number; method: string };
    expect(saved.title).toBe('Sunday lasagna');
    expect(saved.servings).toBe(8);
    expect(saved.method).toBe('Brown the beef.\nLayer and bake 45 minutes.');
    await page.close();
  });
});
