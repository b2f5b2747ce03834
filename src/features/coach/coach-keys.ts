import { queryKeys } from '../../lib/query-keys';

/** Keys of this feature's queries; swaps reuse the shared `swaps` area. */
export const coachKeys = {
  swaps: queryKeys.swaps.list(),
  /** the signed-in cook's coach, targets and published swaps */
  myCoach: ['coach', 'mine'] as const,
  invitation: (token: string) => ['coach', 'invitation', token] as const,
} as const;
