import { useMutation } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { UnitSystem } from '../../../lib/user';
import type { ShoppingPick } from '../shopping-picks';

export type ShoppingFood = { id: number; source: string; sourceId: string; name: string } | { id: null; source?: null; sourceId?: null; name: string };

export interface ShoppingListResult {
  sources: { recipeId: number; title: string; versionNumber: number; portions: number }[];
  /** merged by food across every batch, in the order each food first appears */
  items: { food: ShoppingFood; grams: number; purchase: string }[];
  text: string;
}

export function buildShoppingList(items: ShoppingPick[], unitSystem?: UnitSystem): Promise<ShoppingListResult> {
  return api.post<ShoppingListResult>('/api/shopping-lists', { items, ...(unitSystem ? { unitSystem } : {}) });
}

/** One shopping list for several saved versions, each scaled to its own portions. Nothing is stored. */
export function useBuildShoppingList() {
  return useMutation({
    mutationFn: ({ items, unitSystem }: { items: ShoppingPick[]; unitSystem?: UnitSystem }) => buildShoppingList(items, unitSystem),
  });
}
