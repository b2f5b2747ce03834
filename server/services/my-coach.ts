import { ClientBodyStats, ClientTarget, Swap, User } from '../models';
import type { FoodEngine } from './food-engine';
import { swapView } from './swaps';
import type { MyCoachResponse } from '../../shared/schemas/my-coach';

export async function myCoach(viewer: User, engine: FoodEngine): Promise<MyCoachResponse> {
  if (!viewer.coachId) return { coach: null, targets: null, swaps: [] };
  const coach = await User.findByPk(viewer.coachId);
  const target = await ClientTarget.findByPk(viewer.id);
  const swaps = await Swap.findAll({ where: { coachId: viewer.coachId, status: 'published' }, order: [['updatedAt', 'DESC']] });
  return {
    coach: coach ? { id: coach.id, displayName: coach.displayName } : null,
    targets: target?.targets ?? null,
    swaps: swaps.map((s) => swapView(engine, s)),
  };
}

export async function leaveCoach(viewer: User) {
  if (!viewer.coachId) return;
  await ClientTarget.destroy({ where: { clientId: viewer.id } });
  await ClientBodyStats.destroy({ where: { clientId: viewer.id } });
  await User.update({ coachId: null }, { where: { id: viewer.id } });
}
