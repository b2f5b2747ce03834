/** What kind of dish a recipe is, inferred from all of its lines. */
export type DishType =
  | 'leavened-bake'
  | 'batter'
  | 'dough'
  | 'stovetop-sauce'
  | 'simmered-dish'
  | 'assembled-bake'
  | 'griddle-saute'
  | 'cold-dish'
  | 'other';

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
  | 'binder'
  | 'main-protein'
  | 'melting-cheese'
  | 'hard-cheese'
  | 'fresh-cheese'
  | 'dairy-liquid'
  | 'cream'
  | 'fat-for-roux'
  | 'cooking-fat'
  | 'baking-fat'
  | 'sweetener'
  | 'starch'
  | 'vegetable'
  | 'sauce'
  | 'topping'
  | 'coating'
  | 'other';

/** Where in the dish a food is cooked: decides which substitutions hold up. */
export type DishContext =
  | 'baked-batter-dough'
  | 'roux-white-sauce'
  | 'boiled-sauce'
  | 'filling'
  | 'topping'
  | 'cold-dressing'
  | 'griddle-saute';
