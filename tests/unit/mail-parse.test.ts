import { describe, expect, it } from 'vitest';
import { parseMessage } from '../../server/mail/parse-message';

const crlf = (lines: string[]) => lines.join('\r\n');

describe('parseMessage (mailparser)', () => {
  it('reads a single-part quoted-printable message with folded headers', async () => {
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
    const parsed = await parseMessage(raw);
    expect(parsed.from).toBe('Hearthswap <no-reply@hearthswap.test>');
    expect(parsed.subject).toBe('Your batch plan is ready');
    expect(parsed.messageId).toBe('<abc@hearthswap.test>');
    expect(parsed.text).toBe('Grüße: 1 tbsp = 14.8 mL, and this line is so long that it wraps here.');
    expect(parsed.html).toBeUndefined();
  });

  it('finds text and html inside nested multipart bodies and skips attachments', async () => {
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
    const parsed = await parseMessage(raw);
    expect(parsed.subject).toBe('Skyr ½ cup');
    expect(parsed.text).toBe('Plain part: ½ cup skyr\n');
    expect(parsed.html).toBe('<p>Plain part: &frac12; cup skyr</p>');
  });

  it('tolerates bare LF line endings and a missing body', async () => {
    expect((await parseMessage('Subject: hello\n\nbody line\n')).text).toBe('body line\n');
    expect((await parseMessage('Subject: only headers')).text).toBe('');
  });
});

describe('headers as nodemailer writes them', () => {
  it('decodes RFC 2047 Q and B words and joins adjacent words', async () => {
    // RFC 2047 §4.2: in Q encoding "_" stands for a space; §6.2: white space between adjacent encoded words is dropped.
    const subject = async (value: string) => (await parseMessage(`Subject: ${value}\r\n\r\nbody`)).subject;
    expect(await subject('=?UTF-8?Q?Cr=C3=A8me_br=C3=BBl=C3=A9e_=E2=80=94_li?= =?UTF-8?Q?ghter?=')).toBe('Crème brûlée — lighter');
    expect(await subject('=?utf-8?b?w6k=?= and plain')).toBe('é and plain');
    expect(await subject('no words here')).toBe('no words here');
  });

  it('keeps a stray "=" that is not an escape', async () => {
    const raw = crlf(['Content-Type: text/plain; charset=utf-8', 'Content-Transfer-Encoding: quoted-printable', '', 'a = b =ZZ']);
    expect((await parseMessage(raw)).text).toBe('a = b =ZZ');
  });
});
