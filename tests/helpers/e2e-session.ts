import type { Page } from 'playwright-core';
import { expect } from 'vitest';
import { DEMO_ACCOUNTS } from '../../server/seeders/demo-accounts';

export async function signInAs(page: Page, baseUrl: string, role: 'cook' | 'coach' | 'admin') {
  const account = DEMO_ACCOUNTS.find((a) => a.role === role)!;
  return signIn(page, baseUrl, account.email, account.password);
}

export async function signIn(page: Page, baseUrl: string, email: string, password: string) {
  await page.goto(`${baseUrl}/sign-in`);
  await page.getByRole('textbox', { name: 'E-mail' }).fill(email);
  await page.getByLabel('Password', { exact: true }).fill(password);
  await page.getByRole('button', { name: 'Sign in', exact: true }).click();
  await expect.poll(() => page.getByRole('button', { name: /account menu/i }).isVisible(), { timeout: 15_000 }).toBe(true);
}

/** Creates a home cook's account through the sign-up form; waits on the server, so it works at any width. */
export async function signUpCook(page: Page, baseUrl: string, displayName: string, email: string) {
  await page.goto(`${baseUrl}/sign-up`);
  await page.getByRole('textbox', { name: 'Display name' }).fill(displayName);
  await page.getByRole('textbox', { name: 'E-mail' }).fill(email);
  await page.getByLabel('Password', { exact: true }).fill('a sturdy kitchen password');
  await page.getByText('I cook for myself or my household').click();
  await page.getByRole('button', { name: /create/i }).click();
  // at phone width the account menu sits behind "Menu": ask the server whether the cook is signed in
  const signedIn = async () => Boolean(((await (await page.request.get(`${baseUrl}/api/auth/session`)).json()) as { user?: unknown }).user);
  await expect.poll(signedIn, { timeout: 15_000 }).toBe(true);
}
