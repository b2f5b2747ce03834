import { describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { screenshot } from '../helpers/browser';
import { useLiveBrowser } from '../helpers/e2e-harness';
import { signInAs } from '../helpers/e2e-session';

const live = useLiveBrowser();

const DESKTOP = { width: 1280, height: 900 };
const PHONE = { width: 390, height: 844 };
const NARROW_PHONE = { width: 360, height: 800 };

// eslint-disable-next-line @typescript-eslint/no-explicit-any -- test answers are read loosely by each assertion
async function getJson<T = any>(page: Page, path: string): Promise<T> {
  return (await (await page.request.get(`${live.server.url}${path}`)).json()) as T;
}

/** How far the page reaches past the window's right edge (0 when nothing scrolls sideways). */
function overflow(page: Page): Promise<number> {
  return page.evaluate(() => Math.max(document.documentElement.scrollWidth, document.body.scrollWidth) - window.innerWidth);
}

/** The elements that stick out past the right edge, for a readable failure. */
function culprits(page: Page): Promise<string[]> {
  return page.evaluate(() => {
    const out: string[] = [];
    for (const el of Array.from(document.querySelectorAll('body *'))) {
      const r = el.getBoundingClientRect();
      if (r.right > window.innerWidth + 1 && r.width > 0)
        out.push(`${el.tagName.toLowerCase()}.${(el.className || '').toString().slice(0, 60)} → ${Math.round(r.right)}px`);
      if (out.length >= 5) break;
    }
    return out;
  });
}

/**
 * Opens a page once at desktop width, waits for `ready` text, screenshots it, then narrows the same
 * page to 390×844 (screenshot) and 360×800 and checks that nothing scrolls sideways at either.
 */
async function walk(page: Page, name: string, path: string | null, ready: RegExp | string) {
  await page.setViewportSize(DESKTOP);
  if (path !== null) await page.goto(`${live.server.url}${path}`);
  await expect.poll(() => page.getByText(ready).first().isVisible(), { timeout: 20_000, message: `${name}: ${String(ready)}` }).toBe(true);
  await page.waitForTimeout(300);
  await screenshot(page, `walk-${name}-1280`);
  for (const size of [PHONE, NARROW_PHONE]) {
    await page.setViewportSize(size);
    await page.waitForTimeout(150);
    const past = await overflow(page);
    expect(past, `${name} at ${size.width} px: ${(await culprits(page)).join('; ')}`).toBeLessThanOrEqual(0);
    if (size === PHONE) await screenshot(page, `walk-${name}-390`);
  }
}

describe('every page at 1280 px, 390 px and 360 px', () => {
  it('signed out', async () => {
    const context = await live.browser.newContext();
    const page = await context.newPage();
    const food = (await getJson(page, '/api/foods/search?q=cheddar&limit=1')).results[0];
    await walk(page, 'kitchen-empty', '/', 'Paste a recipe');
    await walk(page, 'foods', '/foods?q=cheddar', /cheddar/i);
    await walk(page, 'food-detail', `/foods/${food.id}`, 'per 100 g');
    await walk(page, 'sign-in', '/sign-in', 'Password');
    await walk(page, 'sign-up', '/sign-up', 'Display name');
    await walk(page, 'forgot-password', '/forgot-password', /e-mail/i);
    await walk(page, 'not-found', '/no-such-page', /isn't on the menu/);
    await context.close();
  }, 300_000);

  it('the demo cook', async () => {
    const context = await live.browser.newContext();
    const page = await context.newPage();
    await signInAs(page, live.server.url, 'cook');
    const recipes = (await getJson<{ recipes: { id: number; versionCount: number; title: string }[] }>(page, '/api/recipes')).recipes;
    expect(recipes.length).toBeGreaterThan(0);
    const recipe = recipes.find((r) => r.versionCount >= 2) ?? recipes[0];
    const detail = await getJson(page, `/api/recipes/${recipe.id}`);
    const [first, last] = [detail.versions[0].number, detail.versions.at(-1).number];

    await walk(page, 'recipe-book', '/recipes', recipe.title);
    await walk(page, 'recipe-detail', `/recipes/${recipe.id}`, 'Versions');
    await walk(page, 'recipe-compare', `/recipes/${recipe.id}/compare?a=${first}&b=${last}`, 'Per serving');
    await walk(page, 'recipe-print', `/recipes/${recipe.id}/print`, 'Method');
    await walk(page, 'prep', `/recipes/${recipe.id}/versions/${last}/prep?portions=6`, 'Portions to prep');
    await walk(page, 'shopping', '/shopping', /shopping/i);
    await walk(page, 'my-coach', '/coach', /coach/i);
    await walk(page, 'account', '/account', /display name/i);

    // The Kitchen with a recipe and its rewrite on it: the widest tables in the app.
    await page.setViewportSize(DESKTOP);
    await page.goto(`${live.server.url}/recipes/${recipe.id}`);
    await page.getByRole('link', { name: /Edit in the Kitchen/ }).click();
    await expect.poll(() => page.getByText('Energy per serving').first().isVisible(), { timeout: 20_000 }).toBe(true);
    await page.getByRole('button', { name: 'Rewrite', exact: true }).click();
    await expect
      .poll(
        () =>
          page
            .getByText(/What changes, and why|Ways to make it reachable/)
            .first()
            .isVisible(),
        { timeout: 30_000 },
      )
      .toBe(true);
    await walk(page, 'kitchen-rewritten', null, /What changes, and why|Ways to make it reachable/);
    await context.close();
  }, 300_000);

  it('the demo coach', async () => {
    const context = await live.browser.newContext();
    const page = await context.newPage();
    await signInAs(page, live.server.url, 'coach');
    const clients = (await getJson<{ clients: { id: number }[] }>(page, '/api/clients')).clients;
    expect(clients.length).toBeGreaterThan(0);
    const versions = (await getJson<{ versions: { recipeId: number; number: number }[] }>(page, `/api/clients/${clients[0].id}/versions`)).versions;

    await walk(page, 'clients', '/clients', /invite/i);
    await walk(page, 'client-detail', `/clients/${clients[0].id}`, /target/i);
    if (versions.length > 0) {
      await walk(page, 'client-version', `/clients/${clients[0].id}/versions/${versions[0].recipeId}/${versions[0].number}`, /per serving/i);
    }
    await walk(page, 'swap-library', '/swaps', /swap/i);
    await context.close();
  }, 300_000);

  it('the demo admin', async () => {
    const context = await live.browser.newContext();
    const page = await context.newPage();
    await signInAs(page, live.server.url, 'admin');
    await walk(page, 'admin-people', '/admin/users', 'cook@hearthswap.test');
    await walk(page, 'admin-outbox', '/admin/outbox', /outbox|message/i);
    await context.close();
  }, 300_000);
});
