/**
 * A deliberately small RFC 5322 / MIME reader for the development outbox: enough to show the
 * messages Hearthswap itself sends (plain text, optionally with an HTML alternative), not a
 * general mail parser. Attachments and other parts are skipped.
 */

export interface ParsedMessage {
  headers: Map<string, string>;
  from: string;
  subject: string;
  messageId: string | null;
  text: string;
  html?: string;
}

interface MimePart {
  headers: Map<string, string>;
  body: Buffer;
}

interface ContentType {
  mediaType: string;
  params: Map<string, string>;
}

const CRLF_CRLF = Buffer.from('\r\n\r\n');
const LF_LF = Buffer.from('\n\n');

function splitHeaderBlock(raw: Buffer): { head: string; body: Buffer } {
  const crlf = raw.indexOf(CRLF_CRLF);
  const lf = raw.indexOf(LF_LF);
  if (crlf !== -1 && (lf === -1 || crlf < lf)) {
    return { head: raw.subarray(0, crlf).toString('utf8'), body: raw.subarray(crlf + 4) };
  }
  if (lf !== -1) return { head: raw.subarray(0, lf).toString('utf8'), body: raw.subarray(lf + 2) };
  return { head: raw.toString('utf8'), body: Buffer.alloc(0) };
}

/** Unfolds continuation lines; the first occurrence of a repeated header wins. */
export function parseHeaders(head: string): Map<string, string> {
  const headers = new Map<string, string>();
  const unfolded = head.replace(/\r?\n[ \t]+/g, ' ');
  for (const line of unfolded.split(/\r?\n/)) {
    const colon = line.indexOf(':');
    if (colon <= 0) continue;
    const name = line.slice(0, colon).trim().toLowerCase();
    if (!headers.has(name)) headers.set(name, line.slice(colon + 1).trim());
  }
  return headers;
}

function parsePart(raw: Buffer): MimePart {
  const { head, body } = splitHeaderBlock(raw);
  return { headers: parseHeaders(head), body };
}

export function parseContentType(value: string | undefined): ContentType {
  const [mediaType, ...rest] = (value ?? 'text/plain').split(';');
  const params = new Map<string, string>();
  for (const piece of rest) {
    const eq = piece.indexOf('=');
    if (eq === -1) continue;
    const key = piece.slice(0, eq).trim().toLowerCase();
    let paramValue = piece.slice(eq + 1).trim();
    if (paramValue.startsWith('"') && paramValue.endsWith('"')) paramValue = paramValue.slice(1, -1).replace(/\\(.)/g, '$1');
    params.set(key, paramValue);
  }
  return { mediaType: mediaType.trim().toLowerCase() || 'text/plain', params };
}

export function decodeQuotedPrintable(input: string): Buffer {
  const softBreaksRemoved = input.replace(/=\r?\n/g, '');
  const bytes: number[] = [];
  for (let i = 0; i < softBreaksRemoved.length; i += 1) {
    const ch = softBreaksRemoved[i];
    const hex = softBreaksRemoved.slice(i + 1, i + 3);
    if (ch === '=' && /^[0-9A-Fa-f]{2}$/.test(hex)) {
      bytes.push(parseInt(hex, 16));
      i += 2;
    } else {
      bytes.push(softBreaksRemoved.charCodeAt(i) & 0xff);
    }
  }
  return Buffer.from(bytes);
}

function decodeTransfer(body: Buffer, encoding: string | undefined): Buffer {
  switch ((encoding ?? '7bit').trim().toLowerCase()) {
    case 'base64':
      return Buffer.from(body.toString('latin1').replace(/[^A-Za-z0-9+/=]/g, ''), 'base64');
    case 'quoted-printable':
      return decodeQuotedPrintable(body.toString('latin1'));
    default:
      return body;
  }
}

function decodeCharset(bytes: Buffer, charset: string | undefined): string {
  try {
    return new TextDecoder(charset ?? 'utf-8').decode(bytes);
  } catch {
    return new TextDecoder('utf-8').decode(bytes);
  }
}

/** RFC 2047 encoded words (`=?UTF-8?Q?...?=`, `=?UTF-8?B?...?=`) as nodemailer writes them. */
export function decodeEncodedWords(value: string): string {
  return value
    .replace(/(=\?[^?]+\?[BbQq]\?[^?]*\?=)\s+(?==\?[^?]+\?[BbQq]\?[^?]*\?=)/g, '$1')
    .replace(/=\?([^?*]+)(?:\*[^?]*)?\?([BbQq])\?([^?]*)\?=/g, (_match, charset: string, kind: string, data: string) => {
      const bytes = kind.toUpperCase() === 'B' ? Buffer.from(data, 'base64') : decodeQuotedPrintable(data.replace(/_/g, ' '));
      return decodeCharset(bytes, charset);
    });
}

function splitMultipart(body: Buffer, boundary: string): Buffer[] {
  const text = body.toString('latin1');
  const delimiter = `--${boundary}`;
  const parts: Buffer[] = [];
  let cursor = text.indexOf(delimiter);
  while (cursor !== -1) {
    const afterDelimiter = cursor + delimiter.length;
    if (text.startsWith('--', afterDelimiter)) break;
    const contentStart = text.indexOf('\n', afterDelimiter);
    if (contentStart === -1) break;
    const next = text.indexOf(`\n${delimiter}`, contentStart);
    const contentEnd = next === -1 ? text.length : next;
    // the CRLF before the next delimiter belongs to the delimiter (RFC 2046 §5.1.1)
    const trimmedEnd = text[contentEnd - 1] === '\r' ? contentEnd - 1 : contentEnd;
    parts.push(Buffer.from(text.slice(contentStart + 1, Math.max(contentStart + 1, trimmedEnd)), 'latin1'));
    cursor = next === -1 ? -1 : next + 1;
  }
  return parts;
}

function collectBodies(part: MimePart, found: { text?: string; html?: string }): void {
  const type = parseContentType(part.headers.get('content-type'));
  const disposition = (part.headers.get('content-disposition') ?? '').toLowerCase();
  if (disposition.startsWith('attachment')) return;
  if (type.mediaType.startsWith('multipart/')) {
    const boundary = type.params.get('boundary');
    if (!boundary) return;
    for (const child of splitMultipart(part.body, boundary)) collectBodies(parsePart(child), found);
    return;
  }
  if (type.mediaType !== 'text/plain' && type.mediaType !== 'text/html') return;
  // SMTP carries CRLF; the outbox shows text the way it was written
  const decoded = decodeCharset(decodeTransfer(part.body, part.headers.get('content-transfer-encoding')), type.params.get('charset')).replace(/\r\n/g, '\n');
  if (type.mediaType === 'text/plain' && found.text === undefined) found.text = decoded;
  if (type.mediaType === 'text/html' && found.html === undefined) found.html = decoded;
}

export function parseMessage(raw: Buffer | string): ParsedMessage {
  const root = parsePart(typeof raw === 'string' ? Buffer.from(raw, 'utf8') : raw);
  const found: { text?: string; html?: string } = {};
  collectBodies(root, found);
  const header = (name: string) => decodeEncodedWords(root.headers.get(name) ?? '');
  const message: ParsedMessage = {
    headers: root.headers,
    from: header('from'),
    subject: header('subject'),
    messageId: root.headers.get('message-id') ?? null,
    text: found.text ?? '',
  };
  if (found.html !== undefined) message.html = found.html;
  return message;
}
