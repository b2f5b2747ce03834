import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import request from 'supertest';
import { agentWithCsrf, createTestApp, linkedCoachAndClient, invitationTokenFrom as tokenFrom, signUp, type TestApp } from '../helpers/test-app';
import { DEMO_ACCOUNTS } from '../../server/seeders/demo-accounts';
import { Invitation } from '../../server/models';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(async () => {
  await t.close();
});

const coachWithClient = () => linkedCoachAndClient(t);

async function foodId(q: string) {
  const res = await request(t.app).get('/api/foods/search').query({ q, limit: 1 }).expect(200);
  return res.body.results[0].id as number;
}

describe('invitations by e-mail', () => {
  it('sends a single-use link through SMTP that links the cook to the coach', async () => {
    const coach = await signUp(t.app, 'coach');
    const cook = await signUp(t.app, 'cook');
    await coach.agent.post('/api/clients/invitations').set('X-CSRF-Token', coach.csrf).send({ email: cook.email }).expect(201);
    const mail = t
      .outbox()
      .filter((m) => m.to.includes(cook.email))
      .at(-1)!;
    expect(mail.subject.length).toBeGreaterThan(0);
    expect(mail.text).toContain('http://hearthswap.test/invitations/');
    const token = tokenFrom(mail.text);
    const info = await request(t.app).get(`/api/invitations/${token}`).expect(200);
    expect(info.body.coachName).toBe('Test coach');
    const accepted = await cook.agent.post(`/api/invitations/${token}/accept`).set('X-CSRF-Token', cook.csrf).expect(200);
    expect(accepted.body.coachId).toBe(coach.user.id);
    const me = await cook.agent.get('/api/auth/me').expect(200);
    expect(me.body.coachId).toBe(coach.user.id);
    const again = await cook.agent.post(`/api/invitations/${token}/accept`).set('X-CSRF-Token', cook.csrf).expect(410);
    expect(again.body.error.code).toBe('invitation_used');
    const list = await coach.agent.get('/api/clients').expect(200);
    expect(list.body.clients.map((c: { id: number }) => c.id)).toContain(cook.user.id);
    expect(list.body.invitations[0].status).toBe('accepted');
  });

  it('refuses an expired token with 410 and an unknown one with 404', async () => {
    const coach = await signUp(t.app, 'coach');
    const cook = await signUp(t.app, 'cook');
    await coach.agent.post('/api/clients/invitations').set('X-CSRF-Token', coach.csrf).send({ email: cook.email }).expect(201);
    const token = tokenFrom(
      t
        .outbox()
        .filter((m) => m.to.includes(cook.email))
        .at(-1)!.text,
    );
    await Invitation.update({ expiresAt: new Date(Date.now() - 1000) }, { where: { email: cook.email } });
    const res = await cook.agent.post(`/api/invitations/${token}/accept`).set('X-CSRF-Token', cook.csrf).expect(410);
    expect(res.body.error.code).toBe('invitation_expired');
    await cook.agent
      .post(`/api/invitations/${'x'.repeat(32)}/accept`)
      .set('X-CSRF-Token', cook.csrf)
      .expect(404);
  });

  it('lets a client leave and a coach remove a client', async () => {
    const { coach, client } = await coachWithClient();
    await client.agent.delete('/api/coach').set('X-CSRF-Token', client.csrf).expect(204);
    expect((await client.agent.get('/api/auth/me')).body.coachId).toBeNull();
    const second = await coachWithClient();
    await second.coach.agent.delete(`/api/clients/${second.client.user.id}`).set('X-CSRF-Token', second.coach.csrf).expect(204);
    expect((await second.client.agent.get('/api/auth/me')).body.coachId).toBeNull();
    await coach.agent.delete(`/api/clients/${second.client.user.id}`).set('X-CSRF-Token', coach.csrf).expect(404);
  });
});

describe('swap library', () => {
  it('is written by coaches only; a client reads their coach’s published swaps only', async () => {
    const { coach, client } = await coachWithClient();
    const from = await foodId('cheese mozzarella whole milk');
    const to = await foodId('cheese mozzarella part skim milk');
    const draft = await coach.agent
      .post('/api/swaps')
      .set('X-CSRF-Token', coach.csrf)
      .send({ fromFoodId: from, toFoodId: to, note: 'Bake 5 minutes longer for melt' })
      .expect(201);
    expect(draft.body.status).toBe('draft');
    expect((await client.agent.get('/api/swaps').expect(200)).body.swaps).toHaveLength(0);
    await coach.agent.post(`/api/swaps/${draft.body.id}/publish`).set('X-CSRF-Token', coach.csrf).expect(200);
    const seen = await client.agent.get('/api/swaps').expect(200);
    expect(seen.body.swaps.map((s: { id: number }) => s.id)).toEqual([draft.body.id]);
    await client.agent.post('/api/swaps').set('X-CSRF-Token', client.csrf).send({ fromFoodId: from, toFoodId: to }).expect(403);
    const other = await signUp(t.app, 'coach');
    await other.agent.patch(`/api/swaps/${draft.body.id}`).set('X-CSRF-Token', other.csrf).send({ note: 'mine now' }).expect(404);
    expect((await other.agent.get('/api/swaps')).body.swaps).toHaveLength(0);
    const bad = await coach.agent
      .post('/api/swaps')
      .set('X-CSRF-Token', coach.csrf)
      .send({ fromFoodId: from, fromRole: 'melting-cheese', toFoodId: to })
      .expect(400);
    expect(bad.body.error.details.fieldErrors.fromFoodId).toBeDefined();
    await request(t.app).get('/api/swaps').expect(401);
  });

  it('makes a client’s rewrite use the approved swap, naming the coach and citing the note', async () => {
    const { coach, client } = await coachWithClient();
    const from = await foodId('cheese mozzarella whole milk');
    const to = await foodId('cheese mozzarella part skim milk');
    const swap = await coach.agent
      .post('/api/swaps')
      .set('X-CSRF-Token', coach.csrf)
      .send({ fromFoodId: from, toFoodId: to, note: 'Bake 5 minutes longer for melt', status: 'published' })
      .expect(201);
    expect(swap.body.status).toBe('published');
    const text = '2 cups shredded mozzarella\n8 oz dry pasta\n1 cup marinara sauce';
    const before = (await request(t.app).post('/api/analyze').send({ text, servings: 4 })).body;
    // Pasta and sauce locked and a tight line band: only a cheese swap can save 15 kcal a serving.
    const targets = { proteinMinG: before.perServing.proteinG * 0.9, kcalMax: before.perServing.kcal - 15 };
    const res = await client.agent
      .post('/api/rewrite')
      .send({ text, servings: 4, targets, maxSwaps: 1, lockedLines: [1, 2], lineTolerancePct: 5 })
      .expect(200);
    const change = res.body.changes.find((c: { swapped: boolean }) => c.swapped);
    expect(change.to.id).toBe(to);
    expect(change.approvedBy).toBe('Test coach');
    expect(change.note).toBe('Bake 5 minutes longer for melt');
  });
});

describe('targets', () => {
  it('estimates with Mifflin–St Jeor (Am J Clin Nutr 1990) and refuses out-of-range stats', async () => {
    const res = await request(t.app)
      .post('/api/targets/estimate')
      .send({ sex: 'male', ageYears: 30, heightCm: 180, weightKg: 80, activity: 'moderate', goal: 'lose', mealsPerDay: 4 })
      .expect(200);
    expect(res.body.bmrKcal).toBeCloseTo(1780, 6);
    expect(res.body.tdeeKcal).toBeCloseTo(1780 * 1.55, 6);
    expect(res.body.kcalPerDay).toBeCloseTo(1780 * 1.55 * 0.8, 6);
    expect(res.body.perMeal.kcal).toBeCloseTo(res.body.kcalPerDay / 4, 6);
    const bad = await request(t.app)
      .post('/api/targets/estimate')
      .send({ sex: 'male', ageYears: 15, heightCm: 180, weightKg: 80, activity: 'moderate', goal: 'lose', mealsPerDay: 4 })
      .expect(400);
    expect(bad.body.error.details.fieldErrors.ageYears).toBeDefined();
  });

  it('lets a coach set a client’s targets, which the client reads; another coach cannot', async () => {
    const { coach, client } = await coachWithClient();
    const targets = { perMeal: { kcal: 550, proteinG: 40 }, kcalPerDay: 2200, proteinGPerDay: 160, mealsPerDay: 4 };
    await coach.agent.put(`/api/clients/${client.user.id}/targets`).set('X-CSRF-Token', coach.csrf).send(targets).expect(200);
    const mine = await client.agent.get('/api/coach').expect(200);
    expect(mine.body.targets).toMatchObject(targets);
    expect(mine.body.coach.id).toBe(coach.user.id);
    const other = await signUp(t.app, 'coach');
    await other.agent.put(`/api/clients/${client.user.id}/targets`).set('X-CSRF-Token', other.csrf).send(targets).expect(404);
    await client.agent.put(`/api/clients/${client.user.id}/targets`).set('X-CSRF-Token', client.csrf).send(targets).expect(403);
    const bad = await coach.agent
      .put(`/api/clients/${client.user.id}/targets`)
      .set('X-CSRF-Token', coach.csrf)
      .send({ perMeal: { kcal: -1, proteinG: 40 } })
      .expect(400);
    expect(bad.body.error.message).toMatch(/perMeal\.kcal/);
  });
});

describe('review', () => {
  it('shows a coach their clients’ saved versions only, and carries comments both ways', async () => {
    const { coach, client } = await coachWithClient();
    const recipe = (
      await client.agent
        .post('/api/recipes')
        .set('X-CSRF-Token', client.csrf)
        .send({ title: 'Turkey chili', servings: 4, text: '1 lb ground turkey\n1 (15 oz) can kidney beans' })
        .expect(201)
    ).body;
    const versions = await coach.agent.get(`/api/clients/${client.user.id}/versions`).expect(200);
    expect(versions.body.versions[0]).toMatchObject({ recipeId: recipe.id, number: 1, recipeTitle: 'Turkey chili' });
    await coach.agent.get(`/api/recipes/${recipe.id}`).expect(200);
    await coach.agent
      .post(`/api/recipes/${recipe.id}/versions/1/comments`)
      .set('X-CSRF-Token', coach.csrf)
      .send({ body: 'Try 93% lean next time.' })
      .expect(201);
    const seen = await client.agent.get(`/api/recipes/${recipe.id}/versions/1/comments`).expect(200);
    expect(seen.body.comments[0]).toMatchObject({ body: 'Try 93% lean next time.', author: { role: 'coach' } });
    const other = await signUp(t.app, 'coach');
    await other.agent.get(`/api/recipes/${recipe.id}`).expect(404);
    await other.agent.get(`/api/clients/${client.user.id}/versions`).expect(404);
    await other.agent.post(`/api/recipes/${recipe.id}/versions/1/comments`).set('X-CSRF-Token', other.csrf).send({ body: 'hi' }).expect(404);
    // The coach reads but does not edit the client's recipe.
    await coach.agent.patch(`/api/recipes/${recipe.id}`).set('X-CSRF-Token', coach.csrf).send({ revision: 1, title: 'x' }).expect(404);
  });
});

describe('custom foods from a label', () => {
  it('stores per 100 g, takes energy from 4/4/9 when the label gives none, and shows it to the coach and clients only', async () => {
    const { coach, client } = await coachWithClient();
    const res = await coach.agent
      .post('/api/foods')
      .set('X-CSRF-Token', coach.csrf)
      .send({ name: 'High-protein wrap (house test)', servingSizeG: 50, proteinG: 10, carbsG: 20, fatG: 2 })
      .expect(201);
    // General Atwater factors (USDA Handbook 74): 4·10 + 4·20 + 9·2 = 138 kcal per 50 g → 276 per 100 g.
    expect(res.body.per100g.kcal).toBeCloseTo(276, 6);
    expect(res.body.per100g.proteinG).toBeCloseTo(20, 6);
    await client.agent.get(`/api/foods/${res.body.id}`).expect(200);
    const stranger = await signUp(t.app, 'cook');
    await stranger.agent.get(`/api/foods/${res.body.id}`).expect(404);
    await request(t.app).get(`/api/foods/${res.body.id}`).expect(404);
    const found = await client.agent.get('/api/foods/search').query({ q: 'house test' }).expect(200);
    expect(found.body.results[0].id).toBe(res.body.id);
    const pinned = await client.agent
      .post('/api/analyze')
      .send({ lines: [{ input: '1 wrap', foodId: res.body.id, grams: 50 }], servings: 1 })
      .expect(200);
    expect(pinned.body.lines[0].food.id).toBe(res.body.id);
    const leaked = await request(t.app)
      .post('/api/analyze')
      .send({ lines: [{ input: '1 wrap', foodId: res.body.id, grams: 50 }], servings: 1 })
      .expect(200);
    expect(leaked.body.lines[0].food?.id).not.toBe(res.body.id);
    // any cook may add a food from a label now (tests/api/my-foods.test.ts has the full matrix)
    await client.agent
      .post('/api/foods')
      .set('X-CSRF-Token', client.csrf)
      .send({ name: 'x food', servingSizeG: 10, proteinG: 1, carbsG: 1, fatG: 1 })
      .expect(201);
    const bad = await coach.agent.post('/api/foods').set('X-CSRF-Token', coach.csrf).send({ name: 'No size', proteinG: 1, carbsG: 1, fatG: 1 }).expect(400);
    expect(bad.body.error.details.fieldErrors.servingSizeG).toBeDefined();
  });
});

describe('password reset', () => {
  it('mails a single-use link that sets a new password', async () => {
    const cook = await signUp(t.app);
    const { agent, csrf } = await agentWithCsrf(t.app);
    await agent.post('/api/auth/password-reset').set('X-CSRF-Token', csrf).send({ email: cook.email }).expect(202);
    await agent.post('/api/auth/password-reset').set('X-CSRF-Token', csrf).send({ email: 'nobody@example.test' }).expect(202);
    // The mail goes out after the answer, off the request path.
    const mail = await vi.waitFor(
      () => {
        const sent = t
          .outbox()
          .filter((m) => m.to.includes(cook.email))
          .at(-1);
        if (!sent) throw new Error('no reset mail yet');
        return sent;
      },
      { timeout: 10_000 },
    );
    const token = mail.text.match(/\/reset-password\/([A-Za-z0-9_-]+)/)![1];
    await agent.post('/api/auth/password-reset/confirm').set('X-CSRF-Token', csrf).send({ token, password: 'a brand new password' }).expect(200);
    await agent.post('/api/auth/password-reset/confirm').set('X-CSRF-Token', csrf).send({ token, password: 'another new password' }).expect(410);
    await agent.post('/api/auth/login').set('X-CSRF-Token', csrf).send({ email: cook.email, password: 'a brand new password' }).expect(200);
  });
});

describe('role matrix', () => {
  it('refuses each coach route to cooks (403) and the signed-out (401), and the outbox to non-admins', async () => {
    const cook = await signUp(t.app, 'cook');
    for (const [method, path] of [
      ['get', '/api/clients'],
      ['post', '/api/clients/invitations'],
      ['put', '/api/clients/1/targets'],
      ['get', '/api/clients/1/versions'],
      ['post', '/api/swaps'],
    ] as const) {
      await cook.agent[method](path).set('X-CSRF-Token', cook.csrf).send({}).expect(403);
      const anonymous = request(t.app);
      await anonymous[method](path).expect(method === 'get' ? 401 : 403);
    }
    await cook.agent.get('/api/dev/outbox').expect(403);
    const admin = DEMO_ACCOUNTS.find((a) => a.role === 'admin')!;
    const { agent, csrf } = await agentWithCsrf(t.app);
    await agent.post('/api/auth/login').set('X-CSRF-Token', csrf).send({ email: admin.email, password: admin.password }).expect(200);
    const outbox = await agent.get('/api/dev/outbox').expect(200);
    expect(Array.isArray(outbox.body.messages)).toBe(true);
  });
});
