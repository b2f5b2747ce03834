import type { ClientTargets } from './coaching';
import type { Swap } from './swaps';

/** GET /api/coach: the signed-in person's coach, the targets set for them and the coach's published swaps. */
export interface MyCoachResponse {
  coach: { id: number; displayName: string } | null;
  targets: ClientTargets | null;
  swaps: Swap[];
}
