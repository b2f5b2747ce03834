import { describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { screenshot } from '../helpers/browser';
import { useLiveBrowser } from '../helpers/e2e-harness';
import { uniqueEmail } from '../helpers/test-app';
import { DEMO_ACCOUNTS } from '../../server/seeders/demo-accounts';

const live = useLiveBrowser();

async function signOut(page: Page) {
  await page.getByRole('button', { name: /account menu/i }).click();
  await page.getByRole('button', { name: 'Sign out' }).click();
  await expect.poll(() => page.getByRole('link', { name: 'Sign in' }).first().isVisible()).toBe(true);
}

describe('accounts in the browser', () => {
  it('signs up a new cook, signs out, and signs in as the demo cook', async () => {
    const page = await live.browser.newPage({ viewport: { width: 1280, height: 900 } });
    await page.goto(`${live.server.url}/sign-up`);
    await page.getByRole('textbox', { name: 'Display name' }).fill('Juniper Fold');
    await page.getByRole('textbox', { name: 'E-mail' }).fill(uniqueEmail('e2e'));
    await page.getByLabel('Password', { exact: true }).fill('a sturdy kitchen password');
    await page.getByText('I cook for myself or my household').click();
    await page.getByRole('button', { name: /create/i }).click();
    await expect.poll(() => page.getByRole('button', { name: /account menu/i }).isVisible(), { timeout: 15_000 }).toBe(true);
    expect(await page.getByRole('button', { name: /account menu/i }).innerText()).toContain('Juniper Fold');
    // A new cook lands in the Kitchen; let that navigation finish before opening the menu.
    await expect.poll(() => new URL(page.url()).pathname).toBe('/');
    await expect.poll(() => page.getByRole('heading', { name: 'Kitchen', level: 1 }).isVisible()).toBe(true);

    await signOut(page);

    const cook = DEMO_ACCOUNTS.find((a) => a.role === 'cook')!;
    await page.goto(`${live.server.url}/sign-in`);
    await page.getByRole('textbox', { name: 'E-mail' }).fill(cook.email);
    await page.getByLabel('Password', { exact: true }).fill(cook.password);
    await page.getByRole('button', { name: 'Sign in', exact: true }).click();
    await expect.poll(() => page.getByRole('button', { name: /account menu/i }).isVisible(), { timeout: 15_000 }).toBe(true);
    expect(await page.getByRole('link', { name: 'Recipe book' }).first().isVisible()).toBe(true);
    const file = await screenshot(page, 'signed-in-home');
    expect(file).toMatch(/signed-in-home\.png$/);
    await page.close();
  });

  it('shows the server’s message for a wrong password', async () => {
    const page = await live.browser.newPage();
    await page.goto(`${live.server.url}/sign-in`);
    await page.getByRole('textbox', { name: 'E-mail' }).fill('cook@hearthswap.test');
    await page.getByLabel('Password', { exact: true }).fill('not the password');
    await page.getByRole('button', { name: 'Sign in', exact: true }).click();
    await expect.poll(() => page.getByText('do not match an account').isVisible(), { timeout: 10_000 }).toBe(true);
    await page.close();
  });
});
