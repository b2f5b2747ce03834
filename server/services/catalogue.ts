import type { Sequelize } from 'sequelize';
import type { CatalogueFood, Portion } from '../../shared/food';
import type { LabelPanel } from '../../shared/label-food';
import { selectAllCustomFoodRows, selectAllFoodRows, selectCustomFoodRows, type FoodRow, type FoodRows } from '../models/food-table';

/** What a food entered from a label keeps beside its per-100 g values. */
export interface LabelRecord {
  servingG: number | null;
  servingMl: number | null;
  servingLabel: string | null;
  barcode: string | null;
  /** the panel per serving as entered; null for foods entered before panels were kept */
  panel: LabelPanel | null;
  energyFromAtwater: boolean;
  createdAt: Date;
  updatedAt: Date;
}

export interface StoredFood extends CatalogueFood {
  /** the cook or coach who entered a custom food; null for catalogue foods */
  ownerId: number | null;
  /** a deleted custom food that saved versions still use: kept for them, offered nowhere else */
  hidden: boolean;
  label: LabelRecord | null;
}

function toFood(row: FoodRow, portions: Portion[]): StoredFood {
  return {
    id: row.id,
    source: row.source,
    sourceId: row.source_id,
    name: row.name,
    sourceName: row.source_name,
    foodGroup: row.food_group,
    per100g: {
      kcal: row.kcal,
      proteinG: row.protein_g,
      fatG: row.fat_g,
      satFatG: row.sat_fat_g,
      carbsG: row.carbs_g,
      fiberG: row.fiber_g,
      sugarG: row.sugar_g,
      sodiumMg: row.sodium_mg,
      waterG: row.water_g,
    },
    portions,
    densityGPerMl: row.density_g_per_ml,
    densitySource: row.density_source,
    roles: row.roles,
    diet: row.diet,
    branded: row.branded,
    ownerId: row.owner_id,
    hidden: row.hidden_at != null,
    label:
      row.source === 'custom'
        ? {
            servingG: row.serving_g,
            servingMl: row.serving_ml,
            servingLabel: row.serving_label,
            barcode: row.barcode,
            panel: row.label,
            energyFromAtwater: row.energy_from_atwater,
            createdAt: row.created_at,
            updatedAt: row.updated_at,
          }
        : null,
  };
}

const finiteAtLeastZero = (n: number | null) => n === null || (Number.isFinite(n) && n >= 0);

/**
 * A food the engine can compute with: every value finite and not negative, a density above 0.
 * PostgreSQL's double precision holds Infinity and NaN, and rows entered before the label limits
 * existed may carry them; such a row is refused here so that no line, prep or rewrite ever sees it.
 */
export function isUsableFood(food: CatalogueFood): boolean {
  const values = Object.values(food.per100g) as (number | null)[];
  return values.every(finiteAtLeastZero) && Number.isFinite(food.densityGPerMl) && food.densityGPerMl > 0;
}

function usablePortions(portions: Portion[]) {
  return portions.filter((p) => Number.isFinite(p.grams) && p.grams > 0 && Number.isFinite(p.amount) && p.amount > 0);
}

function readRows({ foods, portions }: FoodRows): { foods: StoredFood[]; refused: number[] } {
  const byFood = new Map<number, Portion[]>();
  for (const p of portions) {
    const list = byFood.get(p.food_id) ?? [];
    list.push({ label: p.label, amount: p.amount, measure: p.measure, grams: p.grams });
    byFood.set(p.food_id, list);
  }
  const out: StoredFood[] = [];
  const refused: number[] = [];
  for (const row of foods) {
    const food = toFood(row, usablePortions(byFood.get(row.id) ?? []));
    if (isUsableFood(food)) out.push(food);
    else refused.push(row.id);
  }
  return { foods: out, refused };
}

function warnRefused(refused: number[]) {
  if (refused.length > 0) console.warn(`Foods ${refused.join(', ')} have impossible values (non-finite or negative) and were not loaded.`);
}

/** Every usable food with its portions, read once from PostgreSQL. */
export async function readAllFoods(sequelize: Sequelize): Promise<StoredFood[]> {
  const read = readRows(await selectAllFoodRows(sequelize));
  warnRefused(read.refused);
  return read.foods;
}

/** One custom food as it is now in the database: null when it is gone or unusable. */
export async function readCustomFood(sequelize: Sequelize, id: number): Promise<StoredFood | null> {
  const read = readRows(await selectCustomFoodRows(sequelize, id));
  warnRefused(read.refused);
  return read.foods[0] ?? null;
}

/** Every custom food as it is now: what a process re-reads after missing notifications. */
export async function readCustomFoods(sequelize: Sequelize): Promise<StoredFood[]> {
  const read = readRows(await selectAllCustomFoodRows(sequelize));
  warnRefused(read.refused);
  return read.foods;
}
