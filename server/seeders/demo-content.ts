import type { Sequelize } from 'sequelize';
import demo from '../../data/demo/recipes.json';
import { ClientTarget, Recipe, Swap, User } from '../models';
import { getFoodEngine } from '../services/food-engine';
import { createRecipe } from '../services/recipes';

/**
 * The demo cook's recipe book and the demo coach's published swaps (invented data, data/demo/).
 * Idempotent: recipes are matched by title, swaps by their foods.
 */
export async function seedDemoContent(sequelize: Sequelize) {
  const cook = await User.findOne({ where: { email: 'cook@hearthswap.test' } });
  const coach = await User.findOne({ where: { email: 'coach@hearthswap.test' } });
  if (!cook || !coach) return { recipes: 0, swaps: 0 };
  const engine = await getFoodEngine(sequelize);
  let recipes = 0;
  for (const r of demo.recipes) {
    if (await Recipe.findOne({ where: { ownerId: cook.id, title: r.title } })) continue;
    await createRecipe(sequelize, engine, cook, {
      title: r.title,
      servings: r.servings,
      notes: r.notes,
      method: r.method,
      lines: r.ingredients.map((input) => ({ input })),
    });
    recipes++;
  }
  let swaps = 0;
  for (const s of demo.coachSwaps) {
    const from = engine.matcher.search(s.from, 1)[0]?.food;
    const to = engine.matcher.search(s.to, 1)[0]?.food;
    if (!from || !to || from.id === to.id) continue;
    if (await Swap.findOne({ where: { coachId: coach.id, fromFoodId: from.id, toFoodId: to.id } })) continue;
    await Swap.create({
      coachId: coach.id,
      fromFoodId: from.id,
      fromRole: null,
      toFoodId: to.id,
      volumeRatio: 1,
      note: s.note,
      tags: s.tags,
      status: 'published',
    });
    swaps++;
  }
  // On the first seed the demo cook becomes the demo coach's client, with per-meal targets.
  if (recipes === demo.recipes.length && cook.coachId === null) {
    cook.coachId = coach.id;
    await cook.save();
    await ClientTarget.upsert({ clientId: cook.id, coachId: coach.id, targets: demo.clientTargets });
  }
  return { recipes, swaps };
}
