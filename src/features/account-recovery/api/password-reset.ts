import { useMutation } from '@tanstack/react-query';
import { confirmPasswordReset, requestPasswordReset } from '../../../lib/api/auth';

/** Always 202, whether or not the address has an account, so the answer reveals nothing. */
export function useRequestPasswordReset() {
  return useMutation({ mutationFn: requestPasswordReset });
}

/** 404 for a link that was never valid; 410 for one used or expired. */
export function useConfirmPasswordReset() {
  return useMutation({ mutationFn: confirmPasswordReset });
}
