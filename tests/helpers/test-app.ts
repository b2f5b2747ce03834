import { inject } from 'vitest';
import { randomUUID } from 'node:crypto';
import request from 'supertest';
import type { Express } from 'express';
import { loadConfig, type AppConfig, type RateLimitConfig } from '../../server/config';
import { openServices } from '../../server/boot';
import { createApp } from '../../server/app';
import { createMailContext } from '../../server/mail-context';
import type { Mailer, StoredMail } from '../../server/mail';

export interface TestApp {
  app: Express;
  config: AppConfig;
  /**
   * every message this app sent, through its fake SMTP server on loopback, oldest first: each is
   * in the PostgreSQL outbox before it shows here
   */
  outbox: () => StoredMail[];
  /** the shared PostgreSQL outbox (mail from every app on the test database), newest first */
  readOutbox: (limit?: number) => Promise<StoredMail[]>;
  close: () => Promise<void>;
}

/** The real app on the test database; each call is a fresh process-like instance. */
export async function createTestApp(
  limits: Partial<RateLimitConfig> = {},
  options: { mailer?: Mailer; config?: Partial<AppConfig>; logError?: (error: unknown) => void } = {},
): Promise<TestApp> {
  const config = loadConfig({ NODE_ENV: 'test', DATABASE_URL: inject('databaseUrl'), ...inject('s3Env') }, options.config);
  config.limits = {
    ...config.limits,
    loginFailuresPer15Min: 1000,
    loginFailuresPerAccountPerDay: 1000,
    loginFailuresPerAddressPerHour: 1000,
    signupsPerHour: 1000,
    anonymousComputePerMin: 10_000,
    // counters are in PostgreSQL: each test app counts alone, as a fresh process did before
    scope: `test-${randomUUID()}`,
    ...limits,
  };
  const services = await openServices(config);
  const mail = await createMailContext(config, { APP_URL: 'http://hearthswap.test' }, services.sessionPool);
  const app = createApp({
    config,
    ...services,
    logError: options.logError,
    mail: options.mailer && mail.mail ? { ...mail.mail, mailer: options.mailer } : mail.mail,
  });
  return {
    app,
    config,
    outbox: () => [...(mail.smtp?.messages ?? [])],
    readOutbox: (limit = 100) => mail.mail?.outbox?.(limit) ?? Promise.resolve([]),
    close: async () => {
      await mail.close();
      await services.close();
    },
  };
}

let counter = 0;
export function uniqueEmail(prefix = 'user') {
  counter++;
  return `${prefix}-${Date.now().toString(36)}-${process.pid}-${counter}@example.test`;
}

/** A supertest agent that keeps cookies and sends the CSRF token like the client does. */
export async function agentWithCsrf(app: Express) {
  const agent = request.agent(app);
  const res = await agent.get('/api/auth/csrf').expect(200);
  return { agent, csrf: res.body.token as string };
}

export async function signUp(app: Express, role: 'cook' | 'coach' = 'cook') {
  const { agent, csrf } = await agentWithCsrf(app);
  const email = uniqueEmail(role);
  const password = 'correct horse battery';
  const res = await agent
    .post('/api/auth/register')
    .set('X-CSRF-Token', csrf)
    .send({ email, password, displayName: `Test ${role}`, role })
    .expect(201);
  return { agent, csrf, email, password, user: res.body };
}

/** The invitation token in a mail's text (the link /invitations/<token>). */
export function invitationTokenFrom(text: string): string {
  const m = text.match(/\/invitations\/([A-Za-z0-9_-]+)/);
  if (!m) throw new Error(`no invitation link in: ${text}`);
  return m[1];
}

/** A coach and a cook linked to them through an invitation the cook accepted from its e-mail. */
export async function linkedCoachAndClient(t: TestApp) {
  const coach = await signUp(t.app, 'coach');
  const client = await signUp(t.app, 'cook');
  await coach.agent.post('/api/clients/invitations').set('X-CSRF-Token', coach.csrf).send({ email: client.email }).expect(201);
  const mail = t
    .outbox()
    .filter((m) => m.to.includes(client.email))
    .at(-1)!;
  const token = invitationTokenFrom(mail.text);
  await client.agent.post(`/api/invitations/${token}/accept`).set('X-CSRF-Token', client.csrf).expect(200);
  return { coach, client, token };
}

/** A supertest parser that keeps a binary answer (an image) as one Buffer in `res.body`. */
export function binaryBody(res: { on(event: string, listener: (chunk: Buffer) => void): unknown }, cb: (error: Error | null, body: Buffer) => void) {
  const chunks: Buffer[] = [];
  res.on('data', (c: Buffer) => chunks.push(c));
  res.on('end', () => cb(null, Buffer.concat(chunks)));
}
