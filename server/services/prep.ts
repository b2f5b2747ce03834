import type { RecipeVersion, Recipe, User } from '../models';
import { scaleVersion, mergeShopping, roundPrepGrams, type PrepLine } from '../../shared/prep';
import { storageFor } from '../../shared/food-safety';
import { allergensOfRecipe } from '../../shared/allergens';
import { roundLabel } from '../../shared/label-rounding';
import { purchaseHint } from '../../shared/purchase-hint';
import type { FoodEngine } from './food-engine';
import { foodSummary } from './foods';
import { computeVersion, findReadableRecipe, getVersion } from './recipes';
import { badRequest } from '../lib/http-error';
import type { ShoppingListInput } from '../../shared/schemas/prep';

function prepLines(version: RecipeVersion): PrepLine[] {
  return version.lines.map((l) => ({ foodId: l.foodId, name: l.foodName ?? l.input, grams: l.grams }));
}

function foodOf(engine: FoodEngine, id: PrepLine['foodId'], name: string) {
  const food = typeof id === 'number' ? engine.byId.get(id) : undefined;
  return food ? foodSummary(food) : { id: null, source: null, sourceId: null, name };
}

function shortName(name: string) {
  // "Egg, whole, raw, fresh" → "egg": the noun a count hint needs ("3 large eggs").
  return name.split(',')[0].trim().toLowerCase();
}

export function shoppingList(engine: FoodEngine, batches: PrepLine[][], unitSystem: 'us' | 'metric') {
  return mergeShopping(batches).map((line) => {
    const food = typeof line.foodId === 'number' ? engine.byId.get(line.foodId) : undefined;
    return {
      food: foodOf(engine, line.foodId, line.name),
      grams: roundPrepGrams(line.grams),
      purchase: food ? purchaseHint(line.grams, food.portions, unitSystem, shortName(food.name)) : '',
    };
  });
}

export function shoppingText(items: ReturnType<typeof shoppingList>) {
  return items.map((i) => `[ ] ${i.food.name} — ${i.grams} g${i.purchase ? ` (${i.purchase})` : ''}`).join('\n');
}

/** Everything a cook needs to take a saved version to the kitchen for a batch of `portions`. */
/** One list for several versions, each scaled to its portions, in the viewer's units unless the input names them. */
export async function buildShoppingList(engine: FoodEngine, viewer: User, input: ShoppingListInput) {
  const batches = [];
  const sources = [];
  for (const item of input.items) {
    const recipe = await findReadableRecipe(viewer, item.recipeId);
    const version = await getVersion(recipe, item.versionNumber);
    const plan = scaleVersion({ servings: version.servings, lines: prepLines(version) }, item.portions);
    batches.push(plan.batch);
    sources.push({ recipeId: recipe.id, title: recipe.title, versionNumber: version.number, portions: item.portions });
  }
  const items = shoppingList(engine, batches, input.unitSystem ?? viewer.unitSystem ?? 'us');
  return { sources, items, text: shoppingText(items) };
}

export function prepFor(engine: FoodEngine, recipe: Recipe, version: RecipeVersion, portions: number, viewer: User) {
  let plan;
  try {
    plan = scaleVersion({ servings: version.servings, lines: prepLines(version) }, portions);
  } catch (error) {
    if (error instanceof RangeError) throw badRequest(`portions: ${error.message}`, { fieldErrors: { portions: [error.message] } });
    throw error;
  }
  const foods = version.lines.flatMap((l) => (l.foodId != null && engine.byId.get(l.foodId) ? [engine.byId.get(l.foodId)!] : []));
  const { perServing } = computeVersion(engine, version.lines, version.servings);
  const servingSizeG = version.lines.reduce((s, l) => s + l.grams, 0) / version.servings;
  const shopping = shoppingList(engine, [plan.batch], viewer.unitSystem ?? 'us');
  return {
    recipe: { id: recipe.id, title: recipe.title, method: recipe.method, notes: recipe.notes, photoUrl: recipe.photoKey ? `/api/recipes/${recipe.id}/photo?v=${encodeURIComponent(recipe.photoKey)}` : null },
    version: { number: version.number, kind: version.kind, servings: version.servings },
    portions: plan.portions,
    perPortion: plan.perPortion.map((l) => ({ food: foodOf(engine, l.foodId, l.name), grams: roundPrepGrams(l.grams), display: l.display })),
    batch: plan.batch.map((l) => ({ food: foodOf(engine, l.foodId, l.name), grams: roundPrepGrams(l.grams), display: l.display })),
    shopping,
    shoppingText: shoppingText(shopping),
    storage: storageFor({ foods, method: `${recipe.method}\n${recipe.notes}` }),
    allergens: allergensOfRecipe(foods),
    label: roundLabel(perServing, servingSizeG),
    perServing,
  };
}
