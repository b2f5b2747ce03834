/**
 * Words of a food phrase that name another food ("*turkey* pepperoni", "*low-fat* sour cream",
 * "*whole wheat* tortillas"): a match that lacks one is the wrong food, never silently right.
 * Phrases and food names are compared as normalise-phrase.ts words ("low-fat" → "lowfat",
 * "fat-free" → "nonfat", "no salt added" → "unsalted").
 */
import { words } from './normalise-phrase';

export interface FoodModifier {
  /** the words as the warning names them */
  label: string;
  /** word sequence in the phrase */
  asks: string[];
  /** any of these word sequences in a food's name honours it; the asked words themselves always do */
  honouredBy?: string[][];
  /** when set, the modifier is broken only by these words in the name (not by their absence) */
  brokenBy?: string[][];
  /** head foods for which the word changes nothing: "sweet paprika", "hot water", "Italian parsley" */
  neutralFor?: string[];
}

const LOWER_FAT = [['lowfat'], ['light'], ['reduced', 'fat'], ['nonfat'], ['skim'], ['1%'], ['2%'], ['part', 'skim']];
const LESS_SODIUM = [['low', 'sodium'], ['reduced', 'sodium'], ['less', 'sodium'], ['unsalted'], ['lower', 'sodium']];
const WHOLE_GRAIN = [
  ['whole', 'wheat'],
  ['whole', 'grain'],
];
const HOT = [['hot'], ['spicy'], ['chili'], ['jalapeno'], ['cayenne'], ['chipotle'], ['pepper']];
const TEMPERATURE_FOODS = ['water', 'milk', 'tea', 'coffee', 'broth', 'stock', 'dog', 'chocolate', 'cocoa'];

const COLOURS = ['black', 'white', 'brown', 'red', 'green', 'yellow'];

function colour(name: string): FoodModifier[] {
  return [{ label: name, asks: [name], brokenBy: COLOURS.filter((c) => c !== name).map((c) => [c]) }];
}

export const FOOD_MODIFIERS: FoodModifier[] = [
  { label: 'turkey', asks: ['turkey'] },
  { label: 'chicken', asks: ['chicken'] },
  { label: 'beef', asks: ['beef'] },
  { label: 'pork', asks: ['pork'] },
  { label: 'lamb', asks: ['lamb'] },
  { label: 'veal', asks: ['veal'] },
  { label: 'vegan', asks: ['vegan'], honouredBy: [['vegetarian'], ['meatless'], ['imitation'], ['soy'], ['tofu'], ['nondairy']] },
  { label: 'plant-based', asks: ['plant', 'based'], honouredBy: [['vegetarian'], ['meatless'], ['imitation'], ['soy'], ['tofu'], ['nondairy']] },
  { label: 'low-fat', asks: ['lowfat'], honouredBy: LOWER_FAT },
  { label: 'reduced-fat', asks: ['reduced', 'fat'], honouredBy: LOWER_FAT },
  {
    label: 'light',
    asks: ['light'],
    honouredBy: LOWER_FAT,
    neutralFor: ['brown', 'sugar', 'soy', 'olive', 'rum', 'molasses', 'green', 'corn', 'cream', 'red', 'kidney', 'meat'],
  },
  { label: 'fat-free', asks: ['nonfat'], honouredBy: [['skim']] },
  // "full-fat Greek yogurt" (read as "whole", normalise-phrase.ts) is not the nonfat one, "whole
  // buttermilk" not the lowfat one; only a name that says a lower fat level breaks it.
  { label: 'full-fat', asks: ['whole'], honouredBy: [['whole', 'milk'], ['whole']], brokenBy: LOWER_FAT },
  { label: 'skim', asks: ['skim'], honouredBy: [['nonfat']] },
  { label: 'part-skim', asks: ['part', 'skim'], honouredBy: [['lowfat'], ['reduced', 'fat'], ['light']] },
  { label: 'low-sodium', asks: ['low', 'sodium'], honouredBy: LESS_SODIUM },
  { label: 'reduced-sodium', asks: ['reduced', 'sodium'], honouredBy: LESS_SODIUM },
  { label: 'less-sodium', asks: ['less', 'sodium'], honouredBy: LESS_SODIUM },
  { label: 'whole-wheat', asks: ['whole', 'wheat'], honouredBy: WHOLE_GRAIN },
  { label: 'whole-grain', asks: ['whole', 'grain'], honouredBy: WHOLE_GRAIN },
  {
    label: 'low-carb',
    asks: ['low', 'carb'],
    honouredBy: [
      ['low', 'carbohydrate'],
      ['reduced', 'carbohydrate'],
    ],
  },
  { label: 'sugar-free', asks: ['sugar', 'free'], honouredBy: [['unsweetened'], ['diet'], ['sugar', 'substitute'], ['no', 'sugar']] },
  { label: 'gluten-free', asks: ['gluten', 'free'] },
  { label: 'sweet', asks: ['sweet'], neutralFor: ['paprika', 'basil', 'vermouth', 'butter', 'cream', 'relish'] },
  { label: 'hot', asks: ['hot'], honouredBy: HOT, neutralFor: TEMPERATURE_FOODS },
  { label: 'spicy', asks: ['spicy'], honouredBy: HOT, neutralFor: TEMPERATURE_FOODS },
  { label: 'lean', asks: ['lean'] },
  { label: 'Italian', asks: ['italian'], neutralFor: ['parsley'] },
  // "oat milk" is no cow's milk, "almond flour" no wheat flour: the plant a food is made from.
  { label: 'oat', asks: ['oat'], honouredBy: [['oats']] },
  { label: 'almond', asks: ['almond'], honouredBy: [['almonds']] },
  { label: 'soy', asks: ['soy'], honouredBy: [['soymilk'], ['soybean'], ['soybeans'], ['tofu']] },
  { label: 'rice', asks: ['rice'] },
  { label: 'coconut', asks: ['coconut'] },
  { label: 'cashew', asks: ['cashew'], honouredBy: [['cashews']] },
  // "hazelnut butter" is no dairy butter, "walnut oil" no soybean oil: the nut or seed a food is made from.
  { label: 'hazelnut', asks: ['hazelnut'], honouredBy: [['hazelnuts'], ['filberts']] },
  { label: 'walnut', asks: ['walnut'], honouredBy: [['walnuts']] },
  { label: 'pecan', asks: ['pecan'], honouredBy: [['pecans']] },
  { label: 'pistachio', asks: ['pistachio'], honouredBy: [['pistachios']] },
  { label: 'macadamia', asks: ['macadamia'] },
  { label: 'peanut', asks: ['peanut'], honouredBy: [['peanuts']] },
  { label: 'sunflower', asks: ['sunflower'] },
  // "pomegranate molasses" is no cane molasses, "mango chutney" no plain chutney: the fruit a food is made from.
  { label: 'pomegranate', asks: ['pomegranate'] },
  { label: 'mango', asks: ['mango'] },
  // "rye flour" is no wheat flour, "spelt flour" no all-purpose: the grain a flour or bread is milled from.
  { label: 'rye', asks: ['rye'], neutralFor: ['whiskey', 'whisky'] },
  { label: 'spelt', asks: ['spelt'] },
  { label: 'buckwheat', asks: ['buckwheat'] },
  // "fermented black beans" are salted fermented soybeans, not canned black beans.
  { label: 'fermented', asks: ['fermented'] },
  // "candied ginger" is no raw ginger root.
  { label: 'candied', asks: ['candied'], honouredBy: [['candies'], ['candy'], ['candied'], ['glazed']] },
  // "sherry vinegar" is no distilled vinegar: SR28 has none made from sherry.
  { label: 'sherry', asks: ['sherry'] },
  // "vanilla bean" is no snap bean, "nutritional yeast" no baker's yeast.
  { label: 'vanilla', asks: ['vanilla'] },
  { label: 'nutritional', asks: ['nutritional'] },
  // A colour names another food only against another colour: "black rice" is not white rice, but
  // "black olives" are SR28's ripe olives and "red onion" its onions.
  ...colour('black'),
  ...colour('white'),
  ...colour('brown'),
  ...colour('red'),
  ...colour('green'),
  ...colour('yellow'),
  // "fresh tarragon" matched to dried tarragon: a tenth of the water, ten times the nutrients per gram.
  // A raw food is a fresh one when the line's match was not ("fresh green chiles" → raw, not canned, chiles).
  { label: 'fresh', asks: ['fresh'], honouredBy: [['raw']], brokenBy: [['dried'], ['dehydrated'], ['dry'], ['canned'], ['ground']] },
];

function hasSequence(ws: readonly string[], seq: readonly string[]): boolean {
  outer: for (let i = 0; i + seq.length <= ws.length; i++) {
    for (let j = 0; j < seq.length; j++) if (ws[i + j] !== seq[j]) continue outer;
    return true;
  }
  return false;
}

/** The modifiers a phrase asks for ("turkey pepperoni" → turkey), the phrase's own head kept out. */
export function modifiersAskedBy(phrase: string): FoodModifier[] {
  const ws = words(phrase);
  if (ws.length < 2) return [];
  const head = ws[ws.length - 1];
  return FOOD_MODIFIERS.filter((m) => {
    if (!hasSequence(ws, m.asks)) return false;
    // The modifier is the food itself ("ground turkey", "lean beef"? no: "beef" is the head).
    if (m.asks.length === 1 && m.asks[0] === head) return false;
    return !(m.neutralFor ?? []).some((w) => ws.includes(w));
  });
}

const nameWords = new WeakMap<object, string[]>();

function foodWords(food: { name: string }): string[] {
  let ws = nameWords.get(food);
  if (!ws) {
    ws = words(food.name);
    nameWords.set(food, ws);
  }
  return ws;
}

/**
 * True when a food's name carries the modifier (or, for "fresh", does not contradict it). A name that
 * says the asked word itself honours it even beside a contrary one: "red currants" are SR28's
 * "Currants, red and white, raw".
 */
export function honours(food: { name: string }, m: FoodModifier): boolean {
  const ws = foodWords(food);
  if (m.brokenBy) return hasSequence(ws, m.asks) || !m.brokenBy.some((seq) => hasSequence(ws, seq));
  return hasSequence(ws, m.asks) || (m.honouredBy ?? []).some((seq) => hasSequence(ws, seq));
}

/** True when a food's name carries the modifier itself ("Rice, black"), not merely no contrary word. */
export function positivelyHonours(food: { name: string }, m: FoodModifier): boolean {
  const ws = foodWords(food);
  return hasSequence(ws, m.asks) || (m.honouredBy ?? []).some((seq) => hasSequence(ws, seq));
}

/** The asked modifiers a food lacks. */
export function unmetModifiers(food: { name: string }, asked: readonly FoodModifier[]): FoodModifier[] {
  return asked.filter((m) => !honours(food, m));
}
