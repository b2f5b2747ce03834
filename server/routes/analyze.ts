import { Router, type RequestHandler } from 'express';
import type { Sequelize } from 'sequelize';
import { analyzeRequestSchema } from '../../shared/schemas/analyze';
import { parse } from '../middleware/validate';
import { getFoodEngine } from '../services/food-engine';
import { analyzeLines, requestLines, toAnalyzeResponse } from '../services/analysis';
import { readRecipeText } from '../../shared/recipe-text';
import { canSeeFood, ownFoodsFor } from '../services/custom-foods';
import type { StoredFood } from '../services/catalogue';

export function analyzeRouter(sequelize: Sequelize, limit: RequestHandler) {
  const router = Router();
  router.post('/', limit, async (req, res) => {
    const input = parse(analyzeRequestSchema, req.body);
    const engine = await getFoodEngine(sequelize);
    const viewer = req.user ?? null;
    const canUse = (food: StoredFood) => canSeeFood(food, viewer);
    const response = toAnalyzeResponse(analyzeLines(engine, requestLines(input), input.servings, (f) => canUse(f as StoredFood), ownFoodsFor(engine, viewer)));
    if (input.lines === undefined && input.text !== undefined) {
      const { title, servings, setAside } = readRecipeText(input.text);
      response.fromText = { title, servings, setAside };
    }
    res.json(response);
  });
  return router;
}
