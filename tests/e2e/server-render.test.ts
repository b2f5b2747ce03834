/**
 * The Kitchen and the recipe book come drawn from the server (src/entry-server.tsx): their content is
 * in the HTML, shows with JavaScript off, and the browser hydrates those very elements without a
 * word in the console and without asking again for the session or the list it already has.
 */
import { describe, expect, it } from 'vitest';
import type { BrowserContext, ConsoleMessage, Page } from 'playwright-core';
import { useLiveBrowser } from '../helpers/e2e-harness';
import { DEMO_ACCOUNTS } from '../../server/seeders/demo-accounts';
import { PAGE_STATE_ID } from '../../shared/page-render';
import { screenshot } from '../helpers/browser';

const live = useLiveBrowser();
const cook = DEMO_ACCOUNTS.find((a) => a.role === 'cook')!;

async function signedInContext(options: Parameters<typeof live.browser.newContext>[0] = {}): Promise<BrowserContext> {
  const context = await live.browser.newContext(options);
  const csrf = (await (await context.request.get(`${live.server.url}/api/auth/csrf`)).json()) as { token: string };
  const res = await context.request.post(`${live.server.url}/api/auth/login`, {
    headers: { 'X-CSRF-Token': csrf.token },
    data: { email: cook.email, password: cook.password },
  });
  expect(res.ok()).toBe(true);
  return context;
}

function watch(page: Page) {
  const consoleLines: string[] = [];
  const api: string[] = [];
  const styleSheets: string[] = [];
  page.on('console', (m: ConsoleMessage) => {
    if (m.type() === 'error' || m.type() === 'warning') consoleLines.push(`${m.type()}: ${m.text()}`);
  });
  page.on('pageerror', (error) => consoleLines.push(`pageerror: ${error.message}`));
  page.on('request', (r) => {
    const url = new URL(r.url());
    if (url.pathname.startsWith('/api/')) api.push(`${r.method()} ${url.pathname}`);
    if (url.pathname.endsWith('.css')) styleSheets.push(url.pathname);
  });
  return { consoleLines, api, styleSheets };
}

/**
 * Opens `path` with the app's code held back until the server's HTML is on screen, marks the
 * element `selector`, lets the code run and says whether the element React holds after is still
 * that one (hydrated) or was drawn anew.
 */
async function openAndHydrate(page: Page, path: string, selector: string) {
  let release!: () => void;
  const held = new Promise<void>((resolve) => (release = resolve));
  // the entry (Vite's index-<hash>.js): nothing of the app runs before it
  await page.route(/\/assets\/index-[^/]+\.js$/, async (route) => {
    await held;
    await route.continue();
  });
  // not 'domcontentloaded': that waits for the held entry
  await page.goto(`${live.server.url}${path}`, { waitUntil: 'commit' });
  await page.locator(selector).first().waitFor();
  await page
    .locator(selector)
    .first()
    .evaluate((el) => Object.assign(el, { drawnByServer: true }));
  release();
  // React keeps its fiber on each element it owns
  await page.waitForFunction((sel) => Object.keys(document.querySelector(sel) ?? {}).some((k) => k.startsWith('__reactFiber')), selector, { timeout: 30_000 });
  await page.waitForLoadState('networkidle');
  return page
    .locator(selector)
    .first()
    .evaluate((el) => (el as Element & { drawnByServer?: boolean }).drawnByServer === true);
}

describe('pages drawn on the server', () => {
  it('the signed-out Kitchen is in the HTML, with the session in its state and no script run', async () => {
    const res = await fetch(`${live.server.url}/`);
    const html = await res.text();
    expect(res.headers.get('cache-control')).toBe('private, no-cache');
    expect(html).toMatch(/<h1[^>]*>Kitchen<\/h1>/);
    expect(html).toContain('<title>Kitchen · Hearthswap</title>');
    expect(html).toContain(`<script type="application/json" id="${PAGE_STATE_ID}">`);
    // no inline script: the Content-Security-Policy allows scripts from the site only
    expect(html).not.toMatch(/<script(?![^>]*(type="module"|type="application\/json"))[^>]*>/);
    expect(res.headers.get('content-security-policy')).toContain("script-src 'self'");

    const context = await live.browser.newContext({ javaScriptEnabled: false, viewport: { width: 390, height: 844 } });
    const page = await context.newPage();
    await page.goto(`${live.server.url}/`);
    expect(await page.getByRole('heading', { name: 'Kitchen', level: 1 }).isVisible()).toBe(true);
    expect(await page.getByRole('textbox', { name: /ingredients/i }).isVisible()).toBe(true);
    await screenshot(page, 'server-render-kitchen-no-script-390');
    await context.close();
  });

  it('hydrates the Kitchen it drew: the same elements, a quiet console, no session request, and it works', { timeout: 120_000 }, async () => {
    const context = await live.browser.newContext({ viewport: { width: 1280, height: 900 } });
    const page = await context.newPage();
    const seen = watch(page);
    const same = await openAndHydrate(page, '/', 'h1');
    expect(same).toBe(true);
    expect(seen.api).not.toContain('GET /api/auth/session');
    await page.getByRole('textbox', { name: /ingredients/i }).fill('8 oz elbow macaroni\n2 cups shredded sharp cheddar\n2 cups whole milk');
    await page.getByRole('button', { name: /analyse/i }).click();
    await expect.poll(() => page.getByText('Energy per serving').first().isVisible(), { timeout: 30_000 }).toBe(true);
    expect(seen.consoleLines).toEqual([]);
    // the style sheet came in the HTML; the lazy rewrite panel did not fetch it again
    expect(seen.styleSheets).toEqual([]);
    expect(await page.locator('link[rel="stylesheet"]').count()).toBe(0);

    // A reload brings the recipe back from this tab's storage, which the server cannot know: the
    // browser draws the page over the server's HTML instead of hydrating it, still quietly.
    await page.unrouteAll();
    await page.reload();
    await expect.poll(() => page.getByText('Energy per serving').first().isVisible(), { timeout: 30_000 }).toBe(true);
    expect(await page.getByRole('textbox', { name: /ingredients/i }).inputValue()).toContain('elbow macaroni');
    expect(seen.consoleLines).toEqual([]);
    await context.close();
  });

  it('keeps what the cook typed before the page’s code ran, and analyses it', { timeout: 120_000 }, async () => {
    const context = await live.browser.newContext({ viewport: { width: 390, height: 844 } });
    const page = await context.newPage();
    let release!: () => void;
    const held = new Promise<void>((resolve) => (release = resolve));
    await page.route(/\/assets\/index-[^/]+\.js$/, async (route) => {
      await held;
      await route.continue();
    });
    await page.goto(`${live.server.url}/`, { waitUntil: 'commit' });
    const box = page.getByRole('textbox', { name: /ingredients/i });
    await box.waitFor();
    await box.fill('8 oz elbow macaroni\n2 cups shredded sharp cheddar\n2 cups whole milk');
    await page.getByLabel('Servings').first().fill('3');
    release();
    await page.waitForFunction(() => Object.keys(document.querySelector('textarea') ?? {}).some((k) => k.startsWith('__reactFiber')), undefined, {
      timeout: 30_000,
    });
    await page.waitForLoadState('networkidle');
    expect(await box.inputValue()).toContain('elbow macaroni');
    await page.getByRole('button', { name: /analyse/i }).click();
    await expect.poll(() => page.getByText('Energy per serving').first().isVisible(), { timeout: 30_000 }).toBe(true);
    expect(await page.getByText('3 lines. Change a food or a weight and the numbers follow.').isVisible()).toBe(true);
    await context.close();
  });

  it('draws the demo cook’s recipe book with its recipes and hydrates it without asking for them again', { timeout: 120_000 }, async () => {
    const context = await signedInContext({ viewport: { width: 390, height: 844 } });
    const html = await (await context.request.get(`${live.server.url}/recipes`)).text();
    expect(html).toContain('Weeknight baked ziti');
    expect(html).toContain('<title>Recipe book · Hearthswap</title>');

    const page = await context.newPage();
    const seen = watch(page);
    const same = await openAndHydrate(page, '/recipes', 'h1');
    expect(same).toBe(true);
    expect(seen.api).not.toContain('GET /api/auth/session');
    expect(seen.api.filter((r) => r === 'GET /api/recipes')).toEqual([]);
    await screenshot(page, 'server-render-recipe-book-390');
    // hydrated, so the search works
    await page
      .getByRole('searchbox')
      .or(page.getByRole('textbox', { name: /find a recipe/i }))
      .first()
      .fill('ziti');
    await expect.poll(() => page.getByText(/1 recipe with “ziti”/).isVisible(), { timeout: 15_000 }).toBe(true);
    expect(seen.consoleLines).toEqual([]);
    await context.close();
  });

  it('leaves a signed-out visit to the recipe book to the browser, which sends it to sign in', { timeout: 60_000 }, async () => {
    const res = await fetch(`${live.server.url}/recipes`);
    const html = await res.text();
    expect(html).toContain('<div id="root"></div>');
    expect(html).not.toContain('Weeknight baked ziti');
    const page = await live.browser.newPage();
    await page.goto(`${live.server.url}/recipes`);
    await page.waitForURL(/\/sign-in/);
    await page.close();
  });
});
