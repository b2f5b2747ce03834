/**
 * The explanation the solver writes for each change names foods in the cook's words, as the rest of
 * the rewrite does (shared/rewritten-line-text.ts `commonFoodName`): a catalogue food by its common
 * name, a rule's target by the rule's own words, a cook's own food by the name the cook gave it, and a
 * food of unknown origin by its name unchanged. Values per 100 g are approximate, from memory, close to
 * USDA SR28 (enriched dry pasta, whole-wheat dry pasta); not catalogue data.
 */
import { describe, expect, it } from 'vitest';
import { solveRewrite } from '../../shared/rewrite/solve-rewrite';
import type { Candidate, OptimalRewrite, RewriteLine, RuleRef } from '../../shared/rewrite/types';
import type { Nutrients } from '../../shared/nutrition';

const nutrients = (kcal: number, proteinG: number, carbsG: number, fiberG: number): Nutrients => ({
  kcal,
  proteinG,
  fatG: 1.5,
  satFatG: 0.3,
  carbsG,
  fiberG,
  sugarG: 2.7,
  sodiumMg: 6,
});

const PASTA: Candidate = {
  foodId: 1,
  name: 'Pasta, dry, enriched',
  source: 'usda-sr28',
  densityGPerMl: 0.45,
  per100g: nutrients(371, 13, 75, 3.2),
  original: true,
};
const RULE: RuleRef = { id: 'pasta-to-whole-wheat', label: 'whole-wheat pasta for white pasta, 1:1 by weight', why: 'invented for the test' };
const WHOLE_WHEAT: Candidate = {
  foodId: 2,
  name: 'Pasta, whole-wheat, dry',
  source: 'usda-sr28',
  densityGPerMl: 0.45,
  per100g: nutrients(348, 14.6, 75, 9.2),
  massRatio: 1,
  rule: RULE,
};

function explain(original: Candidate, substitute: Candidate, writtenName?: string): string {
  const line: RewriteLine = {
    index: 0,
    foodId: original.foodId,
    grams: 227,
    volumeMl: 227 / 0.45,
    locked: false,
    candidates: [original, substitute],
    ...(writtenName ? { writtenName } : {}),
  };
  const r = solveRewrite([line], { proteinMinG: 31, kcalMax: 850 }, 1, { objective: 'closest', volumeTolerancePct: 20 }) as OptimalRewrite;
  expect(r.status).toBe('optimal');
  expect(r.changes).toHaveLength(1);
  return r.changes[0].reason;
}

describe('the explanation of a change, in the cook’s words', () => {
  it('names catalogue foods by their common names and the rule’s target by the rule’s words', () => {
    const reason = explain(PASTA, WHOLE_WHEAT);
    expect(reason).toMatch(/^Swap 227 g pasta for 2\d\d g whole-wheat pasta — whole-wheat pasta for white pasta, 1:1 by weight/);
    expect(reason).not.toContain('Pasta, dry, enriched');
    expect(reason).not.toContain('Pasta, whole-wheat, dry');
  });

  it('names the written food as the cook’s line named it, when the line says', () => {
    expect(explain(PASTA, WHOLE_WHEAT, 'elbow macaroni')).toMatch(/^Swap 227 g elbow macaroni for 2\d\d g whole-wheat pasta — /);
  });

  it('turns a catalogue name around when the rule’s label names no single food', () => {
    const reason = explain(PASTA, { ...WHOLE_WHEAT, rule: { ...RULE, label: 'a third more fiber in the pasta' } });
    expect(reason).toMatch(/^Swap 227 g pasta for 2\d\d g whole-wheat pasta — a third more fiber in the pasta/);
  });

  it('keeps a cook’s own food by the name they gave it, commas and all', () => {
    const own: Candidate = { ...WHOLE_WHEAT, name: 'Nonna’s bean pasta, dry', source: 'custom' };
    expect(explain(PASTA, own)).toMatch(/^Swap 227 g pasta for 2\d\d g Nonna’s bean pasta, dry — /);
    const ownOriginal: Candidate = { ...PASTA, name: 'Corner shop pasta, enriched', source: 'custom' };
    expect(explain(ownOriginal, WHOLE_WHEAT)).toMatch(/^Swap 227 g Corner shop pasta, enriched for 2\d\d g whole-wheat pasta — /);
  });

  it('uses the name as it is when a candidate does not say where it comes from', () => {
    const { source: _a, ...unknownPasta } = PASTA;
    const { source: _b, ...unknownWholeWheat } = WHOLE_WHEAT;
    expect(explain(unknownPasta, unknownWholeWheat)).toMatch(/^Swap 227 g Pasta, dry, enriched for 2\d\d g Pasta, whole-wheat, dry — /);
  });

  it('names a coach’s approved swap by both foods’ common names', () => {
    const approved: Candidate = { ...WHOLE_WHEAT, rule: undefined, approved: { by: 'Coach Wren' } };
    expect(explain(PASTA, approved)).toContain('— whole-wheat pasta for pasta, 1:1 by weight, a swap approved by Coach Wren');
  });
});
