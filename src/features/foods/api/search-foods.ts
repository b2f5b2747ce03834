import { keepPreviousData, useQuery } from '@tanstack/react-query';
import type { FoodSummary } from '../../../../shared/schemas/analyze';
import { api } from '../../../lib/api-client';
import { queryKeys } from '../../../lib/query-keys';

/** One hit of GET /api/foods/search. */
export interface FoodSearchHit extends FoodSummary {
  foodGroup: string;
  roles: string[];
  branded: boolean;
  kcalPer100g: number;
  proteinPer100g: number;
  /** 0..1, how well the name answers the query */
  score: number;
  /** a food entered from a label: 'you' entered it, or your 'coach' did; null for catalogue foods */
  owner: 'you' | 'coach' | null;
}

export interface FoodSearchResponse {
  query: string;
  results: FoodSearchHit[];
}

export const DEFAULT_SEARCH_LIMIT = 10;

export function searchFoods(q: string, limit = DEFAULT_SEARCH_LIMIT, signal?: AbortSignal): Promise<FoodSearchResponse> {
  const params = new URLSearchParams({ q, limit: String(limit) });
  return api.get<FoodSearchResponse>(`/api/foods/search?${params}`, { signal });
}

/** Catalogue search for a query that is already debounced; an empty query asks nothing. */
export function useFoodSearch(q: string, limit = DEFAULT_SEARCH_LIMIT) {
  const query = q.trim();
  return useQuery({
    queryKey: [...queryKeys.foods.search(query), limit],
    queryFn: ({ signal }) => searchFoods(query, limit, signal),
    enabled: query.length > 0,
    staleTime: 5 * 60_000,
    // Keep the last results on screen while the next keystroke's answer arrives.
    placeholderData: keepPreviousData,
  });
}
