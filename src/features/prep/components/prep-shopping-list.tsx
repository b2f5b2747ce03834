import type { ReactNode } from 'react';
import { Button } from '../../../components/ui/button';
import { CheckList } from '../../../components/ui/check-list';
import { CopyTextButton } from '../../../components/ui/copy-text-button';
import type { PrepShoppingItem } from '../../../../shared/schemas/prep';
import { shoppingCheckItem } from '../../../lib/shopping-items';
import { portionsWord } from '../prep-words';

export interface PrepShoppingListProps {
  items: PrepShoppingItem[];
  /** the list as plain text, one "[ ] food — grams (how to buy)" a line */
  text: string;
  portions: number;
  storageKey: string;
  onPrint: () => void;
  /** one more action beside copy and print, e.g. a link to a list for several recipes */
  extraAction?: ReactNode;
}

/** What to buy for the batch, to tick off in the shop, copy into a note or print. */
export function PrepShoppingList({ items, text, portions, storageKey, onPrint, extraAction }: PrepShoppingListProps) {
  return (
    <section aria-labelledby="prep-shopping" className="flex flex-col gap-3">
      <div className="flex flex-wrap items-end justify-between gap-3">
        <div>
          <h2 id="prep-shopping" className="text-xl font-extrabold">
            Shopping list
          </h2>
          <p className="text-sm text-ink-soft">For {portionsWord(portions)}. Counts and ounces are rounded up so you don't come home short.</p>
        </div>
        <div className="flex flex-wrap gap-2 print:hidden">
          <CopyTextButton text={text} copiedMessage="Shopping list copied.">
            Copy as text
          </CopyTextButton>
          <Button variant="secondary" size="sm" onClick={onPrint}>
            Print list
          </Button>
          {extraAction}
        </div>
      </div>
      <CheckList label={`Shopping list for ${portionsWord(portions)}`} items={items.map(shoppingCheckItem)} storageKey={storageKey} />
    </section>
  );
}
