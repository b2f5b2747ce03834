import { keepPreviousData, useQuery } from '@tanstack/react-query';
import { DEFAULT_SEARCH_LIMIT, foodSearchQuery } from '../../../lib/api/foods';

export type { FoodSearchHit, FoodSearchResponse } from '../../../../shared/schemas/foods';

/** Catalogue search for a query that is already debounced; an empty query asks nothing. */
export function useFoodSearch(q: string, limit = DEFAULT_SEARCH_LIMIT) {
  return useQuery({
    ...foodSearchQuery(q, limit),
    // Keep the last results on screen while the next keystroke's answer arrives.
    placeholderData: keepPreviousData,
  });
}
