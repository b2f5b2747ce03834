import { Router } from 'express';
import type { Sequelize } from 'sequelize';
import { prepQuerySchema, shoppingListSchema } from '../../shared/schemas/prep';
import { versionParam } from '../../shared/schemas/recipes';
import { parse } from '../middleware/validate';
import { requireAuth } from '../middleware/auth';
import { getFoodEngine } from '../services/food-engine';
import { findReadableRecipe, getVersion } from '../services/recipes';
import { prepFor, prepLines, shoppingList, shoppingText } from '../services/prep';
import { scaleVersion } from '../../shared/prep';

export function prepRouter(sequelize: Sequelize) {
  const router = Router({ mergeParams: true });
  router.use(requireAuth);
  router.get('/', async (req, res) => {
    const { id, number } = parse(versionParam, req.params);
    const { portions } = parse(prepQuerySchema, req.query);
    const recipe = await findReadableRecipe(req.user!, id);
    const version = await getVersion(recipe, number);
    res.json(prepFor(await getFoodEngine(sequelize), recipe, version, portions, req.user!));
  });
  return router;
}

export function shoppingListsRouter(sequelize: Sequelize) {
  const router = Router();
  router.use(requireAuth);
  router.post('/', async (req, res) => {
    const input = parse(shoppingListSchema, req.body);
    const engine = await getFoodEngine(sequelize);
    const batches = [];
    const sources = [];
    for (const item of input.items) {
      const recipe = await findReadableRecipe(req.user!, item.recipeId);
      const version = await getVersion(recipe, item.versionNumber);
      const plan = scaleVersion({ servings: version.servings, lines: prepLines(engine, version) }, item.portions);
      batches.push(plan.batch);
      sources.push({ recipeId: recipe.id, title: recipe.title, versionNumber: version.number, portions: item.portions });
    }
    const items = shoppingList(engine, batches, input.unitSystem ?? req.user!.unitSystem ?? 'us');
    res.status(201).json({ sources, items, text: shoppingText(items) });
  });
  return router;
}
