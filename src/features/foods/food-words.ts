/** Catalogue codes in words a cook reads: roles, diet flags, food groups, the source of a food. */
import type { DietFlag, Role } from '../../../shared/food';
import { proteinPer100Kcal, zeroNutrients } from '../../../shared/nutrition';
import type { FoodSummary } from '../../../shared/schemas/analyze';

const ROLE_WORDS: Record<Role, string> = {
  'melting-cheese': 'Melting cheese',
  'hard-cheese': 'Hard cheese',
  'soft-cheese': 'Soft cheese',
  'cured-meat-topping': 'Cured meat topping',
  'ground-meat': 'Ground meat',
  poultry: 'Poultry',
  'red-meat': 'Red meat',
  pork: 'Pork',
  sausage: 'Sausage',
  'fish-seafood': 'Fish or seafood',
  'plant-protein': 'Plant protein',
  'flatbread-wrap': 'Flatbread or wrap',
  bread: 'Bread',
  pasta: 'Pasta',
  'rice-grain': 'Rice or grain',
  potato: 'Potato',
  'tomato-sauce': 'Tomato sauce',
  'cream-sauce-base': 'Cream sauce base',
  'cooking-fat': 'Cooking fat',
  'dairy-milk': 'Milk',
  cream: 'Cream',
  'sour-cream-yogurt': 'Sour cream or yogurt',
  sweetener: 'Sweetener',
  flour: 'Flour',
  'breadcrumb-coating': 'Breadcrumb coating',
  egg: 'Egg',
  vegetable: 'Vegetable',
  fruit: 'Fruit',
  legume: 'Beans and lentils',
  'nut-seed': 'Nuts and seeds',
  'broth-stock': 'Broth or stock',
  condiment: 'Condiment',
  'herb-spice': 'Herb or spice',
  'baking-leavener': 'Leavening',
  chocolate: 'Chocolate',
  other: 'Other',
};

/** The part a food plays in a dish, in words: "melting-cheese" → "Melting cheese". */
export function roleWords(role: string): string {
  const known = ROLE_WORDS[role as Role];
  if (known) return known;
  const spaced = role.replace(/[-_]+/g, ' ').trim();
  return spaced.charAt(0).toUpperCase() + spaced.slice(1);
}

export const DIET_WORDS: Record<DietFlag, { yes: string; no: string }> = {
  vegetarian: { yes: 'Vegetarian', no: 'Not vegetarian' },
  vegan: { yes: 'Vegan', no: 'Not vegan' },
  'dairy-free': { yes: 'Dairy-free', no: 'Not dairy-free' },
  'gluten-free': { yes: 'Gluten-free', no: 'Not gluten-free' },
};

// USDA SR28 FD_GROUP.txt (May 2016): the 25 food groups by their four-digit code's first two digits.
const FOOD_GROUPS: Record<string, string> = {
  '01': 'Dairy and egg products',
  '02': 'Spices and herbs',
  '03': 'Baby foods',
  '04': 'Fats and oils',
  '05': 'Poultry products',
  '06': 'Soups, sauces and gravies',
  '07': 'Sausages and luncheon meats',
  '08': 'Breakfast cereals',
  '09': 'Fruits and fruit juices',
  '10': 'Pork products',
  '11': 'Vegetables and vegetable products',
  '12': 'Nut and seed products',
  '13': 'Beef products',
  '14': 'Beverages',
  '15': 'Finfish and shellfish products',
  '16': 'Legumes and legume products',
  '17': 'Lamb, veal and game products',
  '18': 'Baked products',
  '19': 'Sweets',
  '20': 'Cereal grains and pasta',
  '21': 'Fast foods',
  '22': 'Meals, entrees and side dishes',
  '25': 'Snacks',
  '35': 'American Indian/Alaska Native foods',
  '36': 'Restaurant foods',
};

/** The SR28 food group of a two-digit (or four-digit) code, or null when the code is not one. */
export function foodGroupWords(code: string): string | null {
  return FOOD_GROUPS[code.slice(0, 2)] ?? null;
}

/** Where a food's numbers come from, in words; the USDA reference number only where asked for (referenceNumber). */
export function sourceWords(food: Pick<FoodSummary, 'source' | 'sourceId'>): string {
  return food.source === 'usda-sr28' ? 'USDA food values' : 'Entered from a label';
}

/** "USDA Standard Reference 28, NDB 01009", or null for foods entered from a label. */
export function referenceNumber(food: Pick<FoodSummary, 'source' | 'sourceId'>): string | null {
  return food.source === 'usda-sr28' ? `USDA Standard Reference 28, NDB ${food.sourceId}` : null;
}

/** Grams of protein per 100 kcal of a search hit, from its values per 100 g. */
export function proteinPer100KcalOfHit(hit: { kcalPer100g: number; proteinPer100g: number }): number {
  return proteinPer100Kcal({ ...zeroNutrients(), kcal: hit.kcalPer100g, proteinG: hit.proteinPer100g });
}
