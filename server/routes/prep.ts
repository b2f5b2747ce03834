import { Router } from 'express';
import type { Sequelize } from 'sequelize';
import { prepQuerySchema, shoppingListSchema } from '../../shared/schemas/prep';
import { versionParam } from '../../shared/schemas/recipes';
import { parse } from '../middleware/validate';
import { requireAuth } from '../middleware/auth';
import { getFoodEngine } from '../services/food-engine';
import { findReadableRecipe, getVersion } from '../services/recipes';
import { buildShoppingList, prepFor } from '../services/prep';

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
    res.status(201).json(await buildShoppingList(await getFoodEngine(sequelize), req.user!, input));
  });
  return router;
}
