import { Router, type RequestHandler } from 'express';
import type { Sequelize } from 'sequelize';
import { analyzeRequestSchema } from '../../shared/schemas/analyze';
import { parse } from '../middleware/validate';
import { getFoodEngine } from '../services/food-engine';
import { analyzeLines, requestLines, toAnalyzeResponse } from '../services/analysis';

export function analyzeRouter(sequelize: Sequelize, limit: RequestHandler) {
  const router = Router();
  router.post('/', limit, async (req, res) => {
    const input = parse(analyzeRequestSchema, req.body);
    const engine = await getFoodEngine(sequelize);
    res.json(toAnalyzeResponse(analyzeLines(engine, requestLines(input), input.servings)));
  });
  return router;
}
