import { describe, expect, it } from 'vitest';
import { readFile } from 'node:fs/promises';
import { screenshot } from '../helpers/browser';
import { useLiveBrowser } from '../helpers/e2e-harness';
import { signIn } from '../helpers/e2e-session';
import { uniqueEmail } from '../helpers/test-app';

const live = useLiveBrowser();

describe('account settings in the browser', () => {
  it('changes the password (signing out the other browser), downloads the recipes, then deletes the account', { timeout: 180_000 }, async () => {
    const email = uniqueEmail('e2e-account');
    const first = await live.browser.newContext({ viewport: { width: 1280, height: 900 }, acceptDownloads: true });
    const page = await first.newPage();
    await page.goto(`${live.server.url}/sign-up`);
    await page.getByRole('textbox', { name: 'Display name' }).fill('Marlow Quince');
    await page.getByRole('textbox', { name: 'E-mail' }).fill(email);
    await page.getByLabel('Password', { exact: true }).fill('a sturdy kitchen password');
    await page.getByText('I cook for myself or my household').click();
    await page.getByRole('button', { name: /create/i }).click();
    await expect.poll(() => page.getByRole('button', { name: /account menu/i }).isVisible(), { timeout: 15_000 }).toBe(true);
    // one saved recipe, through the API with this browser's session
    const { token } = (await (await page.request.get(`${live.server.url}/api/auth/csrf`)).json()) as { token: string };
    const saved = await page.request.post(`${live.server.url}/api/recipes`, {
      headers: { 'X-CSRF-Token': token },
      data: { title: 'Sheet-pan fajitas', servings: 4, text: '1 lb chicken breast\n2 bell peppers, sliced\n8 flour tortillas' },
    });
    expect(saved.status()).toBe(201);

    const second = await live.browser.newContext();
    const other = await second.newPage();
    await signIn(other, live.server.url, email, 'a sturdy kitchen password');

    await page.goto(`${live.server.url}/account`);
    await page.getByLabel('Current password', { exact: true }).fill('not my password at all');
    await page.getByLabel('New password', { exact: true }).fill('an even sturdier password');
    await page.getByRole('button', { name: 'Change password' }).click();
    await expect.poll(() => page.getByText('Not your current password.').isVisible(), { timeout: 10_000 }).toBe(true);
    await page.getByLabel('Current password', { exact: true }).fill('a sturdy kitchen password');
    await page.getByRole('button', { name: 'Change password' }).click();
    await expect.poll(() => page.getByText('Your password is changed.').isVisible(), { timeout: 10_000 }).toBe(true);
    // this browser stays signed in; the other one is signed out
    await page.reload();
    await expect.poll(() => page.getByRole('button', { name: /account menu/i }).isVisible(), { timeout: 10_000 }).toBe(true);
    await other.goto(`${live.server.url}/recipes`);
    await expect.poll(() => new URL(other.url()).pathname, { timeout: 10_000 }).toBe('/sign-in');
    await second.close();

    // the export is offered before the delete, and holds every version
    const [download] = await Promise.all([page.waitForEvent('download'), page.getByRole('link', { name: /Download all my recipes/ }).click()]);
    const doc = JSON.parse(await readFile((await download.path())!, 'utf8')) as { '@graph': { name: string; 'hearthswap:versions': unknown[] }[] };
    expect(doc['@graph'].map((r) => r.name)).toEqual(['Sheet-pan fajitas']);
    expect(doc['@graph'][0]['hearthswap:versions']).toHaveLength(1);
    await screenshot(page, 'account-settings');

    await page.getByLabel('Your password', { exact: true }).fill('an even sturdier password');
    await page.getByRole('button', { name: 'Delete my account' }).click();
    await expect.poll(() => page.getByText('Tick this to confirm.').isVisible(), { timeout: 5_000 }).toBe(true);
    await page.getByText('I understand my recipes and foods are deleted for good').click();
    await page.getByRole('button', { name: 'Delete my account' }).click();
    await expect.poll(() => page.getByText('Your account is deleted').isVisible(), { timeout: 15_000 }).toBe(true);
    expect(await page.getByRole('button', { name: /account menu/i }).isVisible()).toBe(false);
    expect((await page.request.get(`${live.server.url}/api/auth/me`)).status()).toBe(401);
    await screenshot(page, 'account-deleted');

    await page.goto(`${live.server.url}/sign-in`);
    await page.getByRole('textbox', { name: 'E-mail' }).fill(email);
    await page.getByLabel('Password', { exact: true }).fill('an even sturdier password');
    await page.getByRole('button', { name: 'Sign in', exact: true }).click();
    await expect.poll(() => page.getByText('do not match an account').isVisible(), { timeout: 10_000 }).toBe(true);
    await first.close();
  });
});
