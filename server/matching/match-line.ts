/**
 * Match a parsed line to a catalogue food as a cook means it (PRODUCT.md step 2), beyond the phrase:
 * - by the can or jar: "1 (28 oz) can crushed tomatoes" is canned crushed tomatoes, not raw ones;
 * - drained: "1 can chickpeas, drained" is SR28's "drained solids" food when it has one;
 * - a word that names another food ("turkey pepperoni", "low-fat", "whole wheat") is honoured by a
 *   food that has it, or the line says which word could not be honoured and asks to be checked;
 * - a generic phrase ("cheese", "oil") or a word the catalogue does not know asks to be checked.
 */
import type { CatalogueFood } from '../../shared/food';
import type { ParsedLine } from '../../shared/parse-line';
import { MATCH_CONFIDENCE_FLOOR, type FoodMatch, type FoodMatcher } from './food-matcher';
import { FOOD_MODIFIERS, modifiersAskedBy, positivelyHonours, unmetModifiers, type FoodModifier } from './food-modifiers';
import { PREPARATION_WORDS, STOP_WORDS, words } from './normalise-phrase';
import { orChoices } from './or-choices';
import { isDrainedSolids } from './drained-share';
import { STATE_WORDS } from './food-index';

/** Under this confidence a match is shown as "check this match". */
export const CHECK_MATCH_BELOW = 0.6;
/** A match that lacks a modifier the line asks for is trusted at most this much. */
const MISSING_MODIFIER_CONFIDENCE = 0.5;
/** A food found to honour the modifiers is trusted a little less than the first match. */
const HONOURING_FACTOR = 0.9;
/** A canned or drained version must score at least this share of the plain match. */
const VARIANT_SHARE = 0.75;

export interface LineMatch extends FoodMatch {
  /** a word of the line that changes the food and that no catalogue food honours */
  missingModifier: string | null;
  /** the line should be checked by the cook: generic, weak, or a word not honoured */
  checkMatch: boolean;
  /** the line says drained: a weight from the can's size keeps only the drained share */
  drained: boolean;
  warnings: string[];
}

/** Package units that hold a canned food. */
const CANNED_UNITS = new Set(['can', 'jar']);
/** What a canned food is sold as, written by the cook as if a preparation: "crushed", "diced". */
const CANNED_FORMS = new Set(['crushed', 'diced', 'stewed', 'whole', 'peeled', 'pureed', 'puree', 'fire', 'roasted', 'sliced']);

/** Phrases that could be many foods: "cheese", "oil", "neutral oil", "nuts". */
const GENERIC_WORDS = new Set([
  'cheese',
  'oil',
  'seed',
  'nut',
  'meat',
  'fish',
  'bean',
  'sauce',
  'seasoning',
  'spice',
  'herb',
  'green',
  'sausage',
  'vinegar',
  'wine',
  'chile',
  'chili',
  'pepper',
  'berry',
  'fruit',
  'vegetable',
  'squash',
  'lettuce',
  'stock',
  'broth',
  'flour',
  'sugar',
  'salt',
  'milk',
]);
/** …except these, which recipes use for one plain food (all-purpose flour, granulated sugar, table salt, black pepper, whole milk). */
const PLAIN_DEFAULTS = new Set(['flour', 'sugar', 'salt', 'pepper', 'milk']);
const GENERIC_ADJECTIVES = new Set([
  'neutral',
  'cooking',
  'mixed',
  'assorted',
  'favorite',
  'favourite',
  'any',
  'other',
  'your',
  'plain',
  'some',
  'kind',
  // "2 whole fish (such as branzino)", "semisoft cheese such as Fontina": a form or texture names no one food.
  'whole',
  'fresh',
  'firm',
  'semisoft',
  'soft',
  'hard',
  'aged',
  'melting',
]);

/** Pieces only a fresh plant has: "3 sprigs tarragon", "a bunch of mint", "¼ cup tarragon leaves". */
const FRESH_PIECES = /\b(?:leaf|leaves|sprigs?|bunch(?:es)?|handfuls?|stems?)\b/i;
const SAYS_DRIED = /\b(?:dried|dry|ground|powder(?:ed)?|flakes?|seeds?)\b/i;
const FRESH = FOOD_MODIFIERS.find((m) => m.label === 'fresh');
/** SR28 food groups whose foods are never leaves: spices and herbs are (fresh ones), vegetables may be. */
const FRUIT_GROUP = '09';

/** The line counts a fresh plant's pieces, so a dried food is another food ("3 sprigs tarragon" is not dried tarragon). */
function asksFresh(parsed: ParsedLine, phrase: string): boolean {
  const pieces = `${parsed.unitText ?? ''} ${parsed.unit ?? ''} ${phrase}`;
  return FRESH_PIECES.test(pieces) && !SAYS_DRIED.test(`${phrase} ${parsed.preparation ?? ''}`);
}

/** "lime leaves", "fig leaves": the line names the leaves of a plant whose fruit (or seed) the catalogue has. */
function leavesOfAnotherPart(food: CatalogueFood, phrase: string): boolean {
  if (!/\b(?:leaf|leaves)\b/i.test(phrase) || /\b(?:leaf|leaves|greens|tops)\b/i.test(food.name)) return false;
  return food.foodGroup === FRUIT_GROUP || /\b(?:seeds?|root|roots|potato|powder|ground)\b/i.test(food.name);
}

function says(parsed: ParsedLine, pattern: RegExp): boolean {
  return pattern.test(`${parsed.preparation ?? ''} ${parsed.comment ?? ''} ${parsed.name ?? ''}`);
}

function isCanned(food: CatalogueFood | null): boolean {
  return Boolean(food && /\bcanned\b|\bcnd\b/i.test(food.name));
}

/** "undrained", "with their liquid": the can is used whole. */
const SAYS_UNDRAINED =
  /\bundrained\b|\bnot drained\b|\bdo(?:n['’]t| not) drain\b|\bwith (?:its|their|the) (?:liquid|juices?|brine)\b|\band (?:its|their) liquid\b/i;
/** SR28's "Vegetables and Vegetable Products". */
const VEGETABLE_GROUP = '11';
/** SR28's "Legumes and Legume Products". */
const LEGUME_GROUP = '16';
/** Canned legumes eaten in their sauce, never drained. */
const EATEN_WITH_SAUCE = /\b(?:baked|refried|chili|sweetened|with pork|with beef|with franks|sauce|soup)\b/i;
export const DRAINED_BY_HABIT = 'Weighed drained, as most recipes use canned beans: write “undrained” to count the liquid.';

/** Two foods of one kind: the first `parts` parts of their SR28 names agree, asides in parentheses left out. */
function sameKind(a: CatalogueFood, b: CatalogueFood, parts: number): boolean {
  const head = (f: CatalogueFood) =>
    f.name
      .toLowerCase()
      .replace(/\([^)]*\)/g, '')
      .split(',')
      .slice(0, parts)
      .map((p) => p.trim())
      .join(',');
  return head(a) === head(b);
}

/** Counted by the can: "2 cans", "1 (15 oz) can", "1 15-ounce can". */
function byCountedCan(parsed: ParsedLine): boolean {
  return parsed.unit === 'can' || (parsed.size !== null && /\bcans?\b/i.test(`${parsed.unitText ?? ''} ${parsed.sizeText ?? ''} ${parsed.name}`));
}

/** Canned beans, chickpeas or lentils that recipes drain (not baked beans, refried beans or chili). */
function beansDrainedByHabit(food: CatalogueFood | null): boolean {
  return Boolean(food && isCanned(food) && food.foodGroup === LEGUME_GROUP && !EATEN_WITH_SAUCE.test(food.name) && !/\bsoy|tofu\b/i.test(food.name));
}

/** The food words of a phrase, preparation and filler left out. */
function foodWordsOf(phrase: string): string[] {
  return words(phrase).filter((w) => !PREPARATION_WORDS.has(w) && !STOP_WORDS.has(w) && !/^\d+$/.test(w));
}

export function isGenericPhrase(phrase: string): string | null {
  const ws = foodWordsOf(phrase).filter((w) => !GENERIC_ADJECTIVES.has(w));
  if (ws.length !== 1 || !GENERIC_WORDS.has(ws[0]) || PLAIN_DEFAULTS.has(ws[0])) return null;
  return ws[0];
}

/** The first food among `candidates` that honours every asked modifier and keeps the matched food's kind. */
function honouringFood(candidates: readonly CatalogueFood[], asked: readonly FoodModifier[], matched: CatalogueFood, phrase: string): CatalogueFood | null {
  const phraseWords = new Set(foodWordsOf(phrase));
  const kept = words(matched.name).filter((w) => phraseWords.has(w));
  // A fresh food is the same food raw: "Peppers, hot chili, green, raw" for "…, canned", never "Oat bran, raw" for "Cereals, oats".
  const sameHead = FRESH !== undefined && asked.includes(FRESH) ? words(matched.name)[0] : null;
  for (const f of candidates) {
    if (f.id === matched.id || f.branded || !asked.every((m) => positivelyHonours(f, m))) continue;
    if (sameHead !== null && words(f.name)[0] !== sameHead) continue;
    // Another version of the same food, of its SR28 group or its name's head: "coconut sugar" is no
    // "Sauce, peanut, made from coconut, water, sugar, peanuts" (a sauce that lists both words).
    if (f.foodGroup !== matched.foodGroup && words(f.name)[0] !== words(matched.name)[0]) continue;
    const fw = new Set(words(f.name));
    if (kept.every((w) => fw.has(w) || asked.some((m) => m.asks.includes(w)))) return f;
  }
  return null;
}

/** Longer phrases are notes, not choices: they are matched whole, once (a 64 KB line stays cheap). */
const LONGEST_CHOICE_PHRASE = 200;
const MAX_CHOICES = 4;

const JUICED = /^\s*juiced\b|^[^,]*\band juiced\b/i;
const CITRUS = /^(?:lemons?|limes?|oranges?|grapefruits?)$/i;

/** "2 c minced pork": a meat named alone and minced is the ground meat (the butcher's mince). */
const MINCED_MEAT = /^\s*(?:beef|pork|lamb|chicken|turkey|veal|goat)\s*$/i;

/** A note that the skin is kept: "with skin and bone", "skin on". */
const SKIN_ON = /\bskin[- ]on\b|\bwith (?:the |its |their )?skins?\b/i;

/** How garlic is cut, never the spice: "2 cloves, minced". */
const GARLIC_CUTS = /\b(?:minced|crushed|smashed|peeled|grated|sliced|chopped|pressed)\b/i;

/** "4 whole cloves", "6 cloves": counted cloves with no food named are the spice, unless cut as garlic is. */
function unnamedCloves(parsed: ParsedLine): string | null {
  if (parsed.unit !== 'clove') return null;
  if (!words(parsed.name).every((w) => w === 'whole' || w === 'dried' || PREPARATION_WORDS.has(w) || STOP_WORDS.has(w))) return null;
  return GARLIC_CUTS.test(`${parsed.name} ${parsed.preparation ?? ''} ${parsed.comment ?? ''}`) ? 'garlic' : 'cloves';
}

/**
 * The nearest food of a phrase that matched none: without the words the catalogue does not know,
 * else its last two food words ("firm but ripe plums" → "ripe plums"), else its head word.
 */
function nearestWithout(matcher: FoodMatcher, phrase: string, unknown: readonly string[]): { match: FoodMatch; leftOut: string[] } | null {
  const all = words(phrase);
  const food = foodWordsOf(phrase);
  const tries: string[][] = [];
  if (unknown.length > 0) tries.push(all.filter((w) => !unknown.includes(w)));
  if (food.length > 2) tries.push(food.slice(-2));
  if (food.length > 1) tries.push(food.slice(-1));
  for (const kept of tries) {
    const found = kept.some((w) => !STOP_WORDS.has(w)) ? matcher.match(kept.join(' ')) : null;
    // "pomegranate seeds" → "Anise seed" is no near food: the food's name must start with the kept words.
    if (found?.food && (found.via === 'alias' || found.nameHeadMatched))
      return { match: found, leftOut: all.filter((w) => !kept.includes(w) && !STOP_WORDS.has(w) && !PREPARATION_WORDS.has(w)) };
  }
  return null;
}

/** "(or substitute light brown sugar)", "(optional, or lemon zest)": the cook's other choice, in a note. */
const NOTED_CHOICE = /(?:^|[,;]\s*)or\s+(?:substitute\s+|use\s+|sub\s+)?(?:with\s+)?([^,;]+)/i;

/** The food of a note's other choice ("jaggery (or light brown sugar)") when the line's own phrase has none. */
function notedChoice(matcher: FoodMatcher, parsed: ParsedLine, input: string): LineMatch | null {
  const way = NOTED_CHOICE.exec(parsed.comment ?? '')?.[1]
    ?.replace(/\s+(?:such as|like|e\.g\.|if|to|for)\b.*$/i, '')
    .trim();
  if (!way || way.length > LONGEST_CHOICE_PHRASE) return null;
  const chosen = matchLine(matcher, { ...parsed, name: way, comment: null }, input, true);
  if (!chosen.food) return null;
  // The cook's first choice is not in the catalogue: the note's is weighed, and the line asks to be checked.
  const warning = `The catalogue has no “${parsed.name}”: weighed as the other choice the line names, ${chosen.food.name}. Check this match.`;
  return { ...chosen, checkMatch: true, confidence: Math.min(chosen.confidence, MISSING_MODIFIER_CONFIDENCE), warnings: [...chosen.warnings, warning] };
}

/** "plus 1 tablespoon all-purpose flour": a note that adds an amount of a named food. */
const ADDED_AMOUNT = /^(?:plus|and)\s+[\d¼½¾⅓⅔⅛⅜⅝⅞./\s-]+(?:[a-z]+\.?\s+)?(?:of\s+)?(.+)$/i;

/**
 * "2 ⅓ c scooped and leveled, plus 1 tablespoon all-purpose flour": a food phrase with no food word
 * leaves the food to the note; the first note that names one without doubt is the line's food.
 */
function foodInNote(matcher: FoodMatcher, parsed: ParsedLine, input: string): LineMatch | null {
  if (foodWordsOf(parsed.name).length > 0) return null;
  for (const segment of (parsed.comment ?? '').split(/[,;]/)) {
    // "grated, not shredded, parmesan cheese": the food may follow the notes that describe it.
    const way = (ADDED_AMOUNT.exec(segment.trim())?.[1] ?? segment).trim();
    if (!way || way.length > LONGEST_CHOICE_PHRASE || foodWordsOf(way).length === 0) continue;
    const chosen = matchLine(matcher, { ...parsed, name: way, comment: null }, input, true);
    if (chosen.food && !chosen.checkMatch) return chosen;
  }
  return null;
}

/** Measures a drink is poured or sold in. */
const DRINK_MEASURES = new Set(['cup', 'fl-oz', 'pint', 'quart', 'gallon', 'ml', 'cl', 'dl', 'l', 'can', 'bottle']);
/** "soda" that is no soft drink: these have foods of their own. */
const SODA_NOT_POP = /\b(?:baking|bicarbonate|bicarb|washing|caustic|club|water|cream|bread|crackers?)\b/i;

/**
 * "2-3 c Moxie soda", "1 bottle soda": soda poured by the cup or sold by the can is a soft drink, not
 * baking soda (a baking recipe's "1 tsp soda" still is, *common practice*). The phrase is read as
 * "soda pop", a stand-in the cook is asked to check.
 */
function sodaPop(matcher: FoodMatcher, parsed: ParsedLine, phrase: string, match: FoodMatch): FoodMatch | null {
  if (!/\bsoda\b/i.test(phrase) || SODA_NOT_POP.test(phrase) || !DRINK_MEASURES.has(parsed.unit ?? '')) return null;
  if (match.food && !/\bbaking soda\b/i.test(match.food.name)) return null;
  const pop = matcher.match(phrase.replace(/\bsoda\b/i, 'soda pop'));
  return pop.food ? pop : null;
}

/** "toasted and ground cumin seeds": two words that say how the food is, joined by "and". */
const JOINED_STATES = /^\s*([a-z]+)\s+and\s+([a-z]+)\s+(?=\S)/i;
const HOW_A_FOOD_IS = (w: string) => STATE_WORDS.has(w) || PREPARATION_WORDS.has(w) || w === 'ground' || w === 'dried';

/** The joined states read as one description of the food ("toasted ground cumin seeds"), not a food "toasted" and another. */
function statesJoined(phrase: string): string {
  const m = JOINED_STATES.exec(phrase);
  if (!m || !HOW_A_FOOD_IS(m[1].toLowerCase()) || !HOW_A_FOOD_IS(m[2].toLowerCase())) return phrase;
  return `${m[1]} ${m[2]} ${phrase.slice(m[0].length)}`;
}

export function matchLine(matcher: FoodMatcher, parsed: ParsedLine, input: string, byChoices = true): LineMatch {
  const own = matchPhrase(matcher, parsed, input, byChoices);
  if (own.food || !byChoices) return own;
  return foodInNote(matcher, parsed, input) ?? notedChoice(matcher, parsed, input) ?? own;
}

function matchPhrase(matcher: FoodMatcher, parsed: ParsedLine, input: string, byChoices: boolean): LineMatch {
  // "28 oz can whole peeled tomatoes": the package word read as the start of the food's name.
  const packageFirst = /^(?:cans?|tins?)\s+(?:of\s+)?(?=\S)/i.exec(parsed.name);
  const named = unnamedCloves(parsed) ?? (packageFirst ? parsed.name.slice(packageFirst[0].length) : parsed.name || input);
  // "2 lemons, juiced": the juice is the food, weighed by what one fruit yields.
  const cut = MINCED_MEAT.test(named) && /\b(?:minced|ground)\b/i.test(parsed.preparation ?? '') ? `ground ${named.trim()}` : named;
  const juiced = JUICED.test(`${parsed.preparation ?? ''}`) && CITRUS.test(named) && !/\bjuice\b/i.test(named) ? `${named} juice` : cut;
  // "4 chicken breast halves, with skin and bone": SR28's "meat and skin" food, not the skinless one.
  const skinOn = SKIN_ON.test(`${parsed.preparation ?? ''} ${parsed.comment ?? ''}`) && !/\bskin/i.test(juiced) ? `skin-on ${juiced}` : juiced;
  const phrase = statesJoined(skinOn);
  // "oat or almond milk": the cook's first choice the catalogue has; else the phrase as a whole
  // when it has a food; else the first choice with a food to check.
  const choices = byChoices && phrase.length <= LONGEST_CHOICE_PHRASE ? orChoices(phrase).slice(0, MAX_CHOICES) : [];
  if (choices.length > 0) {
    let firstToCheck: LineMatch | null = null;
    for (const ways of choices)
      for (const way of ways) {
        const chosen = matchLine(matcher, { ...parsed, name: way }, input, false);
        if (!chosen.food) continue;
        if (!chosen.checkMatch) return chosen;
        // "dried adzuki" asks to be checked, "dried adzuki beans" does not: the choice's next way is tried.
        firstToCheck ??= chosen;
      }
    const whole = matchLine(matcher, parsed, input, false);
    return whole.food ? whole : (firstToCheck ?? whole);
  }
  const warnings: string[] = [];
  const asked = modifiersAskedBy(phrase);
  if (FRESH && !asked.includes(FRESH) && asksFresh(parsed, phrase)) asked.push(FRESH);
  let match: FoodMatch = matcher.match(phrase);
  match = sodaPop(matcher, parsed, phrase, match) ?? match;
  // "low carb whole wheat tortillas": when nothing has every word, the food without the modifiers
  // is the nearest one (and the line says which word it could not honour).
  if (!match.food && asked.length > 0) {
    // One modifier left out at a time, then all of them: keep as many as some food honours.
    const leaveOut = [...asked.map((m) => [m]), asked];
    for (const out of leaveOut) {
      const asks = new Set(out.flatMap((m) => m.asks));
      const plain = words(phrase)
        .filter((w) => !asks.has(w))
        .join(' ');
      const nearest = plain ? matcher.match(plain) : null;
      if (nearest?.food) {
        match = { ...nearest, confidence: Math.min(nearest.confidence, MISSING_MODIFIER_CONFIDENCE) };
        break;
      }
    }
  }

  // "cage-free egg", "raw fine bread crumbs": words no food has hide the food; the food without
  // them is offered, to be checked, with the words it left out named.
  let leftOut: string[] = [];
  if (!match.food && phrase.length <= LONGEST_CHOICE_PHRASE) {
    const nearest = nearestWithout(matcher, phrase, match.unknownWords);
    if (nearest) {
      leftOut = nearest.leftOut;
      match = { ...nearest.match, confidence: Math.min(nearest.match.confidence, MISSING_MODIFIER_CONFIDENCE) };
    }
  }

  // "1 (28 oz) can crushed tomatoes": the cook means the canned food, in the form it is sold.
  const byCan =
    packageFirst !== null ||
    (parsed.unit !== null && CANNED_UNITS.has(parsed.unit)) ||
    /\bcan(?:ned|s)?\b|\btins?\b/i.test(`${parsed.sizeText ?? ''} ${phrase}`);
  const saysCanned = /\bcanned\b/i.test(phrase);
  if (byCan && !isCanned(match.food)) {
    const forms = words(parsed.preparation ?? '')
      .filter((w) => CANNED_FORMS.has(w))
      .join(' ');
    const bare = phrase
      .replace(/\bcanned\b/i, ' ')
      .replace(/\s+/g, ' ')
      .trim();
    for (const variant of [forms ? `${forms} ${bare}` : null, `canned ${forms} ${bare}`]) {
      if (!variant) continue;
      const canned = matcher.match(variant.replace(/\s+/g, ' '));
      // A phrase that says "canned" itself takes any confident canned food over a fresh one.
      const enough = saysCanned ? MATCH_CONFIDENCE_FLOOR : VARIANT_SHARE * match.confidence;
      // "1 can coconut cream" is not the sweetened cream of coconut: a can adds no sugar the line did not ask for.
      const addsSugar = /\bsweetened\b/i.test(canned.food?.name ?? '') && !/\bsweet/i.test(phrase);
      // "canned sweet potato puree" is no canned tomato puree: the canned food keeps the food's kind.
      const otherFood = match.food !== null && canned.food !== null && !sameKind(canned.food, match.food, 1);
      if (isCanned(canned.food) && canned.confidence >= enough && !addsSugar && !otherFood) {
        match = canned;
        break;
      }
    }
  }

  // "1 green chili, finely chopped": a vegetable counted in pieces, not by the can, is the fresh one
  // even where recipes by the cup mean the canned food ("½ cup green chiles").
  if (!byCan && parsed.unit === null && parsed.quantity !== null && FRESH && isCanned(match.food) && match.food?.foodGroup === VEGETABLE_GROUP) {
    const fresh = honouringFood([...match.alternatives, ...matcher.search(phrase, 25).map((h) => h.food)], [FRESH], match.food, phrase);
    if (fresh && /\braw\b/i.test(fresh.name))
      match = { ...match, food: fresh, alternatives: [match.food, ...match.alternatives.filter((f) => f.id !== fresh.id)] };
  }

  // "1 can lentils", "2 (5 oz) cans lentils": SR28 has no canned lentils; their drained seeds are the
  // cooked ones (*common practice*), weighed by the can's drained share.
  let cookedForCanned = false;
  if (byCan && !isCanned(match.food) && match.food?.foodGroup === LEGUME_GROUP && /\braw\b/i.test(match.food.name)) {
    const cooked = matcher.match(`cooked ${phrase.replace(/\bcanned\b/i, ' ')}`.replace(/\s+/g, ' '));
    if (cooked.food && /\bcooked\b/i.test(cooked.food.name) && sameKind(cooked.food, match.food, 1) && cooked.confidence >= MATCH_CONFIDENCE_FLOOR) {
      match = cooked;
      cookedForCanned = true;
    }
  }

  // "1 can chickpeas, drained and rinsed": SR28's drained solids, when it has them. Beans counted by
  // the can are drained unless the line keeps their liquid (*common practice*).
  const saysUndrained = says(parsed, SAYS_UNDRAINED);
  const saysDrained = !saysUndrained && says(parsed, /\bdrain(?:ed)?\b/i);
  const drainedByHabit = !saysDrained && !saysUndrained && byCountedCan(parsed) && (cookedForCanned || beansDrainedByHabit(match.food));
  if (drainedByHabit) warnings.push(DRAINED_BY_HABIT);
  if ((saysDrained || drainedByHabit) && isCanned(match.food) && !isDrainedSolids(match.food)) {
    const solids = matcher.match(`${phrase} canned drained solids`);
    const kept = match.food;
    // The drained version of the same beans, even when an alias ranks the whole can first.
    const found = solids.food && [solids.food, ...solids.alternatives].find((f) => isDrainedSolids(f) && isCanned(f) && kept !== null && sameKind(f, kept, 2));
    if (found && solids.confidence >= VARIANT_SHARE * match.confidence)
      match = { ...solids, food: found, alternatives: [kept!, ...solids.alternatives.filter((f) => f.id !== found.id && f.id !== kept!.id)] };
  }

  let confidence = match.confidence;
  let food = match.food;
  let alternatives = match.alternatives;
  let missingModifier: string | null = null;
  let check = false;

  if (food) {
    const unmet = unmetModifiers(food, asked);
    if (unmet.length > 0) {
      const found = honouringFood([...match.alternatives, ...matcher.search(phrase, 25).map((h) => h.food)], asked, food, phrase);
      if (found) {
        alternatives = [food, ...alternatives.filter((f) => f.id !== found.id)];
        food = found;
        confidence *= HONOURING_FACTOR;
      } else {
        missingModifier = unmet[0].label;
        confidence = Math.min(confidence, MISSING_MODIFIER_CONFIDENCE);
        check = true;
        const names = unmet.map((m) => `“${m.label}”`).join(' and ');
        warnings.push(
          `The catalogue has no ${names} version of this food: weighed as its nearest food, ${food.name}. Add it from its label for exact figures.`,
        );
      }
    }
    // "pancetta" is weighed as bacon, the nearest SR28 food, and the cook is told so.
    if (match.standIn && food === match.food) {
      check = true;
      confidence = Math.min(confidence, MISSING_MODIFIER_CONFIDENCE);
      warnings.push(`The catalogue has no “${match.standIn}”: weighed as its nearest food, ${food.name}. Check this match or add it from its label.`);
    }
    if (leavesOfAnotherPart(food, phrase)) {
      check = true;
      confidence = Math.min(confidence, MISSING_MODIFIER_CONFIDENCE);
      warnings.push(`The catalogue has no leaves of this plant: matched ${food.name}. Check this match or add the food from its label.`);
    }
    // "potato starch" → "Bread, gluten-free, potato extract, …": the food's own name starts elsewhere.
    if (match.via === 'fuzzy' && !match.nameHeadMatched && food === match.food) {
      check = true;
      warnings.push(`“${phrase}” matched words further along the name of ${food.name}: check this match.`);
    }
    if (match.corrected.length > 0) {
      check = true;
      warnings.push(`Read ${match.corrected.map((c) => `“${c.replace(' → ', '” as “')}”`).join(', ')}: check this match.`);
    }
    const generic = isGenericPhrase(phrase);
    if (generic) {
      check = true;
      warnings.push(`“${phrase}” could be many foods: check this match or pick the one you use.`);
    }
    const unknown = match.unknownWords.filter((w) => w.length > 2);
    if (unknown.length > 0 && !missingModifier) {
      check = true;
      warnings.push(`“${unknown.join(' ')}” is not in the catalogue: check this match.`);
    }
    if (leftOut.length > 0) {
      check = true;
      warnings.push(`No food has “${leftOut.join(' ')}”: weighed as its nearest food, ${food.name}. Check this match.`);
    }
    if (confidence < CHECK_MATCH_BELOW) check = true;
  }

  return {
    ...match,
    food,
    confidence,
    alternatives,
    missingModifier,
    checkMatch: check,
    drained: saysDrained || drainedByHabit || (cookedForCanned && !saysUndrained),
    warnings,
  };
}
