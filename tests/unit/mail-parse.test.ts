import { describe, expect, it } from 'vitest';
import { decodeEncodedWords, decodeQuotedPrintable, parseMessage } from '../../server/mail/parse-message';

const crlf = (lines: string[]) => lines.join('\r\n');

describe('parseMessage', () => {
  it('reads a single-part quoted-printable message with folded headers', () => {
    // RFC 2045 §6.7: "=" at a line end is a soft line break; =XX is one octet.
    const raw = crlf([
      'From: "Hearthswap" <no-reply@hearthswap.test>',
      'Subject: Your batch',
      '  plan is ready',
      'Message-ID: <abc@hearthswap.test>',
      'Content-Type: text/plain; charset="utf-8"',
      'Content-Transfer-Encoding: quoted-printable',
      '',
      'Gr=C3=BC=C3=9Fe: 1 tbsp =3D 14.8 mL, and this line is so long that it wraps=',
      ' here.',
    ]);
    const parsed = parseMessage(raw);
    expect(parsed.from).toBe('"Hearthswap" <no-reply@hearthswap.test>');
    expect(parsed.subject).toBe('Your batch plan is ready');
    expect(parsed.messageId).toBe('<abc@hearthswap.test>');
    expect(parsed.text).toBe('Grüße: 1 tbsp = 14.8 mL, and this line is so long that it wraps here.');
    expect(parsed.html).toBeUndefined();
  });

  it('finds text and html inside nested multipart bodies and skips attachments', () => {
    const raw = crlf([
      'Subject: =?UTF-8?B?U2t5ciDCvSBjdXA=?=',
      'Content-Type: multipart/mixed; boundary="outer"',
      '',
      'preamble is ignored',
      '--outer',
      'Content-Type: multipart/alternative; boundary=inner',
      '',
      '--inner',
      'Content-Type: text/plain; charset=utf-8',
      'Content-Transfer-Encoding: base64',
      '',
      Buffer.from('Plain part: ½ cup skyr\n').toString('base64'),
      '--inner',
      'Content-Type: text/html; charset=utf-8',
      '',
      '<p>Plain part: &frac12; cup skyr</p>',
      '--inner--',
      '--outer',
      'Content-Type: text/plain',
      'Content-Disposition: attachment; filename="notes.txt"',
      '',
      'not the body',
      '--outer--',
      '',
    ]);
    const parsed = parseMessage(raw);
    expect(parsed.subject).toBe('Skyr ½ cup');
    expect(parsed.text).toBe('Plain part: ½ cup skyr\n');
    expect(parsed.html).toBe('<p>Plain part: &frac12; cup skyr</p>');
  });

  it('tolerates bare LF line endings and a missing body', () => {
    expect(parseMessage('Subject: hello\n\nbody line\n').text).toBe('body line\n');
    expect(parseMessage('Subject: only headers').text).toBe('');
  });
});

describe('MIME decoding helpers', () => {
  it('decodes RFC 2047 Q and B words and joins adjacent words', () => {
    // RFC 2047 §4.2: in Q encoding "_" stands for a space; §6.2: white space between adjacent encoded words is dropped.
    expect(decodeEncodedWords('=?UTF-8?Q?Cr=C3=A8me_br=C3=BBl=C3=A9e_=E2=80=94_li?= =?UTF-8?Q?ghter?=')).toBe('Crème brûlée — lighter');
    expect(decodeEncodedWords('=?utf-8?b?w6k=?= and plain')).toBe('é and plain');
    expect(decodeEncodedWords('no words here')).toBe('no words here');
  });

  it('keeps a stray "=" that is not an escape', () => {
    expect(decodeQuotedPrintable('a = b =ZZ').toString('utf8')).toBe('a = b =ZZ');
  });
});
