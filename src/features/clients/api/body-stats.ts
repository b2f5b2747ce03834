import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { BodyStats } from '../../../../shared/schemas/body-stats';
import { bodyStatsQuery, saveBodyStats } from '../../../lib/api/clients';
import { queryKeys } from '../../../lib/query-keys';

export function useBodyStats(clientId: number) {
  return useQuery(bodyStatsQuery(clientId));
}

export function useSaveBodyStats(clientId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (stats: BodyStats) => saveBodyStats(clientId, stats),
    onSuccess: (saved) => queryClient.setQueryData(queryKeys.clients.bodyStats(clientId), saved),
  });
}
