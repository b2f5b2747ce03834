import { describe, expect, it } from 'vitest';
import { newestFirst, type OutboxMessage } from '../../../src/features/outbox/api/outbox';
import { splitLinks } from '../../../src/features/outbox/text-links';

describe('splitLinks', () => {
  it('finds http(s) links and leaves the text around them whole', () => {
    const text = 'Accept the invitation:\nhttp://127.0.0.1:3200/invitations/abc_DEF-123.\nThanks';
    const parts = splitLinks(text);
    expect(parts.filter((p) => p.kind === 'link').map((p) => p.kind === 'link' && p.href)).toEqual(['http://127.0.0.1:3200/invitations/abc_DEF-123']);
    expect(parts.map((p) => p.text).join('')).toBe(text);
  });
  it('stops before a closing bracket it did not open, keeps one it did', () => {
    const links = (t: string) => splitLinks(t).flatMap((p) => (p.kind === 'link' ? [p.href] : []));
    expect(links('(see https://example.test/a)')).toEqual(['https://example.test/a']);
    expect(links('https://example.test/wiki/Pie_(dish), then')).toEqual(['https://example.test/wiki/Pie_(dish)']);
  });
  it('links nothing else', () => {
    expect(splitLinks('javascript:alert(1) ftp://x.test mailto:a@b.test')).toEqual([
      { kind: 'text', text: 'javascript:alert(1) ftp://x.test mailto:a@b.test' },
    ]);
    expect(splitLinks('')).toEqual([]);
  });
});

describe('newestFirst', () => {
  it('orders by the time received', () => {
    const m = (id: string, receivedAt: string): OutboxMessage => ({ id, from: '', to: [], subject: '', text: '', receivedAt });
    expect(newestFirst([m('a', '2026-01-01T10:00:00Z'), m('b', '2026-01-02T09:00:00Z'), m('c', '2026-01-01T11:00:00Z')]).map((x) => x.id)).toEqual([
      'b',
      'c',
      'a',
    ]);
  });
});
