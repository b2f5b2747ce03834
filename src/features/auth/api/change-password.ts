import { useMutation } from '@tanstack/react-query';
import type { ChangePasswordInput } from '../../../../shared/schemas/auth';
import { changePassword } from '../../../lib/api/auth';

export type { ChangePasswordInput };

export function useChangePassword() {
  return useMutation({ mutationFn: changePassword });
}
