import { queryOptions } from '@tanstack/react-query';
import type { z } from 'zod';
import type { PrepResponse, shoppingListSchema, ShoppingListResponse } from '../../../shared/schemas/prep';
import { api } from '../api-client';
import { queryKeys } from '../query-keys';
import type { UnitSystem } from '../user';

export function prepPath(id: number, number: number, portions: number): string {
  return `/api/recipes/${id}/versions/${number}/prep?${new URLSearchParams({ portions: String(portions) })}`;
}

export function fetchPrep(id: number, number: number, portions: number, signal?: AbortSignal): Promise<PrepResponse> {
  return api.get<PrepResponse>(prepPath(id, number, portions), { signal });
}

/**
 * A saved version scaled to `portions`. The key sits under the recipe's detail key, so whatever
 * refreshes a recipe (a new version, an edit) refreshes its prep too.
 */
export function prepQuery(id: number | null, number: number | null, portions: number | null) {
  return queryOptions({
    queryKey: queryKeys.recipes.prep(id ?? 'none', number, portions),
    queryFn: ({ signal }) => fetchPrep(id as number, number as number, portions as number, signal),
    enabled: id !== null && number !== null && portions !== null,
  });
}

export type ShoppingListItemInput = z.input<typeof shoppingListSchema>['items'][number];

/** One shopping list for several saved versions, each scaled to its own portions. Nothing is stored. */
export function buildShoppingList(items: ShoppingListItemInput[], unitSystem?: UnitSystem): Promise<ShoppingListResponse> {
  return api.post<ShoppingListResponse>('/api/shopping-lists', { items, ...(unitSystem ? { unitSystem } : {}) });
}
