/**
 * Property tests (fast-check): for any input string parseLine returns a well-formed result from its
 * own path (its last-resort catch counts a fallback: none may happen), and never returns a NaN,
 * infinite or negative amount.
 */
import fc from 'fast-check';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { parseLine, type ParsedLine } from '../../shared/parse-line';
import { UNITS, getUnit } from '../../shared/units';
import { fallbackCount, resetFallbacks } from '../../shared/fallbacks';

const SIXTY_FOUR_KB = 64 * 1024;

function expectWellFormed(line: ParsedLine, input: string): void {
  expect(line.input).toBe(input);
  // The parser's own path handled the line: its last-resort catch did not have to.
  expect(line.flags).not.toContain('unparsed');
  const amounts = [line.quantity, line.range?.min, line.range?.max, line.size?.quantity, ...line.equivalents.map((e) => e.quantity)];
  for (const q of amounts) {
    if (q === null || q === undefined) continue;
    expect(Number.isFinite(q), `finite: ${q}`).toBe(true);
    expect(q).toBeGreaterThanOrEqual(0);
  }
  if (line.range) expect(line.range.min).toBeLessThanOrEqual(line.range.max);
  if (line.unit !== null) expect(getUnit(line.unit), line.unit).not.toBeNull();
  if (line.size) expect(getUnit(line.size.unit)).not.toBeNull();
  expect(typeof line.name).toBe('string');
  expect(Array.isArray(line.flags)).toBe(true);
  expect(line.needsAmount).toBe(line.quantity === null && line.name !== '' && !line.flags.includes('group-header'));
}

const quantityText = fc.oneof(
  fc.nat({ max: 1000 }).map(String),
  fc.double({ noNaN: false, noDefaultInfinity: false }).map(String),
  fc.constantFrom('½', '¾', '1½', '1 1/2', '1/0', '0/0', '-2', '−3', '2-3', '3 to 2', '1e308', '1e400', '9'.repeat(400), '.5', '1..5', '1//2', '⅓', '1 ⅔'),
  fc.tuple(fc.nat({ max: 20 }), fc.nat({ max: 20 })).map(([a, b]) => `${a}/${b}`),
  fc.tuple(fc.nat({ max: 20 }), fc.nat({ max: 20 })).map(([a, b]) => `${a}-${b}`),
);
const unitText = fc.oneof(fc.constantFrom(...UNITS.flatMap((u) => [...u.spellings, ...(u.caseSensitive ?? [])])), fc.constant(''));
const wordText = fc.constantFrom(
  'flour',
  'shredded',
  'mozzarella',
  'cheese,',
  'finely',
  'chopped',
  '(15 oz)',
  '(8-inch)',
  'to taste',
  'plus',
  'or',
  '(optional)',
  '(',
  ')',
  ',',
  'of',
  '—',
  '🧀',
  '\u0000',
  '\u0007',
  '\u200b',
  '\u00ad',
  '\ud83d',
  '\n',
  '\t',
  'x2',
);
const recipeLike = fc
  .tuple(quantityText, unitText, fc.array(fc.oneof(wordText, fc.string({ maxLength: 8 })), { maxLength: 8 }))
  .map(([q, u, ws]) => [q, u, ...ws].join(' '));
const anyCodePoints = fc.string({ unit: 'binary', maxLength: 200 });
const controlCharacters = fc.string({ unit: 'binary-ascii', maxLength: 200 });
const emoji = fc.array(fc.constantFrom('🍳', '🥚', '👩‍🍳', '🇺🇸', '½', '🧂', '\u{1F9C0}'), { maxLength: 50 }).map((a) => a.join(''));
/** A 64 KB line built from a repeated piece, so generating it is cheap. */
const sixtyFourKb = fc
  .oneof(recipeLike, anyCodePoints, fc.constantFrom('1 ', '1/2 ', '½ ', '1-', '(', '1 cup (', 'a', '\u0000'))
  .filter((piece) => piece.length > 0)
  .map((piece) => piece.repeat(Math.ceil(SIXTY_FOUR_KB / piece.length)).slice(0, SIXTY_FOUR_KB));

describe('parseLine properties (fast-check)', () => {
  beforeEach(() => resetFallbacks());
  afterEach(() => expect(fallbackCount('parse-line')).toBe(0));

  it('5,000 random lines: no fallback; every amount is null or finite and ≥ 0', () => {
    const lines = fc.oneof(
      { arbitrary: recipeLike, weight: 40 },
      { arbitrary: anyCodePoints, weight: 25 },
      { arbitrary: controlCharacters, weight: 20 },
      { arbitrary: emoji, weight: 10 },
      { arbitrary: sixtyFourKb, weight: 1 },
    );
    let sixtyFourKbSeen = 0;
    resetFallbacks();
    fc.assert(
      fc.property(lines, (input) => {
        if (input.length === SIXTY_FOUR_KB) sixtyFourKbSeen++;
        expectWellFormed(parseLine(input), input);
      }),
      { numRuns: 5000 },
    );
    expect(sixtyFourKbSeen).toBeGreaterThan(0);
    expect(fallbackCount('parse-line')).toBe(0);
  }, 120_000);

  // How fast they parse is a figure of `npm run bench` (matching bench).
  it('64 KB lines of every kind stay well formed and are flagged truncated', () => {
    for (const piece of ['1 ', '1/2 ', '½ ', '1-', '(', '1 cup flour, ', '\u0000\u0007', '🍳', '9']) {
      const input = piece.repeat(Math.ceil(SIXTY_FOUR_KB / piece.length)).slice(0, SIXTY_FOUR_KB);
      const line = parseLine(input);
      expectWellFormed(line, input);
      expect(line.flags).toContain('truncated');
    }
  });

  it('non-string input is read as text (or as nothing) without a fallback', () => {
    const odd: unknown[] = [
      undefined,
      null,
      42,
      NaN,
      {},
      [],
      Symbol('x'),
      {
        toString: () => {
          throw new Error('no');
        },
      },
    ];
    for (const value of odd) {
      const line = parseLine(value);
      expect(line.quantity === null || Number.isFinite(line.quantity)).toBe(true);
      expect(line.flags).not.toContain('unparsed');
    }
  });

  it('quantities that cannot be amounts come back as null, not NaN or Infinity', () => {
    for (const input of ['1/0 cup sugar', '1e400 cups flour', '-2 cups sugar', `${'9'.repeat(400)} g salt`, 'NaN cups']) {
      const line = parseLine(input);
      expect(line.quantity === null || (Number.isFinite(line.quantity) && line.quantity >= 0), input).toBe(true);
    }
  });
});
