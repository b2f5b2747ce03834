import { Router } from 'express';
import type { Sequelize } from 'sequelize';
import { foodIdParamSchema, foodSearchQuerySchema, labelFoodPatchSchema, labelFoodSchema, type FoodSearchResponse } from '../../shared/schemas/foods';
import { parse } from '../middleware/validate';
import { requireAuth, requireRole } from '../middleware/auth';
import { singleFile } from '../middleware/upload';
import { getFoodEngine } from '../services/food-engine';
import { getFood, searchFoods } from '../services/foods';
import { canSeeFood, createLabelFood, customFoodsFor, deleteLabelFood, listMyFoods, updateLabelFood } from '../services/custom-foods';
import { MAX_LABEL_PHOTO_BYTES, readLabelPhoto } from '../services/label-reader';
import type { StoredFood } from '../services/catalogue';
import { badRequest } from '../lib/http-error';

export function foodsRouter(sequelize: Sequelize) {
  const router = Router();
  const cooksAndCoaches = requireRole('cook', 'coach');
  router.get('/search', async (req, res) => {
    const { q, limit } = parse(foodSearchQuerySchema, req.query);
    const engine = await getFoodEngine(sequelize);
    const viewer = req.user ?? null;
    res.json({ query: q, results: searchFoods(engine, q, limit, customFoodsFor(engine, viewer, q), viewer?.id ?? null) } satisfies FoodSearchResponse);
  });
  router.get('/mine', requireAuth, async (req, res) => {
    res.json({ foods: listMyFoods(await getFoodEngine(sequelize), req.user!) });
  });
  router.post('/', cooksAndCoaches, async (req, res) => {
    const input = parse(labelFoodSchema, req.body);
    res.status(201).json(await createLabelFood(sequelize, await getFoodEngine(sequelize), req.user!, input));
  });
  router.post('/label-scan', cooksAndCoaches, singleFile(MAX_LABEL_PHOTO_BYTES, 'photo', 'image'), async (req, res) => {
    if (!req.file) throw badRequest('image: attach the label photo in the form field "image".', { fieldErrors: { image: ['Required.'] } });
    res.json(await readLabelPhoto(req.file.buffer));
  });
  router.get('/:id', async (req, res) => {
    const { id } = parse(foodIdParamSchema, req.params);
    res.json(getFood(await getFoodEngine(sequelize), id, (food) => canSeeFood(food as StoredFood, req.user ?? null)));
  });
  router.patch('/:id', cooksAndCoaches, async (req, res) => {
    const { id } = parse(foodIdParamSchema, req.params);
    const patch = parse(labelFoodPatchSchema, req.body);
    res.json(await updateLabelFood(sequelize, await getFoodEngine(sequelize), req.user!, id, patch));
  });
  router.delete('/:id', cooksAndCoaches, async (req, res) => {
    const { id } = parse(foodIdParamSchema, req.params);
    const { hidden } = await deleteLabelFood(sequelize, await getFoodEngine(sequelize), req.user!, id);
    res.json({ deleted: true, hidden });
  });
  return router;
}
