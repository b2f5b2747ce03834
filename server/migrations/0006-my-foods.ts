import type { Migration } from './types';

/**
 * Foods entered from a label by any cook or coach: the panel as printed, hiding instead of deleting
 * a food that saved versions use, and a notification on every change of a custom food so that every
 * app process on this database refreshes it (server/services/food-sync.ts).
 *
 * Rows entered before the limits existed may be impossible (a serving of 4.9e-324 g made every value
 * per 100 g Infinity): they are hidden, never deleted, so versions that use them keep their lines.
 *
 * HIDE_IMPOSSIBLE_FOODS hides custom foods whose stored values no food can have. Limits and rounding slack as in
 * shared/label-food.ts: per 100 g, 900 kcal (+5 kcal a serving), 100 g of macros (+ the larger of
 * 2 g and 1.5 g a serving), 40,000 mg sodium; the serving is the food's first portion.
 */
export const HIDE_IMPOSSIBLE_FOODS = `
    WITH serving AS (
      SELECT f.id, (SELECT p.grams FROM food_portions p WHERE p.food_id = f.id ORDER BY p.seq LIMIT 1) AS g
      FROM foods f WHERE f.source = 'custom'
    )
    UPDATE foods SET hidden_at = now(), hidden_reason = 'impossible values'
    FROM serving s
    WHERE foods.id = s.id AND foods.hidden_at IS NULL AND (
      'NaN'::float8 IN (foods.kcal, foods.protein_g, foods.fat_g, foods.sat_fat_g, foods.carbs_g, foods.fiber_g, foods.sugar_g, foods.sodium_mg, foods.density_g_per_ml)
      OR 'Infinity'::float8 IN (foods.kcal, foods.protein_g, foods.fat_g, foods.sat_fat_g, foods.carbs_g, foods.fiber_g, foods.sugar_g, foods.sodium_mg, foods.density_g_per_ml)
      OR LEAST(foods.kcal, foods.protein_g, foods.fat_g, foods.sat_fat_g, foods.carbs_g, foods.fiber_g, foods.sugar_g, foods.sodium_mg) < 0
      OR s.g IS NULL OR s.g < 1 OR s.g = 'Infinity'
      OR foods.kcal > 900 + 500 / s.g
      OR GREATEST(foods.protein_g, foods.fat_g, foods.carbs_g, foods.sat_fat_g, foods.fiber_g, foods.sugar_g) > 100 + GREATEST(2, 150 / s.g)
      OR foods.protein_g + foods.fat_g + foods.carbs_g > 100 + GREATEST(2, 150 / s.g)
      OR foods.sodium_mg > 40000
    );`;

export const up: Migration = async ({ context: qi }) => {
  await qi.sequelize.query(`
    ALTER TABLE foods
      ADD COLUMN serving_g double precision,
      ADD COLUMN serving_ml double precision,
      ADD COLUMN serving_label text,
      ADD COLUMN barcode varchar(14),
      ADD COLUMN label jsonb,
      ADD COLUMN energy_from_atwater boolean NOT NULL DEFAULT false,
      ADD COLUMN hidden_at timestamptz,
      ADD COLUMN hidden_reason text;

    ${HIDE_IMPOSSIBLE_FOODS}
    -- their broken portions would still weigh lines; the food itself stays for the versions that name it
    DELETE FROM food_portions p USING foods f WHERE p.food_id = f.id AND f.hidden_reason = 'impossible values';

    CREATE INDEX foods_owner_idx ON foods (owner_id) WHERE source = 'custom';

    CREATE FUNCTION notify_custom_food_change() RETURNS trigger AS $$
    BEGIN
      IF TG_OP = 'DELETE' THEN
        IF OLD.source = 'custom' THEN PERFORM pg_notify('hearthswap_foods', OLD.id::text); END IF;
      ELSIF NEW.source = 'custom' THEN
        PERFORM pg_notify('hearthswap_foods', NEW.id::text);
      END IF;
      RETURN NULL;
    END;
    $$ LANGUAGE plpgsql;

    CREATE TRIGGER foods_custom_changed AFTER INSERT OR UPDATE OR DELETE ON foods
      FOR EACH ROW EXECUTE FUNCTION notify_custom_food_change();
    -- notifications are sent on commit: change a food and its portions in one transaction
  `);
};

export const down: Migration = async ({ context: qi }) => {
  await qi.sequelize.query(`
    DROP TRIGGER foods_custom_changed ON foods;
    DROP FUNCTION notify_custom_food_change();
    DROP INDEX foods_owner_idx;
    ALTER TABLE foods DROP COLUMN serving_g, DROP COLUMN serving_ml, DROP COLUMN serving_label, DROP COLUMN barcode, DROP COLUMN label,
      DROP COLUMN energy_from_atwater, DROP COLUMN hidden_at, DROP COLUMN hidden_reason;
  `);
};
