import { describe, expect, it } from 'vitest';
import { NUTRIENT_KEYS, type Nutrients } from '../../shared/nutrition';
import { applySuggestion, solveRewrite } from '../../shared/rewrite/solve-rewrite';
import { activeTargets } from '../../shared/rewrite/targets';

/** The share a cook splits a line by (what the model offers a partial swap below the whole line). */
const SHARES = [1 / 2];
import type { Candidate, OptimalRewrite, Plan, RewriteLine, RewriteResult, Targets } from '../../shared/rewrite/types';
import { randomProblem, type RandomProblem } from '../helpers/random-rewrite-problems';

const TOL = 1e-6;
const within = (value: number, lo: number, hi: number) => value >= lo - TOL * Math.max(1, Math.abs(lo)) && value <= hi + TOL * Math.max(1, Math.abs(hi));

function original(line: RewriteLine) {
  return line.candidates.find((c) => c.original)!;
}

function meets(perServing: Nutrients, targets: Targets): boolean {
  return activeTargets(targets).every(({ row, value }) =>
    row.sense === 'min' ? within(perServing[row.key], value, Infinity) : within(perServing[row.key], -Infinity, value),
  );
}

/** The rule's grams per gram of the written food, as the types document it (coach's ratio first, else the rule's, else 1). */
function expectedRatio(line: RewriteLine, c: Candidate): number {
  if (c.approved?.massRatio) return c.approved.massRatio;
  if (c.approved?.volumeRatio) return (c.approved.volumeRatio * c.densityGPerMl) / (line.grams / line.volumeMl);
  return c.massRatio ?? 1;
}

/** Every property an optimal rewrite must have, checked from the inputs alone. */
function checkOptimal(p: RandomProblem, r: OptimalRewrite): void {
  const t = (p.options.volumeTolerancePct ?? 10) / 100;
  const a = (p.options.lineTolerancePct ?? 25) / 100;
  const perServing = sumPerServing(r.after, p.servings);
  expect(meets(perServing, p.targets)).toBe(true);
  const writtenVolume = p.lines.reduce((s, l) => s + Math.max(0, l.volumeMl), 0);
  // the floor leaves out what keepScale lets a free line give up ((1 − lo)·V of each)
  const permittedCut = p.lines.reduce((s, l) => {
    const free = !(l.locked || l.heldReason || !(l.grams > 0) || !(l.volumeMl > 0));
    return free && l.keepScale ? s + (1 - l.keepScale[0]) * l.volumeMl : s;
  }, 0);
  // …and the ceiling what a rule lets it add: a keepScale's (hi − 1)·V, or a swap band's top above its centre
  // where the band reaches past 1 + t (a coach's swap keeps the line tolerance)
  const permittedAdd = p.lines.reduce((s, l) => {
    const free = !(l.locked || l.heldReason || !(l.grams > 0) || !(l.volumeMl > 0));
    if (!free) return s;
    const orig = original(l);
    const adds = l.candidates
      .filter((c) => !c.original)
      .map((c) => {
        const [, hi] = c.approved || !c.band ? [1 - a, 1 + a] : c.band;
        if (hi <= 1 + t + 1e-12) return 0;
        const rho = c.densityGPerMl === orig.densityGPerMl ? l.grams / l.volumeMl : c.densityGPerMl;
        return ((hi - 1) * expectedRatio(l, c) * Math.min(1, c.maxShare ?? 1) * l.grams) / rho;
      });
    return s + Math.max(0, l.keepScale ? (l.keepScale[1] - 1) * l.volumeMl : 0, ...adds);
  }, 0);
  expect(within(r.after.volumeMl, (1 - t) * writtenVolume - permittedCut, (1 + t) * writtenVolume + permittedAdd)).toBe(true);
  expect(r.after.lines.map((l) => l.index)).toEqual([...r.after.lines.map((l) => l.index)].sort((x, y) => x - y));
  let swaps = 0;
  for (const line of p.lines) {
    const parts = r.after.lines.filter((l) => l.index === line.index);
    const orig = original(line);
    for (const planned of parts) {
      const food = line.candidates.find((c) => c.foodId === planned.food.foodId);
      expect(food, `line ${line.index}: food from its candidate set`).toBeDefined();
      // Nutrients are the food's values per 100 g × grams.
      for (const k of NUTRIENT_KEYS) expect(planned.nutrients[k]).toBeCloseTo((food!.per100g[k] * planned.grams) / 100, 9);
    }
    const fixed = line.locked || Boolean(line.heldReason) || !(line.grams > 0) || !(line.volumeMl > 0);
    if (fixed) {
      expect(parts).toHaveLength(1);
      expect(parts[0].food.foodId).toBe(orig.foodId);
      expect(parts[0].grams).toBe(Math.max(0, line.grams));
      continue;
    }
    expect(parts.length).toBeGreaterThanOrEqual(1);
    expect(parts.length).toBeLessThanOrEqual(2);
    const kept = parts.find((l) => l.food.foodId === orig.foodId);
    const sub = parts.find((l) => l.food.foodId !== orig.foodId);
    if (!sub) {
      // Unswapped: exactly the written grams, or within the band a rule allows; never filler.
      const [lo, hi] = line.keepScale ?? [1, 1];
      expect(within(kept!.grams, lo * line.grams, hi * line.grams), `line ${line.index}: ${kept!.grams} of ${line.grams} g`).toBe(true);
      expect(kept!.volumeMl).toBeCloseTo((kept!.grams * line.volumeMl) / line.grams, 6);
      continue;
    }
    swaps += 1;
    const food = line.candidates.find((c) => c.foodId === sub.food.foodId)!;
    const replaced = line.grams - (kept?.grams ?? 0);
    const maxShare = food.maxShare ?? 1;
    if (kept) {
      expect(parts[0]).toBe(kept);
      expect(food.partial || maxShare < 1, `line ${line.index}: only a partial rule shares a line`).toBe(true);
      // A cook's share of the line: half, or the rule's whole maxShare when that is less, never more.
      const share = replaced / line.grams;
      expect(SHARES.some((s) => Math.abs(s - share) < 1e-9) || Math.abs(share - maxShare) < 1e-9, `line ${line.index}: share ${share}`).toBe(true);
      expect(share).toBeLessThanOrEqual(maxShare + 1e-9);
    } else expect(maxShare).toBe(1);
    const ratio = expectedRatio(line, food);
    // the rule's own band where it gives one (never for a coach's swap), else the line tolerance
    const [lo, hi] = !food.approved && food.band ? food.band : [1 - a, 1 + a];
    expect(within(sub.grams, lo * ratio * replaced, hi * ratio * replaced), `line ${line.index}: band`).toBe(true);
    expect(sub.volumeMl).toBeCloseTo(sub.grams / food.densityGPerMl, 6);
    const change = r.changes.find((c) => c.line === line.index)!;
    expect(change.swapped).toBe(true);
    expect(change.partial ?? false).toBe(Boolean(kept));
    if (kept) expect(change.keptGrams).toBeCloseTo(kept.grams, 9);
    expect(change.rule).toEqual(food.rule);
    if (!food.approved) expect(change.reason).toContain(food.rule!.label);
  }
  if (p.options.maxSwaps !== undefined) expect(swaps).toBeLessThanOrEqual(p.options.maxSwaps);
  expect(r.changes.filter((c) => c.swapped)).toHaveLength(swaps);
  for (const change of r.changes) expect(change.reason.length).toBeGreaterThan(10);
  const held = p.lines.filter((l) => l.heldReason).map((l) => ({ line: l.index, reason: l.heldReason }));
  expect(r.held ?? []).toEqual(held);
}

function sumPerServing(plan: Plan, servings: number): Nutrients {
  const out = {} as Nutrients;
  for (const k of NUTRIENT_KEYS) out[k] = plan.lines.reduce((s, l) => s + l.nutrients[k], 0) / servings;
  return out;
}

// Budgets far beyond need, so that a slow machine cannot stop a solve short of its optimum.
const problems = Array.from({ length: 40 }, (_, i) => randomProblem(100 + i)).map((p) => ({ ...p, options: { ...p.options, timeoutMs: 60_000 } }));
const results = new Map<RandomProblem, RewriteResult>(problems.map((p) => [p, solveRewrite(p.lines, p.targets, p.servings, p.options)]));

describe('invariants of every rewrite answer (40 generated problems)', () => {
  it('has both kinds of answer to check', () => {
    const optimal = [...results.values()].filter((r) => r.status === 'optimal').length;
    expect(optimal).toBeGreaterThanOrEqual(10);
    expect(results.size - optimal).toBeGreaterThanOrEqual(5);
  });

  it('exercises what the rules bring: partial swaps, mass ratios other than 1, amount bands, held lines', () => {
    const optimal = [...results].filter((e): e is [RandomProblem, OptimalRewrite] => e[1].status === 'optimal');
    const changes = optimal.flatMap(([, r]) => r.changes);
    expect(changes.filter((c) => c.partial).length).toBeGreaterThan(0);
    expect(changes.filter((c) => !c.swapped).length).toBeGreaterThan(0);
    expect(changes.filter((c) => c.swapped && Math.abs(c.gramsAfter / c.gramsBefore - 1) > 0.3).length).toBeGreaterThan(0);
    expect(optimal.filter(([, r]) => r.held?.length).length).toBeGreaterThan(0);
  });

  it('optimal: targets met, volumes within tolerance, swaps within the limit, locked lines kept, foods from the candidates', () => {
    for (const [p, r] of results) if (r.status === 'optimal') checkOptimal(p, r);
  });

  it('before is the recipe as written', () => {
    for (const [p, r] of results) {
      expect(r.before.lines).toHaveLength(p.lines.length);
      r.before.lines.forEach((l, i) => {
        expect(l.food.foodId).toBe(original(p.lines[i]).foodId);
        expect(l.grams).toBe(Math.max(0, p.lines[i].grams));
      });
    }
  });

  it('infeasible: the targets really are out of reach, and best reachable is the closest plan', () => {
    for (const [p, r] of results) {
      if (r.status !== 'infeasible') continue;
      expect(r.bestReachable).toEqual(r.closest.perServing);
      expect(r.binding.length).toBeGreaterThan(0);
      for (const target of r.binding) {
        const { row, value } = activeTargets(p.targets).find((t) => t.row.target === target)!;
        const reached = r.bestReachable[row.key];
        expect(row.sense === 'min' ? reached < value : reached > value).toBe(true);
      }
      expect(r.message).toMatch(/best reachable: .* g protein at .* kcal/);
    }
  });

  it('infeasible: every suggestion, applied, makes the targets reachable', () => {
    let checked = 0;
    for (const [p, r] of results) {
      if (r.status !== 'infeasible') continue;
      for (const s of r.suggestions) {
        const { targets, options } = applySuggestion(p.targets, p.options, s);
        const again = solveRewrite(p.lines, targets, p.servings, options);
        expect(again.status, `seed ${p.seed}: ${s.message}`).toBe('optimal');
        if (again.status === 'optimal') checkOptimal({ ...p, targets, options }, again);
        checked += 1;
      }
    }
    expect(checked).toBeGreaterThan(0);
  });
});

describe('what the objectives mean', () => {
  const p = problems.find((q) => results.get(q)?.status === 'optimal')!;
  const solve = (objective: 'closest' | 'max-protein' | 'min-kcal') =>
    solveRewrite(p.lines, p.targets, p.servings, { ...p.options, objective }) as OptimalRewrite;

  it('most protein reaches at least the protein of the other objectives, fewest calories at most their kcal', () => {
    const closest = solve('closest');
    const protein = solve('max-protein');
    const kcal = solve('min-kcal');
    for (const other of [closest, kcal]) expect(protein.after.perServing.proteinG).toBeGreaterThanOrEqual(other.after.perServing.proteinG - 1e-6);
    for (const other of [closest, protein]) expect(kcal.after.perServing.kcal).toBeLessThanOrEqual(other.after.perServing.kcal + 1e-6);
  });

  it('closest changes nothing when the recipe as written already meets the targets', () => {
    const written = solveRewrite(p.lines, { proteinMinG: 0, kcalMax: 1e6 }, p.servings, { objective: 'closest' });
    expect(written.status).toBe('optimal');
    if (written.status === 'optimal') expect(written.changes).toEqual([]);
  });
});
