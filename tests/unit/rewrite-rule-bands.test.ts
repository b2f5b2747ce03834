/**
 * A rule's own band on a substitute's grams (shared/rewrite/line-slots.ts `bandOf`): a tight ±10 % for
 * 1:1 liquids, starches and meats, up to ×1.5 for more of a lean main protein; a coach's approved swap
 * keeps the request's line tolerance. Values per 100 g are approximate, from memory, close to USDA SR28
 * (fried mixed chicken meat, roasted chicken breast); not catalogue data.
 */
import { describe, expect, it } from 'vitest';
import { solveRewrite } from '../../shared/rewrite/solve-rewrite';
import { buildRewriteModel } from '../../shared/rewrite/build-model';
import { bandOf, lineSlots } from '../../shared/rewrite/line-slots';
import { resolveOptions } from '../../shared/rewrite/rewrite-options';
import type { Candidate, OptimalRewrite, RewriteLine } from '../../shared/rewrite/types';
import type { Nutrients } from '../../shared/nutrition';

const nutrients = (kcal: number, proteinG: number, fatG: number): Nutrients => ({
  kcal,
  proteinG,
  fatG,
  satFatG: fatG / 3,
  carbsG: 0,
  fiberG: 0,
  sugarG: 0,
  sodiumMg: 80,
});
const FRIED: Candidate = { foodId: 1, name: 'chicken meat, fried', densityGPerMl: 0.6, per100g: nutrients(219, 30.6, 9.1), original: true };
const BREAST: Candidate = {
  foodId: 2,
  name: 'chicken breast, roasted',
  densityGPerMl: 0.6,
  per100g: nutrients(165, 31, 3.6),
  massRatio: 1,
  band: [0.9, 1.5],
  rule: { id: 'cooked-chicken-to-breast', label: 'cooked chicken breast for mixed or dark cooked chicken, 1:1 by weight', why: 'invented for the test' },
};
const line = (breast: Candidate): RewriteLine => ({ index: 0, foodId: 1, grams: 400, volumeMl: 400 / 0.6, locked: false, candidates: [FRIED, breast] });

describe('rule bands on a substitute', () => {
  it('takes the rule band in place of the line tolerance, and the line tolerance for a coach’s swap', () => {
    expect(bandOf(BREAST, 0.25)).toEqual([0.9, 1.5]);
    expect(bandOf({ ...BREAST, band: undefined }, 0.25)).toEqual([0.75, 1.25]);
    expect(bandOf({ ...BREAST, approved: { by: 'Coach Wren' } }, 0.25)).toEqual([0.75, 1.25]);
    expect(() => bandOf({ ...BREAST, band: [1.1, 1.5] }, 0.25)).toThrow(RangeError);
    const [slots] = lineSlots([line(BREAST)], resolveOptions({}), []);
    const swap = slots.slots.find((s) => s.kind === 'swap')!;
    expect(swap.lowGrams).toBeCloseTo(360, 9);
    expect(swap.widthGrams).toBeCloseTo(240, 9);
    expect(swap.centreGrams).toBeCloseTo(400, 9);
  });

  it('the dish-volume ceiling leaves out what the rule lets the line add: ×1.5 of a lean protein is not capped at +10 % of the dish', () => {
    // the chicken is 667 mL of a 1,167 mL dish; ×1.5 adds 333 mL (29 %), beyond a ±10 % bound on the dish as written
    const sauce: Candidate = { foodId: 5, name: 'tomato sauce', densityGPerMl: 1, per100g: nutrients(30, 1.5, 0.2), original: true };
    const dish = [line(BREAST), { index: 1, foodId: 5, grams: 500, volumeMl: 500, locked: false, candidates: [sauce] }];
    const r = solveRewrite(dish, { proteinMinG: 100, kcalMax: 2000 }, 1, { objective: 'max-protein' }) as OptimalRewrite;
    expect(r.status).toBe('optimal');
    expect(r.after.lines[0].grams).toBeCloseTo(600, 6);
    // the model's ceiling leaves out (1.5 − 1) × 400 g ÷ 0.6 g/mL = 333 mL; a ±10 % band adds nothing beyond the dish's own ±10 %
    const meta = (breast: Candidate) => buildRewriteModel([line(breast), dish[1]], { proteinMinG: 100, kcalMax: 2000 }, 1, {}).variables;
    expect(meta(BREAST).permittedAddMl).toBeCloseTo(1000 / 3, 6);
    expect(meta(BREAST).volumeRangeMl[1]).toBeCloseTo(1.1 * (400 / 0.6 + 500) + 1000 / 3, 6);
    expect(meta({ ...BREAST, band: [0.9, 1.1] }).permittedAddMl).toBe(0);
  });

  it('most protein goes to the top of the rule band (×1.5), and the explanation says how far it went', () => {
    const r = solveRewrite([line(BREAST)], { proteinMinG: 100, kcalMax: 2000 }, 1, { objective: 'max-protein', volumeTolerancePct: 60 }) as OptimalRewrite;
    expect(r.status).toBe('optimal');
    expect(r.after.lines[0].grams).toBeCloseTo(600, 6);
    expect(r.changes[0].reason).toContain('here ×1.50 by weight; the rule allows ×0.9–1.5 of its ratio');
    const approved = solveRewrite([line({ ...BREAST, approved: { by: 'Coach Wren' } })], { proteinMinG: 100, kcalMax: 2000 }, 1, {
      objective: 'max-protein',
      volumeTolerancePct: 60,
    }) as OptimalRewrite;
    expect(approved.after.lines[0].grams).toBeCloseTo(500, 6);
  });

  it('fewest calories stays at the bottom of a tight band, never below it', () => {
    const tight = { ...BREAST, band: [0.9, 1.1] as [number, number] };
    const r = solveRewrite([line(tight)], { proteinMinG: 50, kcalMax: 2000 }, 1, { objective: 'min-kcal', volumeTolerancePct: 60 }) as OptimalRewrite;
    expect(r.after.lines[0].food.foodId).toBe(2);
    expect(r.after.lines[0].grams).toBeCloseTo(360, 6);
  });
});

describe("a substitute of the written food's very catalogue density is measured as the line measures it", () => {
  it('a 1:1 swap between two cuts that share a density keeps the line’s measured volume (2 lb of cubed meat read as 909 mL, not 907 g ÷ 0.6)', () => {
    const measured: RewriteLine = { index: 0, foodId: 1, grams: 907, volumeMl: 909, locked: false, candidates: [FRIED, { ...BREAST, band: [0.9, 1.1] }] };
    const [slots] = lineSlots([measured], resolveOptions({}), []);
    const swap = slots.slots.find((s) => s.kind === 'swap')!;
    expect(swap.densityGPerMl).toBeCloseTo(907 / 909, 9);
    // with the dish volume held to ±5 % the swap is possible only because its volume is the line's
    const r = solveRewrite([measured], { proteinMinG: 0, kcalMax: 1800 }, 1, { objective: 'closest', volumeTolerancePct: 5 }) as OptimalRewrite;
    expect(r.status).toBe('optimal');
    expect(r.after.lines[0].food.foodId).toBe(2);
    expect(r.after.lines[0].volumeMl).toBeCloseTo((909 * r.after.lines[0].grams) / 907, 6);
    // a substitute of another density keeps its own
    const [other] = lineSlots([{ ...measured, candidates: [FRIED, { ...BREAST, densityGPerMl: 0.7 }] }], resolveOptions({}), []);
    expect(other.slots.find((s) => s.kind === 'swap')!.densityGPerMl).toBe(0.7);
  });
});

describe('a line only scaled by its rule (keepScale)', () => {
  const BUTTER: Candidate = {
    foodId: 3,
    name: 'butter',
    densityGPerMl: 0.96,
    per100g: nutrients(717, 0.9, 81),
    original: true,
    rule: { id: 'saute-fat-halve', label: 'half the oil or butter for sautéing', why: 'invented for the test', note: 'Use a nonstick pan.' },
  };
  const PASTA: Candidate = { foodId: 4, name: 'pasta', densityGPerMl: 0.5, per100g: nutrients(371, 13, 1.5), original: true };
  const lines = (): RewriteLine[] => [
    { index: 0, foodId: 3, grams: 100, volumeMl: 100 / 0.96, locked: false, candidates: [BUTTER], keepScale: [0.5, 1] },
    { index: 1, foodId: 4, grams: 400, volumeMl: 800, locked: false, candidates: [PASTA] },
  ];

  it('names its rule and shows the rule’s note, as a swap does', () => {
    const r = solveRewrite(lines(), { proteinMinG: 10, kcalMax: 1900 }, 1, { objective: 'min-kcal' }) as OptimalRewrite;
    expect(r.status).toBe('optimal');
    const change = r.changes.find((c) => c.line === 0)!;
    expect(change.swapped).toBe(false);
    expect(change.gramsAfter).toBeCloseTo(50, 6);
    expect(change.rule?.id).toBe('saute-fat-halve');
    expect(change.note).toBe('Use a nonstick pan.');
    expect(change.reason).toContain('half the oil or butter for sautéing');
  });

  it('the dish-volume floor leaves out what the rule lets the line give up: halving the butter needs no filler', () => {
    // the butter is 104 mL of 904 mL; halving it takes out 52 mL (5.8 %), within the floor even at a 1 % tolerance
    const r = solveRewrite(lines(), { proteinMinG: 10, kcalMax: 1900 }, 1, { objective: 'min-kcal', volumeTolerancePct: 1 }) as OptimalRewrite;
    expect(r.status).toBe('optimal');
    expect(r.after.lines.find((l) => l.index === 0)!.grams).toBeCloseTo(50, 6);
    expect(r.after.lines.find((l) => l.index === 1)!.grams).toBeCloseTo(400, 6);
  });
});
