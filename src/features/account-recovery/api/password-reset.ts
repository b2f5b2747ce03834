import { useMutation } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';

/** Always 202, whether or not the address has an account, so the answer reveals nothing. */
export function useRequestPasswordReset() {
  return useMutation({
    mutationFn: (email: string) => api.post<{ ok: true; message?: string }>('/api/auth/password-reset', { email }),
  });
}

/** 404 for a link that was never valid; 410 for one used or expired. */
export function useConfirmPasswordReset() {
  return useMutation({
    mutationFn: (input: { token: string; password: string }) => api.post<{ ok: true }>('/api/auth/password-reset/confirm', input),
  });
}
