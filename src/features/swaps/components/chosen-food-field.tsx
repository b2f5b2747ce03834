import { useEffect, useId, useRef, useState } from 'react';
import { Button } from '../../../components/ui/button';
import { cx } from '../../../lib/cx';
import type { RenderFoodSearch } from '../food-search-slot';
import type { PickedFood } from '../swap-draft';
import { FoodFigures } from '../../../components/ui/food-figures';

export interface ChosenFoodFieldProps {
  label: string;
  hint?: string;
  food: PickedFood | null;
  onChange: (food: PickedFood | null) => void;
  renderFoodSearch: RenderFoodSearch;
  error?: string;
}

/** A food picked from the catalogue: shown with its figures once chosen, searchable again with "Change". */
export function ChosenFoodField({ label, hint, food, onChange, renderFoodSearch, error }: ChosenFoodFieldProps) {
  const [searching, setSearching] = useState(false);
  // After a choice the search box goes away; keep keyboard focus in the field, on its Change button.
  // Counted in handlers, acted on once in the effect: the search slot's callbacks touch no ref.
  const [returns, setReturns] = useState(0);
  const focusedReturns = useRef(0);
  const chosenRef = useRef<HTMLDivElement>(null);
  const id = useId();

  useEffect(() => {
    if (returns === focusedReturns.current || searching || !food) return;
    focusedReturns.current = returns;
    chosenRef.current?.querySelector('button')?.focus();
  }, [returns, searching, food]);
  const errorId = `${id}-error`;

  if (!food || searching) {
    return (
      <div className={cx('flex flex-col gap-1.5 rounded-field', error && 'border-l-4 border-beet-600 pl-3')}>
        {renderFoodSearch({
          label,
          hint,
          autoFocus: searching,
          onChoose: (chosen) => {
            onChange(chosen);
            setSearching(false);
            setReturns((n) => n + 1);
          },
          onCancel: food
            ? () => {
                setSearching(false);
                setReturns((n) => n + 1);
              }
            : undefined,
        })}
        {food && (
          <Button
            variant="quiet"
            size="sm"
            className="self-start"
            onClick={() => {
              setSearching(false);
              setReturns((n) => n + 1);
            }}
          >
            Keep {food.name}
          </Button>
        )}
        {error && (
          <p id={errorId} role="alert" className="flex items-start gap-1.5 text-sm font-semibold text-beet-700">
            <span aria-hidden="true">●</span>
            <span>{error}</span>
          </p>
        )}
      </div>
    );
  }

  return (
    <div className="flex flex-col gap-1.5">
      <p className="font-bold text-ink" id={`${id}-label`}>
        {label}
      </p>
      <div
        ref={chosenRef}
        aria-labelledby={`${id}-label`}
        role="group"
        className={cx(
          'flex flex-wrap items-center justify-between gap-3 rounded-field border bg-oat-50 px-3.5 py-2.5',
          error ? 'border-beet-600' : 'border-line-strong',
        )}
      >
        <div className="flex min-w-0 flex-col">
          <span className="font-semibold text-ink">{food.name}</span>
          {food.kcalPer100g !== undefined && food.proteinPer100g !== undefined && (
            <span className="text-sm">
              <FoodFigures kcalPer100g={food.kcalPer100g} proteinPer100g={food.proteinPer100g} showDensity />
            </span>
          )}
        </div>
        <Button variant="secondary" size="sm" onClick={() => setSearching(true)}>
          Change<span className="sr-only"> {label.toLowerCase()}</span>
        </Button>
      </div>
      {error && (
        <p id={errorId} className="flex items-start gap-1.5 text-sm font-semibold text-beet-700">
          <span aria-hidden="true">●</span>
          <span>{error}</span>
        </p>
      )}
    </div>
  );
}
