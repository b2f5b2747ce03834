import { useMutation } from '@tanstack/react-query';
import { estimateTargets } from '../../../lib/api/compute';

export type { EstimateTargetsInput, TargetEstimate } from '../../../../shared/schemas/targets';

/** A calculation, not a change: POST only because it takes a body. */
export function useEstimateTargets() {
  return useMutation({ mutationFn: estimateTargets });
}
