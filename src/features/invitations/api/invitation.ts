import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { acceptInvitation, invitationQuery } from '../../../lib/api/invitations';
import { queryKeys } from '../../../lib/query-keys';

/** Public: anyone holding the link may read who sent it. Used, expired and withdrawn links answer 410. */
export function useInvitation(token: string) {
  return useQuery(invitationQuery(token));
}

export function useAcceptInvitation(token: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => acceptInvitation(token),
    onSuccess: () => {
      void queryClient.invalidateQueries({ queryKey: queryKeys.auth.me });
      void queryClient.invalidateQueries({ queryKey: queryKeys.coach.mine() });
      void queryClient.invalidateQueries({ queryKey: queryKeys.swaps.list() });
    },
  });
}
