import type pg from 'pg';
import { createMailer, createOutboxStore, startFakeSmtp, type FakeSmtp } from './mail';
import type { AppConfig } from './config';

/**
 * SMTP from SMTP_HOST / SMTP_PORT when set; otherwise, outside production, a fake SMTP server on
 * loopback that keeps every message for the development outbox: in PostgreSQL when a pool is given
 * (every app process on the database reads the same outbox), otherwise in this process's memory.
 */
export async function createMailContext(config: AppConfig, env: NodeJS.ProcessEnv = process.env, pool?: pg.Pool) {
  const from = env.MAIL_FROM ?? 'Hearthswap <no-reply@hearthswap.test>';
  const appUrl = env.APP_URL ?? `http://${config.host}:${config.port}`;
  if (env.SMTP_HOST) {
    const auth = env.SMTP_USER ? { user: env.SMTP_USER, pass: env.SMTP_PASSWORD ?? '' } : undefined;
    const mailer = createMailer({ smtpHost: env.SMTP_HOST, smtpPort: Number(env.SMTP_PORT ?? 587), from, secure: env.SMTP_SECURE === 'true', auth });
    return { mail: { mailer, appUrl }, close: async () => {} };
  }
  if (config.env === 'production') return { mail: undefined, close: async () => {} };
  const store = pool ? createOutboxStore(pool) : null;
  const smtp: FakeSmtp = await startFakeSmtp({ port: Number(env.SMTP_FAKE_PORT ?? 0), host: '127.0.0.1', onMessage: store?.save });
  const mailer = createMailer({ smtpHost: smtp.host, smtpPort: smtp.port, from, ignoreTLS: true });
  const outbox = async (limit: number) => (store ? store.list(limit) : smtp.messages.slice(-limit).reverse());
  return { mail: { mailer, appUrl, outbox }, close: () => smtp.close(), smtp };
}
