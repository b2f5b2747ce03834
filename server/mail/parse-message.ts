import { simpleParser, type AddressObject } from 'mailparser';

/** What the development outbox shows of a message: its sender, subject, id and bodies (attachments are left out). */
export interface ParsedMessage {
  from: string;
  subject: string;
  messageId: string | null;
  text: string;
  html?: string;
}

/** "Name <address>" for each sender, the name decoded and unquoted. */
function senderText(from: AddressObject | undefined): string {
  return (from?.value ?? []).map((a) => (a.name ? `${a.name} <${a.address ?? ''}>` : (a.address ?? ''))).join(', ');
}

/** Reads a raw RFC 5322 / MIME message with mailparser: encoded words, transfer encodings, charsets and nested multiparts. */
export async function parseMessage(raw: Buffer | string): Promise<ParsedMessage> {
  const mail = await simpleParser(raw, { skipHtmlToText: true, skipTextToHtml: true, skipTextLinks: true, skipImageLinks: true });
  const message: ParsedMessage = {
    from: senderText(mail.from),
    subject: mail.subject ?? '',
    messageId: mail.messageId ?? null,
    // SMTP carries CRLF; the outbox shows text the way it was written
    text: (mail.text ?? '').replace(/\r\n/g, '\n'),
  };
  if (typeof mail.html === 'string') message.html = mail.html.replace(/\r\n/g, '\n');
  return message;
}
