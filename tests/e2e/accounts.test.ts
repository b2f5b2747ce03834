import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import { launchBrowser, screenshot } from '../helpers/browser';
import { startLiveServer } from '../helpers/live-server';
import { uniqueEmail } from '../helpers/test-app';
import { DEMO_ACCOUNTS } from '../../server/seeders/demo-accounts';

let server: Awaited<ReturnType<typeof startLiveServer>>;
let browser: Browser;

beforeAll(async () => {
  server = await startLiveServer();
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
  await server?.close();
});

async function signOut(page: Page) {
  await page.getByRole('button', { name: /account menu/i }).click();
  await page.getByRole('button', { name: 'Sign out' }).click();
  await expect.poll(() => page.getByRole('link', { name: 'Sign in' }).first().isVisible()).toBe(true);
}

describe('accounts in the browser', () => {
  it('signs up a new cook, signs out, and signs in as the demo cook', async () => {
    const page = await browser.newPage({ viewport: { width: 1280, height: 900 } });
    await page.goto(`${server.url}/sign-up`);
    await page.getByRole('textbox', { name: 'Display name' }).fill('Juniper Fold');
    await page.getByRole('textbox', { name: 'E-mail' }).fill(uniqueEmail('e2e'));
    await page.getByLabel('Password', { exact: true }).fill('a sturdy kitchen password');
    await page.getByText('I cook for myself or my household').click();
    await page.getByRole('button', { name: /create/i }).click();
    await expect.poll(() => page.getByRole('button', { name: /account menu/i }).isVisible(), { timeout: 15_000 }).toBe(true);
    expect(await page.getByRole('button', { name: /account menu/i }).innerText()).toContain('Juniper Fold');

    await signOut(page);

    const cook = DEMO_ACCOUNTS.find((a) => a.role === 'cook')!;
    await page.goto(`${server.url}/sign-in`);
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
    const page = await browser.newPage();
    await page.goto(`${server.url}/sign-in`);
    await page.getByRole('textbox', { name: 'E-mail' }).fill('cook@hearthswap.test');
    await page.getByLabel('Password', { exact: true }).fill('not the password');
    await page.getByRole('button', { name: 'Sign in', exact: true }).click();
    await expect.poll(() => page.getByText('do not match an account').isVisible(), { timeout: 10_000 }).toBe(true);
    await page.close();
  });
});
