import { Router, type RequestHandler } from 'express';
import type { Sequelize } from 'sequelize';
import { rewriteQuerySchema, rewriteRequestSchema } from '../../shared/schemas/rewrite';
import { parse } from '../middleware/validate';
import { getFoodEngine } from '../services/food-engine';
import { rewriteRecipe } from '../services/rewrite';
import { publishedSwapsForClient as approvedSwapsFor } from '../services/swaps';
import { canSeeFood, ownFoodsFor } from '../services/custom-foods';
import type { StoredFood } from '../services/catalogue';

export function rewriteRouter(sequelize: Sequelize, limit: RequestHandler) {
  const router = Router();
  router.post('/', limit, async (req, res) => {
    const input = parse(rewriteRequestSchema, req.body);
    const { explain } = parse(rewriteQuerySchema, req.query);
    const engine = await getFoodEngine(sequelize);
    const approvedSwaps = await approvedSwapsFor(req.user ?? null);
    const canUse = (food: unknown) => canSeeFood(food as StoredFood, req.user ?? null);
    res.json(await rewriteRecipe(engine, input, { approvedSwaps, canUse, ownFoods: ownFoodsFor(engine, req.user ?? null) }, explain));
  });
  return router;
}
