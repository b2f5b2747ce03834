import type { Sequelize, Transaction } from 'sequelize';
import type { CatalogueFood, DietFlag, Portion, Role } from '../../shared/food';
import type { LabelPanel } from '../../shared/label-food';

/**
 * The `foods` and `food_portions` tables: every statement that reads or writes them lives here.
 * They are raw SQL rather than a Sequelize model because the food engine reads the whole catalogue
 * into memory once (services/catalogue.ts turns rows into foods) and the seed writes it in bulk.
 */

export interface FoodRow {
  id: number;
  source: 'usda-sr28' | 'custom';
  source_id: string;
  name: string;
  source_name: string;
  food_group: string;
  kcal: number;
  protein_g: number;
  fat_g: number;
  sat_fat_g: number;
  carbs_g: number;
  fiber_g: number;
  sugar_g: number;
  sodium_mg: number;
  water_g: number | null;
  density_g_per_ml: number;
  density_source: 'portion' | 'role-default';
  roles: Role[];
  diet: DietFlag[];
  branded: boolean;
  owner_id: number | null;
  serving_g: number | null;
  serving_ml: number | null;
  serving_label: string | null;
  barcode: string | null;
  label: LabelPanel | null;
  energy_from_atwater: boolean;
  hidden_at: Date | null;
  created_at: Date;
  updated_at: Date;
}

export interface PortionRow {
  food_id: number;
  label: string;
  amount: number;
  measure: string;
  grams: number;
}

export interface FoodRows {
  foods: FoodRow[];
  portions: PortionRow[];
}

/** Every food row and every portion, in id and portion order. */
export async function selectAllFoodRows(sequelize: Sequelize): Promise<FoodRows> {
  const [foods] = (await sequelize.query('SELECT * FROM foods ORDER BY id')) as [FoodRow[], unknown];
  const [portions] = (await sequelize.query('SELECT food_id, label, amount, measure, grams FROM food_portions ORDER BY food_id, seq')) as [
    PortionRow[],
    unknown,
  ];
  return { foods, portions };
}

/** One custom food's row and portions (no rows when it is gone). */
export async function selectCustomFoodRows(sequelize: Sequelize, id: number): Promise<FoodRows> {
  const [foods] = (await sequelize.query("SELECT * FROM foods WHERE id = $1 AND source = 'custom'", { bind: [id] })) as [FoodRow[], unknown];
  if (foods.length === 0) return { foods, portions: [] };
  const [portions] = (await sequelize.query('SELECT food_id, label, amount, measure, grams FROM food_portions WHERE food_id = $1 ORDER BY seq', {
    bind: [id],
  })) as [PortionRow[], unknown];
  return { foods, portions };
}

/** Every custom food's row and portions. */
export async function selectAllCustomFoodRows(sequelize: Sequelize): Promise<FoodRows> {
  const [foods] = (await sequelize.query("SELECT * FROM foods WHERE source = 'custom' ORDER BY id")) as [FoodRow[], unknown];
  const [portions] = (await sequelize.query(
    "SELECT p.food_id, p.label, p.amount, p.measure, p.grams FROM food_portions p JOIN foods f ON f.id = p.food_id WHERE f.source = 'custom' ORDER BY p.food_id, p.seq",
  )) as [PortionRow[], unknown];
  return { foods, portions };
}

/** A custom food's own columns, as a label gives them. */
export interface CustomFoodValues {
  name: string;
  per100g: { kcal: number; proteinG: number; fatG: number; satFatG: number; carbsG: number; fiberG: number; sugarG: number; sodiumMg: number };
  densityGPerMl: number;
  densitySource: 'portion' | 'role-default';
  roles: Role[];
  diet: DietFlag[];
  ownerId: number;
  servingG: number | null;
  servingMl: number | null;
  servingLabel: string | null;
  barcode: string | null;
  panel: LabelPanel;
  energyFromAtwater: boolean;
}

/** The nutrient columns kcal … sodium_mg, in table order. */
function nutrientColumns(n: CustomFoodValues['per100g']): number[] {
  return [n.kcal, n.proteinG, n.fatG, n.satFatG, n.carbsG, n.fiberG, n.sugarG, n.sodiumMg];
}

function customBind(v: CustomFoodValues): unknown[] {
  return [
    v.name,
    ...nutrientColumns(v.per100g),
    v.densityGPerMl,
    v.densitySource,
    v.roles,
    v.diet,
    v.ownerId,
    v.servingG,
    v.servingMl,
    v.servingLabel,
    v.barcode,
    JSON.stringify(v.panel),
    v.energyFromAtwater,
  ];
}

/** A new custom food row; returns its id. */
export async function insertCustomFood(sequelize: Sequelize, transaction: Transaction, values: CustomFoodValues): Promise<number> {
  const [rows] = (await sequelize.query(
    `INSERT INTO foods (source, source_id, name, source_name, food_group, kcal, protein_g, fat_g, sat_fat_g, carbs_g, fiber_g, sugar_g, sodium_mg,
       water_g, density_g_per_ml, density_source, roles, diet, branded, owner_id, serving_g, serving_ml, serving_label, barcode, label, energy_from_atwater)
     VALUES ('custom', gen_random_uuid()::text, $1, $1, '', $2, $3, $4, $5, $6, $7, $8, $9, NULL, $10, $11, $12, $13, false, $14, $15, $16, $17, $18, $19::jsonb, $20)
     RETURNING id`,
    { bind: customBind(values), transaction },
  )) as [{ id: number }[], unknown];
  return rows[0].id;
}

export async function updateCustomFood(sequelize: Sequelize, transaction: Transaction, id: number, values: CustomFoodValues): Promise<void> {
  await sequelize.query(
    `UPDATE foods SET name = $1, source_name = $1, kcal = $2, protein_g = $3, fat_g = $4, sat_fat_g = $5, carbs_g = $6, fiber_g = $7, sugar_g = $8,
       sodium_mg = $9, density_g_per_ml = $10, density_source = $11, roles = $12, diet = $13, owner_id = $14, serving_g = $15, serving_ml = $16,
       serving_label = $17, barcode = $18, label = $19::jsonb, energy_from_atwater = $20, updated_at = now()
     WHERE id = $21`,
    { bind: [...customBind(values), id], transaction },
  );
}

/** One food's portions replaced by these, in this order. */
export async function replaceFoodPortions(sequelize: Sequelize, transaction: Transaction, foodId: number, portions: Portion[]): Promise<void> {
  await sequelize.query('DELETE FROM food_portions WHERE food_id = $1', { bind: [foodId], transaction });
  for (const [i, p] of portions.entries()) {
    await sequelize.query('INSERT INTO food_portions (food_id, seq, label, amount, measure, grams) VALUES ($1, $2, $3, $4, $5, $6)', {
      bind: [foodId, i + 1, p.label, p.amount, p.measure, p.grams],
      transaction,
    });
  }
}

/** Kept for the saved versions that use it, offered nowhere else. */
export async function hideFood(sequelize: Sequelize, transaction: Transaction, id: number, reason: 'replaced' | 'deleted'): Promise<void> {
  await sequelize.query('UPDATE foods SET hidden_at = now(), hidden_reason = $2, updated_at = now() WHERE id = $1', { bind: [id, reason], transaction });
}

/**
 * A departing owner's label foods that someone else's saved version uses stay, hidden and ownerless,
 * so those versions keep their numbers; the rest go with the owner (the foreign key cascades).
 */
export async function orphanFoodsUsedByOthers(sequelize: Sequelize, transaction: Transaction, ownerId: number): Promise<void> {
  await sequelize.query(
    `UPDATE foods f SET owner_id = NULL, hidden_at = COALESCE(f.hidden_at, now()), hidden_reason = COALESCE(f.hidden_reason, 'owner deleted'), updated_at = now()
     WHERE f.owner_id = :ownerId AND EXISTS (
       SELECT 1 FROM recipe_versions v JOIN recipes r ON r.id = v.recipe_id
       WHERE r.owner_id <> :ownerId AND v.lines @> jsonb_build_array(jsonb_build_object('foodId', f.id)))`,
    { replacements: { ownerId }, transaction },
  );
}

/** Gone with its portions (the foreign key cascades). */
export async function deleteFood(sequelize: Sequelize, transaction: Transaction, id: number): Promise<void> {
  await sequelize.query('DELETE FROM foods WHERE id = $1', { bind: [id], transaction });
}

// --- The SR28 catalogue seed: bulk writes in chunks.

const CHUNK = 500;

const CATALOGUE_COLUMNS = [
  'source',
  'source_id',
  'name',
  'source_name',
  'food_group',
  'kcal',
  'protein_g',
  'fat_g',
  'sat_fat_g',
  'carbs_g',
  'fiber_g',
  'sugar_g',
  'sodium_mg',
  'water_g',
  'density_g_per_ml',
  'density_source',
  'roles',
  'diet',
  'branded',
];

function catalogueRow(f: CatalogueFood) {
  return [
    f.source,
    f.sourceId,
    f.name,
    f.sourceName,
    f.foodGroup,
    ...nutrientColumns(f.per100g),
    f.per100g.waterG,
    f.densityGPerMl,
    f.densitySource,
    f.roles,
    f.diet,
    f.branded,
  ];
}

/** Inserts or updates every catalogue food by (source, source_id). */
export async function upsertCatalogueFoods(sequelize: Sequelize, foods: CatalogueFood[], transaction: Transaction): Promise<void> {
  const updates = CATALOGUE_COLUMNS.filter((c) => c !== 'source' && c !== 'source_id').map((c) => `${c} = EXCLUDED.${c}`);
  for (let i = 0; i < foods.length; i += CHUNK) {
    const chunk = foods.slice(i, i + CHUNK);
    const values: unknown[] = [];
    const tuples = chunk.map((f) => {
      const row = catalogueRow(f);
      const start = values.length;
      values.push(...row);
      return `(${row.map((_, j) => `$${start + j + 1}`).join(', ')})`;
    });
    await sequelize.query(
      `INSERT INTO foods (${CATALOGUE_COLUMNS.join(', ')}) VALUES ${tuples.join(', ')}
       ON CONFLICT (source, source_id) DO UPDATE SET ${updates.join(', ')}, updated_at = now()`,
      { bind: values, transaction },
    );
  }
}

/** Every SR28 food's portions replaced by the catalogue's. */
export async function replaceCataloguePortions(sequelize: Sequelize, foods: CatalogueFood[], transaction: Transaction): Promise<void> {
  const [ids] = (await sequelize.query(`SELECT id, source_id FROM foods WHERE source = 'usda-sr28'`, { transaction })) as [
    { id: number; source_id: string }[],
    unknown,
  ];
  const idBySource = new Map(ids.map((r) => [r.source_id, r.id]));
  await sequelize.query(`DELETE FROM food_portions WHERE food_id IN (SELECT id FROM foods WHERE source = 'usda-sr28')`, { transaction });
  const rows = foods.flatMap((f) => f.portions.map((p, seq) => [idBySource.get(f.sourceId), seq + 1, p.label, p.amount, p.measure, p.grams]));
  for (let i = 0; i < rows.length; i += CHUNK) {
    const chunk = rows.slice(i, i + CHUNK);
    const values = chunk.flat();
    const tuples = chunk.map((_, r) => `(${[1, 2, 3, 4, 5, 6].map((c) => `$${r * 6 + c}`).join(', ')})`);
    await sequelize.query(`INSERT INTO food_portions (food_id, seq, label, amount, measure, grams) VALUES ${tuples.join(', ')}`, {
      bind: values,
      transaction,
    });
  }
}
