import { describe, expect, it } from 'vitest';
import { formatDateTime, formatDay, formatWhen } from '../../../src/lib/dates';
import { countOf } from '../../../src/lib/words';

describe('countOf', () => {
  it('puts the noun in the number the count asks for', () => {
    expect(countOf(1, 'recipe')).toBe('1 recipe');
    expect(countOf(0, 'recipe')).toBe('0 recipes');
    expect(countOf(3, 'batch')).toBe('3 batches');
    expect(countOf(2, 'coach')).toBe('2 coaches');
    expect(countOf(5, 'ingredient line')).toBe('5 ingredient lines');
    expect(countOf(1250, 'food')).toBe('1,250 foods');
  });
});

describe('dates', () => {
  const now = new Date(2026, 11, 5, 15, 30);
  it('says today and yesterday, then the day', () => {
    expect(formatWhen(new Date(2026, 11, 5, 9, 5).toISOString(), now)).toBe('Today, 9:05 AM');
    expect(formatWhen(new Date(2026, 11, 4, 22, 58).toISOString(), now)).toBe('Yesterday, 10:58 PM');
    expect(formatWhen(new Date(2026, 10, 28, 12, 0).toISOString(), now)).toBe('Nov 28, 2026');
  });
  it('shows nothing for a date it cannot read', () => {
    expect(formatWhen('not a date', now)).toBe('');
    expect(formatDay('')).toBe('');
    expect(formatDateTime(new Date(2026, 11, 1, 22, 58).toISOString())).toBe('Dec 1, 2026, 10:58 PM');
  });
});
