import { useMutation } from '@tanstack/react-query';
import { scanLabel } from '../../../lib/api/foods';

/** POST /api/foods/label-scan: the photo is read on the server; nothing is saved. */
export function useScanLabel() {
  return useMutation({ mutationFn: scanLabel });
}
