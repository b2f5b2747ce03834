import { useMutation } from '@tanstack/react-query';
import { buildShoppingList } from '../../../lib/api/prep';
import type { UnitSystem } from '../../../lib/user';
import type { ShoppingPick } from '../shopping-picks';

/** One shopping list for several saved versions, each scaled to its own portions. Nothing is stored. */
export function useBuildShoppingList() {
  return useMutation({
    mutationFn: ({ items, unitSystem }: { items: ShoppingPick[]; unitSystem?: UnitSystem }) => buildShoppingList(items, unitSystem),
  });
}
