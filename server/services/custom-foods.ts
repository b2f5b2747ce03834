import type { Sequelize } from 'sequelize';
import type { CustomFoodInput } from '../../shared/schemas/coaching';
import { generalAtwaterKcal } from '../../shared/nutrition';
import type { Role } from '../../shared/food';
import { assignRoles } from '../catalogue/assign-roles';
import { assignDiet } from '../catalogue/assign-diet';
import { roleDefaultDensity } from '../catalogue/density';
import type { User } from '../models';
import type { FoodEngine } from './food-engine';
import type { StoredFood } from './catalogue';
import { notFound } from '../lib/http-error';

/**
 * A food entered from a package label: per-serving values scaled to 100 g. A label that gives no
 * energy gets it from the general Atwater factors 4/4/9 (USDA Handbook 74).
 */
export function labelToPer100g(input: CustomFoodInput) {
  const density = input.densityGPerMl ?? null;
  const servingG = input.servingSizeG ?? (input.servingSizeMl !== undefined ? input.servingSizeMl * (density ?? 1) : 0);
  const f = 100 / servingG;
  const kcal = input.kcal ?? generalAtwaterKcal(input.proteinG, input.carbsG, input.fatG);
  return {
    servingG,
    per100g: {
      kcal: kcal * f,
      proteinG: input.proteinG * f,
      fatG: input.fatG * f,
      satFatG: (input.satFatG ?? 0) * f,
      carbsG: input.carbsG * f,
      fiberG: (input.fiberG ?? 0) * f,
      sugarG: (input.sugarG ?? 0) * f,
      sodiumMg: (input.sodiumMg ?? 0) * f,
      waterG: null,
    },
    energyFromAtwater: input.kcal === undefined,
  };
}

export async function createCustomFood(sequelize: Sequelize, engine: FoodEngine, coach: User, input: CustomFoodInput): Promise<StoredFood> {
  const { per100g, servingG } = labelToPer100g(input);
  const roles: Role[] = input.roles?.length ? input.roles : assignRoles({ name: input.name, foodGroup: '', sourceId: '', source: 'custom' });
  const diet = assignDiet({ name: input.name, foodGroup: '' });
  const density = input.densityGPerMl ?? (input.servingSizeG && input.servingSizeMl ? input.servingSizeG / input.servingSizeMl : roleDefaultDensity(roles));
  const [rows] = (await sequelize.query(
    `INSERT INTO foods (source, source_id, name, source_name, food_group, kcal, protein_g, fat_g, sat_fat_g, carbs_g, fiber_g, sugar_g, sodium_mg,
       water_g, density_g_per_ml, density_source, roles, diet, branded, owner_id)
     VALUES ('custom', gen_random_uuid()::text, $1, $1, '', $2, $3, $4, $5, $6, $7, $8, $9, NULL, $10, $11, $12, $13, false, $14) RETURNING id, source_id`,
    {
      bind: [input.name, per100g.kcal, per100g.proteinG, per100g.fatG, per100g.satFatG, per100g.carbsG, per100g.fiberG, per100g.sugarG, per100g.sodiumMg,
        density, input.densityGPerMl || (input.servingSizeG && input.servingSizeMl) ? 'portion' : 'role-default', roles, diet, coach.id],
    },
  )) as [{ id: number; source_id: string }[], unknown];
  const portion = { label: '1 serving', amount: 1, measure: 'serving', grams: servingG };
  await sequelize.query(`INSERT INTO food_portions (food_id, seq, label, amount, measure, grams) VALUES ($1, 1, $2, 1, 'serving', $3)`, { bind: [rows[0].id, portion.label, servingG] });
  const food: StoredFood = {
    id: rows[0].id, source: 'custom', sourceId: rows[0].source_id, name: input.name, sourceName: input.name, foodGroup: '',
    per100g, portions: [portion], densityGPerMl: density, densitySource: 'role-default', roles, diet, branded: false, ownerId: coach.id,
  };
  // The engine keeps custom foods by id (for pinning and as swap targets); the search index is the catalogue's.
  engine.foods.push(food);
  engine.byId.set(food.id, food);
  return food;
}

/** A custom food is visible to the coach who entered it and to that coach's clients. */
export function canSeeFood(food: StoredFood, viewer: User | null) {
  if (food.source !== 'custom') return true;
  if (!viewer) return false;
  return food.ownerId === viewer.id || (viewer.coachId !== null && food.ownerId === viewer.coachId);
}

export function customFoodsFor(engine: FoodEngine, viewer: User | null, query: string) {
  if (!viewer) return [];
  const q = query.toLowerCase();
  return engine.foods.filter((f) => f.source === 'custom' && canSeeFood(f, viewer) && f.name.toLowerCase().includes(q));
}

export function requireVisibleFood(engine: FoodEngine, viewer: User | null, id: number) {
  const food = engine.byId.get(id);
  if (!food || !canSeeFood(food, viewer)) throw notFound('No food with that id.');
  return food;
}
