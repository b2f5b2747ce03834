import { ClientBodyStats, type User } from '../models';
import type { BodyStats, BodyStatsResponse } from '../../shared/schemas/body-stats';
import { ownClient } from './clients';

export async function getBodyStats(coach: User, clientId: number): Promise<BodyStatsResponse> {
  await ownClient(coach, clientId);
  const row = await ClientBodyStats.findOne({ where: { clientId, coachId: coach.id } });
  return { clientId, stats: row?.stats ?? null, updatedAt: row?.updatedAt.toISOString() ?? null };
}

export async function saveBodyStats(coach: User, clientId: number, stats: BodyStats): Promise<BodyStatsResponse> {
  await ownClient(coach, clientId);
  const [row] = await ClientBodyStats.upsert({ clientId, coachId: coach.id, stats });
  return { clientId, stats: row.stats, updatedAt: row.updatedAt.toISOString() };
}
