import { queryOptions } from '@tanstack/react-query';
import type { PublicUser, UserRole } from '../../../shared/schemas/auth';
import type { OutboxResponse } from '../../../shared/schemas/outbox';
import { api } from '../api-client';
import { queryKeys } from '../query-keys';

export function fetchUsers(signal?: AbortSignal): Promise<{ users: PublicUser[] }> {
  return api.get<{ users: PublicUser[] }>('/api/admin/users', { signal });
}

/** Every account, oldest first (admins only; anyone else gets 403). */
export function usersQuery() {
  return queryOptions({ queryKey: queryKeys.admin.users(), queryFn: ({ signal }) => fetchUsers(signal) });
}

export function setRole(id: number, role: UserRole): Promise<PublicUser> {
  return api.patch<PublicUser>(`/api/admin/users/${id}`, { role });
}

export function fetchOutbox(signal?: AbortSignal): Promise<OutboxResponse> {
  return api.get<OutboxResponse>('/api/dev/outbox', { signal });
}

/** The development outbox. It only exists outside production; there the server answers 404. */
export function outboxQuery() {
  return queryOptions({ queryKey: queryKeys.admin.outbox(), queryFn: ({ signal }) => fetchOutbox(signal) });
}
