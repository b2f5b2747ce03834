/** What kind of dish a recipe is, inferred from all of its lines. */
export type DishType = 'leavened-bake' | 'batter' | 'dough' | 'stovetop-sauce' | 'simmered-dish' | 'assembled-bake' | 'griddle-saute' | 'cold-dish' | 'other';

/** What one line does in the dish. */
export type LineFunction =
  | 'seasoning'
  | 'leavener'
  | 'yeast'
  | 'salt'
  | 'extract'
  | 'acid'
  | 'aromatic'
  | 'cooking-liquid'
  | 'structure'
  | 'thickener'
  | 'binder'
  | 'custard'
  | 'main-protein'
  | 'melting-cheese'
  | 'hard-cheese'
  | 'fresh-cheese'
  | 'dairy-liquid'
  | 'cream'
  | 'fat-for-roux'
  | 'cooking-fat'
  | 'baking-fat'
  | 'enrichment'
  | 'sweetener'
  | 'starch'
  | 'vegetable'
  | 'sauce'
  | 'topping'
  | 'coating'
  | 'other';

/** Where in the dish a food is cooked: decides which substitutions hold up. */
export type DishContext = 'baked-batter-dough' | 'roux-white-sauce' | 'boiled-sauce' | 'filling' | 'topping' | 'cold-dressing' | 'griddle-saute';

/** Every line function, in the order the Kitchen lists them. */
export const LINE_FUNCTIONS: readonly LineFunction[] = [
  'main-protein',
  'starch',
  'vegetable',
  'melting-cheese',
  'hard-cheese',
  'fresh-cheese',
  'dairy-liquid',
  'cream',
  'sauce',
  'topping',
  'coating',
  'binder',
  'custard',
  'structure',
  'thickener',
  'sweetener',
  'baking-fat',
  'fat-for-roux',
  'cooking-fat',
  'enrichment',
  'aromatic',
  'seasoning',
  'salt',
  'extract',
  'acid',
  'leavener',
  'yeast',
  'cooking-liquid',
  'other',
];

export const DISH_TYPES: readonly DishType[] = [
  'leavened-bake',
  'batter',
  'dough',
  'stovetop-sauce',
  'simmered-dish',
  'assembled-bake',
  'griddle-saute',
  'cold-dish',
  'other',
];

export const DISH_CONTEXTS: readonly DishContext[] = [
  'baked-batter-dough',
  'roux-white-sauce',
  'boiled-sauce',
  'filling',
  'topping',
  'cold-dressing',
  'griddle-saute',
];

/** What the culinary inference reads of one recipe line. */
export interface CulinaryLine {
  /** the food phrase as written ("elbow macaroni") */
  phrase: string;
  /** the preparation note ("shredded, for the top") */
  comment?: string | null;
  /** the matched food, or null when none matched */
  food: CulinaryFood | null;
  /** the line's written grams (0 when it could not be weighed) */
  grams: number;
}

/** What the inference and the rule matcher read of a food. */
export interface CulinaryFood {
  name: string;
  /** two-digit SR28 food group, '' for custom foods */
  foodGroup: string;
  /** five-digit NDB number for USDA foods */
  sourceId: string;
  roles: readonly string[];
  per100g: { fatG: number };
}
