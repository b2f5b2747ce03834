import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { ClientTargets } from '../../../../shared/schemas/coaching';
import type { Swap } from '../../../../shared/schemas/swaps';
import { api } from '../../../lib/api-client';
import { queryKeys } from '../../../lib/query-keys';

export interface MyCoach {
  coach: { id: number; displayName: string } | null;
  targets: ClientTargets | null;
  swaps: Swap[];
}

export function useMyCoach() {
  return useQuery({
    queryKey: queryKeys.coach.mine(),
    queryFn: ({ signal }) => api.get<MyCoach>('/api/coach', { signal }),
  });
}

/** Leaving changes who the person is linked to: the session user, their coach and their swaps. */
export function useLeaveCoach() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => api.delete<void>('/api/coach'),
    onSuccess: () => {
      queryClient.setQueryData<MyCoach>(queryKeys.coach.mine(), { coach: null, targets: null, swaps: [] });
      void queryClient.invalidateQueries({ queryKey: queryKeys.auth.me });
      void queryClient.invalidateQueries({ queryKey: queryKeys.swaps.list() });
    },
  });
}
