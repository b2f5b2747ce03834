import type { CatalogueFood, DietFlag, Role } from '../../shared/food';
import type { Candidate } from '../../shared/rewrite/types';
import type { FoodEngine } from './food-engine';

/**
 * Roles whose foods Hearthswap will trade for a lighter one. Vegetables, herbs, spices, leaveners and
 * the like stay as written: swapping them changes the dish, not its weight on the waistline.
 */
export const SWAPPABLE_ROLES: ReadonlySet<Role> = new Set<Role>([
  'melting-cheese', 'hard-cheese', 'soft-cheese', 'cured-meat-topping', 'ground-meat', 'poultry', 'red-meat',
  'pork', 'sausage', 'plant-protein', 'flatbread-wrap', 'bread', 'pasta', 'rice-grain', 'tomato-sauce',
  'cream-sauce-base', 'cooking-fat', 'dairy-milk', 'cream', 'sour-cream-yogurt', 'sweetener', 'flour',
  'breadcrumb-coating', 'egg', 'chocolate',
]);

/** SR28 groups never offered as a swap: baby foods, fast foods, meals and entrées, restaurant foods. */
const NEVER_CANDIDATE_GROUPS = new Set(['03', '21', '22', '36']);

const COOKED = /\b(cooked|boiled|roasted|baked|braised|grilled|fried|broiled|stewed|steamed|microwaved|simmered|pan-broiled|scrambled|poached|toasted)\b/i;

/** Raw and cooked forms weigh differently per cup; a swap keeps the form the recipe was written in. */
function sameState(a: CatalogueFood, b: CatalogueFood) {
  return COOKED.test(a.name) === COOKED.test(b.name);
}

/** An approved swap from the cook's coach (filled in once the coach library exists). */
export interface ApprovedSwap {
  fromFoodId?: number;
  fromRole?: Role;
  toFoodId: number;
  volumeRatio: number;
  note?: string;
  coachName: string;
}

export interface CandidateOptions {
  k: number;
  diet: DietFlag[];
  excludedFoodIds: ReadonlySet<number>;
  approved: ApprovedSwap[];
  /**
   * Foods the viewer (or their coach) entered from labels, with the culinary roles they were given:
   * each is a candidate for lines whose food plays one of those roles.
   */
  ownFoods?: readonly CatalogueFood[];
}

export function toCandidate(food: CatalogueFood, extra: Partial<Candidate> = {}): Candidate {
  const { waterG: _water, ...per100g } = food.per100g;
  return { foodId: food.id, name: food.name, densityGPerMl: food.densityGPerMl, per100g, ...extra };
}

function kcalPerMl(f: CatalogueFood) {
  return (f.per100g.kcal / 100) * f.densityGPerMl;
}

function proteinPerKcal(f: CatalogueFood) {
  return f.per100g.kcal > 0 ? f.per100g.proteinG / f.per100g.kcal : f.per100g.proteinG > 0 ? 1 : 0;
}

/** Foods sharing a swappable role with `food`, indexed once per engine. */
const roleIndexes = new WeakMap<FoodEngine, Map<Role, CatalogueFood[]>>();
function foodsByRole(engine: FoodEngine) {
  let index = roleIndexes.get(engine);
  if (!index) {
    index = new Map();
    for (const f of engine.foods) {
      if (f.branded || f.source !== 'usda-sr28' || NEVER_CANDIDATE_GROUPS.has(f.foodGroup)) continue;
      for (const role of f.roles) {
        if (!SWAPPABLE_ROLES.has(role)) continue;
        const list = index.get(role) ?? [];
        list.push(f);
        index.set(role, list);
      }
    }
    roleIndexes.set(engine, index);
  }
  return index;
}

/**
 * A line's candidates (PRODUCT.md step 5): the original food; up to K foods sharing its primary role
 * that pass the diet filters, ranked by lightness (kcal per mL down, protein per kcal up, by the sum
 * of the two ranks); and every approved swap from the cook's coach for that food or role.
 */
export function candidatesFor(engine: FoodEngine, food: CatalogueFood, options: CandidateOptions): Candidate[] {
  const out: Candidate[] = [toCandidate(food, { original: true })];
  const seen = new Set([food.id]);
  // The first swappable role is the most specific one (ROLES is ordered that way): ground beef is
  // ground meat before it is red meat, so its candidates are other minces, not steaks or game.
  const primary = food.roles.find((r) => SWAPPABLE_ROLES.has(r));

  for (const swap of options.approved) {
    const applies = swap.fromFoodId === food.id || (swap.fromRole !== undefined && food.roles.includes(swap.fromRole));
    const to = engine.byId.get(swap.toFoodId);
    if (!applies || !to || seen.has(to.id) || options.excludedFoodIds.has(to.id)) continue;
    if (!options.diet.every((d) => to.diet.includes(d))) continue;
    seen.add(to.id);
    out.push(toCandidate(to, { approved: { by: swap.coachName, note: swap.note, volumeRatio: swap.volumeRatio } }));
  }
  if (!primary || options.k === 0) return out;

  for (const own of options.ownFoods ?? []) {
    if (seen.has(own.id) || options.excludedFoodIds.has(own.id) || !own.roles.includes(primary)) continue;
    if (!options.diet.every((d) => own.diet.includes(d))) continue;
    seen.add(own.id);
    out.push(toCandidate(own));
  }

  const list = (foodsByRole(engine).get(primary) ?? []).filter(
    (f) => !seen.has(f.id) && !options.excludedFoodIds.has(f.id) && sameState(food, f) && options.diet.every((d) => f.diet.includes(d)),
  );
  const byEnergy = [...list].sort((a, b) => kcalPerMl(a) - kcalPerMl(b));
  const byProtein = [...list].sort((a, b) => proteinPerKcal(b) - proteinPerKcal(a));
  const rank = new Map<number, number>();
  byEnergy.forEach((f, i) => rank.set(f.id, i));
  byProtein.forEach((f, i) => rank.set(f.id, (rank.get(f.id) ?? 0) + i));
  list.sort((a, b) => rank.get(a.id)! - rank.get(b.id)! || a.name.length - b.name.length || a.id - b.id);
  for (const f of list.slice(0, options.k)) out.push(toCandidate(f));
  return out;
}
