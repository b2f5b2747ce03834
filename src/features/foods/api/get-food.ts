import { useQuery } from '@tanstack/react-query';
import { foodQuery } from '../../../lib/api/foods';

/** One catalogue food with its nutrients per 100 g and household portions; null id asks nothing. */
export function useFood(id: number | null) {
  return useQuery(foodQuery(id));
}
