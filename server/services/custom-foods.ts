import type { Sequelize, Transaction } from 'sequelize';
import type { LabelFoodInput, LabelFoodPatch, MyFood, SavedFoodResponse } from '../../shared/schemas/foods';
import { labelFoodSchema } from '../../shared/schemas/foods';
import { energyWarning, panelPer100g, panelPortions, type LabelPanel } from '../../shared/label-food';
import type { Role } from '../../shared/food';
import { ownFoodFit } from './own-food-match';
import { assignRoles } from '../catalogue/assign-roles';
import { assignDiet } from '../catalogue/assign-diet';
import { DENSITY_BOUNDS, roleDefaultDensity } from '../catalogue/density';
import type { User } from '../models';
import { deleteFood, hideFood, insertCustomFood, replaceFoodPortions, updateCustomFood, type CustomFoodValues } from '../models/food-table';
import { dropCustomFood, putCustomFood, type FoodEngine } from './food-engine';
import { readCustomFood, type StoredFood } from './catalogue';
import { foodDetail } from './foods';
import { forbidden, notFound } from '../lib/http-error';
import { parse } from '../middleware/validate';

export type { LabelFoodInput };

function panelOf(input: LabelFoodInput): LabelPanel {
  const { name: _name, barcode: _barcode, roles: _roles, ...panel } = input;
  return panel;
}

/** Inserts or rewrites a custom food's row and portions from its panel; returns its id. */
async function writeFood(sequelize: Sequelize, transaction: Transaction, ownerId: number, input: LabelFoodInput, id: number | null): Promise<number> {
  const panel = panelOf(input);
  const { per100g, servingG, energyFromAtwater } = panelPer100g(panel);
  const roles: Role[] = input.roles?.length ? input.roles : assignRoles({ name: input.name, foodGroup: '', sourceId: '', source: 'custom' });
  const diet = assignDiet({ name: input.name, foodGroup: '' });
  const { portions, densityGPerMl } = panelPortions(panel, servingG);
  const density = densityGPerMl === null ? roleDefaultDensity(roles) : Math.min(DENSITY_BOUNDS.max, Math.max(DENSITY_BOUNDS.min, densityGPerMl));
  const values: CustomFoodValues = {
    name: input.name,
    per100g,
    densityGPerMl: density,
    densitySource: densityGPerMl === null ? 'role-default' : 'portion',
    roles,
    diet,
    ownerId,
    servingG: input.servingSizeG ?? null,
    servingMl: input.servingSizeMl ?? null,
    servingLabel: input.servingLabel || null,
    barcode: input.barcode ?? null,
    panel,
    energyFromAtwater,
  };
  const foodId = id === null ? await insertCustomFood(sequelize, transaction, values) : id;
  if (id !== null) await updateCustomFood(sequelize, transaction, id, values);
  await replaceFoodPortions(sequelize, transaction, foodId, portions);
  return foodId;
}

/** Reads the food back and puts it into this process's engine now; other processes follow via food-sync. */
async function refresh(sequelize: Sequelize, engine: FoodEngine, id: number): Promise<StoredFood> {
  const food = await readCustomFood(sequelize, id);
  if (!food) throw new Error(`Food ${id} could not be read back after saving.`);
  putCustomFood(engine, food);
  return food;
}

function warningsFor(input: LabelFoodInput) {
  const warning = energyWarning(panelOf(input));
  return warning ? [warning] : [];
}

/** A food from a package label, entered by any cook or coach; stored per 100 g. */
export async function createLabelFood(sequelize: Sequelize, engine: FoodEngine, owner: User, input: LabelFoodInput): Promise<SavedFoodResponse> {
  const id = await sequelize.transaction((t) => writeFood(sequelize, t, owner.id, input, null));
  const food = await refresh(sequelize, engine, id);
  return { ...myFoodView(food, owner), warnings: warningsFor(input) };
}

async function usedInVersions(sequelize: Sequelize, id: number, transaction?: Transaction) {
  const [rows] = (await sequelize.query('SELECT EXISTS (SELECT 1 FROM recipe_versions WHERE lines @> $1::jsonb) AS used', {
    bind: [JSON.stringify([{ foodId: id }])],
    transaction,
  })) as [{ used: boolean }[], unknown];
  return rows[0].used;
}

/** A food the viewer may change: theirs and not deleted. A coach's food is read-only to clients. */
function requireOwnFood(engine: FoodEngine, viewer: User, id: number): StoredFood {
  const food = engine.custom.get(id);
  if (!food || food.hidden || !canSeeFood(food, viewer)) throw notFound('No food with that id.');
  if (food.ownerId !== viewer.id) throw forbidden('Only the cook who entered this food can change or delete it.');
  return food;
}

/** The panel as stored, for foods entered before panels were kept: rebuilt from the per-100 g values. */
function storedInput(food: StoredFood): LabelFoodInput {
  const panel = food.label?.panel;
  if (panel) return { name: food.name, ...panel, barcode: food.label?.barcode ?? undefined, roles: food.roles };
  const servingG = food.portions.find((p) => p.measure === 'serving')?.grams ?? 100;
  const f = servingG / 100;
  const v = food.per100g;
  return {
    name: food.name,
    servingSizeG: servingG,
    kcal: v.kcal * f,
    proteinG: v.proteinG * f,
    fatG: v.fatG * f,
    satFatG: v.satFatG * f,
    carbsG: v.carbsG * f,
    fiberG: v.fiberG * f,
    sugarG: v.sugarG * f,
    sodiumMg: v.sodiumMg * f,
    roles: food.roles,
  };
}

/**
 * Changes a food. One that saved versions use is not changed under them: the new values become a new
 * food that takes its place (in the owner's list and the coach's swaps), and the old one is hidden,
 * so every saved version keeps its numbers.
 */
export async function updateLabelFood(sequelize: Sequelize, engine: FoodEngine, viewer: User, id: number, patch: LabelFoodPatch): Promise<SavedFoodResponse> {
  const food = requireOwnFood(engine, viewer, id);
  const merged: Record<string, unknown> = { ...storedInput(food), ...patch };
  // A serving given in one unit replaces the other unless both are sent.
  if (patch.servingSizeG !== undefined && patch.servingSizeMl === undefined && food.label?.panel?.servingSizeG === undefined) delete merged.servingSizeMl;
  const input = parse(labelFoodSchema, merged);
  const newId = await sequelize.transaction(async (t) => {
    if (!(await usedInVersions(sequelize, id, t))) return writeFood(sequelize, t, viewer.id, input, id);
    const copy = await writeFood(sequelize, t, viewer.id, input, null);
    await sequelize.query('UPDATE swaps SET to_food_id = $2 WHERE to_food_id = $1', { bind: [id, copy], transaction: t });
    await sequelize.query('UPDATE swaps SET from_food_id = $2 WHERE from_food_id = $1', { bind: [id, copy], transaction: t });
    await hideFood(sequelize, t, id, 'replaced');
    return copy;
  });
  if (newId !== id) await refresh(sequelize, engine, id);
  const saved = await refresh(sequelize, engine, newId);
  return { ...myFoodView(saved, viewer), warnings: warningsFor(input) };
}

/** Deletes a food; one that saved versions use is hidden instead, and they keep it. Swaps to it go either way. */
export async function deleteLabelFood(sequelize: Sequelize, engine: FoodEngine, viewer: User, id: number): Promise<{ hidden: boolean }> {
  requireOwnFood(engine, viewer, id);
  const hidden = await sequelize.transaction(async (t) => {
    if (!(await usedInVersions(sequelize, id, t))) {
      await deleteFood(sequelize, t, id);
      return false;
    }
    await sequelize.query('DELETE FROM swaps WHERE to_food_id = $1 OR from_food_id = $1', { bind: [id], transaction: t });
    await hideFood(sequelize, t, id, 'deleted');
    return true;
  });
  if (hidden) await refresh(sequelize, engine, id);
  else dropCustomFood(engine, id);
  return { hidden };
}

export function myFoodView(food: StoredFood, viewer: User): MyFood {
  const label = food.label;
  const panel = label?.panel ?? storedInput(food);
  return {
    ...foodDetail(food),
    ownerId: food.ownerId ?? 0,
    owner: food.ownerId === viewer.id ? 'you' : 'coach',
    servingSizeG: label?.servingG ?? null,
    servingSizeMl: label?.servingMl ?? null,
    servingLabel: label?.servingLabel ?? null,
    barcode: label?.barcode ?? null,
    label: panel,
    energyFromAtwater: label?.energyFromAtwater ?? false,
    createdAt: (label?.createdAt ?? new Date(0)).toISOString(),
    updatedAt: (label?.updatedAt ?? new Date(0)).toISOString(),
  };
}

/** A custom food is visible to the cook or coach who entered it and, for a coach's, to that coach's clients. */
export function canSeeFood(food: StoredFood, viewer: User | null) {
  if (food.source !== 'custom') return true;
  if (!viewer) return false;
  return food.ownerId === viewer.id || (viewer.coachId !== null && food.ownerId === viewer.coachId);
}

/** The viewer's foods then their coach's, deleted ones left out: what matching, search and swaps offer. */
export function ownFoodsFor(engine: FoodEngine, viewer: User | null): StoredFood[] {
  if (!viewer) return [];
  const mine: StoredFood[] = [];
  const coach: StoredFood[] = [];
  for (const food of engine.custom.values()) {
    if (food.hidden) continue;
    if (food.ownerId === viewer.id) mine.push(food);
    else if (viewer.coachId !== null && food.ownerId === viewer.coachId) coach.push(food);
  }
  return [...mine, ...coach];
}

export function listMyFoods(engine: FoodEngine, viewer: User): MyFood[] {
  return ownFoodsFor(engine, viewer)
    .map((f) => myFoodView(f, viewer))
    .sort((a, b) => (a.owner === b.owner ? a.name.localeCompare(b.name) : a.owner === 'you' ? -1 : 1));
}

/** The viewer's foods (then their coach's) that a search names, by text or by words. */
export function customFoodsFor(engine: FoodEngine, viewer: User | null, query: string): StoredFood[] {
  const q = query.toLowerCase();
  return ownFoodsFor(engine, viewer).filter((f) => f.name.toLowerCase().includes(q) || ownFoodFit(query, f) > 0);
}

export function requireVisibleFood(engine: FoodEngine, viewer: User | null, id: number) {
  const food = engine.byId.get(id);
  if (!food || !canSeeFood(food, viewer)) throw notFound('No food with that id.');
  return food;
}
