import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { UpdateMeInput } from '../../../../shared/schemas/auth';
import { updateMe } from '../../../lib/api/auth';
import { queryKeys } from '../../../lib/query-keys';
import type { User } from '../../../lib/user';

export type { UpdateMeInput };

export function useUpdateMe() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateMe,
    onSuccess: (user, input) => {
      queryClient.setQueryData<User | null>(queryKeys.auth.me, (previous) =>
        // Keep what was sent even if the server answers with fewer fields.
        previous ? { ...previous, ...input, ...user } : user,
      );
    },
  });
}
