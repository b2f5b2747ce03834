import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { ClientTargets } from '../../../../shared/schemas/coaching';
import type { InvitationSent } from '../../../../shared/schemas/invitation-sent';
import { api } from '../../../lib/api-client';
import { clientsKeys } from '../clients-keys';

export type { ClientTargets, InvitationSent };

export interface Client {
  id: number;
  displayName: string;
  email: string;
  targets: ClientTargets | null;
}

export type InvitationStatus = 'pending' | 'accepted' | 'expired' | 'revoked';

export interface Invitation {
  id: number;
  email: string;
  status: InvitationStatus;
  expiresAt: string;
  createdAt: string;
  /** when the link was last mailed: sending again renews an open invitation */
  sentAt: string;
}

export interface ClientsResponse {
  clients: Client[];
  invitations: Invitation[];
}

export function useClients() {
  return useQuery({ queryKey: clientsKeys.list, queryFn: ({ signal }) => api.get<ClientsResponse>('/api/clients', { signal }) });
}

/** One client out of the coach's list (the server has no single-client read). */
export function useClient(clientId: number | null) {
  const clients = useClients();
  const client = clientId === null ? undefined : clients.data?.clients.find((c) => c.id === clientId);
  return { ...clients, client };
}

export function useInviteClient() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (email: string) => api.post<InvitationSent>('/api/clients/invitations', { email }),
    onSuccess: () => void queryClient.invalidateQueries({ queryKey: clientsKeys.list }),
  });
}

export function useWithdrawInvitation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (id: number) => api.delete<void>(`/api/clients/invitations/${id}`),
    onSuccess: (_nothing, id) => {
      queryClient.setQueryData<ClientsResponse>(clientsKeys.list, (previous) =>
        previous
          ? { ...previous, invitations: previous.invitations.map((i) => (i.id === id && i.status === 'pending' ? { ...i, status: 'revoked' } : i)) }
          : previous,
      );
      void queryClient.invalidateQueries({ queryKey: clientsKeys.list });
    },
  });
}

export function useEndClientLink() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (clientId: number) => api.delete<void>(`/api/clients/${clientId}`),
    onSuccess: (_nothing, clientId) => {
      queryClient.setQueryData<ClientsResponse>(clientsKeys.list, (previous) =>
        previous ? { ...previous, clients: previous.clients.filter((c) => c.id !== clientId) } : previous,
      );
      queryClient.removeQueries({ queryKey: clientsKeys.versions(clientId) });
      void queryClient.invalidateQueries({ queryKey: clientsKeys.list });
    },
  });
}

export function useSaveClientTargets(clientId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (targets: ClientTargets) => api.put<{ clientId: number; targets: ClientTargets }>(`/api/clients/${clientId}/targets`, targets),
    onSuccess: ({ targets }) => {
      queryClient.setQueryData<ClientsResponse>(clientsKeys.list, (previous) =>
        previous ? { ...previous, clients: previous.clients.map((c) => (c.id === clientId ? { ...c, targets } : c)) } : previous,
      );
    },
  });
}
