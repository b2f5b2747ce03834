import { divideNutrients, nutrientsForGrams, sumNutrients, type Nutrients } from '../../shared/nutrition';
import { massRatioOf } from '../../shared/rewrite/line-slots';
import type { Candidate, RewriteLine, RewriteObjective, RewriteOptions, Targets } from '../../shared/rewrite/types';

/** Small seeded generator (mulberry32), so every run builds the same problems. */
export function seededRandom(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

type Rng = () => number;
const between = (rng: Rng, lo: number, hi: number) => lo + (hi - lo) * rng();
const pick = <T>(rng: Rng, items: readonly T[]): T => items[Math.floor(rng() * items.length)];

/**
 * Synthetic foods with plausible values per 100 g: macros that leave room for water, energy by the
 * general factors 4/4/9 (USDA Handbook 74), saturated fat a share of fat, fiber and sugar shares of
 * carbohydrate, densities between dry pasta and oil-free sauces. Invented, not catalogue values.
 */
function syntheticNutrients(rng: Rng, kind: 'protein' | 'fat' | 'carb' | 'mixed'): Nutrients {
  const [p, f, c] =
    kind === 'protein'
      ? [between(rng, 12, 32), between(rng, 1, 25), between(rng, 0, 6)]
      : kind === 'fat'
        ? [between(rng, 0, 25), between(rng, 15, 60), between(rng, 0, 10)]
        : kind === 'carb'
          ? [between(rng, 2, 15), between(rng, 0, 8), between(rng, 8, 75)]
          : [between(rng, 1, 12), between(rng, 0, 15), between(rng, 3, 25)];
  return {
    kcal: 4 * p + 9 * f + 4 * c,
    proteinG: p,
    fatG: f,
    satFatG: f * between(rng, 0.1, 0.6),
    carbsG: c,
    fiberG: c * between(rng, 0, 0.25),
    sugarG: c * between(rng, 0, 0.5),
    sodiumMg: between(rng, 0, 900),
  };
}

/** A lighter (or merely different) food in the same part of the dish: leaner, more protein, some noise. */
function variantOf(rng: Rng, base: Nutrients): Nutrients {
  const p = base.proteinG * between(rng, 0.7, 1.8);
  const f = base.fatG * between(rng, 0.05, 1.1);
  const carbs = base.carbsG * between(rng, 0.5, 1.3);
  return {
    kcal: 4 * p + 9 * f + 4 * carbs,
    proteinG: p,
    fatG: f,
    satFatG: f * between(rng, 0.1, 0.6),
    carbsG: carbs,
    fiberG: carbs * between(rng, 0, 0.3),
    sugarG: carbs * between(rng, 0, 0.5),
    sodiumMg: base.sodiumMg * between(rng, 0.4, 1.5),
  };
}

export interface RandomRecipeShape {
  lines: number;
  /** candidates per line besides the original: a number, or [fewest, most] drawn per line */
  candidates: number | [number, number];
  /** share of lines that are locked */
  lockedShare?: number;
  /** share of candidates a coach approved */
  approvedShare?: number;
  /** add one line with no grams ("salt to taste") */
  withEmptyLine?: boolean;
  /** share of substitutes whose rule gives a mass ratio other than 1 (as egg → whites does) */
  massRatioShare?: number;
  /** share of substitutes whose rule allows a partial swap (some only up to half or three quarters) */
  partialShare?: number;
  /** share of lines a rule lets move (less oil, more vegetables) */
  keepScaleShare?: number;
  /** share of substitutes whose rule gives its own band (a tight 1:1 liquid, up to ×1.5 of a lean protein) */
  bandShare?: number;
  /** share of lines held as written */
  heldShare?: number;
}

const RATIOS = [0.5, 0.75, 1, 1, 1.32, 1.5] as const;
const BANDS: [number, number][] = [
  [0.9, 1.1],
  [0.9, 1.5],
  [1, 1],
];
const KEEP_SCALES: [number, number][] = [
  [0.5, 1],
  [1, 1.5],
  [0.75, 1.25],
];

export function randomRecipe(rng: Rng, shape: RandomRecipeShape): RewriteLine[] {
  let nextFoodId = 1;
  const lines: RewriteLine[] = [];
  for (let i = 0; i < shape.lines; i++) {
    const kind = pick(rng, ['protein', 'fat', 'carb', 'mixed'] as const);
    const density = between(rng, 0.4, 1.1);
    const volumeMl = kind === 'fat' ? between(rng, 10, 80) : between(rng, 60, 500);
    const per100g = syntheticNutrients(rng, kind);
    const original: Candidate = { foodId: nextFoodId++, name: `food ${i} as written`, densityGPerMl: density, per100g, original: true };
    const candidates: Candidate[] = [original];
    const count =
      typeof shape.candidates === 'number' ? shape.candidates : shape.candidates[0] + Math.floor(rng() * (shape.candidates[1] - shape.candidates[0] + 1));
    for (let k = 0; k < count; k++) {
      // Substitutes of like density are common (lean for fatty meat); they also give pruning work.
      const c: Candidate = {
        foodId: nextFoodId++,
        name: `food ${i} option ${k + 1}`,
        densityGPerMl: rng() < 0.4 ? density : density * between(rng, 0.7, 1.3),
        per100g: variantOf(rng, per100g),
      };
      const ratio = rng() < (shape.massRatioShare ?? 0) ? pick(rng, RATIOS) : undefined;
      if (ratio !== undefined) c.massRatio = ratio;
      if (rng() < (shape.partialShare ?? 0)) {
        c.partial = true;
        if (rng() < 0.5) c.maxShare = pick(rng, [0.5, 0.75]);
      }
      // drawn only when asked for, so that shapes without bands keep their problems
      if (shape.bandShare && rng() < shape.bandShare) c.band = pick(rng, BANDS);
      c.rule = { id: `rule-${i}-${k + 1}`, label: `${c.name} for ${original.name}, ${ratio ?? 1}:1 by weight`, why: 'invented test rule' };
      if (rng() < (shape.approvedShare ?? 0)) {
        c.approved = { by: 'Coach Wren', note: 'invented test note' };
        const own = rng();
        if (own < 0.3) c.approved.volumeRatio = Number(between(rng, 0.8, 1.2).toFixed(2));
        else if (own < 0.6) c.approved.massRatio = Number(between(rng, 0.8, 1.2).toFixed(2));
      }
      candidates.push(c);
    }
    const line: RewriteLine = {
      index: i,
      foodId: original.foodId,
      grams: volumeMl * density,
      volumeMl,
      locked: rng() < (shape.lockedShare ?? 0),
      candidates,
    };
    if (rng() < (shape.keepScaleShare ?? 0)) line.keepScale = pick(rng, KEEP_SCALES);
    else if (rng() < (shape.heldShare ?? 0)) line.heldReason = 'invented: kept as written';
    lines.push(line);
  }
  if (shape.withEmptyLine) {
    const salt: Candidate = {
      foodId: nextFoodId++,
      name: 'salt to taste',
      densityGPerMl: 1.2,
      per100g: { kcal: 0, proteinG: 0, fatG: 0, satFatG: 0, carbsG: 0, fiberG: 0, sugarG: 0, sodiumMg: 38758 },
      original: true,
    };
    lines.push({ index: lines.length, foodId: salt.foodId, grams: 0, volumeMl: 0, locked: false, candidates: [salt] });
  }
  return lines;
}

export function perServingAsWritten(lines: RewriteLine[], servings: number): Nutrients {
  const totals = sumNutrients(lines.map((l) => nutrientsForGrams(l.candidates.find((c) => c.original)!.per100g, Math.max(0, l.grams))));
  return divideNutrients(totals, servings);
}

export interface RandomProblem {
  seed: number;
  lines: RewriteLine[];
  targets: Targets;
  servings: number;
  options: RewriteOptions;
}

/**
 * Targets a known plan meets: up to `swaps` lines swapped to their leanest-per-mL candidate at the
 * rule's amount (a partial swap at its largest share), the targets set just around that plan's own per-serving values. The rewrite can
 * always reach them, and needs about that many swaps.
 */
export function plantedTargets(rng: Rng, lines: RewriteLine[], servings: number, swaps: number): Targets {
  const free = lines.filter((l) => !l.locked && !l.heldReason && l.grams > 0 && l.candidates.length > 1);
  const order = free
    .map((l) => ({ l, k: rng() }))
    .sort((a, b) => a.k - b.k)
    .slice(0, swaps);
  const planned = new Map<RewriteLine, Candidate>();
  for (const { l } of order) {
    const score = (c: Candidate) => (c.per100g.proteinG * 4 - c.per100g.kcal * 0.5) * c.densityGPerMl;
    const best = l.candidates.filter((c) => !c.original).sort((a, b) => score(b) - score(a))[0];
    planned.set(l, best);
  }
  const totals = sumNutrients(
    lines.map((l) => {
      const c = planned.get(l);
      const original = l.candidates.find((o) => o.original)!;
      if (!c) return nutrientsForGrams(original.per100g, Math.max(0, l.grams));
      // At the rule's amount; a partial swap at its largest share.
      const share = c.maxShare ?? 1;
      const swapped = nutrientsForGrams(c.per100g, massRatioOf(c, l.grams / l.volumeMl) * share * l.grams);
      return sumNutrients([swapped, nutrientsForGrams(original.per100g, (1 - share) * l.grams)]);
    }),
  );
  const plan = divideNutrients(totals, servings);
  return { proteinMinG: plan.proteinG * between(rng, 0.97, 1), kcalMax: plan.kcal * between(rng, 1, 1.03) };
}

/** A recipe with random targets, options and objective: some reachable, some not. */
export function randomProblem(seed: number, shape?: Partial<RandomRecipeShape>): RandomProblem {
  const rng = seededRandom(seed);
  const lines = randomRecipe(rng, {
    lines: shape?.lines ?? 3 + Math.floor(rng() * 8),
    candidates: shape?.candidates ?? 1 + Math.floor(rng() * 5),
    lockedShare: shape?.lockedShare ?? 0.15,
    approvedShare: shape?.approvedShare ?? 0.2,
    withEmptyLine: shape?.withEmptyLine ?? rng() < 0.3,
    massRatioShare: shape?.massRatioShare ?? 0.3,
    partialShare: shape?.partialShare ?? 0.3,
    keepScaleShare: shape?.keepScaleShare ?? 0.2,
    bandShare: shape?.bandShare ?? 0.2,
    heldShare: shape?.heldShare ?? 0.1,
  });
  const servings = pick(rng, [1, 2, 4, 6, 8]);
  const written = perServingAsWritten(lines, servings);
  // Half the problems aim at a plan known to exist, half at values drawn around the recipe's own.
  const targets: Targets =
    rng() < 0.5
      ? plantedTargets(rng, lines, servings, 1 + Math.floor(rng() * 3))
      : { proteinMinG: written.proteinG * between(rng, 0.95, 1.5), kcalMax: written.kcal * between(rng, 0.6, 1.02) };
  if (rng() < 0.25) targets.fiberMinG = written.fiberG * between(rng, 0.8, 1.2);
  if (rng() < 0.25) targets.fatMaxG = written.fatG * between(rng, 0.5, 1);
  if (rng() < 0.2) targets.sodiumMaxMg = written.sodiumMg * between(rng, 0.7, 1.1);
  if (rng() < 0.15) targets.satFatMaxG = written.satFatG * between(rng, 0.5, 1);
  if (rng() < 0.15) targets.sugarMaxG = written.sugarG * between(rng, 0.7, 1.1);
  const options: RewriteOptions = {
    objective: pick(rng, ['closest', 'max-protein', 'min-kcal'] as RewriteObjective[]),
    volumeTolerancePct: pick(rng, [5, 10, 10, 15]),
    lineTolerancePct: pick(rng, [15, 25, 25, 35]),
  };
  if (rng() < 0.6) options.maxSwaps = Math.floor(rng() * 4);
  return { seed, lines, targets, servings, options };
}

// HiGHS, the outside solver these problems are checked against.

type Highs = Awaited<ReturnType<(typeof import('highs'))['default']>>;
let loading: Promise<Highs> | null = null;

/** HiGHS (npm `highs`, WebAssembly), loaded once per test file. Test-only: never used by the product. */
export function loadHighs(): Promise<Highs> {
  loading ??= import('highs').then((m) => m.default());
  return loading;
}

/** The MIP gap both solvers are held to: javascript-lp-solver runs with gap 0, HiGHS with this. */
export const HIGHS_OPTIONS = { output_flag: false, mip_rel_gap: 1e-9, mip_abs_gap: 1e-9 } as const;

export interface HighsOutcome {
  feasible: boolean;
  objective: number;
  status: string;
}

export async function solveWithHighs(lpText: string): Promise<HighsOutcome> {
  const highs = await loadHighs();
  const result = highs.solve(lpText, HIGHS_OPTIONS);
  return { feasible: result.Status === 'Optimal', objective: result.ObjectiveValue, status: result.Status };
}

/** Relative difference scaled by max(1, |b|): objectives near 0 compare absolutely. */
export function relativeGap(a: number, b: number): number {
  return Math.abs(a - b) / Math.max(1, Math.abs(b));
}

/**
 * Whether an outside solver's optimum on the exported LP text agrees with solver.objectiveValue:
 * within relative 1e-6, or within 1e-8 of the objective's constant term. That constant (the
 * elastic repair's price × the written recipe's shortfall) can be 10³–10⁶ times the plan's value
 * and cancels against the repair columns, whose values each solver holds only to its feasibility
 * tolerance (seen: up to 3e-9 of the constant), so the two optima differ by that much.
 */
export function objectiveAgrees(outside: number, ours: number, lpText: string): boolean {
  const constant = /([+-]) ([0-9.e+-]+)\nSubject To/.exec(lpText);
  const magnitude = constant ? Math.abs(Number(constant[2])) : 0;
  return relativeGap(outside, ours) <= 1e-6 || Math.abs(outside - ours) <= 1e-8 * magnitude;
}
