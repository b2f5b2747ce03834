import { describe, expect, it } from 'vitest';
import type { BrowserContext, Page } from 'playwright-core';
import { screenshot } from '../helpers/browser';
import { useLiveBrowser } from '../helpers/e2e-harness';
import { signIn } from '../helpers/e2e-session';
import { uniqueEmail } from '../helpers/test-app';

const live = useLiveBrowser();
const DESKTOP = { width: 1280, height: 900 };
const PHONE = { width: 390, height: 844 };
const PASSWORD = 'a sturdy coaching password';

async function apiAs(page: Page, method: 'get' | 'post' | 'put', path: string, data?: unknown) {
  const csrf = (await (await page.request.get(`${live.server.url}/api/auth/csrf`)).json()).token as string;
  const res = await page.request.fetch(`${live.server.url}${path}`, { method: method.toUpperCase(), data, headers: { 'X-CSRF-Token': csrf } });
  return res.json();
}

async function newPage(viewport: { width: number; height: number }): Promise<{ context: BrowserContext; page: Page }> {
  const context = await live.browser.newContext({ viewport });
  return { context, page: await context.newPage() };
}

async function newCoach(page: Page, name: string) {
  const email = uniqueEmail('e2e-coach');
  const coach = await apiAs(page, 'post', '/api/auth/register', { email, password: PASSWORD, displayName: name, role: 'coach' });
  expect(coach.role).toBe('coach');
  return { ...coach, email } as { id: number; email: string };
}

function latestLink(email: string) {
  const mail = live.server
    .outbox()
    .filter((m) => m.to.includes(email))
    .at(-1);
  // the mail's host is the server's configured address; the test server listens on its own port
  const token = mail?.text.match(/\/invitations\/([A-Za-z0-9_-]+)/)?.[1];
  return token ? `${live.server.url}/invitations/${token}` : null;
}

/** Buttons and links fully shown right now (the point at their centre hits them), remembered for after the toast. */
async function rememberVisibleControls(page: Page) {
  return page.evaluate(() => {
    const controls = [...document.querySelectorAll<HTMLElement>('button, a[href], input[type="submit"], [role="button"], [role="switch"]')].filter((el) => {
      const r = el.getBoundingClientRect();
      if (r.width === 0 || r.height === 0 || r.bottom <= 0 || r.top >= innerHeight || r.right <= 0 || r.left >= innerWidth) return false;
      const hit = document.elementFromPoint(r.left + r.width / 2, r.top + r.height / 2);
      return hit !== null && (hit === el || el.contains(hit));
    });
    (window as unknown as { __controls: HTMLElement[] }).__controls = controls;
    return controls.length;
  });
}

/** Every toast's box against every remembered control still on the page: none may overlap. */
async function toastOverlaps(page: Page) {
  return page.evaluate(() => {
    const toasts = [...document.querySelectorAll<HTMLElement>('[data-toast]')].map((el) => el.getBoundingClientRect());
    const controls = (window as unknown as { __controls: HTMLElement[] }).__controls.filter((el) => el.isConnected && !el.closest('[data-toast]'));
    const overlaps: string[] = [];
    for (const el of controls) {
      const r = el.getBoundingClientRect();
      if (r.width === 0 || r.height === 0) continue;
      for (const t of toasts) {
        if (r.left < t.right && t.left < r.right && r.top < t.bottom && t.top < r.bottom)
          overlaps.push((el.textContent ?? '').trim().slice(0, 40) || el.tagName);
      }
    }
    return { toasts: toasts.length, controls: controls.length, overlaps };
  });
}

/** Clicks `button` with the page scrolled so it sits just under the header (the worst place for a toast strip), then checks the toast. */
async function clickAndCheckToast(page: Page, button: ReturnType<Page['getByRole']>, expected: RegExp, shot: string) {
  await button.evaluate((el) => {
    const header = document.querySelector('header')?.getBoundingClientRect().height ?? 0;
    window.scrollTo(0, Math.max(0, el.getBoundingClientRect().top + window.scrollY - header - 12));
  });
  expect(await rememberVisibleControls(page)).toBeGreaterThan(3);
  await button.click();
  await expect.poll(() => page.locator('[data-toast]').first().isVisible(), { timeout: 10_000 }).toBe(true);
  expect(await page.locator('[data-toast]').first().innerText()).toMatch(expected);
  const check = await toastOverlaps(page);
  await screenshot(page, shot);
  expect(check.toasts).toBeGreaterThan(0);
  expect(check.overlaps).toEqual([]);
  // and the toast is whole on screen, not pushed off it
  const box = (await page.locator('[data-toast]').first().boundingBox())!;
  const viewport = page.viewportSize()!;
  expect(box.y).toBeGreaterThanOrEqual(0);
  expect(box.y + box.height).toBeLessThanOrEqual(viewport.height);
}

describe('what a paying coach and cook expect', () => {
  const state = {} as { coachEmail: string; coachName: string; clientEmail: string; clientId: number };

  it('a second invitation to the same address renews the first, and the screen says so', async () => {
    const { context, page } = await newPage(DESKTOP);
    state.coachName = 'Coach Marisol Quent';
    state.coachEmail = (await newCoach(page, state.coachName)).email;
    state.clientEmail = uniqueEmail('e2e-invitee');

    await page.goto(`${live.server.url}/clients`);
    await page.getByRole('textbox', { name: /Client's e-mail/ }).fill(state.clientEmail);
    await page.getByRole('button', { name: 'Send the invitation' }).click();
    await expect.poll(() => page.getByText(`Invitation sent to ${state.clientEmail}.`).isVisible(), { timeout: 10_000 }).toBe(true);
    await expect.poll(() => latestLink(state.clientEmail), { timeout: 10_000 }).not.toBeNull();
    const firstLink = latestLink(state.clientEmail)!;

    await page.getByRole('textbox', { name: /Client's e-mail/ }).fill(state.clientEmail.toUpperCase());
    await page.getByRole('button', { name: 'Send the invitation' }).click();
    await expect.poll(() => page.getByText(/a fresh link is on its way, and the earlier link no longer works/).isVisible(), { timeout: 10_000 }).toBe(true);
    await expect.poll(() => latestLink(state.clientEmail), { timeout: 10_000 }).not.toBe(firstLink);
    await expect
      .poll(() => page.getByRole('list', { name: 'Invitations you sent' }).getByRole('listitem').filter({ hasText: state.clientEmail }).count(), {
        timeout: 10_000,
      })
      .toBe(1);
    await screenshot(page, 'coach-invitation-renewed');

    // the earlier link now says it does not work
    const { context: other, page: stale } = await newPage(DESKTOP);
    await stale.goto(firstLink);
    await expect.poll(() => stale.getByText('This invitation link does not work').isVisible(), { timeout: 10_000 }).toBe(true);
    await other.close();
    await context.close();
  });

  it('sign-up from the invitation link pre-fills the invited address, keeps it, and joins the coach', async () => {
    const { context, page } = await newPage(PHONE);
    await page.goto(latestLink(state.clientEmail)!);
    await page.locator('main').getByRole('link', { name: 'Create an account' }).click();
    const email = page.getByRole('textbox', { name: 'E-mail' });
    await expect.poll(() => email.inputValue(), { timeout: 10_000 }).toBe(state.clientEmail);
    expect(await email.getAttribute('readonly')).not.toBeNull();
    expect(await page.getByText(`You're joining ${state.coachName} as a cook`).isVisible()).toBe(true);
    await screenshot(page, 'invited-sign-up-phone');
    await page.getByRole('textbox', { name: 'Display name' }).fill('Tamsin Oakhurst');
    await page.getByLabel('Password', { exact: true }).fill('a sturdy kitchen password');
    await page.getByRole('button', { name: `Create account and join ${state.coachName}` }).click();
    await expect.poll(() => page.url(), { timeout: 15_000 }).toMatch(/\/coach$/);
    await expect.poll(() => page.locator('main').getByText(state.coachName).first().isVisible(), { timeout: 10_000 }).toBe(true);
    const me = await apiAs(page, 'get', '/api/auth/me');
    expect(me.email).toBe(state.clientEmail);
    expect(me.coachId).not.toBeNull();
    state.clientId = me.id;
    await screenshot(page, 'invited-cook-linked-phone');
    await context.close();
  });

  it('body stats typed into the estimator are there again on another device', async () => {
    const first = await newPage(DESKTOP);
    await signIn(first.page, live.server.url, state.coachEmail, PASSWORD);
    await first.page.goto(`${live.server.url}/clients/${state.clientId}`);
    await first.page.getByText('Female', { exact: true }).click();
    await first.page.getByRole('textbox', { name: 'Age (years)' }).fill('41');
    await first.page.getByRole('textbox', { name: 'Feet' }).fill('5');
    await first.page.getByRole('textbox', { name: 'Inches' }).fill('6.5');
    await first.page.getByRole('textbox', { name: 'Weight (lb)' }).fill('163.5');
    await first.page.getByRole('combobox', { name: 'Goal' }).selectOption('lose');
    await first.page.getByRole('button', { name: 'Estimate', exact: true }).click();
    await expect.poll(() => first.page.getByText(/^Stats saved /).isVisible(), { timeout: 10_000 }).toBe(true);
    await first.context.close();

    // the other device: a phone (signed in at desktop width, where the account menu shows)
    const second = await newPage(DESKTOP);
    await signIn(second.page, live.server.url, state.coachEmail, PASSWORD);
    await second.page.setViewportSize(PHONE);
    await second.page.goto(`${live.server.url}/clients/${state.clientId}`);
    const age = second.page.getByRole('textbox', { name: 'Age (years)' });
    await expect.poll(() => age.inputValue(), { timeout: 10_000 }).toBe('41');
    expect(await second.page.getByRole('textbox', { name: 'Feet' }).inputValue()).toBe('5');
    expect(await second.page.getByRole('textbox', { name: 'Inches' }).inputValue()).toBe('6.5');
    expect(await second.page.getByRole('textbox', { name: 'Weight (lb)' }).inputValue()).toBe('163.5');
    expect(await second.page.getByRole('combobox', { name: 'Goal' }).inputValue()).toBe('lose');
    expect(await second.page.getByRole('radio', { name: 'Female' }).isChecked()).toBe(true);
    await screenshot(second.page, 'coach-estimator-remembered-phone');
    await second.context.close();
  });

  it('a cook sees a badge for new coach comments and an e-mail; reading the thread clears it', async () => {
    const cook = await newPage(DESKTOP);
    await signIn(cook.page, live.server.url, state.clientEmail, 'a sturdy kitchen password');
    const recipe = await apiAs(cook.page, 'post', '/api/recipes', {
      title: 'Skillet mac and cheese',
      servings: 4,
      text: '8 oz elbow macaroni\n2 cups shredded cheddar',
    });
    expect(recipe.id).toBeGreaterThan(0);

    const coach = await newPage(DESKTOP);
    await signIn(coach.page, live.server.url, state.coachEmail, PASSWORD);
    await coach.page.goto(`${live.server.url}/clients/${state.clientId}/versions/${recipe.id}/1`);
    await coach.page.getByRole('textbox', { name: 'Your comment' }).fill('Try half the cheddar with cottage cheese blended in.');
    await coach.page.getByRole('button', { name: 'Post the comment' }).click();
    await expect.poll(() => coach.page.getByText('Try half the cheddar').first().isVisible(), { timeout: 10_000 }).toBe(true);

    await expect
      .poll(
        () => live.server.outbox().some((m) => m.to.includes(state.clientEmail) && m.subject === `${state.coachName} commented on Skillet mac and cheese`),
        {
          timeout: 10_000,
        },
      )
      .toBe(true);

    await cook.page.goto(`${live.server.url}/recipes`);
    const navLink = cook.page
      .getByRole('navigation', { name: 'Main' })
      .first()
      .getByRole('link', { name: /Recipe book/ });
    await expect.poll(() => navLink.innerText(), { timeout: 10_000 }).toMatch(/Recipe book\s*1/);
    expect(await navLink.getByText('1 unread comment from your coach').count()).toBe(1);
    const row = cook.page.getByRole('row', { name: /Skillet mac and cheese/ });
    expect(await row.locator('[data-count-badge]').innerText()).toContain('1');
    await screenshot(cook.page, 'cook-unread-badge-book');

    // the recipe page shows it too; the badge stays until the thread is on screen
    await cook.page.setViewportSize({ width: 1280, height: 500 });
    await cook.page.goto(`${live.server.url}/recipes/${recipe.id}`);
    await expect.poll(() => cook.page.locator('main [data-count-badge]').first().isVisible(), { timeout: 10_000 }).toBe(true);
    await cook.page.waitForTimeout(500);
    expect((await apiAs(cook.page, 'get', '/api/comments/unread')).total).toBe(1);
    await cook.page.getByText('Try half the cheddar').first().scrollIntoViewIfNeeded();
    await expect.poll(async () => (await apiAs(cook.page, 'get', '/api/comments/unread')).total, { timeout: 10_000 }).toBe(0);
    await expect.poll(() => cook.page.locator('[data-count-badge]').count(), { timeout: 10_000 }).toBe(0);
    await screenshot(cook.page, 'cook-comments-read');

    // the phone shows the count on the Menu button
    await coach.page.getByRole('textbox', { name: 'Your comment' }).fill('And a pinch of mustard powder.');
    await coach.page.getByRole('button', { name: 'Post the comment' }).click();
    await cook.page.setViewportSize(PHONE);
    await cook.page.goto(`${live.server.url}/recipes`);
    await expect.poll(() => cook.page.getByRole('button', { name: /Menu/ }).innerText(), { timeout: 10_000 }).toMatch(/Menu\s*1/);
    await screenshot(cook.page, 'cook-unread-badge-phone');
    await cook.context.close();
    await coach.context.close();
  });

  for (const [label, viewport] of [
    ['1280×900', DESKTOP],
    ['390×844', PHONE],
  ] as const) {
    it(`toasts never cover a button (${label})`, async () => {
      const { context, page } = await newPage(DESKTOP);
      await signIn(page, live.server.url, state.coachEmail, PASSWORD);
      await page.setViewportSize(viewport);
      const slug = label.replace('×', 'x');

      await page.goto(`${live.server.url}/clients`);
      await page.getByRole('textbox', { name: /Client's e-mail/ }).fill(uniqueEmail('e2e-toast'));
      await clickAndCheckToast(page, page.getByRole('button', { name: 'Send the invitation' }), /Invitation sent to/, `toast-clients-${slug}`);

      await page.goto(`${live.server.url}/clients/${state.clientId}`);
      await page.getByRole('textbox', { name: 'Energy, at most (kcal)' }).fill('650');
      await page.getByRole('textbox', { name: 'Protein, at least (g)' }).fill('40');
      await clickAndCheckToast(page, page.getByRole('button', { name: 'Save targets' }), /Saved .* targets/, `toast-targets-${slug}`);
      await context.close();
    });
  }
});
