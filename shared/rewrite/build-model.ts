import { nutrientsForGrams, sumNutrients, zeroNutrients, type NutrientKey, type Nutrients } from '../nutrition';
import { closestWeights, lineSlots, type CandidateSlot, type ClosestWeights, type LineSlot } from './line-slots';
import { toLpFormat } from './lp-format';
import { FEASIBILITY_TOLERANCE, type LpModel } from './lp-model';
import { resolveOptions, type ResolvedOptions } from './rewrite-options';
import { activeTargets } from './targets';
import type { Candidate, RewriteLine, RewriteObjective, RewriteOptions, TargetName, Targets } from './types';

/** What the builder wants optimised; the last three serve the infeasibility analysis. */
export type ModelObjective =
  { kind: RewriteObjective } | { kind: 'nutrient'; key: NutrientKey; sense: 'min' | 'max' } | { kind: 'swaps' } | { kind: 'dish-volume' };

export interface ModelVariant {
  objective: ModelObjective;
  /**
   * Targets as hard rows (absent) or elastic: every target then has slack, priced at
   * `penaltyFactor` × the objective's scale per unit of relative shortfall, on top of the objective.
   */
  penaltyFactor?: number;
  /** targets left out of the model */
  dropTargets?: TargetName[];
  /** overrides options.maxSwaps; null for no limit */
  maxSwaps?: number | null;
}

/** Slack of one elastic target: shortfall − repair + extra (see buildModel). */
export interface TargetSlack {
  /** how far the written recipe misses the target (per serving, ≥ 0) */
  shortfall: number;
  /** how much of that shortfall the plan makes good (≤ shortfall); absent when it is 0 */
  repair?: string;
  /** shortfall beyond the written recipe's */
  extra: string;
  /** 1 / target: slack is priced in relative units */
  weight: number;
}

export function slackOf(slack: TargetSlack, values: Record<string, number>): number {
  return slack.shortfall - (slack.repair ? (values[slack.repair] ?? 0) : 0) + (values[slack.extra] ?? 0);
}

export interface RewriteModelMeta {
  lines: LineSlot[];
  /** ΣV over all lines */
  originalVolumeMl: number;
  /** mL the keepScale rules let lines give up at most; the volume floor leaves it out */
  permittedCutMl: number;
  /** mL the rules let lines add at most (more vegetables, more of a lean main protein); the ceiling leaves it out */
  permittedAddMl: number;
  volumeRangeMl: [number, number];
  weights: ClosestWeights;
  /** slack per elastic target */
  slack: Partial<Record<TargetName, TargetSlack>>;
  /** the objective's constant part, so that solver objective + constant = the plan's value */
  objectiveConstant: number;
}

export interface BuiltRewriteModel {
  model: LpModel;
  variables: RewriteModelMeta;
}

/** the first slack price tried by solveElastic */
export const FIRST_PENALTY_FACTOR = 1e4;

/**
 * A typical size of the objective's values, so that a slack penalty can be set relative to it:
 * the swap costs for 'closest', the recipe's own value of the nutrient optimised, the swap count,
 * the dish volume.
 */
function objectiveScale(
  objective: ModelObjective,
  weights: ClosestWeights,
  maxSwaps: number | null,
  lines: LineSlot[],
  written: Nutrients,
  volumeMl: number,
): number {
  const swappable = lines.filter((l) => l.slots.length > 1).length;
  switch (objective.kind) {
    case 'closest':
      return weights.swap * (Math.min(swappable, maxSwaps ?? swappable) + 1);
    case 'max-protein':
      return Math.max(1, written.proteinG);
    case 'min-kcal':
      return Math.max(1, written.kcal);
    case 'nutrient':
      return Math.max(1, written[objective.key]);
    case 'swaps':
      return swappable + 1;
    case 'dish-volume':
      return Math.max(1, volumeMl);
  }
}

/**
 * A row no free variable enters (every line fixed) is a constant 0 against its bounds: dropped when
 * 0 meets them, kept when not, so that both solvers see the same infeasible row.
 */
/**
 * mL a rule lets this choice add above the written line: a keepScale's (hi − 1)·G (more vegetables), or
 * a swap band's top above its centre where the band reaches past 1 + t (a mixed dish's lean protein up to
 * ×1.5); a ±10 % band of a 1:1 swap adds nothing the dish's own tolerance does not already hold.
 */
function ruleAdditionMl(slot: CandidateSlot, t: number): number {
  if (slot.kind === 'original') return slot.keepAbove / slot.densityGPerMl;
  const top = slot.lowGrams + slot.widthGrams;
  return top > (1 + t) * slot.centreGrams + 1e-9 ? (top - slot.centreGrams) / slot.densityGPerMl : 0;
}

function dropEmptyRows(constraints: LpModel['constraints'], variables: LpModel['variables']): void {
  const used = new Set<string>();
  for (const column of Object.values(variables)) for (const row of Object.keys(column)) used.add(row);
  for (const [name, bound] of Object.entries(constraints)) {
    if (used.has(name) || typeof bound !== 'object') continue;
    const lo = bound.equal ?? bound.min;
    const hi = bound.equal ?? bound.max;
    const fits =
      (lo === undefined || lo <= FEASIBILITY_TOLERANCE * Math.max(1, Math.abs(lo))) &&
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
 * The product's model, for free line i with written grams G_i and candidate c of mass ratio r_c:
 * binary y_ics, grams x_ics, at most one substitute and share per line, and
 *  - a swap of share s (1 for the whole line; for a partial candidate each of SHARES up to its
 *    maxShare): lo_c·r_c·s·G_i·y_ics ≤ x_ics ≤ hi_c·r_c·s·G_i·y_ics, the written food keeping (1−s)·G_i
 *    ([lo_c, hi_c] the candidate's rule band, else [1−a, 1+a]);
 *  - unswapped, the written food at exactly G_i, or within keepScale_i·G_i where a rule allows;
 * dish volume Σ x/ρ within (1 − t)·ΣV − Σ (1−lo_i)·V_i … (1 + t)·ΣV + Σ_i A_i (a sanity bound that leaves
 * out what rules let lines give up or add: A_i the most line i may add by a rule, (hi_i − 1)·V_i for a
 * keepScale, or a swap band's top above 1 + t times its centre), per-serving targets, Σ y ≤ M, and for
 * 'closest' each line's mL away from its centre (r_c·s·G_i, or G_i) plus the mL of written food a
 * swap gives up (s·G_i/ρ_orig). Here it is the same model after exact substitutions:
 *  - y_i,orig = 1 − Σ y_ics, so Σ y_ics ≤ 1 (row pick_i);
 *  - x_i,orig = G_i·(1 − Σ s·y_ics) − b_i + h_i with b_i ≤ (1−lo)·G_i·y_i,orig and
 *    h_i ≤ (hi−1)·G_i·y_i,orig (rows kb_i, ka_i; b_i and h_i exist only with keepScale);
 *  - x_ics = lo_c·r_c·s·G_i·y_ics + z_ics with z_ics ≤ (hi_c − lo_c)·r_c·s·G_i·y_ics, one row zb each;
 *  - for 'closest', one deviation per line, dev_i ≥ ±[(h_i − b_i)/ρ_orig + Σ (z_ics − (1 − lo_c)·r_c·s·G_i·y_ics)/ρ_c]:
 *    at most one substitute of a line is used, so this is that food's |volume − centre|.
 * Every nutrient, volume and objective row then reads as "change from the written recipe", the
 * written values moving to the right-hand sides. Fixed lines are constants there too.
 * Why: javascript-lp-solver keeps a dense tableau, has no variable bounds (each bound is a row) and
 * starts its simplex at all zeros. Starting from x = 0 its phase 1 had to repair every line's
 * Σy = 1 and the dish volume at once and, on these degenerate rows, its pivoting blew up
 * numerically; from the written recipe only unmet targets need repair, and with elastic targets
 * (below) nothing does. Few rows and columns (about K + 1 rows and 2K columns a line for K swap
 * slots) make each pivot cheaper.
 */
export function buildModel(
  lines: RewriteLine[],
  targets: Targets,
  servings: number,
  options: ResolvedOptions,
  variant: ModelVariant = { objective: { kind: options.objective } },
): BuiltRewriteModel {
  if (!(servings > 0)) throw new RangeError('servings must be > 0');
  const objective = variant.objective;
  const dropped = new Set(variant.dropTargets ?? []);
  const active = activeTargets(targets).filter(({ row }) => !dropped.has(row.target));
  const elastic = variant.penaltyFactor !== undefined;
  const slots = lineSlots(
    lines,
    options,
    activeTargets(targets).map((t) => t.row),
  );
  const maxSwaps = variant.maxSwaps === undefined ? options.maxSwaps : variant.maxSwaps;
  const weights = closestWeights(slots, maxSwaps);

  const writtenTotals = sumNutrients(slots.map((l) => nutrientsForGrams(l.original.per100g, Math.max(0, l.line.grams))));
  const writtenPerServing = zeroNutrients();
  for (const k of Object.keys(writtenTotals) as NutrientKey[]) writtenPerServing[k] = writtenTotals[k] / servings;
  const originalVolumeMl = slots.reduce((s, l) => s + Math.max(0, l.line.volumeMl), 0);
  const t = options.volumeTolerance;
  // What a rule itself lets a line give up (keepScale: half the oil, a third less cheese on top) is
  // taken out by design, so the floor does not make other lines put it back as filler.
  const permittedCutMl = slots.reduce((s, l) => (l.fixed ? s : s + l.slots[0].keepBelow / l.slots[0].densityGPerMl), 0);
  // Likewise what a rule lets a line add (half again the vegetables, up to ×1.5 of a mixed dish's lean
  // protein) is added by design: the ceiling would otherwise cap "×1.5" at whatever the rest of the dish leaves.
  const permittedAddMl = slots.reduce((s, l) => (l.fixed ? s : s + Math.max(0, ...l.slots.map((slot) => ruleAdditionMl(slot, t)))), 0);
  const volumeRangeMl: [number, number] = [(1 - t) * originalVolumeMl - permittedCutMl, (1 + t) * originalVolumeMl + permittedAddMl];

  const constraints: LpModel['constraints'] = {};
  const variables: LpModel['variables'] = {};
  const ints: Record<string, 1> = {};
  const OBJ = 'objective';
  const free = slots.filter((l) => !l.fixed);

  const objectiveKey: NutrientKey | null =
    objective.kind === 'max-protein' ? 'proteinG' : objective.kind === 'min-kcal' ? 'kcal' : objective.kind === 'nutrient' ? objective.key : null;
  const maximise = objective.kind === 'max-protein' || (objective.kind === 'nutrient' && objective.sense === 'max');
  let objectiveConstant = objectiveKey ? writtenPerServing[objectiveKey] : 0;
  const rowsInModel = active.map((t) => t.row);
  const volumeRows = objective.kind === 'dish-volume' ? ['vol_over', 'vol_under'] : ['volume'];

  /** Adds the effect of `grams` more of a food (per gram of it) to a column: nutrients, volume, objective. */
  const addFood = (column: Record<string, number>, food: Candidate, density: number, grams: number) => {
    for (const row of rowsInModel) add(column, row.row, (food.per100g[row.key] / 100 / servings) * grams);
    for (const row of volumeRows) add(column, row, grams / density);
    if (objectiveKey) add(column, OBJ, (food.per100g[objectiveKey] / 100 / servings) * grams);
  };

  for (const l of free) {
    const [orig, ...swaps] = l.slots;
    const p = l.position;
    const closest = objective.kind === 'closest';
    const rhoOrig = orig.densityGPerMl;
    // dev_i − Δ_i ≥ 0 and dev_i + Δ_i ≥ 0, Δ_i the line's mL away from its centre (made on first use)
    const deviationUp = `dvu_${p}`;
    const deviationDown = `dvd_${p}`;
    const deviation = (column: Record<string, number>, perMl: number) => {
      if (!closest || perMl === 0) return;
      if (!constraints[deviationUp]) {
        constraints[deviationUp] = { min: 0 };
        constraints[deviationDown] = { min: 0 };
        variables[`dev_${p}`] = { [deviationUp]: 1, [deviationDown]: 1, [OBJ]: weights.perMl };
      }
      add(column, deviationUp, -perMl);
      add(column, deviationDown, perMl);
    };
    const keepBelow = `kb_${p}`;
    const keepAbove = `ka_${p}`;
    if (orig.below) {
      constraints[keepBelow] = { max: orig.keepBelow };
      const below: Record<string, number> = { [keepBelow]: 1 };
      addFood(below, orig.candidate, rhoOrig, -1);
      deviation(below, -1 / rhoOrig);
      variables[orig.below] = below;
    }
    if (orig.above) {
      constraints[keepAbove] = { max: orig.keepAbove };
      const above: Record<string, number> = { [keepAbove]: 1 };
      addFood(above, orig.candidate, rhoOrig, 1);
      deviation(above, 1 / rhoOrig);
      variables[orig.above] = above;
    }
    const pick = `pick_${p}`;
    if (swaps.length) constraints[pick] = { max: 1 };

    for (const s of swaps) {
      const y: Record<string, number> = { [pick]: 1 };
      // a swap leaves the written food's own amount band shut
      if (orig.below) add(y, keepBelow, orig.keepBelow);
      if (orig.above) add(y, keepAbove, orig.keepAbove);
      add(y, 'swaps', 1);
      if (objective.kind === 'swaps') add(y, OBJ, 1);
      if (closest) add(y, OBJ, s.candidate.approved ? weights.approvedSwap : weights.swap);
      const rho = s.densityGPerMl;
      const band = `zb_${p}_${s.key}`;
      // the written food gives up its share s, the substitute comes in at the low end of its band
      addFood(y, orig.candidate, rhoOrig, -s.share * orig.centreGrams);
      addFood(y, s.candidate, rho, s.lowGrams);
      deviation(y, (s.lowGrams - s.centreGrams) / rho);
      add(y, band, -s.widthGrams);
      // 'closest' prices the written food given up, so a partial swap replaces no more than it must
      if (closest) add(y, OBJ, (weights.perMl * s.share * orig.centreGrams) / rhoOrig);
      variables[s.y!] = y;
      ints[s.y!] = 1;
      if (s.above) {
        constraints[band] = { max: 0 };
        const z: Record<string, number> = { [band]: 1 };
        addFood(z, s.candidate, rho, 1);
        deviation(z, 1 / rho);
        variables[s.above] = z;
      }
    }
  }

  if (free.length) {
    // Dish volume as a change from the written ΣV.
    if (objective.kind === 'dish-volume') {
      constraints.vol_over = { max: permittedAddMl };
      // a change within the cuts and additions the rules permit is no deviation (the bound leaves them out)
      constraints.vol_under = { min: -permittedCutMl };
      variables.dish_dev = { vol_over: -1, vol_under: 1, [OBJ]: 1 };
    } else {
      constraints.volume = { min: volumeRangeMl[0] - originalVolumeMl, max: volumeRangeMl[1] - originalVolumeMl };
    }
  }

  const slack: RewriteModelMeta['slack'] = {};
  const penalty = elastic ? variant.penaltyFactor! * objectiveScale(objective, weights, maxSwaps, slots, writtenPerServing, originalVolumeMl) : 0;
  // In a maximisation the objective rewards, so slack enters with the opposite sign.
  const price = maximise ? -penalty : penalty;
  for (const { row, value } of active) {
    const rhs = value - writtenPerServing[row.key];
    const floor = row.sense === 'min';
    if (!elastic) {
      constraints[row.row] = floor ? { min: rhs } : { max: rhs };
      continue;
    }
    // Slack s = shortfall − repair + extra with 0 ≤ repair ≤ shortfall, extra ≥ 0, where the shortfall
    // is the written recipe's: the all-zero start (the written recipe, repair = extra = 0) then
    // meets every row, and the simplex needs no phase 1 at the root.
    const shortfall = Math.max(0, floor ? rhs : -rhs);
    const weight = 1 / Math.max(Math.abs(value), 1);
    const sign = floor ? 1 : -1;
    constraints[row.row] = floor ? { min: rhs - shortfall } : { max: rhs + shortfall };
    const extra = `s_${row.row}`;
    variables[extra] = { [row.row]: sign, [OBJ]: price * weight };
    const entry: TargetSlack = { shortfall, extra, weight };
    if (shortfall > 0) {
      const repair = `r_${row.row}`;
      const cap = `rcap_${row.row}`;
      constraints[cap] = { max: shortfall };
      variables[repair] = { [row.row]: -sign, [cap]: 1, [OBJ]: -price * weight };
      entry.repair = repair;
      objectiveConstant += price * weight * shortfall;
    }
    slack[row.target] = entry;
  }

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
    variables: { lines: slots, originalVolumeMl, permittedCutMl, permittedAddMl, volumeRangeMl, weights, slack, objectiveConstant },
  };
}

/**
 * The model `solveRewrite` solves first, and a map to read its solution back: the rewrite with
 * elastic targets (slack priced at FIRST_PENALTY_FACTOR × the objective's scale), whose optimum is
 * the product's model's whenever all slack comes out 0. `{ hardTargets: true }` gives the product's
 * model itself, targets as hard rows (what the HiGHS cross-check solves).
 */
export function buildRewriteModel(
  lines: RewriteLine[],
  targets: Targets,
  servings: number,
  options: RewriteOptions = {},
  form: { hardTargets?: boolean } = {},
): BuiltRewriteModel {
  const resolved = resolveOptions(options);
  return buildModel(lines, targets, servings, resolved, {
    objective: { kind: resolved.objective },
    penaltyFactor: form.hardTargets ? undefined : FIRST_PENALTY_FACTOR,
  });
}

/** The built model as CPLEX LP text with its objective constant: an outside solver's optimum on it is the plan's objective value. */
export function modelText(built: BuiltRewriteModel): string {
  return toLpFormat(built.model, { objectiveConstant: built.variables.objectiveConstant });
}
