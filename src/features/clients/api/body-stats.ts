import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { BodyStats, BodyStatsResponse } from '../../../../shared/schemas/body-stats';
import { api } from '../../../lib/api-client';
import { clientsKeys } from '../clients-keys';

export type { BodyStats, BodyStatsResponse };

/** The body stats the coach last estimated this client with (null before the first estimate). */
export function useBodyStats(clientId: number) {
  return useQuery({
    queryKey: clientsKeys.bodyStats(clientId),
    queryFn: ({ signal }) => api.get<BodyStatsResponse>(`/api/clients/${clientId}/body-stats`, { signal }),
  });
}

export function useSaveBodyStats(clientId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (stats: BodyStats) => api.put<BodyStatsResponse>(`/api/clients/${clientId}/body-stats`, stats),
    onSuccess: (saved) => queryClient.setQueryData(clientsKeys.bodyStats(clientId), saved),
  });
}
