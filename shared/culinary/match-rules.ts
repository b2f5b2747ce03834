import type { LineKind } from './line-kind';
import type { FoodClass, SubstitutionRule } from './rule-schema';
import type { CulinaryFood, DishContext, DishType, LineFunction } from './types';

const regexCache = new Map<string, RegExp>();
function re(source: string): RegExp {
  let r = regexCache.get(source);
  if (!r) {
    r = new RegExp(source, 'i');
    regexCache.set(source, r);
  }
  return r;
}

/** Whether a food (as written in `phrase`) belongs to a rule's food class. */
export function inFoodClass(cls: FoodClass, food: CulinaryFood, phrase: string): boolean {
  if (cls.ndb && !cls.ndb.includes(food.sourceId)) return false;
  if (cls.groups && !cls.groups.includes(food.foodGroup)) return false;
  if (cls.name && !re(cls.name).test(food.name)) return false;
  if (cls.notName && re(cls.notName).test(food.name)) return false;
  if (cls.phrase && !re(cls.phrase).test(phrase)) return false;
  if (cls.notPhrase && re(cls.notPhrase).test(phrase)) return false;
  if (cls.roles && !cls.roles.some((r) => food.roles.includes(r))) return false;
  if (cls.minFatG !== undefined && !(food.per100g.fatG >= cls.minFatG)) return false;
  if (cls.maxFatG !== undefined && !(food.per100g.fatG <= cls.maxFatG)) return false;
  return true;
}

/** Whether a rule holds for a line's function in this dish and context (`mixedDish`: see DishReading). */
export function ruleHoldsIn(
  rule: SubstitutionRule,
  role: LineFunction,
  dishType: DishType,
  context: DishContext,
  mixedDish = false,
  recipeKinds: ReadonlySet<LineKind> = new Set(),
  browsMeat = false,
  wokSauce = false,
): boolean {
  if (rule.functions && !rule.functions.includes(role)) return false;
  if (rule.stirFried && !wokSauce) return false;
  if (rule.browning !== undefined && rule.browning !== browsMeat) return false;
  if (rule.recipeHas && !rule.recipeHas.every((k) => recipeKinds.has(k))) return false;
  if (rule.recipeLacks && rule.recipeLacks.some((k) => recipeKinds.has(k))) return false;
  if (rule.mixedDishOnly && !(mixedDish && role === 'main-protein')) return false;
  if (rule.dishTypes && !rule.dishTypes.includes(dishType)) return false;
  if (rule.contexts.fails?.includes(context)) return false;
  if (rule.contexts.works) return rule.contexts.works.includes(context);
  // structural ingredients of bakes change only through rules that name bakes
  return context !== 'baked-batter-dough';
}

export interface LineSituation {
  food: CulinaryFood;
  phrase: string;
  role: LineFunction;
  dishType: DishType;
  context: DishContext;
  /** the dish's main protein is one part of a mixed dish (DishReading.mixedDish) */
  mixedDish?: boolean;
  /** every line kind in the recipe (for rules with recipeHas) */
  recipeKinds?: ReadonlySet<LineKind>;
  /** raw meat or fish is browned in the dish's pan (DishReading.browsMeat) */
  browsMeat?: boolean;
  /** the recipe is seasoned with soy, oyster or fish sauce (DishReading.wokSauce) */
  wokSauce?: boolean;
}

/** The rules that apply to a line: its food class, function, dish type and context. */
export function rulesForLine(rules: readonly SubstitutionRule[], line: LineSituation): SubstitutionRule[] {
  return rules.filter(
    (r) =>
      inFoodClass(r.from, line.food, line.phrase) &&
      ruleHoldsIn(r, line.role, line.dishType, line.context, line.mixedDish, line.recipeKinds, line.browsMeat, line.wokSauce),
  );
}

/**
 * The band of a rule's targets on this line: its own band, widened up to `moreInMixedDish` on the main
 * protein of a mixed dish (without a band of its own the low end is the written amount, ×1).
 */
export function bandFor(rule: SubstitutionRule, line: Pick<LineSituation, 'role' | 'mixedDish'>): [number, number] | undefined {
  const more = rule.moreInMixedDish !== undefined && line.mixedDish === true && line.role === 'main-protein' ? rule.moreInMixedDish : undefined;
  if (!more) return rule.band;
  const [lo, hi] = rule.band ?? [1, 1];
  return [lo, Math.max(hi, more)];
}

/**
 * The range the original food may take when it is not swapped: the widest keepScale among the rules
 * that apply, or none (the written grams exactly).
 */
export function keepScaleOf(applicable: readonly SubstitutionRule[]): { range: [number, number]; rule: SubstitutionRule } | undefined {
  let best: { range: [number, number]; rule: SubstitutionRule } | undefined;
  for (const r of applicable) {
    if (!r.keepScale) continue;
    const [lo, hi] = r.keepScale;
    if (!best) best = { range: [lo, hi], rule: r };
    else if (hi - lo > best.range[1] - best.range[0]) best = { range: [lo, hi], rule: r };
  }
  return best;
}
