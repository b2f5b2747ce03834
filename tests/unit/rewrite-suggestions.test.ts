import { describe, expect, it } from 'vitest';
import { nutrientsForGrams, sumNutrients } from '../../shared/nutrition';
import { applySuggestion, solveRewrite } from '../../shared/rewrite/solve-rewrite';
import type { InfeasibleRewrite } from '../../shared/rewrite/types';
import { randomProblem } from '../helpers/random-rewrite-problems';

// Seeds chosen only for having protein and calories both out of reach; budgets far beyond need.
const problems = Array.from({ length: 60 }, (_, i) => randomProblem(300 + i)).map((p) => ({ ...p, options: { ...p.options, timeoutMs: 60_000 } }));
const both = problems.flatMap((p) => {
  const r = solveRewrite(p.lines, p.targets, p.servings, p.options);
  return r.status === 'infeasible' && r.binding.includes('proteinMinG') && r.binding.includes('kcalMax') ? [{ p, r: r as InfeasibleRewrite }] : [];
});

describe('"both targets out of reach" suggestions', () => {
  it('has problems where protein and calories both bind', () => {
    expect(both.length).toBeGreaterThanOrEqual(3);
  });

  it('the combined suggestion never asks for less protein than the dish as written gives', () => {
    let checked = 0;
    for (const { p, r } of both) {
      const s = r.suggestions.find((x) => x.kind === 'targets');
      expect(s, `seed ${p.seed}`).toBeDefined();
      const written = sumNutrients(p.lines.map((l) => nutrientsForGrams(l.candidates.find((c) => c.original)!.per100g, Math.max(0, l.grams))));
      const writtenProtein = written.proteinG / p.servings;
      const floor = s!.targets!.proteinMinG ?? p.targets.proteinMinG;
      // rounded down to the 0.1 g or 1 g a floor is shown with
      expect(floor, `seed ${p.seed}`).toBeGreaterThanOrEqual(Math.min(p.targets.proteinMinG, writtenProtein) - 1);
      checked += 1;
    }
    expect(checked).toBeGreaterThan(0);
  });

  it('every suggestion, applied, gives a plan', () => {
    for (const { p, r } of both) {
      for (const s of r.suggestions) {
        const { targets, options } = applySuggestion(p.targets, p.options, s);
        expect(solveRewrite(p.lines, targets, p.servings, options).status, `seed ${p.seed}: ${s.message}`).toBe('optimal');
      }
    }
  });
});
