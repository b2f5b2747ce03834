import { mkdtemp, readFile, rm } from 'node:fs/promises';
import net from 'node:net';
import os from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startFakeSmtp, type FakeSmtp } from '../../server/mail/fake-smtp';
import { createMailer } from '../../server/mail/mailer';
import { mailTemplates } from '../../server/mail/templates';

// Longer than a 76-character quoted-printable line, with '=' signs, so the soft line breaks
// and =3D escapes nodemailer writes must be undone exactly.
const LINK = 'https://hearthswap.test/invite/accept?token=6f1c0e9a2b7d4c3e8f5a1b2c3d4e5f60718293a4b5c6d7e8&client=new';

describe('mail round trip through the fake SMTP server', () => {
  let smtp: FakeSmtp;
  let outboxDir: string;
  let outboxFile: string;

  beforeAll(async () => {
    outboxDir = await mkdtemp(path.join(os.tmpdir(), 'hearthswap-outbox-'));
    outboxFile = path.join(outboxDir, 'nested', 'outbox.jsonl');
    smtp = await startFakeSmtp({ port: 0, host: '127.0.0.1', outboxFile });
  });

  afterAll(async () => {
    await smtp.close();
    await rm(outboxDir, { recursive: true, force: true });
  });

  const mailer = () =>
    createMailer({ smtpHost: smtp.host, smtpPort: smtp.port, from: 'Hearthswap <no-reply@hearthswap.test>', secure: false, ignoreTLS: true });

  it('listens on a random loopback port', () => {
    expect(smtp.host).toBe('127.0.0.1');
    expect(smtp.port).toBeGreaterThan(0);
  });

  it('stores an invitation with recipients, subject, the exact link and escaped HTML', async () => {
    const content = mailTemplates.invitation({ coachName: 'Juno <b>Fennick</b> & Crew', link: LINK, expiresAt: '2031-05-09T17:30:00Z' });
    const sent = await mailer().send({ to: ['client.one@hearthswap.test', 'client.two@hearthswap.test'], ...content });

    const stored = smtp.messages.find((m) => m.messageId === sent.messageId);
    expect(stored).toBeDefined();
    expect(stored!.to).toEqual(['client.one@hearthswap.test', 'client.two@hearthswap.test']);
    expect(stored!.from).toBe('Hearthswap <no-reply@hearthswap.test>');
    expect(stored!.subject).toBe(content.subject);
    expect(stored!.subject).toBe('Juno <b>Fennick</b> & Crew invited you to Hearthswap');
    expect(stored!.text.split('\n')).toContain(LINK);
    expect(stored!.text).toBe(content.text);
    expect(stored!.html).toBeDefined();
    expect(stored!.html).toContain('Juno &lt;b&gt;Fennick&lt;/b&gt; &amp; Crew');
    expect(stored!.html).not.toContain('<b>Fennick');
    expect(stored!.html).toContain(`href="${LINK.replace(/&/g, '&amp;')}"`);
    expect(Number.isNaN(Date.parse(stored!.receivedAt))).toBe(false);
  });

  it('decodes non-ASCII subjects and bodies, and leaves html out of a text-only mail', async () => {
    const subject = 'Crème brûlée, lighter — 31 g protein per serving';
    const text = 'Grüße from the kitchen: ½ cup skyr replaces the cream.\n';
    const sent = await mailer().send({ to: 'cook@hearthswap.test', subject, text });

    const stored = smtp.messages.find((m) => m.messageId === sent.messageId)!;
    expect(stored.subject).toBe(subject);
    expect(stored.text).toBe(text);
    expect(stored).not.toHaveProperty('html');
  });

  it('appends every message to the JSON-lines outbox file', async () => {
    const lines = (await readFile(outboxFile, 'utf8')).trim().split('\n');
    expect(lines).toHaveLength(smtp.messages.length);
    const fromFile = lines.map((line) => JSON.parse(line));
    expect(fromFile.map((m) => m.id)).toEqual(smtp.messages.map((m) => m.id));
    expect(fromFile[0].text).toContain(LINK);
  });
});

describe('fake SMTP server lifecycle', () => {
  it('refuses a host that is not loopback', async () => {
    await expect(startFakeSmtp({ host: '0.0.0.0' as '127.0.0.1' })).rejects.toThrow(/loopback/);
  });

  it('closes cleanly and stops accepting connections', async () => {
    const smtp = await startFakeSmtp({ port: 0, host: '127.0.0.1' });
    const { port } = smtp;
    await smtp.close();
    await smtp.close(); // a second close is harmless
    const refused = await new Promise<boolean>((resolve) => {
      const socket = net.connect(port, '127.0.0.1');
      socket.once('connect', () => {
        socket.destroy();
        resolve(false);
      });
      socket.once('error', () => resolve(true));
    });
    expect(refused).toBe(true);
  });

  it('keeps only the newest messages past maxMessages', async () => {
    const smtp = await startFakeSmtp({ port: 0, host: '127.0.0.1', maxMessages: 1 });
    try {
      const mailer = createMailer({ smtpHost: smtp.host, smtpPort: smtp.port, from: 'no-reply@hearthswap.test', ignoreTLS: true });
      for (const n of [1, 2]) await mailer.send({ to: 'cook@hearthswap.test', subject: `batch ${n}`, text: `note ${n}` });
      expect(smtp.messages.map((m) => m.subject)).toEqual(['batch 2']);
    } finally {
      await smtp.close();
    }
  });
});

describe('createMailer', () => {
  it('refuses to send credentials without TLS', () => {
    expect(() => createMailer({ smtpHost: '127.0.0.1', smtpPort: 2525, from: 'a@hearthswap.test', ignoreTLS: true, auth: { user: 'u', pass: 'p' } })).toThrow(
      /TLS/,
    );
  });
});
