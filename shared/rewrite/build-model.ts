import { nutrientsForGrams, sumNutrients, zeroNutrients, type NutrientKey, type Nutrients } from '../nutrition';
import { keptCandidates } from './candidate-pruning';
import { FEASIBILITY_TOLERANCE, type LpModel } from './lp-model';
import { activeTargets, type TargetRow } from './targets';
import type { Candidate, RewriteLine, RewriteObjective, RewriteOptions, TargetName, Targets } from './types';

export interface ResolvedOptions {
  /** t as a fraction */
  volumeTolerance: number;
  /** a as a fraction */
  lineTolerance: number;
  maxSwaps: number | null;
  objective: RewriteObjective;
  explain: boolean;
  timeoutMs: number;
  pruneDominated: boolean;
}

export function resolveOptions(options: RewriteOptions = {}): ResolvedOptions {
  const pct = (v: number | undefined, fallback: number, name: string) => {
    const value = v ?? fallback;
    if (!Number.isFinite(value) || value < 0 || value >= 100) throw new RangeError(`${name} must be in [0, 100)`);
    return value / 100;
  };
  const maxSwaps = options.maxSwaps ?? null;
  if (maxSwaps !== null && (!Number.isInteger(maxSwaps) || maxSwaps < 0)) {
    throw new RangeError('maxSwaps must be a whole number ≥ 0');
  }
  return {
    volumeTolerance: pct(options.volumeTolerancePct, 10, 'volumeTolerancePct'),
    lineTolerance: pct(options.lineTolerancePct, 25, 'lineTolerancePct'),
    maxSwaps,
    objective: options.objective ?? 'closest',
    explain: options.explain ?? false,
    timeoutMs: options.timeoutMs ?? 2000,
    pruneDominated: options.pruneDominated ?? true,
  };
}

/**
 * One candidate of a free line as it appears in the model. Amounts are written as deviations from
 * the recipe as written (see buildModel): grams = centre − below + above, for a swap only when y = 1.
 */
export interface CandidateSlot {
  candidate: Candidate;
  /** index in line.candidates */
  position: number;
  original: boolean;
  /** binary "this swap is made"; the original has none (it is kept when no swap is made) */
  y?: string;
  /** grams below the band centre */
  below: string;
  /** grams above the band centre */
  above: string;
  /** ρ used in the model; the original food's comes from the line itself (grams ÷ volumeMl) */
  densityGPerMl: number;
  /** V_i, or V_i·r for an approved swap with volume ratio r */
  centreMl: number;
  centreGrams: number;
  /** a·centreGrams: how far grams may go either way */
  spanGrams: number;
  /** rank for pruning: 0 original, 1 approved swap, 2 unapproved swap */
  rank: number;
}

export interface LineSlot {
  line: RewriteLine;
  /** position in the lines array */
  position: number;
  original: Candidate;
  /** fixed lines (locked, no grams or no volume) are constants, with no slots */
  fixed: boolean;
  /** the original's slot first */
  slots: CandidateSlot[];
  /** candidates left out because another one is never worse */
  pruned: Candidate[];
}

/** What the builder wants optimised; the last four serve the infeasibility analysis. */
export type ModelObjective =
  | { kind: RewriteObjective }
  | { kind: 'slack' }
  | { kind: 'nutrient'; key: NutrientKey; sense: 'min' | 'max' }
  | { kind: 'swaps' }
  | { kind: 'dish-volume' };

export type TargetMode = 'hard' | 'elastic' | 'off';

export interface ModelVariant {
  objective: ModelObjective;
  /** how each target enters (default hard) */
  targetModes?: Partial<Record<TargetName, TargetMode>>;
  /** overrides options.maxSwaps; null for no limit */
  maxSwaps?: number | null;
  /** overrides a target's value */
  targetValues?: Partial<Targets>;
  /** an extra row bounding the weighted slack (second stage of the elastic solve) */
  slackCap?: number;
}

export interface ClosestWeights {
  /** cost of an unapproved swap */
  swap: number;
  /** cost of a coach-approved swap */
  approvedSwap: number;
  /** cost per mL of volume away from the band centre */
  perMl: number;
}

export interface RewriteModelMeta {
  lines: LineSlot[];
  servings: number;
  targets: Targets;
  options: ResolvedOptions;
  variant: ModelVariant;
  /** per-serving nutrients of the recipe as written */
  writtenPerServing: Nutrients;
  /** per-serving nutrients of the fixed lines */
  constantPerServing: Nutrients;
  constantVolumeMl: number;
  /** ΣV over all lines */
  originalVolumeMl: number;
  volumeRangeMl: [number, number];
  weights: ClosestWeights;
  /** slack variable per elastic target, with its weight */
  slack: Partial<Record<TargetName, { variable: string; weight: number }>>;
  /** the objective's constant part, so that solver objective + constant = the plan's value */
  objectiveConstant: number;
  /** the dish-volume deviation variable ('dish-volume' objective) */
  dishDeviation?: string;
}

export interface BuiltRewriteModel {
  model: LpModel;
  variables: RewriteModelMeta;
}

const SWAP_COST = 1000;

function originalOf(line: RewriteLine): Candidate {
  const originals = line.candidates.filter((c) => c.original);
  if (originals.length !== 1) throw new RangeError(`line ${line.index}: needs exactly one original candidate`);
  return originals[0];
}

function isFixed(line: RewriteLine): boolean {
  return line.locked || !(line.grams > 0) || !(line.volumeMl > 0);
}

function usable(c: Candidate): boolean {
  return c.original === true || (Number.isFinite(c.densityGPerMl) && c.densityGPerMl > 0);
}

/**
 * Weights of the 'closest' objective, chosen so that its order is lexicographic:
 * fewest swaps first, then approved swaps before unapproved ones, then the smallest volume changes.
 * With at most k swaps possible, an approved swap costs S − δ and an unapproved one S, δ = S/(k+1),
 * and all volume change together costs at most δ/2 (λ = δ / (2·Dmax), Dmax the largest total
 * deviation the line bands allow). Then n swaps always cost less than n + 1 (n·S + δ/2 < (n+1)(S − δ)
 * for n < k), at equal swap counts one more approved swap saves δ, more than any volume term.
 * (Fixed costs like 1000 and 600 would not do this: four approved swaps, 2400, would beat three
 * unapproved ones, 3000.)
 */
function closestWeights(lines: LineSlot[], maxSwaps: number | null, lineTolerance: number): ClosestWeights {
  const swappable = lines.filter((l) => l.slots.some((s) => !s.original)).length;
  const k = Math.max(1, Math.min(swappable, maxSwaps ?? swappable));
  const delta = SWAP_COST / (k + 1);
  const maxDeviation = lines.reduce(
    (sum, l) => sum + Math.max(0, ...l.slots.map((s) => lineTolerance * s.centreMl)),
    0,
  );
  return { swap: SWAP_COST, approvedSwap: SWAP_COST - delta, perMl: maxDeviation > 0 ? delta / (2 * maxDeviation) : 0 };
}

function lineSlots(lines: RewriteLine[], options: ResolvedOptions, rows: readonly TargetRow[]): LineSlot[] {
  const a = options.lineTolerance;
  return lines.map((line, position) => {
    const original = originalOf(line);
    if (isFixed(line)) return { line, position, original, fixed: true, slots: [], pruned: [] };
    const all = line.candidates.flatMap((candidate, j): CandidateSlot[] => {
      if (!usable(candidate)) return [];
      const isOriginal = candidate.original === true;
      const densityGPerMl = isOriginal ? line.grams / line.volumeMl : candidate.densityGPerMl;
      const ratio = !isOriginal && candidate.approved?.volumeRatio ? candidate.approved.volumeRatio : 1;
      const centreMl = line.volumeMl * ratio;
      const centreGrams = isOriginal ? line.grams : centreMl * densityGPerMl;
      return [
        {
          candidate,
          position: j,
          original: isOriginal,
          y: isOriginal ? undefined : `y_${position}_${j}`,
          below: `b_${position}_${j}`,
          above: `h_${position}_${j}`,
          densityGPerMl,
          centreMl,
          centreGrams,
          spanGrams: a * centreGrams,
          rank: isOriginal ? 0 : candidate.approved ? 1 : 2,
        },
      ];
    });
    all.sort((p, q) => p.rank - q.rank);
    const keep = options.pruneDominated
      ? new Set(
          keptCandidates(
            all.map((s) => ({ ...s, per100g: s.candidate.per100g, cost: s.rank })),
            rows,
          ),
        )
      : new Set(all.map((_, i) => i));
    return {
      line,
      position,
      original,
      fixed: false,
      slots: all.filter((_, i) => keep.has(i)),
      pruned: all.filter((_, i) => !keep.has(i)).map((s) => s.candidate),
    };
  });
}

/**
 * A row no free variable enters (every line fixed) is a constant 0 against its bounds: dropped when
 * 0 meets them, kept when not, so that both solvers see the same infeasible row.
 */
function dropEmptyRows(constraints: LpModel['constraints'], variables: LpModel['variables']): void {
  const used = new Set<string>();
  for (const column of Object.values(variables)) for (const row of Object.keys(column)) used.add(row);
  for (const [name, bound] of Object.entries(constraints)) {
    if (used.has(name) || typeof bound !== 'object') continue;
    const lo = bound.equal ?? bound.min;
    const hi = bound.equal ?? bound.max;
    const fits = (lo === undefined || lo <= FEASIBILITY_TOLERANCE * Math.max(1, Math.abs(lo))) &&
      (hi === undefined || hi >= -FEASIBILITY_TOLERANCE * Math.max(1, Math.abs(hi)));
    if (fits) delete constraints[name];
  }
}

function add(column: Record<string, number>, row: string, value: number): void {
  if (value !== 0) column[row] = (column[row] ?? 0) + value;
}

/**
 * The rewrite as a javascript-lp-solver JSON model (PRODUCT.md "The computation", step 6), written
 * as changes to the recipe as written so that the all-zero start is the written recipe.
 *
 * The product's model, for free line i and candidate c: binary y_ic, grams x_ic, Σ_c y_ic = 1,
 * (1−a)·C_ic·ρ_c·y_ic ≤ x_ic ≤ (1+a)·C_ic·ρ_c·y_ic (C_ic = V_i, or V_i·r for an approved swap),
 * dish volume Σ x_ic/ρ_c within (1 ± t)·ΣV, per-serving targets, Σ_{c swapped} y_ic ≤ M.
 * Here it is the same model after two exact substitutions:
 *  - y_i,original = 1 − Σ_{c≠original} y_ic, so "one food per line" is Σ_{c≠original} y_ic ≤ 1;
 *  - x_ic = centre_ic·y_ic − b_ic + h_ic with 0 ≤ b_ic, h_ic ≤ a·centre_ic·y_ic (grams below and
 *    above the band centre); for the original centre = the written grams and y the keep-indicator.
 * |volume change| of a line is (b + h)/ρ at the optimum of 'closest' (which pays for both, so never
 * uses both at once): the deviation variables d_ic of the product's model are not needed.
 * Why: javascript-lp-solver starts its simplex at all zeros; from x = 0 its phase 1 has to repair
 * every line's Σy = 1 and the dish volume at once and, on these degenerate rows, its pivoting
 * can blow up numerically. From the written recipe only the unmet targets need repair.
 * Fixed lines (locked, no grams, no volume) are constants on the right-hand sides.
 */
export function buildModel(
  lines: RewriteLine[],
  targets: Targets,
  servings: number,
  options: ResolvedOptions,
  variant: ModelVariant = { objective: { kind: options.objective } },
): BuiltRewriteModel {
  if (!(servings > 0)) throw new RangeError('servings must be > 0');
  const effectiveTargets: Targets = { ...targets, ...variant.targetValues };
  const active = activeTargets(effectiveTargets);
  const modes = variant.targetModes ?? {};
  const slots = lineSlots(lines, options, activeTargets(targets).map((t) => t.row));
  const maxSwaps = variant.maxSwaps === undefined ? options.maxSwaps : variant.maxSwaps;
  const weights = closestWeights(slots, maxSwaps, options.lineTolerance);
  const objective = variant.objective;

  const writtenTotals = sumNutrients(slots.map((l) => nutrientsForGrams(l.original.per100g, Math.max(0, l.line.grams))));
  const writtenPerServing = zeroNutrients();
  for (const k of Object.keys(writtenTotals) as NutrientKey[]) writtenPerServing[k] = writtenTotals[k] / servings;
  const fixedTotals = sumNutrients(slots.filter((l) => l.fixed).map((l) => nutrientsForGrams(l.original.per100g, Math.max(0, l.line.grams))));
  const constantPerServing = zeroNutrients();
  for (const k of Object.keys(fixedTotals) as NutrientKey[]) constantPerServing[k] = fixedTotals[k] / servings;
  const volumeOf = (l: LineSlot) => (l.line.volumeMl > 0 ? l.line.volumeMl : 0);
  const constantVolumeMl = slots.filter((l) => l.fixed).reduce((s, l) => s + volumeOf(l), 0);
  const originalVolumeMl = slots.reduce((s, l) => s + volumeOf(l), 0);
  const t = options.volumeTolerance;
  const volumeRangeMl: [number, number] = [(1 - t) * originalVolumeMl, (1 + t) * originalVolumeMl];

  const constraints: LpModel['constraints'] = {};
  const variables: LpModel['variables'] = {};
  const ints: Record<string, 1> = {};
  const OBJ = 'objective';
  const free = slots.filter((l) => !l.fixed);

  const objectiveKey: NutrientKey | null =
    objective.kind === 'max-protein' ? 'proteinG' : objective.kind === 'min-kcal' ? 'kcal' : objective.kind === 'nutrient' ? objective.key : null;
  const maximise = objective.kind === 'max-protein' || (objective.kind === 'nutrient' && objective.sense === 'max');
  const objectiveConstant = objectiveKey ? writtenPerServing[objectiveKey] : 0;
  const rowsInModel = active.filter(({ row }) => (modes[row.target] ?? 'hard') !== 'off').map((t) => t.row);
  const volumeRows = objective.kind === 'dish-volume' ? ['vol_over', 'vol_under'] : ['volume'];

  /** Adds the effect of `grams` more of a food (per gram of it) to a column: nutrients, volume, objective. */
  const addFood = (column: Record<string, number>, food: Candidate, density: number, grams: number) => {
    for (const row of rowsInModel) add(column, row.row, (food.per100g[row.key] / 100 / servings) * grams);
    for (const row of volumeRows) add(column, row, grams / density);
    if (objectiveKey) add(column, OBJ, (food.per100g[objectiveKey] / 100 / servings) * grams);
  };

  for (const l of free) {
    const [orig, ...swaps] = l.slots;
    const pick = `pick_${l.position}`;
    const keepBelow = `kb_${l.position}`;
    const keepAbove = `ka_${l.position}`;
    // b, h ≤ a·written·y_original = a·written·(1 − Σ y_swap)
    constraints[keepBelow] = { max: orig.spanGrams };
    constraints[keepAbove] = { max: orig.spanGrams };
    const below: Record<string, number> = { [keepBelow]: 1 };
    const above: Record<string, number> = { [keepAbove]: 1 };
    addFood(below, orig.candidate, orig.densityGPerMl, -1);
    addFood(above, orig.candidate, orig.densityGPerMl, 1);
    if (objective.kind === 'closest') {
      add(below, OBJ, weights.perMl / orig.densityGPerMl);
      add(above, OBJ, weights.perMl / orig.densityGPerMl);
    }
    variables[orig.below] = below;
    variables[orig.above] = above;
    if (swaps.length) constraints[pick] = { max: 1 };

    for (const s of swaps) {
      const y: Record<string, number> = { [pick]: 1, [keepBelow]: orig.spanGrams, [keepAbove]: orig.spanGrams };
      // choosing the swap removes the written food and adds the swap at its centre
      addFood(y, orig.candidate, orig.densityGPerMl, -orig.centreGrams);
      addFood(y, s.candidate, s.densityGPerMl, s.centreGrams);
      add(y, 'swaps', 1);
      if (objective.kind === 'swaps') add(y, OBJ, 1);
      if (objective.kind === 'closest') add(y, OBJ, s.candidate.approved ? weights.approvedSwap : weights.swap);
      const sb = `sb_${l.position}_${s.position}`;
      const sa = `sa_${l.position}_${s.position}`;
      add(y, sb, -s.spanGrams);
      add(y, sa, -s.spanGrams);
      constraints[sb] = { max: 0 };
      constraints[sa] = { max: 0 };
      const b: Record<string, number> = { [sb]: 1 };
      const h: Record<string, number> = { [sa]: 1 };
      addFood(b, s.candidate, s.densityGPerMl, -1);
      addFood(h, s.candidate, s.densityGPerMl, 1);
      if (objective.kind === 'closest') {
        add(b, OBJ, weights.perMl / s.densityGPerMl);
        add(h, OBJ, weights.perMl / s.densityGPerMl);
      }
      variables[s.y!] = y;
      variables[s.below] = b;
      variables[s.above] = h;
      ints[s.y!] = 1;
    }
  }

  if (free.length) {
    // Dish volume as a change from the written ΣV.
    if (objective.kind === 'dish-volume') {
      constraints.vol_over = { max: 0 };
      constraints.vol_under = { min: 0 };
      variables.dish_dev = { vol_over: -1, vol_under: 1, [OBJ]: 1 };
    } else {
      constraints.volume = { min: volumeRangeMl[0] - originalVolumeMl, max: volumeRangeMl[1] - originalVolumeMl };
    }
  }

  const slack: RewriteModelMeta['slack'] = {};
  for (const { row, value } of active) {
    const mode = modes[row.target] ?? 'hard';
    if (mode === 'off') continue;
    const rhs = value - writtenPerServing[row.key];
    constraints[row.row] = row.sense === 'min' ? { min: rhs } : { max: rhs };
    if (mode === 'elastic') {
      // Slack in relative units, so a 10 % protein shortfall weighs as much as 10 % too many kcal.
      const variable = `s_${row.row}`;
      const weight = 1 / Math.max(Math.abs(value), 1);
      slack[row.target] = { variable, weight };
      variables[variable] = { [row.row]: row.sense === 'min' ? 1 : -1 };
      if (objective.kind === 'slack') variables[variable][OBJ] = weight;
      if (variant.slackCap !== undefined) variables[variable].slack_cap = weight;
    }
  }
  if (variant.slackCap !== undefined) constraints.slack_cap = { max: variant.slackCap };

  const anySwap = Object.keys(ints).length > 0;
  if (maxSwaps !== null && anySwap && objective.kind !== 'swaps') constraints.swaps = { max: maxSwaps };

  if (Object.keys(variables).length === 0) {
    // Nothing is free: a constant placeholder keeps the model well formed.
    variables.none = { [OBJ]: 0 };
  }
  dropEmptyRows(constraints, variables);
  const model: LpModel = { optimize: OBJ, opType: maximise ? 'max' : 'min', constraints, variables, ints };
  return {
    model,
    variables: {
      lines: slots,
      servings,
      targets: effectiveTargets,
      options,
      variant,
      writtenPerServing,
      constantPerServing,
      constantVolumeMl,
      originalVolumeMl,
      volumeRangeMl,
      weights,
      slack,
      objectiveConstant,
      dishDeviation: objective.kind === 'dish-volume' && free.length ? 'dish_dev' : undefined,
    },
  };
}

/** The model solved for `solveRewrite`, with a map to read its solution back. */
export function buildRewriteModel(
  lines: RewriteLine[],
  targets: Targets,
  servings: number,
  options: RewriteOptions = {},
): BuiltRewriteModel {
  return buildModel(lines, targets, servings, resolveOptions(options));
}
