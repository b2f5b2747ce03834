import type { CatalogueFood, DietFlag, Role } from '../../shared/food';
import { allergensOf, allergensOfRecipe, type Allergen } from '../../shared/allergens';
import { heldReasonFor, readDish } from '../../shared/culinary/infer-dish';
import { bandFor, keepScaleOf, rulesForLine } from '../../shared/culinary/match-rules';
import type { CulinaryLine, DishContext, DishType, LineFunction } from '../../shared/culinary/types';
import type { Candidate, RuleRef } from '../../shared/rewrite/types';
import { resolvedRulesFor, type ResolvedRule } from './substitution-rules';

/** SR28 groups never offered as a swap: baby foods, fast foods, meals and entrées, restaurant foods. */
const NEVER_CANDIDATE_GROUPS = new Set(['03', '21', '22', '36']);

/** An approved swap from the cook's coach. */
export interface ApprovedSwap {
  fromFoodId?: number;
  fromRole?: Role;
  toFoodId: number;
  /** mL of the swap per mL of the original */
  volumeRatio: number;
  /** grams of the swap per gram of the original, when the coach gave the ratio by mass */
  massRatio?: number;
  note?: string;
  coachName: string;
}

export interface CandidateOptions {
  diet: DietFlag[];
  excludedFoodIds: ReadonlySet<number>;
  approved: ApprovedSwap[];
  /** allergens the cook allows a swap to bring into the recipe */
  allowAllergens?: readonly Allergen[];
  /** the cook's choice of function by line index */
  lineRoles?: Readonly<Record<number, LineFunction>>;
  /** which custom foods the viewer may use (their own and their coach's) */
  canUse?: (food: CatalogueFood) => boolean;
}

/** A recipe line as the candidate builder reads it. */
export interface CandidateLine {
  food: CatalogueFood | null;
  /** the food phrase as written */
  phrase: string;
  comment?: string | null;
  grams: number;
}

export interface LineCandidates {
  role: LineFunction;
  context: DishContext;
  candidates: Candidate[];
  keepScale?: [number, number];
  heldReason?: string;
}

export interface RecipeCandidates {
  dishType: DishType;
  lines: LineCandidates[];
}

export function toCandidate(food: CatalogueFood, extra: Partial<Candidate> = {}): Candidate {
  const { waterG: _water, ...per100g } = food.per100g;
  return { foodId: food.id, name: food.name, source: food.source, densityGPerMl: food.densityGPerMl, per100g, ...extra };
}

function toCulinaryLine(line: CandidateLine): CulinaryLine {
  return { phrase: line.phrase, comment: line.comment ?? null, food: line.food, grams: line.grams };
}

/** The coach's ratio by mass: given by mass, or from the volume ratio and the two densities. */
export function approvedMassRatio(swap: ApprovedSwap, from: CatalogueFood, to: CatalogueFood): number {
  if (swap.massRatio !== undefined && swap.massRatio > 0) return swap.massRatio;
  return (swap.volumeRatio * to.densityGPerMl) / from.densityGPerMl;
}

interface Filters {
  diet: DietFlag[];
  excluded: ReadonlySet<number>;
  /** allergens already in the recipe, plus those the cook allows */
  allowed: ReadonlySet<Allergen>;
}

/** Why a food may not join this recipe, or null when it may. */
function refusal(food: CatalogueFood, filters: Filters): string | null {
  if (filters.excluded.has(food.id)) return 'excluded';
  if (food.branded || NEVER_CANDIDATE_GROUPS.has(food.foodGroup)) return 'branded or prepared';
  if (!filters.diet.every((d) => food.diet.includes(d))) return 'diet';
  const added = allergensOf(food).filter((a) => !filters.allowed.has(a));
  return added.length ? `brings ${added.join(', ')}` : null;
}

function ruleCandidates(
  engine: { foods: readonly CatalogueFood[] },
  rule: ResolvedRule,
  filters: Filters,
  canUse: ((f: CatalogueFood) => boolean) | undefined,
  band: [number, number] | undefined,
  lineGrams: number,
): Candidate[] {
  const out: Candidate[] = [];
  // a line of one piece (1 egg) is swapped whole or not at all: no cook keeps half an egg
  const onePiece = rule.pieceGrams !== undefined && lineGrams < 1.5 * rule.pieceGrams;
  if (onePiece && rule.rule.maxShare < 1) return out;
  const ref = (): RuleRef => ({ ...rule.ref, ...(rule.ref.cautions ? { cautions: [...rule.ref.cautions] } : {}) });
  const extra = (massRatio: number): Partial<Candidate> => ({
    massRatio,
    maxShare: rule.rule.maxShare,
    ...(rule.rule.partial && !onePiece ? { partial: true } : {}),
    ...(band ? { band: [band[0], band[1]] as [number, number] } : {}),
    rule: ref(),
  });
  for (const t of rule.targets) {
    if (t.kind === 'food') {
      if (refusal(t.food, filters)) continue;
      out.push(toCandidate(t.food, extra(t.massRatio)));
    } else if (canUse) {
      for (const f of engine.foods) {
        if (f.source !== 'custom' || !f.roles.includes(t.role as Role) || !canUse(f)) continue;
        if (!filters.diet.every((d) => f.diet.includes(d)) || filters.excluded.has(f.id)) continue;
        if (allergensOf(f).some((a) => !filters.allowed.has(a))) continue;
        out.push(toCandidate(f, extra(t.massRatio)));
      }
    }
  }
  return out;
}

/**
 * The cook's own foods (and their coach's), entered from labels with the culinary roles they play: a
 * swap, weight for weight, for a line whose food plays the food's main role, where the line may change.
 */
function ownFoodCandidates(
  engine: { foods: readonly CatalogueFood[] },
  food: CatalogueFood,
  filters: Filters,
  canUse: ((f: CatalogueFood) => boolean) | undefined,
): Candidate[] {
  const main = food.roles[0];
  if (!canUse || !main) return [];
  const out: Candidate[] = [];
  for (const f of engine.foods) {
    if (f.source !== 'custom' || f.id === food.id || !f.roles.includes(main) || !canUse(f)) continue;
    if (refusal(f, filters)) continue;
    out.push(
      toCandidate(f, {
        massRatio: 1,
        maxShare: 1,
        rule: { id: 'own-food', label: `your ${f.name} for ${food.name}, 1:1 by weight`, why: 'a food you entered from its label for this role' },
      }),
    );
  }
  return out;
}

/**
 * Every line's function and candidates (PRODUCT.md step 5): the original food; the targets of the
 * substitution rules that apply to its food class in this dish context, kept only when they pass the
 * diet filters and bring no major allergen absent from the recipe (unless the cook allows it); and
 * every approved swap of the cook's coach for that food or role, which takes the place of a general
 * rule offering the same food. A held line (seasoning, leavener, cooking liquid…) has only its original
 * food; a line no rule covers keeps its food at the written grams.
 */
export function recipeCandidates(
  engine: { foods: readonly CatalogueFood[]; byId: ReadonlyMap<number, CatalogueFood> },
  lines: readonly CandidateLine[],
  options: CandidateOptions,
): RecipeCandidates {
  const reading = readDish(lines.map(toCulinaryLine), options.lineRoles ?? {});
  const resolved = resolvedRulesFor(engine.foods as CatalogueFood[]);
  const recipeAllergens = allergensOfRecipe(lines.flatMap((l) => (l.food ? [l.food] : [])));
  const filters: Filters = {
    diet: options.diet,
    excluded: options.excludedFoodIds,
    allowed: new Set<Allergen>([...recipeAllergens, ...(options.allowAllergens ?? [])]),
  };
  const rules = resolved.map((r) => r.rule);
  const recipeKinds = new Set(reading.lines.map((l) => l.kind));
  const byRule = new Map(resolved.map((r) => [r.rule, r]));

  const out = lines.map((line, i): LineCandidates => {
    const { role, context } = reading.lines[i];
    const food = line.food;
    if (!food) return { role, context, candidates: [] };
    const original = toCandidate(food, { original: true, massRatio: 1 });
    const heldReason = heldReasonFor(role);
    if (heldReason) return { role, context, candidates: [original], heldReason };

    const situation = {
      food,
      phrase: line.phrase,
      role,
      dishType: reading.dishType,
      context,
      mixedDish: reading.mixedDish,
      recipeKinds,
      browsMeat: reading.browsMeat,
      wokSauce: reading.wokSauce,
    };
    const applicable = rulesForLine(rules, situation);
    const seen = new Map<number, Candidate>();
    const candidates: Candidate[] = [original];
    seen.set(food.id, original);

    for (const swap of options.approved) {
      const applies = swap.fromFoodId === food.id || (swap.fromRole !== undefined && food.roles.includes(swap.fromRole));
      const to = engine.byId.get(swap.toFoodId);
      if (!applies || !to || seen.has(to.id)) continue;
      if (filters.excluded.has(to.id) || !filters.diet.every((d) => to.diet.includes(d))) continue;
      if (allergensOf(to).some((a) => !filters.allowed.has(a))) continue;
      const massRatio = approvedMassRatio(swap, food, to);
      const c = toCandidate(to, {
        massRatio,
        maxShare: 1,
        approved: { by: swap.coachName, note: swap.note, volumeRatio: swap.volumeRatio, massRatio },
      });
      seen.set(to.id, c);
      candidates.push(c);
    }
    for (const rule of applicable) {
      const r = byRule.get(rule)!;
      for (const c of ruleCandidates(engine, r, filters, options.canUse, bandFor(rule, situation), line.grams)) {
        if (seen.has(c.foodId)) continue;
        seen.set(c.foodId, c);
        candidates.push(c);
      }
    }
    for (const c of ownFoodCandidates(engine, food, filters, options.canUse)) {
      if (seen.has(c.foodId)) continue;
      seen.set(c.foodId, c);
      candidates.push(c);
    }
    const keep = keepScaleOf(applicable);
    if (keep) original.rule = byRule.get(keep.rule)!.ref;
    return { role, context, candidates, ...(keep ? { keepScale: keep.range } : {}) };
  });
  return { dishType: reading.dishType, lines: out };
}
