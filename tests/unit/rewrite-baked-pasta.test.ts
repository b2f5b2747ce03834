import { describe, expect, it } from 'vitest';
import { buildRewriteModel, modelText } from '../../shared/rewrite/build-model';
import { applySuggestion, solveRewrite } from '../../shared/rewrite/solve-rewrite';
import type { Nutrients } from '../../shared/nutrition';
import type { Candidate, OptimalRewrite, RewriteLine, RewriteObjective, RuleRef } from '../../shared/rewrite/types';
import { objectiveAgrees, perServingAsWritten, relativeGap, solveWithHighs } from '../helpers/random-rewrite-problems';

// An invented baked-pasta recipe for six with lighter candidates for its lines. Values per 100 g
// and densities are approximate, from memory, close to USDA SR28 entries; the pulse pastas are
// label-style values, also from memory. Not catalogue data.
type Food = [
  name: string,
  densityGPerMl: number,
  kcal: number,
  proteinG: number,
  fatG: number,
  satFatG: number,
  carbsG: number,
  fiberG: number,
  sugarG: number,
  sodiumMg: number,
];

const n = ([, , kcal, proteinG, fatG, satFatG, carbsG, fiberG, sugarG, sodiumMg]: Food): Nutrients => ({
  kcal,
  proteinG,
  fatG,
  satFatG,
  carbsG,
  fiberG,
  sugarG,
  sodiumMg,
});

let nextId = 1;
/** A substitute's quantity rule, share and RuleRef, as the rules side hands them to the model. */
type Offer = { massRatio?: number; maxShare?: number; partial?: boolean; rule?: RuleRef; approved?: Candidate['approved'] };

function line(index: number, grams: number, foods: Food[], offers: Record<string, Offer> = {}, extra: Partial<RewriteLine> = {}): RewriteLine {
  const candidates: Candidate[] = foods.map((f, i) => ({
    foodId: nextId++,
    name: f[0],
    densityGPerMl: f[1],
    per100g: n(f),
    ...(i === 0 ? { original: true } : {}),
    ...(offers[f[0]] ?? {}),
  }));
  return { index, foodId: candidates[0].foodId, grams, volumeMl: grams / foods[0][1], locked: false, candidates, ...extra };
}

const rule = (id: string, label: string, note?: string): RuleRef => ({ id, label, why: `invented test rule ${id}`, ...(note ? { note } : {}) });

const BAKED_PASTA_SERVINGS = 6;
const BEEF_TO_TURKEY = rule('ground-beef-to-lean-turkey', 'lean ground turkey for 80/20 beef, 1:1 by weight');
const EGG_TO_WHITES = rule('egg-to-whites', '2 large egg whites for 1 large egg (66 g for 50 g)');

function bakedPasta(): RewriteLine[] {
  nextId = 1;
  return [
    line(
      0,
      340,
      [
        ['penne, dry', 0.42, 371, 13.0, 1.5, 0.3, 74.7, 3.2, 2.7, 6],
        ['whole-wheat penne, dry', 0.42, 352, 14.6, 2.9, 0.5, 71.0, 9.2, 2.8, 8],
        ['chickpea penne, dry', 0.42, 360, 20.0, 6.0, 0.7, 57.0, 8.0, 4.0, 60],
        ['red lentil penne, dry', 0.42, 350, 25.0, 2.0, 0.3, 55.0, 8.0, 1.0, 10],
      ],
      {
        'whole-wheat penne, dry': { massRatio: 1, rule: rule('pasta-to-whole-wheat', 'whole-wheat penne for penne, 1:1 by weight') },
        'chickpea penne, dry': {
          massRatio: 1,
          partial: true,
          rule: rule('pasta-to-pulse', 'chickpea penne for penne, 1:1 by weight', 'boil it 2 minutes less; it softens fast'),
        },
        'red lentil penne, dry': { massRatio: 1, partial: true, rule: rule('pasta-to-pulse-lentil', 'red lentil penne for penne, 1:1 by weight') },
      },
    ),
    line(
      1,
      454,
      [
        ['ground beef 80/20, raw', 0.96, 254, 17.2, 20.0, 7.6, 0, 0, 0, 66],
        ['lean ground turkey 93/7, raw', 0.96, 150, 18.7, 8.3, 2.3, 0, 0, 0, 69],
        ['ground beef 95/5, raw', 0.96, 137, 21.4, 5.0, 2.3, 0, 0, 0, 66],
      ],
      {
        'lean ground turkey 93/7, raw': { massRatio: 1, partial: true, rule: BEEF_TO_TURKEY },
        'ground beef 95/5, raw': { massRatio: 1, rule: rule('beef-to-lean-beef', '95/5 ground beef for 80/20, 1:1 by weight') },
      },
    ),
    line(
      2,
      226,
      [
        ['mozzarella, whole milk, shredded', 0.47, 299, 22.2, 22.4, 13.2, 2.2, 0, 1.0, 627],
        ['mozzarella, part-skim, shredded', 0.47, 254, 24.3, 15.9, 10.1, 2.8, 0, 1.1, 619],
      ],
      {
        'mozzarella, part-skim, shredded': {
          massRatio: 1,
          rule: rule('mozzarella-part-skim', 'part-skim mozzarella for whole-milk, 1:1 by weight', 'bake 5 minutes longer so it melts'),
        },
      },
    ),
    line(3, 680, [['marinara sauce', 1.06, 51, 1.4, 1.5, 0.2, 8.1, 1.8, 5.4, 437]]),
    line(
      4,
      425,
      [
        ['ricotta, whole milk', 1.04, 174, 11.3, 13.0, 8.3, 3.0, 0, 0.3, 84],
        ['ricotta, part-skim', 1.05, 138, 11.4, 7.9, 4.9, 5.1, 0, 0.3, 99],
        ['cottage cheese, fat-free', 0.955, 72, 10.3, 0.3, 0.2, 6.7, 0, 1.9, 372],
      ],
      {
        'ricotta, part-skim': { massRatio: 1, rule: rule('ricotta-part-skim', 'part-skim ricotta for whole-milk, 1:1 by weight') },
        'cottage cheese, fat-free': { approved: { by: 'Coach Maren Holt', note: 'blend it smooth first so it layers like ricotta', massRatio: 1 } },
      },
    ),
    line(5, 27, [['olive oil', 0.913, 884, 0, 100, 13.8, 0, 0, 0, 2]], {}, { keepScale: [0.5, 1], role: 'cooking-fat' }),
    line(6, 50, [['parmesan, grated', 0.42, 431, 38.5, 28.6, 17.3, 4.1, 0, 0.9, 1529]]),
    line(7, 160, [['onion, chopped', 0.676, 40, 1.1, 0.1, 0, 9.3, 1.7, 4.2, 4]], {}, { keepScale: [1, 1.5], role: 'vegetable' }),
    line(
      8,
      100,
      [
        ['egg, whole, raw', 1.03, 143, 12.6, 9.5, 3.1, 0.7, 0, 0.4, 142],
        ['egg white, raw', 1.03, 52, 10.9, 0.2, 0, 0.7, 0, 0.7, 166],
      ],
      { 'egg white, raw': { massRatio: 66 / 50, rule: EGG_TO_WHITES } },
    ),
    // Offered a substitute, but held: the model must keep it as written.
    line(
      9,
      6,
      [
        ['salt, table', 1.2, 0, 0, 0, 0, 0, 0, 0, 38758],
        ['salt substitute', 1.2, 0, 0, 0, 0, 0, 0, 0, 0],
      ],
      {},
      { heldReason: 'salt: kept as written' },
    ),
  ];
}

// Worked example: an invented baked pasta for six (values approximate, from memory, close to
// USDA SR28), rewritten for at least +30 % protein and at least −20 % kcal per serving with at
// most 3 swaps and the dish's volume within 10 %. Candidates carry hand-made rules as the rules
// side hands them over: mass ratios, partial swaps, a coach's swap, amount bands and a held line.
const lines = bakedPasta();
const written = perServingAsWritten(lines, BAKED_PASTA_SERVINGS);
const targets = { proteinMinG: written.proteinG * 1.3, kcalMax: written.kcal * 0.8 };
// A budget far beyond need, so that a slow machine cannot stop a solve short of its optimum.
const options = { maxSwaps: 3, volumeTolerancePct: 10, timeoutMs: 60_000 };
const A = 0.25;

function rewrite(objective: RewriteObjective): OptimalRewrite {
  const result = solveRewrite(lines, targets, BAKED_PASTA_SERVINGS, { ...options, objective, explain: true });
  if (result.status !== 'optimal') throw new Error(`expected a plan, got ${result.message}`);
  return result;
}

const within = (v: number, lo: number, hi: number) => v >= lo * (1 - 1e-9) - 1e-9 && v <= hi * (1 + 1e-9) + 1e-9;

describe('baked pasta rewrite', () => {
  it('starts from the recipe as written: about 790 kcal and 43 g protein per serving', () => {
    const result = rewrite('closest');
    expect(result.before.perServing.kcal).toBeCloseTo(written.kcal, 9);
    expect(result.before.perServing.proteinG).toBeCloseTo(written.proteinG, 9);
    expect(written.kcal).toBeGreaterThan(770);
    expect(written.kcal).toBeLessThan(810);
  });

  for (const objective of ['closest', 'max-protein', 'min-kcal'] as const) {
    it(`${objective}: targets met; quantities from each rule's ratio; no filler; the held line as written`, () => {
      const { before, after, changes, held } = rewrite(objective);
      expect(after.perServing.proteinG).toBeGreaterThanOrEqual(before.perServing.proteinG * 1.3 * (1 - 1e-9));
      expect(after.perServing.kcal).toBeLessThanOrEqual(before.perServing.kcal * 0.8 * (1 + 1e-9));
      expect(changes.filter((c) => c.swapped).length).toBeLessThanOrEqual(3);
      expect(Math.abs(after.volumeMl - before.volumeMl)).toBeLessThanOrEqual(0.1 * before.volumeMl * (1 + 1e-9));
      expect(held).toEqual([{ line: 9, reason: 'salt: kept as written' }]);
      for (const l of lines) {
        const parts = after.lines.filter((p) => p.index === l.index);
        const original = l.candidates.find((c) => c.original)!;
        const substitute = parts.find((p) => p.food.foodId !== original.foodId);
        const kept = parts.find((p) => p.food.foodId === original.foodId);
        expect(parts.length, `line ${l.index}`).toBeLessThanOrEqual(2);
        if (!substitute) {
          // Unswapped: exactly as written, or within the band a rule allows.
          const [lo, hi] = l.keepScale ?? [1, 1];
          expect(within(kept!.grams, lo * l.grams, hi * l.grams), `line ${l.index}: ${kept!.grams} g`).toBe(true);
          continue;
        }
        const food = l.candidates.find((c) => c.foodId === substitute.food.foodId)!;
        const r = food.approved?.massRatio ?? food.massRatio ?? 1;
        // The substitute's grams: (1 ± a)·r × the written grams it replaces.
        const replaced = l.grams - (kept?.grams ?? 0);
        expect(within(substitute.grams, (1 - A) * r * replaced, (1 + A) * r * replaced), `line ${l.index}`).toBe(true);
        if (kept) {
          expect(food.partial).toBe(true);
          expect(replaced).toBeGreaterThanOrEqual(0.25 * l.grams * (1 - 1e-9));
        }
        const change = changes.find((c) => c.line === l.index)!;
        expect(change.swapped).toBe(true);
        expect(change.gramsAfter).toBeCloseTo(substitute.grams, 9);
        expect(change.partial ?? false).toBe(Boolean(kept));
        if (kept) expect(change.keptGrams).toBeCloseTo(kept.grams, 9);
        // Each change names its rule (the coach's swap names the coach and its ratio).
        if (food.rule) {
          expect(change.rule).toEqual(food.rule);
          expect(change.reason).toContain(food.rule.label);
        } else expect(change.reason).toMatch(/1:1 by weight, a swap approved by Coach Maren Holt/);
        expect(change.serves.length).toBeGreaterThan(0);
      }
      const salt = after.lines.filter((p) => p.index === 9);
      expect(salt).toHaveLength(1);
      expect(salt[0].food.name).toBe('salt, table');
      expect(salt[0].grams).toBe(6);
    });
  }

  it('closest takes the coach-approved cottage cheese and carries the note', () => {
    const { changes } = rewrite('closest');
    const ricotta = changes.find((c) => c.from.name === 'ricotta, whole milk');
    expect(ricotta?.to.name).toBe('cottage cheese, fat-free');
    expect(ricotta?.approvedBy).toBe('Coach Maren Holt');
    expect(ricotta?.note).toMatch(/blend it smooth/);
    expect(ricotta?.gramsAfter).toBeGreaterThanOrEqual(425 * (1 - A) - 1e-9);
  });

  it('a partial swap shows both parts with the same index, original first, and says what share it replaces', () => {
    const onlyBeef = lines.map((l) => (l.index === 1 ? l : { ...l, locked: true }));
    const beefOnly = solveRewrite(onlyBeef, { proteinMinG: written.proteinG * 1.02, kcalMax: written.kcal }, BAKED_PASTA_SERVINGS, options);
    const plans = [rewrite('closest'), rewrite('max-protein'), rewrite('min-kcal'), beefOnly].filter((r): r is OptimalRewrite => r.status === 'optimal');
    const shared = plans.flatMap(({ after, changes }) => changes.filter((c) => c.partial).map((change) => ({ after, change })));
    expect(shared.length).toBeGreaterThan(0);
    for (const { after, change } of shared) {
      const parts = after.lines.filter((l) => l.index === change.line);
      expect(parts.map((p) => p.food.name)).toEqual([change.from.name, change.to.name]);
      expect(parts[0].grams).toBeCloseTo(change.keptGrams!, 9);
      expect(parts[1].grams).toBeCloseTo(change.gramsAfter, 9);
      expect(change.reason).toMatch(
        new RegExp(`^Replace (half|a third|a quarter|two thirds|three quarters) of the ${change.from.name.replace(/[()/,]/g, '.')} with \\d+ g `),
      );
      expect(change.reason).toContain(`g of the ${change.gramsBefore.toFixed(0)} g kept) — ${change.rule!.label}`);
    }
  });

  it('only the beef line free: closest replaces half the beef rather than all of it', () => {
    const lockedAllButBeef = lines.map((l) => (l.index === 1 ? l : { ...l, locked: true }));
    const protein = written.proteinG * 1.02;
    const result = solveRewrite(lockedAllButBeef, { proteinMinG: protein, kcalMax: written.kcal }, BAKED_PASTA_SERVINGS, { ...options, objective: 'closest' });
    expect(result.status).toBe('optimal');
    if (result.status !== 'optimal') return;
    const [beef] = result.changes;
    expect(beef.partial).toBe(true);
    expect(beef.to.name).toBe('lean ground turkey 93/7, raw');
    expect(beef.reason).toContain(BEEF_TO_TURKEY.label);
    // Half the beef (a cook's split), and the protein floor met.
    expect(beef.keptGrams).toBeCloseTo(454 / 2, 9);
    expect(result.after.perServing.proteinG).toBeGreaterThanOrEqual(protein * (1 - 1e-9));
  });

  it('the egg line uses the per-piece ratio of its rule (2 whites, 66 g, for 1 egg, 50 g), never equal volume', () => {
    const onlyEgg = lines.map((l) => (l.index === 8 ? l : { ...l, locked: true }));
    const result = solveRewrite(onlyEgg, { proteinMinG: 0, kcalMax: written.kcal * 2 }, BAKED_PASTA_SERVINGS, { ...options, objective: 'max-protein' });
    expect(result.status).toBe('optimal');
    if (result.status !== 'optimal') return;
    const whites = result.after.lines.filter((l) => l.index === 8);
    expect(whites.map((l) => l.food.name)).toEqual(['egg white, raw']);
    // Most protein takes the top of the band: (1 + a) × 66/50 × 100 g = 165 g (equal volume would give 100 g).
    expect(whites[0].grams).toBeCloseTo(165, 6);
  });

  it('most protein gives more protein than closest, fewest calories fewer kcal', () => {
    const closest = rewrite('closest').after.perServing;
    expect(rewrite('max-protein').after.perServing.proteinG).toBeGreaterThan(closest.proteinG);
    expect(rewrite('min-kcal').after.perServing.kcal).toBeLessThan(closest.kcal);
  });

  it('explains with the exact model solved; HiGHS on that text reaches solver.objectiveValue', { timeout: 60_000 }, async () => {
    // HiGHS (npm `highs`) on the exported LP text, objective constant included.
    for (const objective of ['closest', 'max-protein', 'min-kcal'] as const) {
      const result = rewrite(objective);
      const elastic = buildRewriteModel(lines, targets, BAKED_PASTA_SERVINGS, { ...options, objective });
      expect(result.solver.model).toBe(modelText(elastic));
      const highs = await solveWithHighs(result.solver.model!);
      expect(highs.feasible).toBe(true);
      expect(
        objectiveAgrees(highs.objective, result.solver.objectiveValue, result.solver.model!),
        `${objective}: ${highs.objective} vs ${result.solver.objectiveValue}`,
      ).toBe(true);
    }
  });

  it('HiGHS finds no plan closer than ours on the product model (hard targets)', { timeout: 60_000 }, async () => {
    const result = rewrite('closest');
    const hard = buildRewriteModel(lines, targets, BAKED_PASTA_SERVINGS, options, { hardTargets: true });
    const highs = await solveWithHighs(modelText(hard));
    expect(highs.feasible).toBe(true);
    expect(relativeGap(result.solver.objectiveValue, highs.objective)).toBeLessThan(1e-6);
  });

  it('with one swap the targets are out of reach, and the suggestions say what would do', { timeout: 60_000 }, () => {
    const result = solveRewrite(lines, targets, BAKED_PASTA_SERVINGS, { ...options, maxSwaps: 1 });
    expect(result.status).toBe('infeasible');
    if (result.status !== 'infeasible') return;
    expect(result.message).toMatch(/best reachable: \d+ g protein at \d+ kcal per serving/);
    expect(result.held).toEqual([{ line: 9, reason: 'salt: kept as written' }]);
    const more = result.suggestions.find((s) => s.kind === 'more-swaps');
    expect(more?.message).toMatch(/^allow \d more swaps? \(\d in all\)$/);
    for (const s of result.suggestions) {
      const request = applySuggestion(targets, { ...options, maxSwaps: 1 }, s);
      expect(solveRewrite(lines, request.targets, BAKED_PASTA_SERVINGS, request.options).status, s.message).toBe('optimal');
    }
  });
});
