import type { FoodSummary } from './analyze';
import type { SWAP_STATUSES } from './coaching';

export type SwapStatus = (typeof SWAP_STATUSES)[number];

/** The food a swap puts on the plate, with its figures per 100 g. */
export interface SwapTargetFood extends FoodSummary {
  kcalPer100g: number;
  proteinPer100g: number;
}

/** One approved swap as GET /api/swaps returns it. */
export interface Swap {
  id: number;
  coachId: number;
  fromFood: FoodSummary | null;
  fromRole: string | null;
  toFood: SwapTargetFood | null;
  volumeRatio: number;
  note: string;
  tags: string[];
  status: SwapStatus;
  updatedAt: string;
}

/** GET /api/swaps: a coach's whole library, or a client's coach's published swaps. */
export interface SwapsResponse {
  swaps: Swap[];
}

/** What POST /api/swaps and PATCH /api/swaps/:id take. */
export interface SwapRequest {
  fromFoodId: number | null;
  fromRole: string | null;
  toFoodId: number;
  volumeRatio: number;
  note: string;
  tags: string[];
  status?: SwapStatus;
}
