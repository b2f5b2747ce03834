import type { PrepFood, PrepShoppingItem } from '../../shared/schemas/prep';
import type { CheckListItem } from '../components/ui/check-list';
import { formatGrams } from './format';

/** What the checks of one food on a list are remembered by: its catalogue id, or the line's words. */
export function foodKey(food: PrepFood): string {
  return food.id === null ? `name:${food.name.trim().toLowerCase()}` : `food:${food.id}`;
}

/** One food to buy as a check-list row, on a batch's list and on the list for several batches alike. */
export function shoppingCheckItem(item: PrepShoppingItem): CheckListItem {
  const unmatched = item.food.id === null;
  return {
    key: foodKey(item.food),
    label: item.food.name,
    amount: unmatched && item.grams === 0 ? '—' : formatGrams(item.grams),
    detail: item.purchase ? `Buy ${item.purchase}` : unmatched ? 'Not in the catalogue: buy what the recipe line says.' : undefined,
  };
}
