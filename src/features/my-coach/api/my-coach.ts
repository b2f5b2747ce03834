import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { MyCoachResponse } from '../../../../shared/schemas/my-coach';
import { leaveCoach, myCoachQuery } from '../../../lib/api/my-coach';
import { queryKeys } from '../../../lib/query-keys';

export function useMyCoach() {
  return useQuery(myCoachQuery());
}

/** Leaving changes who the person is linked to: the session user, their coach and their swaps. */
export function useLeaveCoach() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: leaveCoach,
    onSuccess: () => {
      queryClient.setQueryData<MyCoachResponse>(queryKeys.coach.mine(), { coach: null, targets: null, swaps: [] });
      void queryClient.invalidateQueries({ queryKey: queryKeys.auth.me });
      void queryClient.invalidateQueries({ queryKey: queryKeys.swaps.list() });
    },
  });
}
