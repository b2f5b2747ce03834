import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { UserRole } from '../../../../shared/schemas/auth';
import { setRole, usersQuery } from '../../../lib/api/admin';

/** Every account, oldest first (admins only; anyone else gets 403). */
export function useUsers() {
  return useQuery({ ...usersQuery(), select: (data) => data.users });
}

export function useSetRole() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, role }: { id: number; role: UserRole }) => setRole(id, role),
    onSuccess: (user) => {
      queryClient.setQueryData(usersQuery().queryKey, (data) => (data ? { users: data.users.map((u) => (u.id === user.id ? user : u)) } : data));
    },
  });
}
