import type { CulinaryLine } from './types';

const FRESH_HERB = /^(parsley, fresh|coriander \(cilantro\) leaves|chives, raw)/i;

/**
 * What kind of ingredient a line is, before the dish is known: read from the food's catalogue roles
 * and name, and the words the cook wrote. Dish type and line function are built on these kinds.
 */
export const LINE_KINDS = [
  'salt',
  'yeast',
  'leavener',
  'extract',
  'acid',
  'seasoning',
  'aromatic',
  'liquid',
  'flour',
  'starch',
  'crumbs',
  'egg',
  'sugar',
  'syrup',
  'chocolate',
  'mix-in',
  'butter-oil',
  'milk',
  'cream',
  'cultured',
  'melting-cheese',
  'hard-cheese',
  'fresh-cheese',
  'meat',
  'cured-meat',
  'fish',
  'legume',
  'tomato',
  'vegetable',
  'fruit',
  'nut',
  'sauce',
  'condensed-soup',
  'dressing',
  'wrap',
  'other',
] as const;
export type LineKind = (typeof LINE_KINDS)[number];

const has = (roles: readonly string[], ...r: string[]) => r.some((x) => roles.includes(x));

const AROMATIC = /\b(onions?|garlic|shallots?|scallions?|green onions?|leeks?|ginger|chives|jalape(n|ñ)os?|chil(i|e)s?|chilies|chil(i|e) peppers?)\b/i;
const ACID = /\b(vinegar|lemon juice|lime juice|lemon|lime)\b/i;
const EXTRACT = /\bextract\b/i;
const LIQUID = /\b(broth|stock|bouillon|water|wine|beer)\b/i;
const TOMATO = /\btomato(es)?\b/i;
const SALT = /^salt\b|\bsalt, table\b|\bkosher salt\b|\bsea salt\b/i;

export function lineKind(line: CulinaryLine): LineKind {
  const f = line.food;
  const text = `${line.phrase} ${f?.name ?? ''}`;
  if (!f) {
    if (SALT.test(line.phrase)) return 'salt';
    if (/\bwater\b/i.test(line.phrase)) return 'liquid';
    return 'other';
  }
  const name = f.name;
  const roles = f.roles;
  if (/^salt\b/i.test(name) || SALT.test(line.phrase)) return 'salt';
  if (/\byeast\b/i.test(name)) return 'yeast';
  if (has(roles, 'baking-leavener') || /\bleavening\b|baking (soda|powder)|cream of tartar/i.test(name)) return 'leavener';
  if (EXTRACT.test(name) || EXTRACT.test(line.phrase)) return 'extract';
  if (/^(vinegar|lemon juice|lime juice)\b/i.test(name) || (has(roles, 'fruit', 'condiment') && ACID.test(line.phrase) && !/\bzest\b/i.test(line.phrase)))
    return 'acid';
  if (
    has(roles, 'broth-stock') ||
    /^(water|beverages, water)\b|^alcoholic beverage/i.test(name) ||
    (LIQUID.test(line.phrase) && !has(roles, 'dairy-milk', 'cream'))
  )
    return 'liquid';
  // SR28 files parsley, cilantro and chives with the vegetables; in a dish they are herbs that season it
  if (has(roles, 'herb-spice') || FRESH_HERB.test(name)) return 'seasoning';
  if (AROMATIC.test(line.phrase) && has(roles, 'vegetable', 'herb-spice', 'other')) return 'aromatic';
  if (/^soup,.*condensed/i.test(name)) return 'condensed-soup';
  if (/\b(catsup|ketchup|mustard, prepared|worcestershire|salsa|barbecue sauce)\b/i.test(name)) return 'sauce';
  if (has(roles, 'flatbread-wrap') || /^taco shells|^tortillas\b/i.test(name)) return 'wrap';
  if (/mayonnaise|salad dressing/i.test(name)) return 'dressing';
  if (has(roles, 'flour') || /^wheat flour|\bflour\b/i.test(name)) return 'flour';
  if (has(roles, 'breadcrumb-coating') || /\bcrumbs\b|\bpanko\b/i.test(line.phrase)) return 'crumbs';
  if (has(roles, 'egg')) return 'egg';
  if (has(roles, 'chocolate')) return /\b(chips|morsels|chunks)\b/i.test(line.phrase) ? 'mix-in' : 'chocolate';
  if (has(roles, 'sweetener')) return /syrup|honey|molasses/i.test(name) ? 'syrup' : 'sugar';
  if (has(roles, 'melting-cheese')) return 'melting-cheese';
  if (has(roles, 'hard-cheese')) return 'hard-cheese';
  if (/^cheese, (ricotta|cream|neufchatel|cottage)/i.test(name)) return 'fresh-cheese';
  if (has(roles, 'soft-cheese')) return 'fresh-cheese';
  if (has(roles, 'sour-cream-yogurt')) return 'cultured';
  if (has(roles, 'cream') || /^cream\b|half and half/i.test(name)) return 'cream';
  if (has(roles, 'dairy-milk') || /^milk\b|buttermilk/i.test(name)) return 'milk';
  if (/^milk, canned, evaporated/i.test(name)) return 'milk';
  // a spoonful of sesame oil is stirred in for its toasted flavour, a seasoning; more than a tablespoon is the cooking oil
  if (/^oil, sesame\b/i.test(name) && line.grams <= 15) return 'seasoning';
  if (has(roles, 'cooking-fat') || /^(butter|oil|margarine|shortening|lard)\b/i.test(name)) return 'butter-oil';
  if (has(roles, 'cured-meat-topping')) return 'cured-meat';
  if (has(roles, 'ground-meat', 'poultry', 'red-meat', 'pork', 'sausage', 'plant-protein')) return 'meat';
  if (has(roles, 'fish-seafood')) return 'fish';
  if (has(roles, 'tomato-sauce') || /alfredo|sauce/i.test(name)) return TOMATO.test(text) && !/sauce/i.test(text) ? 'tomato' : 'sauce';
  if (TOMATO.test(name)) return 'tomato';
  if (has(roles, 'pasta', 'rice-grain', 'potato', 'bread')) return 'starch';
  if (has(roles, 'flatbread-wrap')) return 'wrap';
  if (has(roles, 'legume')) return 'legume';
  if (has(roles, 'vegetable')) return 'vegetable';
  if (has(roles, 'fruit')) return 'fruit';
  if (has(roles, 'nut-seed')) return 'nut';
  if (has(roles, 'condiment')) return 'sauce';
  return 'other';
}
