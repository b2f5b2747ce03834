import { describe, expect, it } from 'vitest';
import solver from 'javascript-lp-solver';
import { buildRewriteModel } from '../../shared/rewrite/build-model';
import { findViolations, fixVariables, objectiveValue, scaleRows, type LpModel } from '../../shared/rewrite/lp-model';
import { guarded, SolverStalled } from '../../shared/rewrite/pivot-guard';
import { solveLp } from '../../shared/rewrite/solve-lp';
import { randomProblem } from '../helpers/random-rewrite-problems';

const model: LpModel = {
  optimize: 'cost',
  opType: 'min',
  constraints: { need: { min: 10 }, cap: { max: 8 }, band: { min: 1, max: 3 } },
  variables: {
    a: { need: 2, cap: 1, cost: 3, band: 1 },
    b: { need: 1, cap: 1, cost: 1 },
    k: { need: 1, cost: 2 },
  },
  ints: { k: 1 },
};

describe('checking what the solver returns', () => {
  it('finds rows out of bounds, negative values and fractional integers', () => {
    expect(findViolations(model, { a: 2, b: 6, k: 0 })).toEqual([]);
    const found = findViolations(model, { a: 4, b: 5, k: 0.5 });
    expect(found.some((v) => v.startsWith('cap:'))).toBe(true);
    expect(found.some((v) => v.startsWith('band:'))).toBe(true);
    expect(found.some((v) => v.startsWith('k:') && v.includes('not integral'))).toBe(true);
    expect(findViolations(model, { a: 2, b: 6.1, k: -1 }).some((v) => v.startsWith('k:') && v.includes('< 0'))).toBe(true);
  });

  it('allows 1e-6 of the bound size, no more', () => {
    expect(findViolations(model, { a: 2, b: 6 + 7.9e-6, k: 0 }).filter((v) => v.startsWith('cap'))).toEqual([]);
    expect(findViolations(model, { a: 2, b: 6 + 8.1e-6, k: 0 }).filter((v) => v.startsWith('cap'))).toHaveLength(1);
  });

  it('fixing variables moves their share into the bounds and the objective constant', () => {
    const { model: reduced, objectiveConstant, violations } = fixVariables(model, { k: 2 });
    expect(violations).toEqual([]);
    expect(reduced.variables.k).toBeUndefined();
    expect(reduced.constraints.need).toEqual({ min: 8 });
    expect(objectiveConstant).toBe(4);
    expect(reduced.ints).toBeUndefined();
    // A row left with no variables is judged on the spot.
    expect(fixVariables(model, { a: 5, b: 5 }).violations.some((v) => v.startsWith('cap:'))).toBe(true);
  });

  it('scaling rows leaves the optimum where it was', () => {
    const p = randomProblem(7);
    const { model: m } = buildRewriteModel(p.lines, p.targets, p.servings, p.options);
    const plain = solveLp(m);
    const scaled = solveLp(scaleRows(m));
    expect(plain.status).toBe('optimal');
    expect(scaled.status).toBe('optimal');
    expect(objectiveValue(m, scaled.values)).toBeCloseTo(plain.objective, 6);
    expect(findViolations(m, scaled.values)).toEqual([]);
  });
});

describe('solveLp', () => {
  it('solves, recomputes the objective from the values and reports how', () => {
    const r = solveLp(model);
    expect(r.status).toBe('optimal');
    expect(r.objective).toBe(objectiveValue(model, r.values));
    expect(findViolations(model, r.values)).toEqual([]);
    // By hand: b = 8 − a is cheapest, so need is a + 8 + k ≥ 10 and cost 2(a + k) + 8 ≥ 12.
    expect(r.objective).toBeCloseTo(12, 9);
    expect(r.route).toBe('direct');
  });

  it('tells infeasible from unbounded', () => {
    expect(solveLp({ ...model, constraints: { ...model.constraints, cap: { max: 0 }, band: { min: 1 } } }).status).toBe('infeasible');
    expect(solveLp({ optimize: 'gain', opType: 'max', constraints: { floor: { min: 1 } }, variables: { x: { gain: 1, floor: 1 } } }).status).toBe('unbounded');
  });
});

describe('pivot guard', () => {
  it('stops a simplex that runs past its deadline', () => {
    const p = randomProblem(11, { lines: 20, candidates: 8 });
    const { model: m } = buildRewriteModel(p.lines, p.targets, p.servings, p.options);
    expect(() => guarded(-1, () => solver.Solve({ ...m, options: { presolve: false } }))).toThrow(SolverStalled);
  });

  it('leaves solves outside it alone', () => {
    expect(guarded(10_000, () => (solver.Solve(model) as { feasible: boolean }).feasible)).toBe(true);
    expect((solver.Solve(model) as { feasible: boolean }).feasible).toBe(true);
  });
});
