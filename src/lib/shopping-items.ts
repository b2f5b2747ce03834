import type { PrepFood, PrepShoppingItem } from '../../shared/schemas/prep';
import type { CheckListItem } from '../components/ui/check-list';
import { formatGrams } from './format';
import { commonFoodName } from '../../shared/rewritten-line-text';

/** What the checks of one food on a list are remembered by: its catalogue id, or the line's words. */
export function foodKey(food: PrepFood): string {
  return food.id === null ? `name:${food.name.trim().toLowerCase()}` : `food:${food.id}`;
}

/** A food as a cook says it ("reduced-fat cheddar cheese"); a line no food matched keeps its own words. */
export function foodWords(food: PrepFood): string {
  return food.source === null ? food.name : commonFoodName(food);
}

/** One food to buy as a check-list row, on a batch's list and on the list for several batches alike. */
export function shoppingCheckItem(item: PrepShoppingItem): CheckListItem {
  const unmatched = item.food.id === null;
  return {
    key: foodKey(item.food),
    label: foodWords(item.food),
    amount: unmatched && item.grams === 0 ? '—' : formatGrams(item.grams),
    detail: item.purchase ? `Buy ${item.purchase}` : unmatched ? 'Not in the catalogue: buy what the recipe line says.' : undefined,
  };
}
