import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import request from 'supertest';
import { agentWithCsrf, createTestApp, signUp, uniqueEmail, type TestApp } from '../helpers/test-app';
import { Invitation, VersionComment } from '../../server/models';
import { addComment } from '../../server/services/comments';
import { Recipe, RecipeVersion, User } from '../../server/models';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(async () => {
  await t.close();
});

function tokenFrom(text: string) {
  const m = text.match(/\/invitations\/([A-Za-z0-9_-]+)/);
  if (!m) throw new Error(`no invitation link in: ${text}`);
  return m[1];
}

function mailsTo(email: string) {
  return t.outbox().filter((m) => m.to.includes(email));
}

type Session = Awaited<ReturnType<typeof signUp>>;

function invite(coach: Session, email: string) {
  return coach.agent.post('/api/clients/invitations').set('X-CSRF-Token', coach.csrf).send({ email });
}

async function coachWithClient() {
  const coach = await signUp(t.app, 'coach');
  const client = await signUp(t.app, 'cook');
  await invite(coach, client.email).expect(201);
  const token = tokenFrom(mailsTo(client.email).at(-1)!.text);
  await client.agent.post(`/api/invitations/${token}/accept`).set('X-CSRF-Token', client.csrf).expect(200);
  return { coach, client };
}

describe('one open invitation per address and coach', () => {
  it('renews the open invitation on a second invite: 200, a new link mailed, the earlier link dead, one pending row', async () => {
    const coach = await signUp(t.app, 'coach');
    const email = uniqueEmail('invitee');
    const first = await invite(coach, email).expect(201);
    expect(first.body).toMatchObject({ email, status: 'pending', renewed: false });
    const firstToken = tokenFrom(mailsTo(email).at(-1)!.text);

    const second = await invite(coach, email.toUpperCase()).expect(200);
    expect(second.body).toMatchObject({ id: first.body.id, email, status: 'pending', renewed: true });
    expect(mailsTo(email)).toHaveLength(2);
    const secondToken = tokenFrom(mailsTo(email).at(-1)!.text);
    expect(secondToken).not.toBe(firstToken);

    await request(t.app).get(`/api/invitations/${firstToken}`).expect(404);
    expect((await request(t.app).get(`/api/invitations/${secondToken}`).expect(200)).body.email).toBe(email);
    const list = await coach.agent.get('/api/clients').expect(200);
    expect(list.body.invitations.filter((i: { email: string }) => i.email === email)).toHaveLength(1);
  });

  it('renews an expired one too, and starts a new one after a withdrawal; two coaches each keep their own', async () => {
    const coach = await signUp(t.app, 'coach');
    const other = await signUp(t.app, 'coach');
    const email = uniqueEmail('invitee');
    const first = await invite(coach, email).expect(201);
    await Invitation.update({ expiresAt: new Date(Date.now() - 1000) }, { where: { id: first.body.id } });
    const renewed = await invite(coach, email).expect(200);
    expect(renewed.body.id).toBe(first.body.id);
    expect(new Date(renewed.body.expiresAt).getTime()).toBeGreaterThan(Date.now() + 6 * 24 * 3600 * 1000);

    await coach.agent.delete(`/api/clients/invitations/${first.body.id}`).set('X-CSRF-Token', coach.csrf).expect(204);
    const fresh = await invite(coach, email).expect(201);
    expect(fresh.body.id).not.toBe(first.body.id);
    await invite(other, email).expect(201);
  });

  it('holds under two invites at once: one row, both answered', async () => {
    const coach = await signUp(t.app, 'coach');
    const email = uniqueEmail('race');
    const answers = await Promise.all([invite(coach, email), invite(coach, email), invite(coach, email)]);
    expect(answers.map((a) => a.status).sort()).toEqual([200, 200, 201]);
    expect(await Invitation.count({ where: { coachId: coach.user.id, email } })).toBe(1);
  });
});

describe('sign-up from an invitation link', () => {
  async function pendingInvitation() {
    const coach = await signUp(t.app, 'coach');
    const email = uniqueEmail('newcook');
    await invite(coach, email).expect(201);
    return { coach, email, token: tokenFrom(mailsTo(email).at(-1)!.text) };
  }

  it('creates the cook account on the invited address and links it with the coach at once', async () => {
    const { coach, email, token } = await pendingInvitation();
    const { agent, csrf } = await agentWithCsrf(t.app);
    const res = await agent
      .post('/api/auth/register')
      .set('X-CSRF-Token', csrf)
      .send({ email, password: 'correct horse battery', displayName: 'New cook', role: 'cook', invitationToken: token })
      .expect(201);
    expect(res.body).toMatchObject({ email, role: 'cook', coachId: coach.user.id });
    const clients = await coach.agent.get('/api/clients').expect(200);
    expect(clients.body.clients.map((c: { email: string }) => c.email)).toContain(email);
    expect(clients.body.invitations.find((i: { email: string }) => i.email === email).status).toBe('accepted');
  });

  it('refuses another address (400 naming email) and a coach account (400 naming role), creating nothing', async () => {
    const { email, token } = await pendingInvitation();
    const { agent, csrf } = await agentWithCsrf(t.app);
    const otherAddress = uniqueEmail('elsewhere');
    const wrong = await agent
      .post('/api/auth/register')
      .set('X-CSRF-Token', csrf)
      .send({ email: otherAddress, password: 'correct horse battery', displayName: 'X', role: 'cook', invitationToken: token })
      .expect(400);
    expect(wrong.body.error.details.fieldErrors.email[0]).toContain(email);
    const coachRole = await agent
      .post('/api/auth/register')
      .set('X-CSRF-Token', csrf)
      .send({ email, password: 'correct horse battery', displayName: 'X', role: 'coach', invitationToken: token })
      .expect(400);
    expect(Object.keys(coachRole.body.error.details.fieldErrors)).toEqual(['role']);
    expect(await User.count({ where: { email: [email, otherAddress] } })).toBe(0);
    const bad = await agent
      .post('/api/auth/register')
      .set('X-CSRF-Token', csrf)
      .send({ email, password: 'correct horse battery', displayName: 'X', role: 'cook', invitationToken: 'short' })
      .expect(400);
    expect(Object.keys(bad.body.error.details.fieldErrors)).toEqual(['invitationToken']);
  });

  it('answers 410 for a withdrawn invitation and creates no account', async () => {
    const { coach, email, token } = await pendingInvitation();
    const id = (await coach.agent.get('/api/clients').expect(200)).body.invitations.find((i: { email: string }) => i.email === email).id;
    await coach.agent.delete(`/api/clients/invitations/${id}`).set('X-CSRF-Token', coach.csrf).expect(204);
    const { agent, csrf } = await agentWithCsrf(t.app);
    const res = await agent
      .post('/api/auth/register')
      .set('X-CSRF-Token', csrf)
      .send({ email, password: 'correct horse battery', displayName: 'X', role: 'cook', invitationToken: token })
      .expect(410);
    expect(res.body.error.code).toBe('invitation_revoked');
    expect(await User.count({ where: { email } })).toBe(0);
  });
});

describe('body stats for the estimate', () => {
  const stats = { sex: 'female', ageYears: 41, heightCm: 165.1, weightKg: 72.5, activity: 'light', goal: 'lose', mealsPerDay: 3, units: 'us' };

  it('are kept per client on the server: a second session of the coach reads them', async () => {
    const { coach, client } = await coachWithClient();
    const empty = await coach.agent.get(`/api/clients/${client.user.id}/body-stats`).expect(200);
    expect(empty.body).toEqual({ clientId: client.user.id, stats: null, updatedAt: null });
    await coach.agent.put(`/api/clients/${client.user.id}/body-stats`).set('X-CSRF-Token', coach.csrf).send(stats).expect(200);

    const elsewhere = request.agent(t.app);
    const { body: csrf } = await elsewhere.get('/api/auth/csrf').expect(200);
    await elsewhere.post('/api/auth/login').set('X-CSRF-Token', csrf.token).send({ email: coach.email, password: coach.password }).expect(200);
    const read = await elsewhere.get(`/api/clients/${client.user.id}/body-stats`).expect(200);
    expect(read.body.stats).toEqual(stats);
    expect(typeof read.body.updatedAt).toBe('string');
  });

  it('refuses bad stats with 400 naming the field, keeping what was saved', async () => {
    const { coach, client } = await coachWithClient();
    const url = `/api/clients/${client.user.id}/body-stats`;
    await coach.agent.put(url).set('X-CSRF-Token', coach.csrf).send(stats).expect(200);
    const young = await coach.agent
      .put(url)
      .set('X-CSRF-Token', coach.csrf)
      .send({ ...stats, ageYears: 15 })
      .expect(400);
    expect(Object.keys(young.body.error.details.fieldErrors)).toEqual(['ageYears']);
    const units = await coach.agent
      .put(url)
      .set('X-CSRF-Token', coach.csrf)
      .send({ ...stats, units: 'imperial' })
      .expect(400);
    expect(Object.keys(units.body.error.details.fieldErrors)).toEqual(['units']);
    const text = await coach.agent
      .put(url)
      .set('X-CSRF-Token', coach.csrf)
      .send({ ...stats, weightKg: '72' })
      .expect(400);
    expect(text.body.error.message).toContain('weightKg');
    expect((await coach.agent.get(url).expect(200)).body.stats).toEqual(stats);
  });

  it('belong to the client’s own coach only, and go when the link ends', async () => {
    const { coach, client } = await coachWithClient();
    const stranger = await signUp(t.app, 'coach');
    const url = `/api/clients/${client.user.id}/body-stats`;
    await stranger.agent.get(url).expect(404);
    await stranger.agent.put(url).set('X-CSRF-Token', stranger.csrf).send(stats).expect(404);
    await client.agent.get(url).expect(403);
    await coach.agent.put(url).set('X-CSRF-Token', coach.csrf).send(stats).expect(200);
    await client.agent.delete('/api/coach').set('X-CSRF-Token', client.csrf).expect(204);
    await coach.agent.get(url).expect(404);
    await invite(coach, client.email).expect(201);
    const token = tokenFrom(mailsTo(client.email).at(-1)!.text);
    await client.agent.post(`/api/invitations/${token}/accept`).set('X-CSRF-Token', client.csrf).expect(200);
    expect((await coach.agent.get(url).expect(200)).body.stats).toBeNull();
  });
});

describe('unread coach comments', () => {
  async function clientRecipe() {
    const pair = await coachWithClient();
    const recipe = (
      await pair.client.agent
        .post('/api/recipes')
        .set('X-CSRF-Token', pair.client.csrf)
        .send({ title: 'Baked ziti', servings: 4, text: '1 lb ziti\n2 cups ricotta' })
        .expect(201)
    ).body;
    return { ...pair, recipe };
  }

  it('counts the coach’s comments for the cook, mails each one, and clears when the cook opens the thread', async () => {
    const { coach, client, recipe } = await clientRecipe();
    const url = `/api/recipes/${recipe.id}/versions/1/comments`;
    expect((await client.agent.get('/api/comments/unread').expect(200)).body).toEqual({ total: 0, recipes: [] });
    await coach.agent.post(url).set('X-CSRF-Token', coach.csrf).send({ body: 'Try part-skim ricotta.' }).expect(201);
    await coach.agent.post(url).set('X-CSRF-Token', coach.csrf).send({ body: 'And bake it covered.' }).expect(201);

    const unread = await client.agent.get('/api/comments/unread').expect(200);
    expect(unread.body).toEqual({ total: 2, recipes: [{ recipeId: recipe.id, title: 'Baked ziti', unread: 2, versions: [{ number: 1, unread: 2 }] }] });
    expect((await coach.agent.get('/api/comments/unread').expect(200)).body.total).toBe(0);

    const mails = mailsTo(client.email).filter((m) => m.subject.includes('Baked ziti'));
    expect(mails).toHaveLength(2);
    expect(mails[0].subject).toBe('Test coach commented on Baked ziti');
    expect(mails[0].text).toContain('Try part-skim ricotta.');
    expect(mails[0].text).toContain(`http://hearthswap.test/recipes/${recipe.id}?version=1#comments`);

    // reading the list is not reading the thread: a GET never clears
    await client.agent.get(url).expect(200);
    expect((await client.agent.get('/api/comments/unread').expect(200)).body.total).toBe(2);
    // the coach marking "read" changes nothing for the cook
    await coach.agent.post(`${url}/read`).set('X-CSRF-Token', coach.csrf).expect(200);
    expect((await client.agent.get('/api/comments/unread').expect(200)).body.total).toBe(2);
    const cleared = await client.agent.post(`${url}/read`).set('X-CSRF-Token', client.csrf).expect(200);
    expect(cleared.body).toEqual({ total: 0, recipes: [] });
  });

  it('never counts or mails the cook’s own replies; a reply reads the thread', async () => {
    const { coach, client, recipe } = await clientRecipe();
    const url = `/api/recipes/${recipe.id}/versions/1/comments`;
    await coach.agent.post(url).set('X-CSRF-Token', coach.csrf).send({ body: 'Less salt?' }).expect(201);
    const before = mailsTo(coach.email).length;
    await client.agent.post(url).set('X-CSRF-Token', client.csrf).send({ body: 'Will do.' }).expect(201);
    expect((await client.agent.get('/api/comments/unread').expect(200)).body.total).toBe(0);
    expect(mailsTo(coach.email)).toHaveLength(before);
    expect(mailsTo(client.email).filter((m) => m.subject.includes('commented'))).toHaveLength(1);
  });

  it('leaves out deleted recipes, and keeps the comment when the mail cannot be sent', async () => {
    const { coach, client, recipe } = await clientRecipe();
    await coach.agent.post(`/api/recipes/${recipe.id}/versions/1/comments`).set('X-CSRF-Token', coach.csrf).send({ body: 'One note.' }).expect(201);
    await client.agent.delete(`/api/recipes/${recipe.id}`).set('X-CSRF-Token', client.csrf).send({ revision: recipe.revision }).expect(200);
    expect((await client.agent.get('/api/comments/unread').expect(200)).body.total).toBe(0);

    const second = await clientRecipe();
    const log = vi.fn();
    const failing = { send: vi.fn().mockRejectedValue(new Error('SMTP away')) };
    const recipeRow = (await Recipe.findByPk(second.recipe.id))!;
    const version = (await RecipeVersion.findOne({ where: { recipeId: recipeRow.id, number: 1 } }))!;
    const author = (await User.findByPk(second.coach.user.id))!;
    await addComment(recipeRow, version, author, 'Kept anyway.', { mailer: failing, appUrl: 'http://hearthswap.test', log });
    expect(failing.send).toHaveBeenCalledTimes(1);
    expect(log).toHaveBeenCalledTimes(1);
    expect(await VersionComment.count({ where: { recipeVersionId: version.id, body: 'Kept anyway.' } })).toBe(1);
    expect((await second.client.agent.get('/api/comments/unread').expect(200)).body.total).toBe(1);
  });
});
