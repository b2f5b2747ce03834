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
