import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { PublicUser, UserRole } from '../../../../shared/schemas/auth';
import { api } from '../../../lib/api-client';
import { queryKeys } from '../../../lib/query-keys';

/** Every account, oldest first (admins only; anyone else gets 403). */
export function useUsers() {
  return useQuery({
    queryKey: queryKeys.admin.users(),
    queryFn: ({ signal }) => api.get<{ users: PublicUser[] }>('/api/admin/users', { signal }),
    select: (data) => data.users,
  });
}

export function useSetRole() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, role }: { id: number; role: UserRole }) => api.patch<PublicUser>(`/api/admin/users/${id}`, { role }),
    onSuccess: (user) => {
      queryClient.setQueryData<{ users: PublicUser[] }>(queryKeys.admin.users(), (data) =>
        data ? { users: data.users.map((u) => (u.id === user.id ? user : u)) } : data,
      );
    },
  });
}
