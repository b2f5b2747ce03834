import { describe, expect, it } from 'vitest';
import { escapeHtml, formatExpiry, mailTemplates } from '../../server/mail/templates';

const LINK = 'https://hearthswap.test/reset?token=a1b2c3&user=42';
const EXPIRES = '2031-05-09T17:30:00Z';

describe('mail templates', () => {
  for (const [name, build] of [
    ['invitation', () => mailTemplates.invitation({ coachName: 'Marlo Quill', link: LINK, expiresAt: EXPIRES })],
    ['passwordReset', () => mailTemplates.passwordReset({ displayName: 'Wren Tally', link: LINK, expiresAt: new Date(EXPIRES) })],
  ] as const) {
    it(`${name}: plain link on its own line, expiry, and an ignore line`, () => {
      const mail = build();
      expect(mail.subject).toMatch(/Hearthswap/);
      expect(mail.subject).not.toMatch(/[\r\n]/);
      expect(mail.text.split('\n')).toContain(LINK);
      expect(mail.text).toContain('May 9, 2031');
      expect(mail.text).toContain('5:30 PM UTC');
      expect(mail.text).toMatch(/ignore this e-mail/i);
      expect(mail.html).toMatch(/ignore this e-mail/i);
      expect(mail.html).toContain(`href="${LINK.replace('&', '&amp;')}"`);
    });
  }

  it('invitation names the coach in subject and body', () => {
    const mail = mailTemplates.invitation({ coachName: 'Marlo  Quill\r\nBcc: x@y.test', link: LINK, expiresAt: EXPIRES });
    expect(mail.subject).toBe('Marlo Quill Bcc: x@y.test invited you to Hearthswap');
    expect(mail.text).toContain('Marlo Quill Bcc: x@y.test would like to coach you');
  });

  it('escapes names in the html part but not in the text part', () => {
    const mail = mailTemplates.passwordReset({ displayName: `<img src=x onerror="alert('hi')"> & co`, link: LINK, expiresAt: EXPIRES });
    expect(mail.text).toContain(`Hello <img src=x onerror="alert('hi')"> & co,`);
    expect(mail.html).toContain('Hello &lt;img src=x onerror=&quot;alert(&#39;hi&#39;)&quot;&gt; &amp; co,');
    expect(mail.html).not.toContain('<img');
  });

  it('refuses links that are not http(s) or carry white space, and bad dates', () => {
    expect(() => mailTemplates.invitation({ coachName: 'M', link: 'javascript:alert(1)', expiresAt: EXPIRES })).toThrow(/http/);
    expect(() => mailTemplates.invitation({ coachName: 'M', link: 'not a url', expiresAt: EXPIRES })).toThrow(/URL/);
    expect(() => mailTemplates.invitation({ coachName: 'M', link: 'https://hearthswap.test/a\nb', expiresAt: EXPIRES })).toThrow(/white space/);
    expect(() => mailTemplates.invitation({ coachName: 'M', link: LINK, expiresAt: 'soon' })).toThrow(/date/);
  });

  it('escapeHtml covers the five HTML-special characters', () => {
    expect(escapeHtml(`<a href="x">'&'</a>`)).toBe('&lt;a href=&quot;x&quot;&gt;&#39;&amp;&#39;&lt;/a&gt;');
  });

  it('formatExpiry is in UTC whatever the offset written', () => {
    expect(formatExpiry('2031-05-09T19:30:00+02:00')).toBe(formatExpiry(EXPIRES));
  });
});
