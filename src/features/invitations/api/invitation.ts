import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { queryKeys } from '../../../lib/query-keys';

export interface InvitationSummary {
  coachName: string;
  email: string;
  expiresAt: string;
}

/** Public: anyone holding the link may read who sent it. Used, expired and withdrawn links answer 410. */
export function useInvitation(token: string) {
  return useQuery({
    queryKey: queryKeys.coach.invitation(token),
    queryFn: ({ signal }) => api.get<InvitationSummary>(`/api/invitations/${encodeURIComponent(token)}`, { signal }),
    enabled: token.length > 0,
  });
}

export function useAcceptInvitation(token: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => api.post<{ coachId: number; coachName: string }>(`/api/invitations/${encodeURIComponent(token)}/accept`),
    onSuccess: () => {
      void queryClient.invalidateQueries({ queryKey: queryKeys.auth.me });
      void queryClient.invalidateQueries({ queryKey: queryKeys.coach.mine() });
      void queryClient.invalidateQueries({ queryKey: queryKeys.swaps.list() });
    },
  });
}
