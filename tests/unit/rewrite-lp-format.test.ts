import { describe, expect, it } from 'vitest';
import { toLpFormat } from '../../shared/rewrite/lp-format';
import type { LpModel } from '../../shared/rewrite/lp-model';
import { solveLp } from '../../shared/rewrite/solve-lp';
import { solveWithHighs, relativeGap } from '../helpers/random-rewrite-problems';

const small: LpModel = {
  optimize: 'profit',
  opType: 'max',
  constraints: {
    wood: { max: 300 },
    labor: { max: 110 },
    mix: { min: 2, max: 40 },
    pair: { equal: 3 },
  },
  variables: {
    table: { wood: 30, labor: 5, profit: 1200, mix: 1 },
    dresser: { wood: 20, labor: 10, profit: 1600, mix: 1 },
    shelf: { wood: 0.30000000000000004, profit: -1, pair: 1 },
    spare: { pair: 1, profit: 0.1 },
  },
  ints: { table: 1, dresser: 1 },
  binaries: { spare: 1 },
};

describe('toLpFormat', () => {
  const text = toLpFormat(small);

  it('writes the CPLEX LP sections in order', () => {
    const order = ['Maximize', 'Subject To', 'Binaries', 'General', 'End'].map((k) => text.indexOf(`\n${k}\n`));
    expect(order.every((i) => i > 0)).toBe(true);
    expect([...order].sort((a, b) => a - b)).toEqual(order);
  });

  it('splits a two-sided row into ≥ and ≤ rows, keeps equalities, puts integers in their sections', () => {
    expect(text).toContain(' mix: table + dresser >= 2\n');
    expect(text).toContain(' mix_max: table + dresser <= 40\n');
    expect(text).toContain(' pair: shelf + spare = 3\n');
    expect(text).toMatch(/Binaries\n spare\n/);
    expect(text).toMatch(/General\n table dresser\n/);
  });

  it('writes every coefficient so that it reads back as the same double', () => {
    expect(text).toContain('0.30000000000000004 shelf');
    expect(text).toContain(' obj: 1200 table + 1600 dresser - shelf + 0.1 spare\n');
  });

  it('declares free variables and leaves the rest at their default bound ≥ 0', () => {
    const free = toLpFormat({ ...small, unrestricted: { shelf: 1 } });
    expect(free).toMatch(/Bounds\n shelf free\n/);
    expect(text).not.toContain('Bounds');
  });

  it('refuses names that LP text cannot carry', () => {
    for (const bad of ['2x', 'e1', 'x-y', 'end', 'free']) {
      expect(() => toLpFormat({ ...small, variables: { ...small.variables, [bad]: { wood: 1 } } })).toThrow(/cannot be written/);
    }
  });

  it('wraps long rows onto continuation lines that still parse', async () => {
    const variables: LpModel['variables'] = {};
    for (let i = 0; i < 200; i++) variables[`item_${i}`] = { weight: 1 + (i % 7) / 3, value: 1 + ((i * 37) % 11) };
    const knapsack: LpModel = {
      optimize: 'value',
      opType: 'max',
      constraints: { weight: { max: 50 } },
      variables,
      binaries: Object.fromEntries(Object.keys(variables).map((v) => [v, 1])),
    };
    const lp = toLpFormat(knapsack);
    expect(Math.max(...lp.split('\n').map((l) => l.length))).toBeLessThanOrEqual(255);
    // HiGHS reads the wrapped text and agrees with javascript-lp-solver on the optimum.
    const highs = await solveWithHighs(lp);
    const ours = solveLp(knapsack, { timeoutMs: 60_000 });
    expect(highs.feasible).toBe(true);
    expect(relativeGap(ours.objective, highs.objective)).toBeLessThan(1e-6);
  });

  it('is read by HiGHS as the same model javascript-lp-solver solves', async () => {
    // HiGHS (npm `highs`) as the outside reader of the text.
    const ours = solveLp(small);
    const highs = await solveWithHighs(text);
    expect(ours.status).toBe('optimal');
    expect(highs.feasible).toBe(true);
    expect(relativeGap(ours.objective, highs.objective)).toBeLessThan(1e-6);
  });

  it('keeps an empty row that no plan can meet, so both solvers see the model as infeasible', async () => {
    const impossible: LpModel = { ...small, constraints: { ...small.constraints, never: { min: 1 } } };
    expect(toLpFormat(impossible)).toContain(' never: 0 table >= 1\n');
    expect(solveLp(impossible).status).toBe('infeasible');
    expect((await solveWithHighs(toLpFormat(impossible))).feasible).toBe(false);
  });
});
