import { describe, expect, it } from 'vitest';
import { keptCandidates, type PrunableCandidate } from '../../shared/rewrite/candidate-pruning';
import { activeTargets } from '../../shared/rewrite/targets';
import type { Nutrients } from '../../shared/nutrition';

const rows = activeTargets({ proteinMinG: 30, kcalMax: 500 }).map((t) => t.row);
const withFat = activeTargets({ proteinMinG: 30, kcalMax: 500, fatMaxG: 20 }).map((t) => t.row);

function food(kcal: number, proteinG: number, fatG = 0, extra: Partial<PrunableCandidate> = {}): PrunableCandidate {
  const per100g: Nutrients = { kcal, proteinG, fatG, satFatG: 0, carbsG: 0, fiberG: 0, sugarG: 0, sodiumMg: 0 };
  return { per100g, densityGPerMl: 1, centreMl: 200, cost: 2, original: false, ...extra };
}

describe('dominance pruning of candidates', () => {
  const original = food(250, 17, 20, { original: true, cost: 0 });

  it('drops a candidate with less protein and more kcal per mL than another of equal cost', () => {
    expect(keptCandidates([original, food(150, 19), food(180, 18)], rows)).toEqual([0, 1]);
  });

  it('compares per mL, not per 100 g: a denser food carries more of everything per mL', () => {
    const light = food(100, 10, 0, { densityGPerMl: 0.5 });
    const dense = food(100, 10, 0, { densityGPerMl: 1 });
    // Per mL the dense food has twice the protein and twice the kcal: neither is better.
    expect(keptCandidates([original, light, dense], rows)).toEqual([0, 1, 2]);
  });

  it('only counts the nutrients that have targets', () => {
    const leanerFat = food(160, 18, 1);
    const fatty = food(150, 19, 15);
    expect(keptCandidates([original, leanerFat, fatty], rows)).toEqual([0, 2]);
    expect(keptCandidates([original, leanerFat, fatty], withFat)).toEqual([0, 1, 2]);
  });

  it('never drops the original, and keeps one of two equal candidates', () => {
    const weak = food(400, 5, 30, { original: true, cost: 0 });
    expect(keptCandidates([weak, food(100, 20), food(100, 20)], rows)).toEqual([0, 1]);
  });

  it('keeps a candidate that is cheaper in the closest objective or centred elsewhere', () => {
    const unapproved = food(100, 25);
    const approved = food(120, 20, 0, { cost: 1 });
    const otherCentre = food(130, 19, 0, { centreMl: 160 });
    expect(keptCandidates([original, unapproved, approved, otherCentre], rows)).toEqual([0, 1, 2, 3]);
    // The approved swap itself beats a worse unapproved one.
    expect(keptCandidates([original, approved, food(130, 19)], rows)).toEqual([0, 1]);
  });
});
