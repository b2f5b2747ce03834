import type { RequestHandler } from 'express';
import type { Sequelize } from 'sequelize';
import { customFoodSchema } from '../../shared/schemas/coaching';
import { parse } from '../middleware/validate';
import { requireRole } from '../middleware/auth';
import { getFoodEngine } from '../services/food-engine';
import { foodDetail } from '../services/foods';
import { createCustomFood } from '../services/custom-foods';

export function customFoodsRoute(sequelize: Sequelize): RequestHandler[] {
  return [
    requireRole('coach'),
    async (req, res) => {
      const input = parse(customFoodSchema, req.body);
      const food = await createCustomFood(sequelize, await getFoodEngine(sequelize), req.user!, input);
      res.status(201).json(foodDetail(food));
    },
  ];
}
