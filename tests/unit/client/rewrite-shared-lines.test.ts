import { describe, expect, it } from 'vitest';
import { zeroNutrients } from '../../../shared/nutrition';
import { rewriteNote, rewrittenLinesOf } from '../../../src/features/rewrite/save-draft';
import type { RewriteAnswer, RewritePlanLine } from '../../../src/features/rewrite/rewrite-types';
import { heldWords } from '../../../src/features/rewrite/rewrite-words';

const food = (id: number, name: string) => ({ id, source: 'usda-sr28' as const, sourceId: String(id).padStart(5, '0'), name });
const beef = food(23557, 'Beef, ground, 80% lean meat / 20% fat, raw');
const turkey = food(5305, 'Turkey, ground, 93% lean, 7% fat, raw');
const onion = food(11282, 'Onions, raw');

const planLine = (index: number, f: ReturnType<typeof food>, grams: number): RewritePlanLine => ({
  index,
  food: f,
  grams,
  volumeMl: grams,
  nutrients: zeroNutrients(),
});
const plan = (lines: RewritePlanLine[]) => ({ lines, totals: zeroNutrients(), perServing: zeroNutrients(), volumeMl: 0 });

// An invented chili: line 0 shared half and half (beef kept, turkey in), line 1 unchanged, line 2 unread.
const answer: RewriteAnswer = {
  status: 'optimal',
  before: plan([planLine(0, beef, 454), planLine(1, onion, 160)]),
  after: plan([planLine(0, beef, 227), planLine(0, turkey, 227), planLine(1, onion, 160)]),
  changes: [
    {
      line: 0,
      from: beef,
      to: turkey,
      gramsBefore: 454,
      gramsAfter: 227,
      swapped: true,
      partial: true,
      keptGrams: 227,
      rule: { id: 'ground-beef-to-lean-turkey', label: 'lean ground turkey for 80/20 beef, 1:1 by weight', why: 'invented' },
      serves: ['kcalMax'],
      reason: 'Replace half of the beef with 227 g turkey.',
    },
  ],
  held: [{ line: 3, reason: 'leavener: kept as written' }],
  skippedLines: [{ line: 2, input: 'a pinch of love', reason: 'no food matched' }],
  solver: { objective: 'closest', objectiveValue: 0, ms: 1, solves: 1, provenOptimal: true },
};

describe('a shared line in a saved version', () => {
  it('keeps both parts with their grams, original first, each saying which line it shares', () => {
    expect(rewrittenLinesOf(answer)).toEqual([
      { food: { id: beef.id, name: beef.name }, grams: 227, input: `227 g ${beef.name} — shares line 1 with ${turkey.name}` },
      { food: { id: turkey.id, name: turkey.name }, grams: 227, input: `227 g ${turkey.name} — shares line 1 with ${beef.name}` },
      { food: { id: onion.id, name: onion.name }, grams: 160 },
      { input: 'a pinch of love' },
    ]);
  });

  it("saves every line in the cook's words: the shared line as two readable lines, the others as written", () => {
    const written = ['1 lb ground beef', '1 large onion, diced', 'a pinch of love'];
    expect(rewrittenLinesOf(answer, written).map((l) => l.input)).toEqual([
      '1/2 lb ground beef',
      '1/2 lb lean ground turkey',
      '1 large onion, diced',
      'a pinch of love',
    ]);
  });

  it("names the part swap in the version note in the cook's words, not the catalogue's", () => {
    expect(rewriteNote(answer, ['1 lb ground beef', '1 large onion, diced', 'a pinch of love'])).toBe(
      'Lighter rewrite: ground beef → part lean ground turkey.',
    );
    // without the written lines, both foods by their common names
    expect(rewriteNote(answer)).toBe('Lighter rewrite: 80% lean ground beef → part lean ground turkey.');
  });
});

describe('held lines in cook’s words', () => {
  it('turns the rule side’s "function: kept as written" into a sentence', () => {
    expect(heldWords('leavener: kept as written')).toBe('Leavener, kept as written');
    expect(heldWords('salt: kept as written')).toBe('Salt, kept as written');
    expect(heldWords('kept because the cook locked it')).toBe('Kept because the cook locked it');
  });
});
