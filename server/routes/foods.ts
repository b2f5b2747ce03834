import { Router } from 'express';
import type { Sequelize } from 'sequelize';
import { foodIdParamSchema, foodSearchQuerySchema } from '../../shared/schemas/foods';
import { parse } from '../middleware/validate';
import { getFoodEngine } from '../services/food-engine';
import { getFood, searchFoods } from '../services/foods';
import { canSeeFood, customFoodsFor } from '../services/custom-foods';
import type { StoredFood } from '../services/catalogue';

export function foodsRouter(sequelize: Sequelize) {
  const router = Router();
  router.get('/search', async (req, res) => {
    const { q, limit } = parse(foodSearchQuerySchema, req.query);
    const engine = await getFoodEngine(sequelize);
    res.json({ query: q, results: searchFoods(engine, q, limit, customFoodsFor(engine, req.user ?? null, q)) });
  });
  router.get('/:id', async (req, res) => {
    const { id } = parse(foodIdParamSchema, req.params);
    res.json(getFood(await getFoodEngine(sequelize), id, (food) => canSeeFood(food as StoredFood, req.user ?? null)));
  });
  return router;
}
