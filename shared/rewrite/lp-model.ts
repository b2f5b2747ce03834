import type { ConstraintBound, Model } from 'javascript-lp-solver';

/**
 * The JSON model javascript-lp-solver reads. Every variable is ≥ 0 unless listed in `unrestricted`;
 * a variable's coefficient keyed by the `optimize` attribute is its objective cost, keyed by a
 * constraint name its row coefficient.
 */
export type LpModel = Model;
export type LpBound = ConstraintBound;

/** How far a value may sit outside its bound, scaled by the bound's size: 1e-6 × max(1, |bound|). */
export const FEASIBILITY_TOLERANCE = 1e-6;

function slackAllowance(bound: number, tol: number): number {
  return tol * Math.max(1, Math.abs(bound));
}

export function objectiveAttribute(model: LpModel): string {
  if (typeof model.optimize !== 'string') {
    throw new Error('only single-objective models are supported');
  }
  return model.optimize;
}

/** Explicit constraint bounds; rejects the forms this project never writes (relaxed or string bounds). */
export function constraintBounds(model: LpModel, name: string): { min?: number; max?: number } {
  const raw = model.constraints[name];
  if (typeof raw !== 'object' || raw === null) throw new Error(`constraint ${name}: bound must be an object`);
  if (raw.weight !== undefined || raw.priority !== undefined) {
    throw new Error(`constraint ${name}: relaxed constraints are not supported`);
  }
  if (raw.equal !== undefined) return { min: raw.equal, max: raw.equal };
  return { min: raw.min, max: raw.max };
}

export function isIntegerVariable(model: LpModel, name: string): boolean {
  return Boolean(model.ints?.[name]) || Boolean(model.binaries?.[name]);
}

/** Row activities Σ coefficient × value for every constraint. */
export function constraintActivities(model: LpModel, values: Record<string, number>): Record<string, number> {
  const objective = objectiveAttribute(model);
  const activity: Record<string, number> = {};
  for (const name of Object.keys(model.constraints)) activity[name] = 0;
  for (const [variable, coefficients] of Object.entries(model.variables)) {
    const value = values[variable] ?? 0;
    if (value === 0) continue;
    for (const [row, coefficient] of Object.entries(coefficients)) {
      if (row !== objective && row in activity) activity[row] += coefficient * value;
    }
  }
  return activity;
}

export function objectiveValue(model: LpModel, values: Record<string, number>): number {
  const objective = objectiveAttribute(model);
  let total = 0;
  for (const [variable, coefficients] of Object.entries(model.variables)) {
    const cost = coefficients[objective];
    if (cost) total += cost * (values[variable] ?? 0);
  }
  return total;
}

/**
 * Every way `values` breaks the model: rows outside their bounds, negative non-free variables,
 * binaries above 1 and integer variables off an integer, each beyond `tol` (scaled as above).
 */
export function findViolations(model: LpModel, values: Record<string, number>, tol = FEASIBILITY_TOLERANCE): string[] {
  const violations: string[] = [];
  const activity = constraintActivities(model, values);
  for (const name of Object.keys(model.constraints)) {
    const { min, max } = constraintBounds(model, name);
    const a = activity[name];
    if (min !== undefined && a < min - slackAllowance(min, tol)) violations.push(`${name}: ${a} < ${min}`);
    if (max !== undefined && a > max + slackAllowance(max, tol)) violations.push(`${name}: ${a} > ${max}`);
  }
  for (const variable of Object.keys(model.variables)) {
    const v = values[variable] ?? 0;
    if (!model.unrestricted?.[variable] && v < -tol) violations.push(`${variable}: ${v} < 0`);
    if (model.binaries?.[variable] && v > 1 + tol) violations.push(`${variable}: ${v} > 1`);
    if (isIntegerVariable(model, variable) && Math.abs(v - Math.round(v)) > tol) {
      violations.push(`${variable}: ${v} is not integral`);
    }
  }
  return violations;
}

/**
 * The same model with some variables fixed at given values: their columns are removed and
 * their contributions moved into the row bounds. Returns the objective's constant part too.
 */
export function fixVariables(
  model: LpModel,
  fixed: Record<string, number>,
  tol = FEASIBILITY_TOLERANCE,
): { model: LpModel; objectiveConstant: number; violations: string[] } {
  const objective = objectiveAttribute(model);
  const shift: Record<string, number> = {};
  let objectiveConstant = 0;
  const variables: LpModel['variables'] = {};
  for (const [variable, coefficients] of Object.entries(model.variables)) {
    if (!(variable in fixed)) {
      variables[variable] = coefficients;
      continue;
    }
    const value = fixed[variable];
    for (const [row, coefficient] of Object.entries(coefficients)) {
      if (row === objective) objectiveConstant += coefficient * value;
      else shift[row] = (shift[row] ?? 0) + coefficient * value;
    }
  }
  const stillUsed = new Set<string>();
  for (const coefficients of Object.values(variables)) {
    for (const [row, coefficient] of Object.entries(coefficients)) if (coefficient !== 0) stillUsed.add(row);
  }
  // A row left with no variables is checked here, with the tolerance, instead of being handed to the
  // solver as an exact 0 ≤ rhs that rounding error could make infeasible.
  const violations: string[] = [];
  const constraints: LpModel['constraints'] = {};
  for (const name of Object.keys(model.constraints)) {
    const { min, max } = constraintBounds(model, name);
    const s = shift[name] ?? 0;
    if (!stillUsed.has(name)) {
      if (min !== undefined && s < min - slackAllowance(min, tol)) violations.push(`${name}: ${s} < ${min}`);
      if (max !== undefined && s > max + slackAllowance(max, tol)) violations.push(`${name}: ${s} > ${max}`);
      continue;
    }
    const bound: LpBound = {};
    if (min !== undefined && min === max) bound.equal = min - s;
    else {
      if (min !== undefined) bound.min = min - s;
      if (max !== undefined) bound.max = max - s;
    }
    constraints[name] = bound;
  }
  const keep = (set: Record<string, unknown> | undefined) =>
    set ? Object.fromEntries(Object.entries(set).filter(([v]) => !(v in fixed) && v in variables)) : undefined;
  const { ints: _ints, binaries: _binaries, unrestricted: _unrestricted, ...rest } = model;
  const out: LpModel = { ...rest, constraints, variables };
  const ints = keep(model.ints);
  const binaries = keep(model.binaries);
  const unrestricted = keep(model.unrestricted);
  if (ints && Object.keys(ints).length) out.ints = ints as LpModel['ints'];
  if (binaries && Object.keys(binaries).length) out.binaries = binaries as LpModel['binaries'];
  if (unrestricted && Object.keys(unrestricted).length) out.unrestricted = unrestricted as LpModel['unrestricted'];
  return { model: out, objectiveConstant, violations };
}

/**
 * The same model with every row divided by its largest coefficient magnitude: the same solutions
 * and objective, but a different pivoting path for javascript-lp-solver (used when it cycles).
 */
export function scaleRows(model: LpModel): LpModel {
  const objective = objectiveAttribute(model);
  const scale: Record<string, number> = {};
  for (const column of Object.values(model.variables)) {
    for (const [row, c] of Object.entries(column)) {
      if (row !== objective && row in model.constraints) scale[row] = Math.max(scale[row] ?? 0, Math.abs(c));
    }
  }
  const factor = (row: string) => (scale[row] > 0 ? scale[row] : 1);
  const constraints: LpModel['constraints'] = {};
  for (const name of Object.keys(model.constraints)) {
    const { min, max } = constraintBounds(model, name);
    const f = factor(name);
    constraints[name] =
      min !== undefined && min === max ? { equal: min / f } : { min: min === undefined ? undefined : min / f, max: max === undefined ? undefined : max / f };
    if (min === undefined) delete (constraints[name] as LpBound).min;
    if (max === undefined) delete (constraints[name] as LpBound).max;
  }
  const variables: LpModel['variables'] = {};
  for (const [variable, column] of Object.entries(model.variables)) {
    variables[variable] = Object.fromEntries(
      Object.entries(column).map(([row, c]) => [row, row !== objective && row in model.constraints ? c / factor(row) : c]),
    );
  }
  return { ...model, constraints, variables };
}

/** The same model with its columns in reverse order: another pivoting path when the simplex cycles. */
export function reverseColumns(model: LpModel): LpModel {
  return { ...model, variables: Object.fromEntries(Object.entries(model.variables).reverse()) };
}
