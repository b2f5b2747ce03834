import { useEffect, useId, useRef } from 'react';
import { Button } from '../../../components/ui/button';
import { CheckList } from '../../../components/ui/check-list';
import { CopyTextButton } from '../../../components/ui/copy-text-button';
import type { ShoppingListResponse as ShoppingListResult } from '../../../../shared/schemas/prep';
import { shoppingCheckItem } from '../../../lib/shopping-items';
import { shoppingChecksKey } from '../shopping-picks';
import { portionsWord } from '../shopping-words';
import { countOf } from '../../../lib/words';

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
            {countOf(list.items.length, 'item')} for {countOf(list.sources.length, 'batch')}, {portionsWord(totalPortions)} in all.
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
      <CheckList label="Shopping list for every batch" items={list.items.map(shoppingCheckItem)} storageKey={shoppingChecksKey(list.sources)} />
    </section>
  );
}
