import { queryOptions } from '@tanstack/react-query';
import type { AcceptedInvitation, InvitationSummary } from '../../../shared/schemas/invitations';
import { api } from '../api-client';
import { queryKeys } from '../query-keys';

export function fetchInvitation(token: string, signal?: AbortSignal): Promise<InvitationSummary> {
  return api.get<InvitationSummary>(`/api/invitations/${encodeURIComponent(token)}`, { signal });
}

/** Public: anyone holding the link may read who sent it. Used, expired and withdrawn links answer 410. */
export function invitationQuery(token: string) {
  return queryOptions({
    queryKey: queryKeys.coach.invitation(token),
    queryFn: ({ signal }) => fetchInvitation(token, signal),
    enabled: token.length > 0,
  });
}

export function acceptInvitation(token: string): Promise<AcceptedInvitation> {
  return api.post<AcceptedInvitation>(`/api/invitations/${encodeURIComponent(token)}/accept`);
}
