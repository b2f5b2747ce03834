import { Router } from 'express';
import { estimateTargetsSchema } from '../../shared/schemas/targets';
import { estimateTargets } from '../../shared/targets';
import { parse } from '../middleware/validate';

export function targetsRouter() {
  const router = Router();
  router.post('/estimate', (req, res) => {
    res.json(estimateTargets(parse(estimateTargetsSchema, req.body)));
  });
  return router;
}
