export { startFakeSmtp } from './fake-smtp';
export type { FakeSmtp, FakeSmtpOptions, LoopbackHost, StoredMail } from './fake-smtp';
export { createMailer } from './mailer';
export type { Mailer, MailerConfig, OutgoingMail } from './mailer';
export { escapeHtml, formatExpiry, mailTemplates } from './templates';
export type { InvitationMail, MailContent, PasswordResetMail } from './templates';
export { parseMessage } from './parse-message';
export type { ParsedMessage } from './parse-message';
