import { useQuery } from '@tanstack/react-query';
import type { MyCoachResponse } from '../../../../shared/schemas/my-coach';
import { isApiError } from '../../../lib/api-client';
import { fetchMyCoach } from '../../../lib/api/my-coach';
import { queryKeys } from '../../../lib/query-keys';

/** What a client's coach set for one meal, with the coach's name for saying where the defaults come from. */
export interface CoachMealTargets {
  coachName: string;
  kcal: number;
  proteinG: number;
}

/** GET /api/coach read down to the per-meal targets; null without a coach, without targets, or signed out (401). */
export async function readCoachMealTargets(signal?: AbortSignal): Promise<CoachMealTargets | null> {
  let answer: MyCoachResponse;
  try {
    answer = await fetchMyCoach(signal);
  } catch (error) {
    if (isApiError(error) && (error.status === 401 || error.status === 403 || error.status === 404)) return null;
    throw error;
  }
  const perMeal = answer?.targets?.perMeal;
  if (!answer?.coach || !perMeal) return null;
  const { kcal, proteinG } = perMeal;
  if (typeof kcal !== 'number' || typeof proteinG !== 'number' || !(kcal > 0) || !(proteinG >= 0)) return null;
  return { coachName: answer.coach.displayName, kcal, proteinG };
}

/** Only asked for a signed-in person; a coach's targets change rarely, so one read a visit is enough. */
export function useCoachMealTargets(signedIn: boolean) {
  return useQuery({
    queryKey: queryKeys.coach.mealTargets(),
    queryFn: ({ signal }) => readCoachMealTargets(signal),
    enabled: signedIn,
    staleTime: 5 * 60_000,
    retry: false,
  });
}
