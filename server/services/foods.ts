import type { CatalogueFood } from '../../shared/food';
import type { FoodDetail, FoodSummary } from '../../shared/schemas/analyze';
import type { FoodSearchHit } from '../../shared/schemas/foods';
import { notFound } from '../lib/http-error';
import type { FoodEngine } from './food-engine';
import type { StoredFood } from './catalogue';

function ownerOf(food: CatalogueFood, viewerId: number | null): 'you' | 'coach' | null {
  if (food.source !== 'custom') return null;
  return (food as StoredFood).ownerId === viewerId ? 'you' : 'coach';
}

export function foodSummary(food: CatalogueFood): FoodSummary {
  return { id: food.id, source: food.source, sourceId: food.sourceId, name: food.name };
}

export function foodDetail(food: CatalogueFood): FoodDetail {
  return {
    ...foodSummary(food),
    foodGroup: food.foodGroup,
    roles: food.roles,
    diet: food.diet,
    branded: food.branded,
    densityGPerMl: food.densityGPerMl,
    per100g: food.per100g,
    portions: food.portions,
  };
}

/** Catalogue hits after `extra` (the viewer's own foods, then their coach's), each marked whose it is. */
export function searchFoods(engine: FoodEngine, q: string, limit: number, extra: StoredFood[] = [], viewerId: number | null = null): FoodSearchHit[] {
  const hits = [...extra.map((food) => ({ food, score: 1 })), ...engine.matcher.search(q, limit)].slice(0, limit);
  return hits.map((hit) => ({
    owner: ownerOf(hit.food, viewerId),
    ...foodSummary(hit.food),
    foodGroup: hit.food.foodGroup,
    roles: hit.food.roles,
    branded: hit.food.branded,
    kcalPer100g: hit.food.per100g.kcal,
    proteinPer100g: hit.food.per100g.proteinG,
    score: hit.score,
  }));
}

export function getFood(engine: FoodEngine, id: number, visible: (food: CatalogueFood) => boolean): FoodDetail {
  const food = engine.byId.get(id);
  if (!food || !visible(food)) throw notFound('No food with that id.');
  return foodDetail(food);
}
