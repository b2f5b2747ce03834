import { Router } from 'express';
import type { Sequelize } from 'sequelize';
import { createSwapSchema, updateSwapSchema } from '../../shared/schemas/coaching';
import { idParam } from '../../shared/schemas/recipes';
import { parse } from '../middleware/validate';
import { requireAuth, requireRole } from '../middleware/auth';
import { getFoodEngine } from '../services/food-engine';
import * as swaps from '../services/swaps';
import type { SwapsResponse } from '../../shared/schemas/swaps';

export function swapsRouter(sequelize: Sequelize) {
  const router = Router();
  router.use(requireAuth);
  const engine = () => getFoodEngine(sequelize);
  router.get('/', async (req, res) => {
    const e = await engine();
    res.json({ swaps: (await swaps.listSwapsFor(req.user!)).map((s) => swaps.swapView(e, s)) } satisfies SwapsResponse);
  });
  router.post('/', requireRole('coach'), async (req, res) => {
    const input = parse(createSwapSchema, req.body);
    const e = await engine();
    res.status(201).json(swaps.swapView(e, await swaps.createSwap(e, req.user!, input)));
  });
  router.patch('/:id', requireRole('coach'), async (req, res) => {
    const { id } = parse(idParam, req.params);
    const input = parse(updateSwapSchema, req.body);
    const e = await engine();
    res.json(swaps.swapView(e, await swaps.updateSwap(e, req.user!, id, input)));
  });
  router.post('/:id/publish', requireRole('coach'), async (req, res) => {
    const { id } = parse(idParam, req.params);
    const e = await engine();
    res.json(swaps.swapView(e, await swaps.updateSwap(e, req.user!, id, { status: 'published' })));
  });
  router.post('/:id/unpublish', requireRole('coach'), async (req, res) => {
    const { id } = parse(idParam, req.params);
    const e = await engine();
    res.json(swaps.swapView(e, await swaps.updateSwap(e, req.user!, id, { status: 'draft' })));
  });
  router.delete('/:id', requireRole('coach'), async (req, res) => {
    const { id } = parse(idParam, req.params);
    await swaps.deleteSwap(req.user!, id);
    res.status(204).end();
  });
  return router;
}
