import { useEffect, useId, useRef } from 'react';
import { Button } from '../../../components/ui/button';
import { CheckList, type CheckListItem } from '../../../components/ui/check-list';
import { CopyTextButton } from '../../../components/ui/copy-text-button';
import { formatGrams } from '../../../lib/format';
import type { PrepFood as ShoppingFood, ShoppingListResponse as ShoppingListResult } from '../../../../shared/schemas/prep';
import { shoppingChecksKey } from '../shopping-picks';
import { portionsWord } from '../shopping-words';

function foodKey(food: ShoppingFood): string {
  return food.id === null ? `name:${food.name.trim().toLowerCase()}` : `food:${food.id}`;
}

function checkItem(item: ShoppingListResult['items'][number]): CheckListItem {
  const unmatched = item.food.id === null;
  return {
    key: foodKey(item.food),
    label: item.food.name,
    amount: unmatched && item.grams === 0 ? '—' : formatGrams(item.grams),
    detail: item.purchase ? `Buy ${item.purchase}` : unmatched ? 'Not in the catalogue: buy what the recipe line says.' : undefined,
  };
}

export interface MergedShoppingListProps {
  list: ShoppingListResult;
  onPrint: () => void;
}

/** One list for every batch, each food once with its grams added up. */
export function MergedShoppingList({ list, onPrint }: MergedShoppingListProps) {
  const headingId = useId();
  const heading = useRef<HTMLHeadingElement>(null);
  // A fresh list may be far below the picker on a phone: take the reader to it.
  useEffect(() => {
    heading.current?.focus();
  }, [list]);
  const totalPortions = list.sources.reduce((sum, s) => sum + s.portions, 0);
  return (
    <section aria-labelledby={headingId} className="flex flex-col gap-4">
      <div className="flex flex-wrap items-end justify-between gap-3">
        <div>
          <h2 id={headingId} ref={heading} tabIndex={-1} className="scroll-mt-24 text-xl font-extrabold focus:outline-none">
            What to buy
          </h2>
          <p className="text-sm text-ink-soft">
            {list.items.length} item{list.items.length === 1 ? '' : 's'} for {list.sources.length} batch{list.sources.length === 1 ? '' : 'es'},{' '}
            {portionsWord(totalPortions)} in all.
          </p>
        </div>
        <div className="flex flex-wrap gap-2 print:hidden">
          <CopyTextButton text={list.text} copiedMessage="Shopping list copied.">
            Copy as text
          </CopyTextButton>
          <Button variant="secondary" size="sm" onClick={onPrint}>
            Print list
          </Button>
        </div>
      </div>
      <ul aria-label="Batches this list covers" className="flex flex-wrap gap-2">
        {list.sources.map((s) => (
          <li key={`${s.recipeId}.${s.versionNumber}`} className="rounded-pill border border-line bg-oat-100 px-3 py-1 text-sm font-semibold text-ink">
            {s.title} · v{s.versionNumber} · {portionsWord(s.portions)}
          </li>
        ))}
      </ul>
      <CheckList label="Shopping list for every batch" items={list.items.map(checkItem)} storageKey={shoppingChecksKey(list.sources)} />
    </section>
  );
}
