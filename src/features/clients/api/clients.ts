import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { ClientsResponse } from '../../../../shared/schemas/clients';
import type { ClientTargets } from '../../../../shared/schemas/coaching';
import { clientsQuery, endClientLink, inviteClient, saveClientTargets, withdrawInvitation } from '../../../lib/api/clients';
import { queryKeys } from '../../../lib/query-keys';

export type { Client, ClientsResponse, Invitation, InvitationStatus, SentInvitation } from '../../../../shared/schemas/clients';
export type { ClientTargets };

export function useClients() {
  return useQuery(clientsQuery());
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
    mutationFn: inviteClient,
    onSuccess: () => void queryClient.invalidateQueries({ queryKey: queryKeys.clients.list() }),
  });
}

export function useWithdrawInvitation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: withdrawInvitation,
    onSuccess: (_nothing, id) => {
      queryClient.setQueryData<ClientsResponse>(queryKeys.clients.list(), (previous) =>
        previous
          ? { ...previous, invitations: previous.invitations.map((i) => (i.id === id && i.status === 'pending' ? { ...i, status: 'revoked' } : i)) }
          : previous,
      );
      void queryClient.invalidateQueries({ queryKey: queryKeys.clients.list() });
    },
  });
}

export function useEndClientLink() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: endClientLink,
    onSuccess: (_nothing, clientId) => {
      queryClient.setQueryData<ClientsResponse>(queryKeys.clients.list(), (previous) =>
        previous ? { ...previous, clients: previous.clients.filter((c) => c.id !== clientId) } : previous,
      );
      queryClient.removeQueries({ queryKey: queryKeys.clients.versions(clientId) });
      void queryClient.invalidateQueries({ queryKey: queryKeys.clients.list() });
    },
  });
}

export function useSaveClientTargets(clientId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (targets: ClientTargets) => saveClientTargets(clientId, targets),
    onSuccess: ({ targets }) => {
      queryClient.setQueryData<ClientsResponse>(queryKeys.clients.list(), (previous) =>
        previous ? { ...previous, clients: previous.clients.map((c) => (c.id === clientId ? { ...c, targets } : c)) } : previous,
      );
    },
  });
}
