import { describe, expect, it } from 'vitest';
import type { LpModel } from '../../shared/rewrite/lp-model';
import { toLpFormat } from '../../shared/rewrite/lp-format';
import { solveLp } from '../../shared/rewrite/solve-lp';
import { readStigler } from '../helpers/reference-data';

const reference = readStigler();

/** Dollars per day on each commodity, minimising the total, every nutrient at or above its daily minimum. */
function stiglerModel(): LpModel {
  const constraints: LpModel['constraints'] = {};
  reference.nutrients.forEach((n, j) => (constraints[`n${j}`] = { min: n.dailyMinimum }));
  const variables: LpModel['variables'] = {};
  reference.commodities.forEach((c, i) => {
    const column: Record<string, number> = { dollars: 1 };
    c.perDollar.forEach((amount, j) => {
      if (amount !== 0) column[`n${j}`] = amount;
    });
    variables[`f${i}`] = column;
  });
  return { optimize: 'dollars', opType: 'min', constraints, variables };
}

// G. J. Stigler, "The Cost of Subsistence", J. Farm Econ. 27(2), 1945; optimum by the simplex method.
describe('Stigler diet through the rewrite solver wrapper', () => {
  const model = stiglerModel();
  const solution = solveLp(model);

  it('finds the simplex optimum, $39.6617 a year, within relative 1e-4', () => {
    expect(solution.status).toBe('optimal');
    const annual = solution.objective * 365;
    expect(Math.abs(annual - reference.expected.annualCostDollars) / reference.expected.annualCostDollars).toBeLessThan(1e-4);
    expect(Math.abs(solution.objective - reference.expected.dailyCostDollars) / reference.expected.dailyCostDollars).toBeLessThan(1e-4);
  });

  it('buys exactly the five foods of the optimal basis', () => {
    const bought = reference.commodities.filter((_, i) => solution.values[`f${i}`] > 1e-9).map((c) => c.name);
    expect(bought.sort()).toEqual([...reference.expected.basis].sort());
  });

  it('meets every nutrient minimum', () => {
    reference.nutrients.forEach((n, j) => {
      const got = reference.commodities.reduce((sum, c, i) => sum + c.perDollar[j] * solution.values[`f${i}`], 0);
      expect(got).toBeGreaterThanOrEqual(n.dailyMinimum * (1 - 1e-6));
    });
  });

  it('gives HiGHS the same optimum from the LP text of the same model', async () => {
    const highs = await (await import('highs')).default();
    const result = highs.solve(toLpFormat(model), { output_flag: false } as never);
    expect(result.Status).toBe('Optimal');
    expect(Math.abs(result.ObjectiveValue * 365 - reference.expected.annualCostDollars) / reference.expected.annualCostDollars).toBeLessThan(1e-4);
  });
});
