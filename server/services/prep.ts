import type { RecipeVersion, Recipe, User } from '../models';
import { scaleVersion, mergeShopping, roundPrepGrams, type PrepLine } from '../../shared/prep';
import { storageFor } from '../../shared/food-safety';
import { allergensOfRecipe } from '../../shared/allergens';
import { roundLabel } from '../../shared/label-rounding';
import { measureHint, purchaseHint, writtenMeasure } from '../../shared/purchase-hint';
import { parseLine } from '../../shared/parse-line';
import { weighLine } from '../matching/weigh-line';
import type { FoodEngine } from './food-engine';
import { foodSummary } from './foods';
import { computeVersion, findReadableRecipe, getVersion } from './recipes';
import { badRequest } from '../lib/http-error';
import type { PrepFood, PrepResponse, PrepShoppingItem, ShoppingListInput, ShoppingListResponse } from '../../shared/schemas/prep';

/**
 * A version's lines for prep, each with the measure its text names: the text is weighed again with
 * the line's food, so a rewrite or a corrected weight scales that measure in proportion.
 */
export function prepLines(engine: FoodEngine, version: Pick<RecipeVersion, 'lines'>): PrepLine[] {
  return version.lines.map((l) => {
    const food = l.foodId != null ? engine.byId.get(l.foodId) : undefined;
    let measure = null;
    if (food) {
      const parsed = parseLine(l.input);
      const written = weighLine(parsed, food, food.portions, { countDefault: engine.countDefaults.get(food.id) }).grams;
      const named = writtenMeasure(parsed, written);
      measure = named && l.grams > 0 ? { ...named, amount: (named.amount * l.grams) / written } : null;
    }
    return { foodId: l.foodId, name: l.foodName ?? l.input, grams: l.grams, measure };
  });
}

function foodOf(engine: FoodEngine, id: PrepLine['foodId'], name: string): PrepFood {
  const food = typeof id === 'number' ? engine.byId.get(id) : undefined;
  return food ? foodSummary(food) : { id: null, source: null, sourceId: null, name };
}

function shortName(name: string) {
  // "Egg, whole, raw, fresh" → "egg": the noun a count hint needs ("3 large eggs").
  return name.split(',')[0].trim().toLowerCase();
}

export function shoppingList(engine: FoodEngine, batches: PrepLine[][], unitSystem: 'us' | 'metric'): PrepShoppingItem[] {
  return mergeShopping(batches).map((line) => {
    const food = typeof line.foodId === 'number' ? engine.byId.get(line.foodId) : undefined;
    return {
      food: foodOf(engine, line.foodId, line.name),
      grams: roundPrepGrams(line.grams),
      purchase: line.measure ? measureHint(line.measure) : food ? purchaseHint(line.grams, food.portions, unitSystem, shortName(food.name)) : '',
    };
  });
}

export function shoppingText(items: PrepShoppingItem[]) {
  return items.map((i) => `[ ] ${i.food.name} — ${i.grams} g${i.purchase ? ` (${i.purchase})` : ''}`).join('\n');
}

/** Everything a cook needs to take a saved version to the kitchen for a batch of `portions`. */
/** One list for several versions, each scaled to its portions, in the viewer's units unless the input names them. */
export async function buildShoppingList(engine: FoodEngine, viewer: User, input: ShoppingListInput): Promise<ShoppingListResponse> {
  const batches = [];
  const sources = [];
  for (const item of input.items) {
    const recipe = await findReadableRecipe(viewer, item.recipeId);
    const version = await getVersion(recipe, item.versionNumber);
    const plan = scaleVersion({ servings: version.servings, lines: prepLines(engine, version) }, item.portions);
    batches.push(plan.batch);
    sources.push({ recipeId: recipe.id, title: recipe.title, versionNumber: version.number, portions: item.portions });
  }
  const items = shoppingList(engine, batches, input.unitSystem ?? viewer.unitSystem ?? 'us');
  return { sources, items, text: shoppingText(items) };
}

export function prepFor(engine: FoodEngine, recipe: Recipe, version: RecipeVersion, portions: number, viewer: User): PrepResponse {
  let plan;
  try {
    plan = scaleVersion({ servings: version.servings, lines: prepLines(engine, version) }, portions);
  } catch (error) {
    if (error instanceof RangeError) throw badRequest(`portions: ${error.message}`, { fieldErrors: { portions: [error.message] } });
    throw error;
  }
  const foods = version.lines.flatMap((l) => (l.foodId != null && engine.byId.get(l.foodId) ? [engine.byId.get(l.foodId)!] : []));
  const { perServing } = computeVersion(engine, version.lines, version.servings);
  const servingSizeG = version.lines.reduce((s, l) => s + l.grams, 0) / version.servings;
  const shopping = shoppingList(engine, [plan.batch], viewer.unitSystem ?? 'us');
  return {
    recipe: {
      id: recipe.id,
      title: recipe.title,
      method: recipe.method,
      notes: recipe.notes,
      photoUrl: recipe.photoKey ? `/api/recipes/${recipe.id}/photo?v=${encodeURIComponent(recipe.photoKey)}` : null,
    },
    version: { number: version.number, kind: version.kind, servings: version.servings },
    portions: plan.portions,
    perPortion: plan.perPortion.map((l) => ({ food: foodOf(engine, l.foodId, l.name), grams: roundPrepGrams(l.grams), display: l.display })),
    batch: plan.batch.map((l) => ({
      food: foodOf(engine, l.foodId, l.name),
      grams: roundPrepGrams(l.grams),
      display: l.display,
      household: l.measure ? measureHint(l.measure) : '',
    })),
    shopping,
    shoppingText: shoppingText(shopping),
    storage: storageFor({ foods, method: `${recipe.method}\n${recipe.notes}` }),
    allergens: allergensOfRecipe(foods),
    label: roundLabel(perServing, servingSizeG),
    perServing,
  };
}
