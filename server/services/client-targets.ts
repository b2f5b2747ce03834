import { ClientTarget, type User } from '../models';
import type { ClientTargets } from '../../shared/schemas/coaching';
import { ownClient } from './clients';

export async function setClientTargets(coach: User, clientId: number, targets: ClientTargets) {
  await ownClient(coach, clientId);
  await ClientTarget.upsert({ clientId, coachId: coach.id, targets });
  return targets;
}
