import { Button } from '../../../components/ui/button';
import { NumberStepper } from '../../../components/ui/number-stepper';
import { MAX_PORTIONS, MIN_PORTIONS, type ShoppingPick } from '../shopping-picks';
import { portionsProblem } from '../shopping-words';

export interface PickedBatchesProps {
  picks: ShoppingPick[];
  /** recipe titles by id, null while they load; a missing one is a recipe no longer in the book */
  titles: Map<number, string> | null;
  onPortions: (index: number, portions: number) => void;
  onRemove: (index: number) => void;
  /** field messages from the server, by pick index */
  errors?: Record<number, string>;
}

/** The batches on the list, each with its own portions. */
export function PickedBatches({ picks, titles, onPortions, onRemove, errors = {} }: PickedBatchesProps) {
  return (
    <ol aria-label="Batches on the list" className="flex flex-col gap-3">
      {picks.map((pick, index) => {
        const title = titles === null ? `Recipe ${pick.recipeId}` : (titles.get(pick.recipeId) ?? 'A recipe no longer in your book');
        return (
          <li
            key={`${pick.recipeId}.${pick.versionNumber}`}
            className="flex flex-col gap-3 rounded-field border border-line bg-oat-50 p-3.5 sm:flex-row sm:items-end sm:justify-between"
          >
            <div className="flex min-w-0 flex-col gap-2">
              <p className="font-extrabold text-ink">
                {title} <span className="font-semibold text-ink-soft">· version {pick.versionNumber}</span>
              </p>
              <NumberStepper
                label={
                  <span className="sr-only">
                    Portions of {title}, version {pick.versionNumber}
                  </span>
                }
                value={pick.portions}
                min={MIN_PORTIONS}
                max={MAX_PORTIONS}
                unit="portions"
                onChange={(value) => onPortions(index, value)}
                error={portionsProblem(pick.portions) ?? errors[index]}
              />
            </div>
            <Button
              variant="quiet"
              size="sm"
              onClick={() => onRemove(index)}
              aria-label={`Remove ${title}, version ${pick.versionNumber}`}
              className="self-start sm:self-end"
            >
              Remove
            </Button>
          </li>
        );
      })}
    </ol>
  );
}
