import type { Nutrients } from './nutrition';

/** Culinary roles a food can play in a dish; candidates for a swap share a role. */
export const ROLES = [
  'melting-cheese',
  'hard-cheese',
  'soft-cheese',
  'cured-meat-topping',
  'ground-meat',
  'poultry',
  'red-meat',
  'pork',
  'sausage',
  'fish-seafood',
  'plant-protein',
  'flatbread-wrap',
  'bread',
  'pasta',
  'rice-grain',
  'potato',
  'tomato-sauce',
  'cream-sauce-base',
  'cooking-fat',
  'dairy-milk',
  'cream',
  'sour-cream-yogurt',
  'sweetener',
  'flour',
  'breadcrumb-coating',
  'egg',
  'vegetable',
  'fruit',
  'legume',
  'nut-seed',
  'broth-stock',
  'condiment',
  'herb-spice',
  'baking-leavener',
  'chocolate',
  'other',
] as const;
export type Role = (typeof ROLES)[number];

export const DIET_FLAGS = ['vegetarian', 'vegan', 'dairy-free', 'gluten-free'] as const;
export type DietFlag = (typeof DIET_FLAGS)[number];

export interface Portion {
  /** e.g. "1 cup, shredded", "1 large" */
  label: string;
  /** the number in the measure: 1 for "1 cup", 0.5 for "1/2 cup" */
  amount: number;
  /** the measure text without the amount: "cup, shredded", "large" */
  measure: string;
  grams: number;
}

/** A catalogue food as the server keeps it in memory and the rewrite reads it. */
export interface CatalogueFood {
  id: number;
  source: 'usda-sr28' | 'custom';
  /** five-digit NDB number for USDA foods */
  sourceId: string;
  /** readable name, abbreviations expanded */
  name: string;
  /** name as the source wrote it */
  sourceName: string;
  /** two-digit SR28 food group code, or '' for custom foods */
  foodGroup: string;
  per100g: Nutrients & { waterG: number | null };
  portions: Portion[];
  /** grams per mL, from a volume portion or the role default */
  densityGPerMl: number;
  densitySource: 'portion' | 'role-default';
  roles: Role[];
  diet: DietFlag[];
  /** brand-named or restaurant entries: never chosen automatically */
  branded: boolean;
}
