import { useMutation } from '@tanstack/react-query';
import type { EstimateTargetsInput, TargetEstimate } from '../../../../shared/schemas/targets';
import { api } from '../../../lib/api-client';

export type { EstimateTargetsInput, TargetEstimate };

/** A calculation, not a change: POST only because it takes a body. */
export function useEstimateTargets() {
  return useMutation({
    mutationFn: (input: EstimateTargetsInput) => api.post<TargetEstimate>('/api/targets/estimate', input),
  });
}
