/**
 * English plural → singular for food words. Matching needs both sides (recipe phrase and catalogue
 * name) reduced the same way more than it needs perfect grammar: "tomatoes" and "tomato" must meet,
 * "hummus" and "molasses" must stay whole.
 */

/** Words ending in "s" that are not plurals. */
const INVARIANT = new Set([
  'asparagus',
  'hummus',
  'couscous',
  'citrus',
  'octopus',
  'molasses',
  'swiss',
  'series',
  'species',
  'bass',
  'grass',
  'glass',
  'floss',
  'schnapps',
  'chassis',
  'cactus',
  'hibiscus',
  'this',
  'plus',
  'less',
]);

/** Plurals no rule below gets right. */
const IRREGULAR: Record<string, string> = {
  leaves: 'leaf',
  loaves: 'loaf',
  halves: 'half',
  calves: 'calf',
  knives: 'knife',
  shelves: 'shelf',
  chilies: 'chili',
  chillies: 'chili',
  chilis: 'chili',
  cookies: 'cookie',
  brownies: 'brownie',
  pies: 'pie',
  smoothies: 'smoothie',
  veggies: 'veggie',
  hoagies: 'hoagie',
  goodies: 'goodie',
  geese: 'goose',
  feet: 'foot',
  teeth: 'tooth',
  mice: 'mouse',
  dice: 'die',
  potatoes: 'potato',
  tomatoes: 'tomato',
  mangoes: 'mango',
  tomatillos: 'tomatillo',
  avocados: 'avocado',
  tamales: 'tamale',
  anchovies: 'anchovy',
  radishes: 'radish',
};

/** The singular of one lowercase word; other words are returned unchanged. */
export function singular(word: string): string {
  if (word.length <= 3 || !word.endsWith('s') || !/^[a-z]+$/.test(word)) return word;
  if (INVARIANT.has(word)) return word;
  const irregular = IRREGULAR[word];
  if (irregular) return irregular;
  if (/(?:ss|us)$/.test(word)) return word;
  if (word.endsWith('ies') && word.length > 4) return `${word.slice(0, -3)}y`;
  if (word.endsWith('oes') && word.length > 5) return word.slice(0, -2);
  if (/(?:ch|sh|x|z|ss)es$/.test(word)) return word.slice(0, -2);
  return word.slice(0, -1);
}
