import { Swap, User } from '../models';
import type { Role } from '../../shared/food';
import type { FoodEngine } from './food-engine';
import type { ApprovedSwap } from './candidates';
import { foodSummary } from './foods';
import { badRequest, notFound } from '../lib/http-error';
import type { Swap as SwapView } from '../../shared/schemas/swaps';

export function swapView(engine: FoodEngine, swap: Swap): SwapView {
  const from = swap.fromFoodId ? engine.byId.get(swap.fromFoodId) : undefined;
  const to = engine.byId.get(swap.toFoodId);
  return {
    id: swap.id,
    coachId: swap.coachId,
    fromFood: from ? foodSummary(from) : null,
    fromRole: swap.fromRole,
    toFood: to ? { ...foodSummary(to), kcalPer100g: to.per100g.kcal, proteinPer100g: to.per100g.proteinG } : null,
    volumeRatio: swap.volumeRatio,
    note: swap.note,
    tags: swap.tags,
    status: swap.status,
    updatedAt: swap.updatedAt.toISOString(),
  };
}

function checkFoodVisible(engine: FoodEngine, coach: User, id: number, field: string) {
  const food = engine.byId.get(id);
  const visible = food && (food.source === 'usda-sr28' || food.ownerId === coach.id);
  if (!visible) throw badRequest(`${field}: no food ${id} that you can use.`, { fieldErrors: { [field]: ['Unknown food.'] } });
}

export async function listSwapsFor(viewer: User) {
  if (viewer.role === 'coach') return Swap.findAll({ where: { coachId: viewer.id }, order: [['updatedAt', 'DESC']] });
  if (!viewer.coachId) return [];
  return Swap.findAll({ where: { coachId: viewer.coachId, status: 'published' }, order: [['updatedAt', 'DESC']] });
}

export async function createSwap(
  engine: FoodEngine,
  coach: User,
  input: {
    fromFoodId?: number | null;
    fromRole?: Role | null;
    toFoodId: number;
    volumeRatio?: number;
    note?: string;
    tags?: string[];
    status?: 'draft' | 'published';
  },
) {
  if (input.fromFoodId) checkFoodVisible(engine, coach, input.fromFoodId, 'fromFoodId');
  checkFoodVisible(engine, coach, input.toFoodId, 'toFoodId');
  if (input.fromFoodId && input.fromFoodId === input.toFoodId)
    throw badRequest('toFoodId: a swap goes to a different food.', { fieldErrors: { toFoodId: ['Same as fromFoodId.'] } });
  return Swap.create({
    coachId: coach.id,
    fromFoodId: input.fromFoodId ?? null,
    fromRole: input.fromRole ?? null,
    toFoodId: input.toFoodId,
    volumeRatio: input.volumeRatio ?? 1,
    note: input.note ?? '',
    tags: input.tags ?? [],
    status: input.status ?? 'draft',
  });
}

async function ownSwap(coach: User, id: number) {
  const swap = await Swap.findOne({ where: { id, coachId: coach.id } });
  if (!swap) throw notFound('No swap with that id in your library.');
  return swap;
}

export async function updateSwap(
  engine: FoodEngine,
  coach: User,
  id: number,
  input: Partial<{
    fromFoodId: number | null;
    fromRole: Role | null;
    toFoodId: number;
    volumeRatio: number;
    note: string;
    tags: string[];
    status: 'draft' | 'published';
  }>,
) {
  const swap = await ownSwap(coach, id);
  if (input.toFoodId !== undefined) checkFoodVisible(engine, coach, input.toFoodId, 'toFoodId');
  if (input.fromFoodId) checkFoodVisible(engine, coach, input.fromFoodId, 'fromFoodId');
  const next = {
    fromFoodId: input.fromFoodId !== undefined ? input.fromFoodId : swap.fromFoodId,
    fromRole: input.fromRole !== undefined ? input.fromRole : swap.fromRole,
  };
  if ((next.fromFoodId != null) === (next.fromRole != null))
    throw badRequest('fromFoodId: a swap starts from either a food or a role.', { fieldErrors: { fromFoodId: ['Give either fromFoodId or fromRole.'] } });
  Object.assign(swap, Object.fromEntries(Object.entries(input).filter(([, v]) => v !== undefined)));
  await swap.save();
  return swap;
}

export async function deleteSwap(coach: User, id: number) {
  const swap = await ownSwap(coach, id);
  await swap.destroy();
}

/** The published swaps of the viewer's coach, as the rewrite's candidate builder reads them. */

export async function publishedSwapsForClient(viewer: User | null): Promise<ApprovedSwap[]> {
  if (!viewer?.coachId) return [];
  const coach = await User.findByPk(viewer.coachId);
  if (!coach) return [];
  const swaps = await Swap.findAll({ where: { coachId: coach.id, status: 'published' } });
  return swaps.map((s) => ({
    fromFoodId: s.fromFoodId ?? undefined,
    fromRole: (s.fromRole as Role | null) ?? undefined,
    toFoodId: s.toFoodId,
    volumeRatio: s.volumeRatio,
    note: s.note || undefined,
    coachName: coach.displayName,
  }));
}
