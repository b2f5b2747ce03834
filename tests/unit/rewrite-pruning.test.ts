import { describe, expect, it } from 'vitest';
import { keptCandidates, type PrunableCandidate } from '../../shared/rewrite/candidate-pruning';
import { activeTargets } from '../../shared/rewrite/targets';
import type { Nutrients } from '../../shared/nutrition';

const rows = activeTargets({ proteinMinG: 30, kcalMax: 500 }).map((t) => t.row);
const withFat = activeTargets({ proteinMinG: 30, kcalMax: 500, fatMaxG: 20 }).map((t) => t.row);

function food(kcal: number, proteinG: number, fatG = 0, extra: Partial<PrunableCandidate> = {}): PrunableCandidate {
  const per100g: Nutrients = { kcal, proteinG, fatG, satFatG: 0, carbsG: 0, fiberG: 0, sugarG: 0, sodiumMg: 0 };
  return { per100g, shape: 'swap|1|1|200', cost: 2, original: false, ...extra };
}

describe('dominance pruning of candidates', () => {
  const original = food(250, 17, 20, { original: true, cost: 0 });

  it('drops a candidate with less protein and more kcal per mL than another of equal cost', () => {
    expect(keptCandidates([original, food(150, 19), food(180, 18)], rows)).toEqual([0, 1]);
  });

  it('compares only candidates of the same shape: density, ratio, band and share decide which plans each allows', () => {
    const denser = food(100, 10, 0, { shape: 'swap|1.2|1|200' });
    const partial = food(90, 12, 0, { shape: 'partial|1|1|200' });
    const same = food(120, 9, 0);
    // Better per gram, but it allows other volumes or other amounts: neither can stand in for the other.
    expect(keptCandidates([original, same, denser, partial], rows)).toEqual([0, 1, 2, 3]);
    expect(keptCandidates([original, same, food(100, 10)], rows)).toEqual([0, 2]);
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
    const otherCentre = food(130, 19, 0, { shape: 'swap|1|0.75|150' });
    expect(keptCandidates([original, unapproved, approved, otherCentre], rows)).toEqual([0, 1, 2, 3]);
    // The approved swap itself beats a worse unapproved one.
    expect(keptCandidates([original, approved, food(130, 19)], rows)).toEqual([0, 1]);
  });
});
