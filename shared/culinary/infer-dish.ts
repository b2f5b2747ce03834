import { lineKind, type LineKind } from './line-kind';
import type { CulinaryLine, DishContext, DishType, LineFunction } from './types';

export interface DishReading {
  dishType: DishType;
  /** a butter-and-flour (or oil-and-flour) roux thickens milk or cream */
  hasRoux: boolean;
  /**
   * the main protein is one part of a mixed dish (a casserole, pie filling, pasta or rice dish, chili,
   * taco filling), not shaped or breaded into the portion itself (a loaf, meatballs, patties, a cutlet)
   */
  mixedDish: boolean;
  /** raw meat or fish is browned in the dish's pan (ground beef for tacos), outside a bake */
  browsMeat: boolean;
  /** seasoned with soy, oyster or fish sauce: its noodles or rice are stir-fried (lo mein, pad thai, fried rice) */
  wokSauce: boolean;
  lines: { kind: LineKind; role: LineFunction; context: DishContext }[];
}

const TOPPING_WORDS = /\b(for (the )?(top|topping|serving|garnish|sprinkling)|to (serve|garnish|sprinkle|top)|on top|topping|garnish|sprinkle|dollop)\b/i;
const GREASE_WORDS = /\b(for (the )?(pan|griddle|skillet|greasing|frying)|to grease|greasing|for the dish)\b/i;
/** a fat that fries in a pan or on a griddle (not one that greases a baking dish) */
const PAN_WORDS = /\bfor (the )?(pan|griddle|skillet|frying)\b/i;
const COATING_WORDS = /\b(for (dredging|coating|dusting|breading)|dredg|dust(ing)?)\b/i;
// an egg beaten to brush a crust or a calzone is a wash, not the dough's structure
const WASH_WORDS = /\b(for (brushing|the egg wash|glazing)|egg wash|to brush)\b/i;
// crumbs and egg bind mince (a meatloaf, meatballs); around a whole cut (a cutlet, a chop) they are its breading
const MINCE_WORDS = /\b(ground|minced?|sausage)\b/i;
const BAKE_TYPES: readonly DishType[] = ['leavened-bake', 'batter', 'dough'];
const MIXED_TYPES: readonly DishType[] = ['assembled-bake', 'stovetop-sauce', 'simmered-dish', 'griddle-saute'];
const PASTA_WORDS = /\b(pasta|spaghetti|macaroni|noodles?|linguine|fettuccine|penne|rigatoni|bucatini|tagliatelle)\b/i;
// the sauces of a wok: noodles tossed with them are stir-fried (lo mein), and eggs go in scrambled
const WOK_SAUCE_WORDS = /\b(soy sauce|oyster sauce|fish sauce|hoisin|tamari|shoyu)\b/i;
/** the protein is the portion: a patty, a burger, a cutlet */
const PORTION_WORDS = /\b(patt(y|ies)|burgers?|cutlets?)\b/i;
/** fat kept cold to be cut or grated into flour, not melted or creamed into a batter */
const CUT_IN_FAT = /\b(cold|chilled|frozen|cut in|cut into|grated)\b/i;
/** a whole cut served as it is (a breast, a chop, a fillet): the portion, unless it is cut up for the dish */
const WHOLE_CUT_WORDS = /\b(breasts?|chops?|fillets?|filets?|steaks?|thighs?|drumsticks?|tenderloins?)\b/i;
const CUT_UP_WORDS = /\b(pieces|bite[- ]size|cubed|cubes|chunks|strips|nuggets|sliced|slices|diced|chopped|shredded|cut|ground|minced)\b/i;
/** served in a bun or roll: the portion too, unless the meat is simmered in a sauce spooned onto it (sloppy joes) */
const BUN_WORDS = /\b(buns?|rolls?)\b/i;
/** meat cut small before it is coated and fried, then tossed with rice or a sauce: one part of a mixed dish */
const BITE_PIECE_WORDS = /\b(pieces|bite[- ]size|cubed|cubes|chunks|strips|nuggets)\b/i;
/** a grain baked into bars, a crisp or a granola (rolled oats): not a savoury dish's starch */
const BAKING_GRAIN = /\boats?\b|\boatmeal\b/i;
/** meat cut to be braised or stewed in liquid (a paprikash, a stew), not sliced for a stir-fry */
const BRAISE_CUT_WORDS = /\b(cubed|cubes|chunks|stew meat|stewing)\b/i;
/** starches that thicken as a slurry, with no fat: they make no roux */
const SLURRY_STARCH = /\b(cornstarch|corn starch|arrowroot|potato starch|tapioca)\b/i;

const POTATO = /^potato/i;
/** grams of sugar, honey or syrup up to a level tablespoon (12.5 g granulated, about 14 g packed brown): a seasoning */
export const SEASONING_SUGAR_G = 14;
/** breads eaten as they are (a sandwich's muffin, a roll, toast): no sauce is tossed with them */
const BREAD_NAME = /^(bread|english muffins?|rolls?|bagels?|croissants?|biscuits?)\b/i;

/**
 * The potato line of a mashed-potato top over a meat filling (a cottage or shepherd's pie), or -1;
 * potatoes in a quarter or more of liquid are a stew's.
 */
function mashedPotatoLine(lines: readonly CulinaryLine[], kinds: readonly LineKind[]): number {
  const total = lines.reduce((s, l) => s + Math.max(0, l.grams), 0) || 1;
  const wet = gramsBy(lines, kinds, ['liquid', 'tomato', 'sauce']);
  if (!kinds.includes('meat') || kinds.includes('wrap') || wet >= 0.25 * total) return -1;
  return lines.findIndex((l, i) => kinds[i] === 'starch' && POTATO.test(l.food?.name ?? ''));
}

/**
 * Whole cuts of meat (no mince) dipped in egg and rolled in crumbs, or dredged in flour or starch
 * (a schnitzel, baked tenders, a chicken-fried steak, sesame chicken): the egg and crumbs or flour are the
 * breading. A dredge without crumbs counts only outside a pie, a dough or a soup.
 */
export function breadedPieces(lines: readonly CulinaryLine[], kinds: readonly LineKind[]): boolean {
  const cuts = lines.filter((_, i) => kinds[i] === 'meat');
  if (cuts.length === 0 || cuts.some((l) => MINCE_WORDS.test(`${l.phrase} ${l.food?.name ?? ''}`))) return false;
  if (!kinds.includes('egg')) return false;
  if (kinds.includes('crumbs')) return true;
  if (!lines.some((l, i) => kinds[i] === 'egg' && !WASH_WORDS.test(`${l.comment ?? ''} ${l.phrase}`))) return false;
  const total = lines.reduce((s, l) => s + Math.max(0, l.grams), 0) || 1;
  const meat = cuts.reduce((s, l) => s + Math.max(0, l.grams), 0);
  const dredge = gramsBy(lines, kinds, ['flour']);
  const wet = gramsBy(lines, kinds, ['liquid', 'tomato', 'sauce', 'condensed-soup']);
  const pie = lines.some((l) => /\b(pie crust|pastry|biscuit dough|dumplings?)\b/i.test(`${l.phrase} ${l.food?.name ?? ''}`));
  return dredge >= 0.05 * meat && wet < 0.25 * total && !pie && !kinds.includes('yeast') && !kinds.includes('wrap');
}

/** Fruit baked under a crumble of flour or oats, sugar and butter (an apple crisp, a cobbler): an assembled bake. */
function fruitUnderCrumble(lines: readonly CulinaryLine[], kinds: readonly LineKind[]): boolean {
  const total = lines.reduce((s, l) => s + Math.max(0, l.grams), 0) || 1;
  const crumble = kinds.includes('flour') || lines.some((l, i) => kinds[i] === 'starch' && BAKING_GRAIN.test(`${l.phrase} ${l.food?.name ?? ''}`));
  return gramsBy(lines, kinds, ['fruit']) >= 0.4 * total && crumble && kinds.includes('sugar') && kinds.includes('butter-oil');
}

/** Kinds that need a fat to cook in (browned, sautéed or scrambled): where none is in the dish, butter is only stirred in. */
const COOKED_IN_FAT: readonly LineKind[] = [
  'meat',
  'cured-meat',
  'fish',
  'egg',
  'aromatic',
  'vegetable',
  'legume',
  'tomato',
  'sauce',
  'condensed-soup',
  'wrap',
  'flour',
];

/**
 * Lines stirred into a cooked starch for richness: the butter, milk, cream or sour cream of a mashed-potato
 * top (written after its potatoes), or the butter, cream or sour cream of grits or a mash on their own.
 */
function enrichmentLines(lines: readonly CulinaryLine[], kinds: readonly LineKind[], dish: DishType): Set<number> {
  const out = new Set<number>();
  if (BAKE_TYPES.includes(dish)) return out;
  const stirredIn = (i: number) => !GREASE_WORDS.test(`${lines[i].comment ?? ''}`) && !TOPPING_WORDS.test(`${lines[i].comment ?? ''} ${lines[i].phrase}`);
  const potato = dish === 'assembled-bake' ? mashedPotatoLine(lines, kinds) : -1;
  if (potato >= 0) {
    kinds.forEach((k, i) => {
      if (i > potato && (k === 'butter-oil' || k === 'milk' || k === 'cream' || k === 'cultured') && stirredIn(i)) out.add(i);
    });
    return out;
  }
  const porridge = kinds.includes('starch') && kinds.some((k) => k === 'milk' || k === 'liquid') && !kinds.some((k) => COOKED_IN_FAT.includes(k));
  if (porridge) {
    kinds.forEach((k, i) => {
      if ((k === 'butter-oil' || k === 'cream' || k === 'cultured') && stirredIn(i)) out.add(i);
    });
  }
  return out;
}

function gramsBy(lines: readonly CulinaryLine[], kinds: readonly LineKind[], of: readonly LineKind[]) {
  return lines.reduce((s, l, i) => (of.includes(kinds[i]) ? s + Math.max(0, l.grams) : s), 0);
}

/** The dish type from every line's kind and weight (PRODUCT.md step 5). */
export function inferDishType(lines: readonly CulinaryLine[], kinds: readonly LineKind[] = lines.map(lineKind)): DishType {
  const g = (...of: LineKind[]) => gramsBy(lines, kinds, of);
  const has = (...of: LineKind[]) => kinds.some((k) => of.includes(k));
  const total = lines.reduce((s, l) => s + Math.max(0, l.grams), 0) || 1;
  const flour = g('flour');
  const comments = lines.map((l) => `${l.phrase} ${l.comment ?? ''}`).join(' ');

  if (has('yeast') && flour > 0) return 'dough';
  // rolled oats in bars or a crisp are a baking grain, not a savoury dish's starch
  const savouryStarch = lines.some((l, i) => kinds[i] === 'starch' && !BAKING_GRAIN.test(`${l.phrase} ${l.food?.name ?? ''}`));
  const savouryMain = savouryStarch || has('meat', 'cured-meat', 'fish', 'wrap', 'condensed-soup');
  const bakeCore = flour + g('sugar', 'chocolate');
  if (flour > 0 && !savouryMain && bakeCore >= 0.25 * total) {
    const liquid = g('milk', 'liquid', 'cultured');
    // a pancake, waffle or crêpe batter pours thin: about twice the flour's weight in liquid; a quick bread's
    // batter (cornbread, muffins, cakes) is thicker and bakes in a pan, as a leavened bake
    if (liquid >= 1.4 * flour && g('sugar') < 0.5 * flour) return 'batter';
    // rich and dry (cookies, shortbread, pastry): the fat is the dough's structure
    const moisture = liquid + g('fruit', 'vegetable', 'legume');
    if (g('butter-oil') >= 0.5 * flour && moisture < 0.25 * flour) return 'dough';
    // cold fat cut into the flour (biscuits, scones, a pie crust) is a dough: its flakes are the fat's own
    if (lines.some((l, i) => kinds[i] === 'butter-oil' && CUT_IN_FAT.test(`${l.phrase} ${l.comment ?? ''}`))) return 'dough';
    return 'leavened-bake';
  }
  // cream cheese beaten with sugar and eggs and baked (a cheesecake) is a bake: its eggs, cheese and sugar are structure
  if (!savouryMain && has('egg') && g('fresh-cheese') >= 0.25 * total && g('sugar') >= 0.1 * total) return 'leavened-bake';
  if (g('dressing') >= 0.08 * total && !has('condensed-soup', 'flour')) return 'cold-dish';
  const pieCrust = lines.some((l) => /\b(pie crust|pastry|biscuit dough|puff pastry)\b/i.test(`${l.phrase} ${l.food?.name ?? ''}`));
  const layered = /\b(layer|lasagna|casserole|baked|gratin)\b/i.test(comments);
  const cheese = has('melting-cheese', 'fresh-cheese', 'hard-cheese');
  const wet = g('liquid', 'tomato', 'sauce');
  const mashedTop = mashedPotatoLine(lines, kinds) >= 0;
  // eggs set with milk around bread or fillings in the oven: a strata, quiche or breakfast casserole
  const custard = has('egg') && has('milk', 'cream') && !has('flour') && g('egg', 'milk', 'cream') >= 0.3 * total;
  // bread dipped in eggs and milk and fried in a buttered pan (French toast) is a griddle dish, not a baked custard
  const panFried = lines.some((l, i) => kinds[i] === 'butter-oil' && PAN_WORDS.test(l.comment ?? ''));
  if (custard && panFried && !pieCrust && !layered && !has('meat', 'cured-meat', 'fish')) return 'griddle-saute';
  // raw potatoes sliced into a flour-thickened milk sauce with little broth bake as a gratin (scalloped potatoes);
  // in a quarter or more of liquid they are a soup
  const slicedPotatoGratin =
    lines.some(
      (l, i) =>
        kinds[i] === 'starch' && POTATO.test(l.food?.name ?? '') && /\braw\b/i.test(l.food?.name ?? '') && /\bslic/i.test(`${l.phrase} ${l.comment ?? ''}`),
    ) &&
    has('flour') &&
    has('milk', 'cream') &&
    wet < 0.25 * total;
  if (
    custard ||
    pieCrust ||
    has('condensed-soup') ||
    layered ||
    (has('fresh-cheese') && has('starch') && has('melting-cheese')) ||
    (has('crumbs') && has('starch') && cheese) ||
    (mashedTop && !has('wrap')) ||
    slicedPotatoGratin ||
    fruitUnderCrumble(lines, kinds)
  ) {
    return 'assembled-bake';
  }
  // a sauce baked over the dish (enchilada sauce), not one served beside it (salsa, ketchup)
  const bakedSauce = lines.reduce(
    (s, l, i) => (kinds[i] === 'sauce' && !/salsa|catsup|ketchup/i.test(`${l.phrase} ${l.food?.name ?? ''}`) ? s + l.grams : s),
    0,
  );
  if (has('wrap') && cheese) return bakedSauce >= 0.1 * total || has('fresh-cheese') ? 'assembled-bake' : 'griddle-saute';
  // breaded cutlets or pieces, pan-fried or oven-fried (a schnitzel, tenders, sesame chicken)
  if (breadedPieces(lines, kinds)) return 'griddle-saute';
  // a loaf or meatballs: mince held together by crumbs and egg
  if (has('meat') && has('crumbs') && has('egg') && !has('starch', 'wrap')) return 'assembled-bake';
  // a sandwich's bread is not tossed with its eggs and cheese: a breakfast sandwich is a griddle dish
  const sauceStarch = lines.some((l, i) => kinds[i] === 'starch' && !BREAD_NAME.test(l.food?.name ?? ''));
  if (sauceStarch && has('cream', 'milk', 'melting-cheese', 'hard-cheese', 'egg') && wet < 0.25 * total) return 'stovetop-sauce';
  if (wet >= 0.25 * total || (has('legume') && has('tomato'))) return 'simmered-dish';
  // raw meat in cubes or chunks, browned and then cooked in broth or wine (a paprikash, a goulash): a braise
  const braised = lines.some((l, i) => kinds[i] === 'meat' && BRAISE_CUT_WORDS.test(`${l.phrase} ${l.comment ?? ''}`) && /\braw\b/i.test(l.food?.name ?? ''));
  if (braised && has('liquid') && !lines.some((l) => WOK_SAUCE_WORDS.test(`${l.phrase} ${l.food?.name ?? ''}`))) return 'simmered-dish';
  // a sandwich: bread around eggs or bacon cooked in the pan
  if (has('meat', 'fish', 'wrap') || (has('starch') && !sauceStarch && has('egg', 'cured-meat'))) return 'griddle-saute';
  return 'other';
}

function roleOf(
  line: CulinaryLine,
  kind: LineKind,
  dish: DishType,
  ctx: {
    hasRoux: boolean;
    kinds: readonly LineKind[];
    sugarIsStructure: boolean;
    rouxFat: number;
    riceNotPasta: boolean;
    wokSauce: boolean;
    /** crumbs, egg and flour coat whole pieces of meat (no mince in the recipe) */
    breaded: boolean;
    enrichment: ReadonlySet<number>;
    /** the breading's flour line (the largest), or -1 */
    dredgeFlour: number;
    /** whether a milk line is the breading's egg dip */
    dipMilk: (index: number) => boolean;
    /** fruit baked under a crumble: its flour, oats and butter are the topping */
    crumble: boolean;
    /** crumbs are written "for the top" */
    crumbTopping: boolean;
  },
  index: number,
): LineFunction {
  if (ctx.enrichment.has(index)) return 'enrichment';
  const note = `${line.comment ?? ''}`;
  const topping = TOPPING_WORDS.test(note) || TOPPING_WORDS.test(line.phrase);
  const bake = BAKE_TYPES.includes(dish);
  const has = (...of: LineKind[]) => ctx.kinds.some((k) => of.includes(k));
  switch (kind) {
    case 'salt':
      return 'salt';
    case 'yeast':
      return 'yeast';
    case 'leavener':
      return 'leavener';
    case 'extract':
      return 'extract';
    case 'acid':
      return 'acid';
    case 'seasoning':
      return 'seasoning';
    case 'aromatic':
      return 'aromatic';
    case 'liquid':
      return bake ? 'structure' : 'cooking-liquid';
    case 'flour':
      if (ctx.crumble) return 'topping';
      if (COATING_WORDS.test(note) || (ctx.breaded && !bake && (index === ctx.dredgeFlour || !ctx.hasRoux))) return 'coating';
      return bake ? 'structure' : 'thickener';
    case 'starch':
    case 'wrap':
      if (ctx.crumble && BAKING_GRAIN.test(`${line.phrase} ${line.food?.name ?? ''}`)) return 'topping';
      return bake ? 'structure' : 'starch';
    case 'crumbs':
      if (topping) return 'topping';
      if (ctx.breaded) return 'coating';
      if (has('meat') && has('egg') && !COATING_WORDS.test(note)) return 'binder';
      return dish === 'assembled-bake' ? 'topping' : 'coating';
    case 'egg':
      if (WASH_WORDS.test(`${note} ${line.phrase}`)) return 'coating';
      if (bake) return 'structure';
      if (ctx.breaded) return 'coating';
      if (has('meat') && has('crumbs')) return 'binder';
      if (dish === 'assembled-bake' && has('fresh-cheese')) return 'binder';
      // eggs set with milk in the oven: a strata, quiche or breakfast casserole
      if (dish === 'assembled-bake' && has('milk', 'cream')) return 'custard';
      // eggs tossed with hot pasta make its sauce (carbonara); stirred into rice (fried rice) or into noodles
      // stir-fried with soy or oyster sauce (lo mein) they are scrambled
      if (dish === 'stovetop-sauce' && has('starch') && !has('milk', 'cream')) return ctx.riceNotPasta || ctx.wokSauce ? 'main-protein' : 'sauce';
      if (COATING_WORDS.test(note) || has('crumbs')) return 'coating';
      return 'main-protein';
    case 'sugar':
      // a teaspoon or a tablespoon of sugar seasons a sauce or feeds a dough's yeast: kept as written
      if (line.grams > 0 && line.grams <= SEASONING_SUGAR_G && !topping) return 'seasoning';
      if (bake) return ctx.sugarIsStructure ? 'structure' : 'sweetener';
      return 'sweetener';
    case 'syrup':
      if (topping) return 'topping';
      return line.grams > 0 && line.grams <= SEASONING_SUGAR_G ? 'seasoning' : 'sweetener';
    case 'chocolate':
      return bake ? 'structure' : 'other';
    case 'mix-in':
      return topping ? 'topping' : 'other';
    case 'butter-oil':
      if (ctx.crumble) return 'topping';
      if (GREASE_WORDS.test(note)) return 'cooking-fat';
      // melted butter beside a crumb topping on a casserole is tossed with the crumbs, not a pan's fat
      if (dish === 'assembled-bake' && ctx.crumbTopping && /\bmelted\b/i.test(`${note} ${line.phrase}`)) return 'topping';
      if (bake) return 'baking-fat';
      if (ctx.hasRoux && index === ctx.rouxFat) return 'fat-for-roux';
      return 'cooking-fat';
    case 'milk':
      // milk soaking the crumbs of a meatloaf or meatballs (a panade) binds them
      if (!bake && ctx.dipMilk(index)) return 'coating';
      if (!bake && has('meat') && has('crumbs') && has('egg') && !ctx.breaded) return 'binder';
      return 'dairy-liquid';
    case 'cream':
      return topping ? 'topping' : 'cream';
    case 'cultured':
      // sour cream beside tacos, quesadillas or chili is served on top; in a stovetop sauce it is the sauce
      if (topping || dish === 'cold-dish' || dish === 'griddle-saute' || dish === 'simmered-dish') return 'topping';
      return bake ? 'dairy-liquid' : 'cream';
    case 'melting-cheese':
      return topping ? 'topping' : 'melting-cheese';
    case 'hard-cheese':
      return 'hard-cheese';
    case 'fresh-cheese':
      return 'fresh-cheese';
    case 'meat':
    case 'fish':
      return 'main-protein';
    case 'cured-meat':
      return topping ? 'topping' : 'main-protein';
    case 'legume':
    case 'vegetable':
      // a yeast dough's vegetables go on top of it or inside it (a pizza, a calzone); a quick bread's grated zucchini is its moisture
      return bake && !has('yeast') ? 'other' : 'vegetable';
    case 'tomato':
    case 'sauce':
    case 'condensed-soup':
    case 'dressing':
      return 'sauce';
    case 'fruit':
      return bake ? 'structure' : topping ? 'topping' : 'other';
    case 'nut':
      return topping ? 'topping' : 'other';
    default:
      return 'other';
  }
}

/** Where the line's food is cooked, from its function, the dish type and the cook's note. */
export function contextOf(role: LineFunction, dish: DishType, hasRoux: boolean, comment?: string | null): DishContext {
  // stirred into the hot starch off the boil
  if (role === 'enrichment') return 'filling';
  if (role === 'topping' || role === 'coating' || TOPPING_WORDS.test(comment ?? '')) return 'topping';
  if (role === 'cooking-fat') return 'griddle-saute';
  if (role === 'fat-for-roux' || role === 'thickener') return 'roux-white-sauce';
  if (BAKE_TYPES.includes(dish))
    return dish === 'dough' &&
      (role === 'melting-cheese' || role === 'hard-cheese' || role === 'fresh-cheese' || role === 'main-protein' || role === 'vegetable' || role === 'sauce')
      ? 'topping'
      : 'baked-batter-dough';
  const saucy = role === 'dairy-liquid' || role === 'cream' || role === 'melting-cheese' || role === 'hard-cheese' || role === 'sauce';
  if (hasRoux && saucy && role !== 'sauce') return 'roux-white-sauce';
  switch (dish) {
    case 'cold-dish':
      return 'cold-dressing';
    case 'griddle-saute':
      return 'griddle-saute';
    case 'stovetop-sauce':
    case 'simmered-dish':
      return saucy || role === 'main-protein' || role === 'vegetable' || role === 'fresh-cheese' ? 'boiled-sauce' : 'filling';
    case 'assembled-bake':
      return role === 'dairy-liquid' ? 'boiled-sauce' : 'filling';
    default:
      return saucy ? 'boiled-sauce' : 'filling';
  }
}

/**
 * Reads a whole recipe: its dish type, whether it has a roux, and each line's function and context.
 * `overrides` are the cook's choices of function by line index; their contexts follow from them.
 */
export function readDish(lines: readonly CulinaryLine[], overrides: Readonly<Record<number, LineFunction>> = {}): DishReading {
  const kinds = lines.map(lineKind);
  const dishType = inferDishType(lines, kinds);
  const g = (k: LineKind) => gramsBy(lines, kinds, [k]);
  const flourGrams = g('flour');
  const enrichment = enrichmentLines(lines, kinds, dishType);
  const browsMeat =
    !BAKE_TYPES.includes(dishType) && lines.some((l, i) => (kinds[i] === 'meat' || kinds[i] === 'fish') && /\b(raw|unprepared)\b/i.test(l.food?.name ?? ''));
  // a roux thickens milk or cream (a white sauce), or a broth where no raw meat browns in the fat first: flour
  // stirred into the oil that browned a stew's or a paprikash's meat thickens its braise, and the oil browns
  const dairyForSauce = kinds.some((k, i) => (k === 'milk' || k === 'cream' || (k === 'liquid' && !browsMeat)) && !enrichment.has(i));
  // the roux fat: butter when there is some, else the first fat (not one stirred into a mash)
  const fats = kinds.map((k, i) => (k === 'butter-oil' && !enrichment.has(i) ? i : -1)).filter((i) => i >= 0);
  // a roux is wheat flour cooked in fat; cornstarch and the like thicken as a slurry
  const rouxFlour = lines.some((l, i) => kinds[i] === 'flour' && !SLURRY_STARCH.test(`${l.food?.name ?? ''} ${l.phrase}`));
  const hasRoux = !BAKE_TYPES.includes(dishType) && rouxFlour && fats.length > 0 && dairyForSauce;
  const rouxFat = fats.find((i) => /^butter\b/i.test(lines[i].food?.name ?? '')) ?? fats[0] ?? -1;
  // sugar is structure where it far outweighs the flour (brownies, angel food) or melts into chocolate;
  // a cookie's or pound cake's sugar, about the flour's weight, only sweetens: a quarter less still bakes
  const sugarIsStructure = kinds.includes('chocolate') || g('sugar') >= 1.5 * flourGrams;
  const starchNames = lines.filter((_, i) => kinds[i] === 'starch').map((l) => `${l.phrase} ${l.food?.name ?? ''}`);
  const riceNotPasta = starchNames.some((n) => /\brice\b/i.test(n)) && !starchNames.some((n) => PASTA_WORDS.test(n));
  const wokSauce = lines.some((l) => WOK_SAUCE_WORDS.test(`${l.phrase} ${l.food?.name ?? ''}`));
  const breaded = breadedPieces(lines, kinds);
  // the breading's flour is the largest flour line; a smaller one beside a milk gravy thickens it (chicken-fried steak)
  const flourLines = kinds.map((k, i) => (k === 'flour' ? i : -1)).filter((i) => i >= 0);
  const dredgeFlour = flourLines.reduce((best, i) => (best < 0 || lines[i].grams > lines[best].grams ? i : best), -1);
  // the milk beaten with the breading's eggs (written next to them) is its dip
  const dipMilk = (i: number) => breaded && (kinds[i - 1] === 'egg' || kinds[i + 1] === 'egg');
  const crumble = dishType === 'assembled-bake' && fruitUnderCrumble(lines, kinds);
  const crumbTopping = lines.some((l, i) => kinds[i] === 'crumbs' && TOPPING_WORDS.test(`${l.comment ?? ''} ${l.phrase}`));
  const ctx = { hasRoux, kinds, sugarIsStructure, rouxFat, riceNotPasta, wokSauce, breaded, enrichment, dredgeFlour, dipMilk, crumble, crumbTopping };
  // mince bound with crumbs and egg (a loaf, meatballs) or a breaded piece is shaped into the portion; a dredged
  // cutlet or steak is the portion too, unless it is cut into bite-size pieces tossed in a sauce (sesame chicken)
  const bitePieces = lines.some((l, i) => kinds[i] === 'meat' && BITE_PIECE_WORDS.test(`${l.phrase} ${l.comment ?? ''}`));
  const shaped = (kinds.includes('meat') && kinds.includes('crumbs') && kinds.includes('egg')) || (breaded && !bitePieces);
  const words = lines.map((l) => `${l.phrase} ${l.comment ?? ''}`);
  const wholeCut = lines.some((l, i) => (kinds[i] === 'meat' || kinds[i] === 'fish') && WHOLE_CUT_WORDS.test(words[i]) && !CUT_UP_WORDS.test(words[i]));
  const portion = wholeCut || words.some((w) => PORTION_WORDS.test(w)) || (dishType !== 'simmered-dish' && words.some((w) => BUN_WORDS.test(w)));
  const mixedDish = MIXED_TYPES.includes(dishType) && !shaped && !portion;
  const panSauced = kinds.includes('meat') || kinds.includes('fish');
  const mashPotato = dishType === 'assembled-bake' && enrichment.size > 0 ? mashedPotatoLine(lines, kinds) : -1;
  const out = lines.map((line, i) => {
    const role = overrides[i] ?? roleOf(line, kinds[i], dishType, ctx, i);
    // the potatoes of a mashed top are mashed and spread over the filling
    let context = i === mashPotato && role === 'starch' ? 'topping' : contextOf(role, dishType, hasRoux, line.comment);
    // cream or milk poured into the pan over browned meat (a creamy skillet chicken) simmers into its sauce
    if (dishType === 'griddle-saute' && context === 'griddle-saute' && (role === 'cream' || role === 'dairy-liquid') && panSauced) context = 'boiled-sauce';
    return { kind: kinds[i], role, context };
  });
  return { dishType, hasRoux, mixedDish, browsMeat, wokSauce, lines: out };
}

/** Functions that keep a line exactly as written unless the cook unlocks it (PRODUCT.md step 5). */
export const HELD_FUNCTIONS: ReadonlySet<LineFunction> = new Set<LineFunction>([
  'seasoning',
  'leavener',
  'yeast',
  'salt',
  'extract',
  'acid',
  'aromatic',
  'cooking-liquid',
]);

/** A line function in a cook's plain words, for the Kitchen and held-line reasons. */
export const LINE_FUNCTION_WORDS: Record<LineFunction, string> = {
  seasoning: 'seasoning',
  leavener: 'leavener',
  yeast: 'yeast',
  salt: 'salt',
  extract: 'flavouring extract',
  acid: 'acid (brightens)',
  aromatic: 'aromatic',
  'cooking-liquid': 'cooking liquid',
  structure: 'structure of the bake',
  thickener: 'thickener',
  binder: 'binder',
  custard: 'custard (eggs set with milk)',
  'main-protein': 'main protein',
  'melting-cheese': 'melting cheese',
  'hard-cheese': 'hard cheese',
  'fresh-cheese': 'fresh cheese',
  'dairy-liquid': 'milk or dairy liquid',
  cream: 'cream',
  'fat-for-roux': 'fat for the roux',
  'cooking-fat': 'fat for the pan',
  'baking-fat': 'fat in the bake',
  enrichment: 'stirred in for richness (a mash, grits)',
  sweetener: 'sweetener',
  starch: 'starch (pasta, bread, potato)',
  vegetable: 'vegetable',
  sauce: 'sauce',
  topping: 'topping',
  coating: 'coating or crumbs',
  other: 'other',
};

export const DISH_TYPE_WORDS: Record<DishType, string> = {
  'leavened-bake': 'a leavened bake',
  batter: 'a batter',
  dough: 'a dough',
  'stovetop-sauce': 'a stovetop sauce dish',
  'simmered-dish': 'a simmered dish',
  'assembled-bake': 'an assembled or layered bake',
  'griddle-saute': 'a griddle, sauté or pan- or oven-fried dish',
  'cold-dish': 'a cold dish',
  other: 'a dish',
};

/** The reason shown for a held line: "leavener: kept as written". */
export function heldReasonFor(role: LineFunction): string | undefined {
  return HELD_FUNCTIONS.has(role) ? `${LINE_FUNCTION_WORDS[role]}: kept as written` : undefined;
}
