import { Router, type RequestHandler } from 'express';
import type { Sequelize } from 'sequelize';
import { analyzeRequestSchema } from '../../shared/schemas/analyze';
import { parse } from '../middleware/validate';
import { getFoodEngine } from '../services/food-engine';
import { analyzeLines, readRequest, toAnalyzeResponse } from '../services/analysis';
import { canSeeFood, ownFoodsFor } from '../services/custom-foods';
import type { StoredFood } from '../services/catalogue';

export function analyzeRouter(sequelize: Sequelize, limit: RequestHandler) {
  const router = Router();
  router.post('/', limit, async (req, res) => {
    const input = parse(analyzeRequestSchema, req.body);
    const engine = await getFoodEngine(sequelize);
    const viewer = req.user ?? null;
    const canUse = (food: StoredFood) => canSeeFood(food, viewer);
    const { lines, fromText } = readRequest(input);
    const response = toAnalyzeResponse(analyzeLines(engine, lines, input.servings, (f) => canUse(f as StoredFood), ownFoodsFor(engine, viewer)));
    res.json(fromText ? { ...response, fromText } : response);
  });
  return router;
}
