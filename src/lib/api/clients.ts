import { queryOptions } from '@tanstack/react-query';
import type { ClientsResponse, ClientVersionsResponse, SavedClientTargets, SentInvitation } from '../../../shared/schemas/clients';
import type { ClientTargets } from '../../../shared/schemas/coaching';
import type { BodyStats, BodyStatsResponse } from '../../../shared/schemas/body-stats';
import { api } from '../api-client';
import { queryKeys } from '../query-keys';

export function fetchClients(signal?: AbortSignal): Promise<ClientsResponse> {
  return api.get<ClientsResponse>('/api/clients', { signal });
}

export function fetchClientVersions(clientId: number, signal?: AbortSignal): Promise<ClientVersionsResponse> {
  return api.get<ClientVersionsResponse>(`/api/clients/${clientId}/versions`, { signal });
}

/** A coach's clients and the invitations they sent. */
export function clientsQuery() {
  return queryOptions({ queryKey: queryKeys.clients.list(), queryFn: ({ signal }) => fetchClients(signal) });
}

/** The client's most recently saved versions, newest first (the server sends up to 50); a null id asks nothing. */
export function clientVersionsQuery(clientId: number | null) {
  return queryOptions({
    queryKey: queryKeys.clients.versions(clientId ?? 0),
    queryFn: ({ signal }) => fetchClientVersions(clientId as number, signal),
    enabled: clientId !== null,
  });
}

export function inviteClient(email: string): Promise<SentInvitation> {
  return api.post<SentInvitation>('/api/clients/invitations', { email });
}

export function withdrawInvitation(id: number): Promise<void> {
  return api.delete<void>(`/api/clients/invitations/${id}`);
}

export function endClientLink(clientId: number): Promise<void> {
  return api.delete<void>(`/api/clients/${clientId}`);
}

export function saveClientTargets(clientId: number, targets: ClientTargets): Promise<SavedClientTargets> {
  return api.put<SavedClientTargets>(`/api/clients/${clientId}/targets`, targets);
}

export function fetchBodyStats(clientId: number, signal?: AbortSignal): Promise<BodyStatsResponse> {
  return api.get<BodyStatsResponse>(`/api/clients/${clientId}/body-stats`, { signal });
}

/** The body stats the coach last estimated this client with (stats null before the first estimate). */
export function bodyStatsQuery(clientId: number) {
  return queryOptions({ queryKey: queryKeys.clients.bodyStats(clientId), queryFn: ({ signal }) => fetchBodyStats(clientId, signal) });
}

export function saveBodyStats(clientId: number, stats: BodyStats): Promise<BodyStatsResponse> {
  return api.put<BodyStatsResponse>(`/api/clients/${clientId}/body-stats`, stats);
}
