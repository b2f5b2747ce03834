import { randomUUID } from 'node:crypto';
import { appendFile, mkdir } from 'node:fs/promises';
import path from 'node:path';
import type { AddressInfo } from 'node:net';
import { SMTPServer } from 'smtp-server';
import type { OutboxMessage } from '../../shared/schemas/outbox';
import { parseMessage } from './parse-message';

/** One message as the development outbox keeps it. */
export type StoredMail = OutboxMessage;

export type LoopbackHost = '127.0.0.1' | '::1' | 'localhost';

export interface FakeSmtpOptions {
  /** 0 (the default) picks a free port */
  port?: number;
  host?: LoopbackHost;
  /** when given, every message is also appended to this file as one JSON line */
  outboxFile?: string;
  /** oldest messages are dropped from memory past this many (default 1,000) */
  maxMessages?: number;
  /** when given, each message is handed here (the PostgreSQL outbox) before the server accepts it */
  onMessage?: (mail: StoredMail) => Promise<void>;
}

export interface FakeSmtp {
  port: number;
  host: LoopbackHost;
  messages: StoredMail[];
  close(): Promise<void>;
}

const LOOPBACK_HOSTS: readonly string[] = ['127.0.0.1', '::1', 'localhost'];
const MAX_MESSAGE_BYTES = 10 * 1024 * 1024;

/**
 * A catch-all SMTP server for development and tests: accepts any sender and recipient without
 * authentication or TLS, and keeps what it receives in memory (and, given `onMessage`, wherever
 * that puts it). It only listens on loopback.
 */
export async function startFakeSmtp(options: FakeSmtpOptions = {}): Promise<FakeSmtp> {
  const host = options.host ?? '127.0.0.1';
  if (!LOOPBACK_HOSTS.includes(host)) throw new Error(`The fake SMTP server listens on loopback only, not on ${host}.`);
  const maxMessages = options.maxMessages ?? 1_000;
  const messages: StoredMail[] = [];
  if (options.outboxFile) await mkdir(path.dirname(options.outboxFile), { recursive: true });

  async function store(raw: Buffer, envelopeFrom: string, envelopeTo: string[]): Promise<void> {
    const parsed = await parseMessage(raw);
    const mail: StoredMail = {
      id: randomUUID(),
      from: parsed.from || envelopeFrom,
      to: envelopeTo,
      subject: parsed.subject,
      text: parsed.text,
      receivedAt: new Date().toISOString(),
    };
    if (parsed.html !== undefined) mail.html = parsed.html;
    if (parsed.messageId) mail.messageId = parsed.messageId;
    if (options.outboxFile) await appendFile(options.outboxFile, `${JSON.stringify(mail)}\n`, 'utf8');
    if (options.onMessage) await options.onMessage(mail);
    messages.push(mail);
    if (messages.length > maxMessages) messages.splice(0, messages.length - maxMessages);
  }

  const server = new SMTPServer({
    name: 'hearthswap-outbox.localhost',
    banner: 'Hearthswap development outbox',
    authOptional: true,
    disabledCommands: ['STARTTLS'],
    size: MAX_MESSAGE_BYTES,
    logger: false,
    disableReverseLookup: true,
    closeTimeout: 1_000,
    onData(stream, session, callback) {
      const chunks: Buffer[] = [];
      stream.on('data', (chunk: Buffer) => chunks.push(chunk));
      stream.on('error', (err: Error) => callback(err));
      stream.on('end', () => {
        if (stream.sizeExceeded) {
          callback(Object.assign(new Error('Message is larger than the outbox accepts.'), { responseCode: 552 }));
          return;
        }
        const envelopeFrom = session.envelope.mailFrom ? session.envelope.mailFrom.address : '';
        const envelopeTo = session.envelope.rcptTo.map((recipient) => recipient.address);
        store(Buffer.concat(chunks), envelopeFrom, envelopeTo).then(
          () => callback(),
          (err: unknown) => callback(Object.assign(new Error(`Outbox could not store the message: ${String(err)}`), { responseCode: 451 })),
        );
      });
    },
  });

  await new Promise<void>((resolve, reject) => {
    const onError = (err: Error) => reject(err);
    server.once('error', onError);
    server.listen(options.port ?? 0, host, () => {
      server.off('error', onError);
      resolve();
    });
  });
  // later errors belong to single connections (a client hanging up mid-command); an unhandled
  // 'error' event would take the whole process down
  server.on('error', () => {});

  const address = server.server.address() as AddressInfo;
  let closing: Promise<void> | null = null;
  return {
    port: address.port,
    host,
    messages,
    close() {
      closing ??= new Promise<void>((resolve) => server.close(() => resolve()));
      return closing;
    },
  };
}
