import { describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { screenshot } from '../helpers/browser';
import { useLiveBrowser } from '../helpers/e2e-harness';
import { uniqueEmail } from '../helpers/test-app';

const live = useLiveBrowser();

async function apiAs(page: Page, method: 'get' | 'post' | 'put', path: string, data?: unknown) {
  const csrf = (await (await page.request.get(`${live.server.url}/api/auth/csrf`)).json()).token as string;
  const res = await page.request.fetch(`${live.server.url}${path}`, { method: method.toUpperCase(), data, headers: { 'X-CSRF-Token': csrf } });
  return res.json();
}

describe('a coach and a client in the browser', () => {
  it('coach invites, client accepts, coach publishes a swap, the client’s rewrite uses it', async () => {
    // A coach of our own, so the demo coach's seeded swaps stay out of this test.
    const coach = await live.browser.newPage({ viewport: { width: 1280, height: 900 } });
    const registered = await apiAs(coach, 'post', '/api/auth/register', {
      email: uniqueEmail('e2e-coach'),
      password: 'a sturdy coaching password',
      displayName: 'Coach Rowan Tilly',
      role: 'coach',
    });
    expect(registered.role).toBe('coach');
    const clientEmail = uniqueEmail('e2e-client');

    await coach.goto(`${live.server.url}/clients`);
    await coach.getByRole('textbox', { name: /Client's e-mail/ }).fill(clientEmail);
    await coach.getByRole('button', { name: 'Send the invitation' }).click();
    await expect.poll(() => live.server.outbox().some((m) => m.to.includes(clientEmail)), { timeout: 10_000 }).toBe(true);
    await expect.poll(() => coach.getByText(clientEmail).first().isVisible(), { timeout: 10_000 }).toBe(true);
    await screenshot(coach, 'coach-invited');
    const link = live.server
      .outbox()
      .find((m) => m.to.includes(clientEmail))!
      .text.match(/https?:\/\/\S+\/invitations\/[A-Za-z0-9_-]+/)![0];
    const token = link.split('/invitations/')[1];

    // The client signs up from the link and accepts.
    const client = await live.browser.newPage({ viewport: { width: 1280, height: 900 } });
    await client.goto(`${live.server.url}/invitations/${token}`);
    await client
      .locator('main')
      .getByRole('link', { name: /create|sign up/i })
      .first()
      .click();
    // the form takes the invited address and joins the coach as the account is created
    await client.getByRole('textbox', { name: 'Display name' }).fill('Idris Fennel');
    expect(await client.getByRole('textbox', { name: 'E-mail' }).inputValue()).toBe(clientEmail);
    await client.getByLabel('Password', { exact: true }).fill('a sturdy kitchen password');
    await client.getByRole('button', { name: /create account and join/i }).click();
    await expect.poll(() => client.url(), { timeout: 15_000 }).toMatch(/\/coach$/);

    // The coach adds a draft swap for whole-milk mozzarella, then publishes it from the library.
    const from = (await apiAs(coach, 'get', '/api/foods/search?q=cheese%20mozzarella%20whole%20milk&limit=1')).results[0];
    const to = (await apiAs(coach, 'get', '/api/foods/search?q=cheese%20mozzarella%20part%20skim%20milk&limit=1')).results[0];
    const note = `Bake 5 minutes longer for melt (${Date.now()})`;
    const swap = await apiAs(coach, 'post', '/api/swaps', { fromFoodId: from.id, toFoodId: to.id, note, status: 'draft' });
    expect(swap.status).toBe('draft');
    await coach.goto(`${live.server.url}/swaps`);
    const publish = coach.getByRole('switch', { name: new RegExp(`Publish to clients: .*${to.name.split(',')[1].trim()}`, 'i') }).first();
    await publish.click();
    await expect.poll(() => publish.getAttribute('aria-checked'), { timeout: 10_000 }).toBe('true');
    await screenshot(coach, 'coach-swap-published');

    // Per-meal targets that one lighter cheese reaches while amounts alone cannot (protein must not drop).
    const text = '2 cups shredded mozzarella\n8 oz dry pasta\n1 cup marinara sauce';
    const before = await apiAs(client, 'post', '/api/analyze', { text, servings: 4 });
    const me = await apiAs(client, 'get', '/api/auth/me');
    await apiAs(coach, 'put', `/api/clients/${me.id}/targets`, {
      perMeal: { kcal: Math.floor(before.perServing.kcal * 0.9), proteinG: Math.ceil(before.perServing.proteinG) },
    });

    await client.goto(`${live.server.url}/coach`);
    await expect.poll(() => client.getByText(note).first().isVisible(), { timeout: 10_000 }).toBe(true);
    await screenshot(client, 'client-my-coach');

    // The client's rewrite picks the approved swap and shows the coach's note.
    await client.goto(`${live.server.url}/`);
    await client.getByRole('textbox', { name: /ingredients/i }).fill(text);
    await client.getByRole('spinbutton').first().fill('4');
    await client.getByRole('button', { name: /analyse/i }).click();
    await expect.poll(() => client.getByText('Energy per serving').first().isVisible(), { timeout: 15_000 }).toBe(true);
    await client.getByRole('button', { name: 'Rewrite', exact: true }).click();
    await expect.poll(() => client.getByText('What changes, and why').isVisible(), { timeout: 20_000 }).toBe(true);
    await expect.poll(() => client.getByText(`Note: ${note}`).first().isVisible(), { timeout: 5_000 }).toBe(true);
    expect(await client.getByText('Coach approved').first().isVisible()).toBe(true);
    await screenshot(client, 'client-rewrite-with-approved-swap');
    await coach.close();
    await client.close();
  });
});
