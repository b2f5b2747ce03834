import { useMutation } from '@tanstack/react-query';
import type { LabelScanResponse } from '../../../../shared/schemas/foods';
import { uploadFile } from '../../../lib/upload-file';

/** POST /api/foods/label-scan: the photo is read on the server; nothing is saved. */
export function useScanLabel() {
  return useMutation({
    mutationFn: (photo: File) => uploadFile<LabelScanResponse>('/api/foods/label-scan', photo, { fieldName: 'image' }),
  });
}
