import { Router } from 'express';
import type { Sequelize } from 'sequelize';
import { requireAuth } from '../middleware/auth';
import { getFoodEngine } from '../services/food-engine';
import { leaveCoach, myCoach } from '../services/my-coach';

export function myCoachRouter(sequelize: Sequelize) {
  const router = Router();
  router.use(requireAuth);
  router.get('/', async (req, res) => {
    res.json(await myCoach(req.user!, await getFoodEngine(sequelize)));
  });
  router.delete('/', async (req, res) => {
    await leaveCoach(req.user!);
    res.status(204).end();
  });
  return router;
}
