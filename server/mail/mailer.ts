import nodemailer from 'nodemailer';

export interface MailerConfig {
  smtpHost: string;
  smtpPort: number;
  /** e.g. `Hearthswap <no-reply@hearthswap.test>` */
  from: string;
  /** TLS from the first byte (usually port 465); otherwise STARTTLS is used when offered */
  secure?: boolean;
  auth?: { user: string; pass: string };
  /**
   * Never upgrade with STARTTLS, for the development outbox. Refused together with `auth`,
   * which must not travel in the clear.
   */
  ignoreTLS?: boolean;
}

export interface OutgoingMail {
  to: string | string[];
  subject: string;
  text: string;
  html?: string;
}

export interface Mailer {
  send(mail: OutgoingMail): Promise<{ messageId: string }>;
}

export function createMailer(config: MailerConfig): Mailer {
  const secure = config.secure ?? false;
  if (config.auth && config.ignoreTLS && !secure) {
    throw new Error('SMTP credentials need TLS: drop ignoreTLS or use secure: true.');
  }
  const transport = nodemailer.createTransport({
    host: config.smtpHost,
    port: config.smtpPort,
    secure,
    ignoreTLS: config.ignoreTLS ?? false,
    // credentials over a plain port only after a STARTTLS upgrade
    requireTLS: Boolean(config.auth) && !secure,
    auth: config.auth,
    connectionTimeout: 10_000,
    greetingTimeout: 10_000,
    socketTimeout: 20_000,
  });
  return {
    async send(mail) {
      const info = await transport.sendMail({
        from: config.from,
        to: mail.to,
        subject: mail.subject,
        text: mail.text,
        ...(mail.html !== undefined ? { html: mail.html } : {}),
      });
      return { messageId: info.messageId };
    },
  };
}
