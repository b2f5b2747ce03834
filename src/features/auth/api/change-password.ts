import { useMutation } from '@tanstack/react-query';
import type { ChangePasswordInput } from '../../../../shared/schemas/auth';
import { api } from '../../../lib/api-client';

export type { ChangePasswordInput };

/** The session stays signed in; every other session of the account ends on the server. */
export function changePassword(input: ChangePasswordInput): Promise<{ ok: true }> {
  return api.post<{ ok: true }>('/api/auth/password', input);
}

export function useChangePassword() {
  return useMutation({ mutationFn: changePassword });
}
