import { useId, type ReactNode } from 'react';
import type { PrepResponse as Prep } from '../../../../shared/schemas/prep';
import { portionsWord, prepChecksKey } from '../prep-words';
import { AllergenNotice } from './allergen-notice';
import { PrepShoppingList } from './prep-shopping-list';
import { ServingPanel } from './serving-panel';
import { StorageGuide } from './storage-guide';
import { WeightsTable } from './weights-table';

/** what marks a part for printing on its own (usePrintPart's partProps) */
type PrintPartProps = { 'data-print-part': string; 'data-print-chosen'?: string };

export interface PrepSheetProps {
  prep: Prep;
  /** the portions control, shown beside the allergens */
  portionsControl: ReactNode;
  onPrintShopping: () => void;
  /** marks the shopping list as the part printed on its own */
  shoppingPartProps: PrintPartProps;
  shoppingExtraAction?: ReactNode;
}

/** The working view of a batch: portions, allergens, weights line for line, shopping, panel, storage. */
export function PrepSheet({ prep, portionsControl, onPrintShopping, shoppingPartProps, shoppingExtraAction }: PrepSheetProps) {
  const weightsId = useId();
  const unmatched = prep.perPortion.filter((l) => l.food.id === null).length;
  return (
    <div className="flex flex-col gap-8">
      <div data-print-part="controls" className="grid items-start gap-4 lg:grid-cols-2 print:block">
        <div className="rounded-card border border-line bg-surface p-4 shadow-card sm:p-5 print:hidden">{portionsControl}</div>
        <p className="hidden text-lg font-extrabold print:mb-3 print:block">
          A batch of {portionsWord(prep.portions)}: one portion is one serving of the version.
        </p>
        <AllergenNotice allergens={prep.allergens} unmatchedLines={unmatched} />
      </div>

      <div className="grid items-start gap-8 lg:grid-cols-[minmax(0,7fr)_minmax(0,5fr)]">
        <div className="flex min-w-0 flex-col gap-8">
          <section data-print-part="weights" aria-labelledby={weightsId} className="flex flex-col gap-3">
            <div>
              <h2 id={weightsId} className="text-xl font-extrabold">
                Weights, line for line
              </h2>
              <p className="text-sm text-ink-soft">
                Weigh it raw: put each ingredient on the food scale in grams before it is cooked. Each portion is what one container gets; the batch is what
                goes in the pot.
              </p>
            </div>
            <WeightsTable perPortion={prep.perPortion} batch={prep.batch} portions={prep.portions} />
          </section>

          <div {...shoppingPartProps}>
            <PrepShoppingList
              items={prep.shopping}
              text={prep.shoppingText}
              portions={prep.portions}
              storageKey={prepChecksKey(prep.recipe.id, prep.version.number, prep.portions)}
              onPrint={onPrintShopping}
              extraAction={shoppingExtraAction}
            />
          </div>
        </div>

        <div data-print-part="panel" className="flex min-w-0 flex-col gap-8">
          <ServingPanel label={prep.label} perServing={prep.perServing} />
          <StorageGuide storage={prep.storage} />
        </div>
      </div>
    </div>
  );
}
