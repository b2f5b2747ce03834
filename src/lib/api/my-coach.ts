import { queryOptions } from '@tanstack/react-query';
import type { MyCoachResponse } from '../../../shared/schemas/my-coach';
import { api } from '../api-client';
import { queryKeys } from '../query-keys';

export function fetchMyCoach(signal?: AbortSignal): Promise<MyCoachResponse> {
  return api.get<MyCoachResponse>('/api/coach', { signal });
}

/** The signed-in person's coach, the targets set for them and the coach's published swaps. */
export function myCoachQuery() {
  return queryOptions({ queryKey: queryKeys.coach.mine(), queryFn: ({ signal }) => fetchMyCoach(signal) });
}

/** Ends the link with the coach; their targets for this person go with it. */
export function leaveCoach(): Promise<void> {
  return api.delete<void>('/api/coach');
}
