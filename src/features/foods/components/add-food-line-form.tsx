import { useId, useState, type FormEvent } from 'react';
import type { FoodSummary } from '../../../../shared/schemas/analyze';
import { nutrientsForGrams } from '../../../../shared/nutrition';
import { Button } from '../../../components/ui/button';
import { ErrorState } from '../../../components/ui/error-state';
import { TextField } from '../../../components/ui/field';
import { SelectField } from '../../../components/ui/select-field';
import { LoadingState } from '../../../components/ui/spinner';
import { formatKcal, formatMacroG, formatWeight } from '../../../lib/format';
import { readRequiredNumber } from '../../../lib/read-number';
import type { UnitSystem } from '../../../lib/user';
import { useFood } from '../api/get-food';
import type { FoodSearchHit } from '../api/search-foods';
import { gramsPerMeasure, ingredientLineFor, measureParts } from '../portion-words';
import { FoodCombobox } from './food-combobox';

/** A line chosen from the catalogue: the food and its weight are pinned, the text is for reading. */
export interface CatalogueLine {
  input: string;
  foodId: number;
  grams: number;
  food: FoodSummary;
}

const GRAMS = 'grams';
const MAX_GRAMS = 100_000;

export interface AddFoodLineFormProps {
  onAdd: (line: CatalogueLine) => void;
  unitSystem: UnitSystem;
  disabled?: boolean;
}

/** Build a recipe line by line: find a food, give its amount in grams or in one of its household measures. */
export function AddFoodLineForm({ onAdd, unitSystem, disabled }: AddFoodLineFormProps) {
  const formId = useId();
  const [chosen, setChosen] = useState<FoodSearchHit | null>(null);
  const detail = useFood(chosen?.id ?? null);
  const [measure, setMeasure] = useState<string>(GRAMS);
  const [amountText, setAmountText] = useState('100');
  const [error, setError] = useState<string | undefined>();
  // After the first food, focus comes back to the search box for the next one.
  const [searchedBefore, setSearchedBefore] = useState(false);

  const portions = detail.data?.portions ?? [];
  const portionIndex = measure === GRAMS ? -1 : Number(measure);
  const portion = portionIndex >= 0 ? portions[portionIndex] : undefined;
  const amount = readRequiredNumber(amountText);
  const amountValid = amountText.trim() !== '' && Number.isFinite(amount) && amount > 0;
  const grams = !amountValid ? 0 : portion ? amount * gramsPerMeasure(portion) : amount;
  const preview = detail.data && amountValid ? nutrientsForGrams(detail.data.per100g, grams) : null;

  function choose(hit: FoodSearchHit) {
    setChosen(hit);
    setSearchedBefore(true);
    setMeasure(GRAMS);
    setAmountText('100');
    setError(undefined);
  }

  function submit(event: FormEvent) {
    event.preventDefault();
    if (!chosen) return;
    if (!amountValid) return setError(portion ? 'Enter how many, e.g. 1 or 0.5.' : 'Enter the grams, e.g. 120.');
    if (grams > MAX_GRAMS) return setError('That is more than 100 kg; enter a smaller amount.');
    const input = portion ? ingredientLineFor(chosen.name, { quantity: amount, portion }) : ingredientLineFor(chosen.name, { grams });
    onAdd({ input, foodId: chosen.id, grams, food: { id: chosen.id, source: chosen.source, sourceId: chosen.sourceId, name: chosen.name } });
    setChosen(null);
    setError(undefined);
  }

  if (!chosen) {
    return (
      <FoodCombobox
        label="Find a food"
        hint="Choose it from the list, then give its amount."
        placeholder="e.g. elbow macaroni"
        onChoose={choose}
        autoFocus={searchedBefore}
      />
    );
  }

  return (
    <form onSubmit={submit} noValidate aria-labelledby={`${formId}-food`} className="flex flex-col gap-4">
      <div className="flex flex-wrap items-start justify-between gap-2 rounded-field border border-line bg-oat-50 px-4 py-3">
        <div className="flex min-w-0 flex-col">
          <span className="text-sm font-bold text-ink-soft">Adding</span>
          <span id={`${formId}-food`} className="font-bold text-ink">
            {chosen.name}
          </span>
        </div>
        <Button variant="quiet" size="sm" onClick={() => setChosen(null)}>
          Choose another food
        </Button>
      </div>
      {detail.isPending ? (
        <LoadingState label="Fetching its household measures…" className="py-2" />
      ) : detail.isError ? (
        <ErrorState title="Its measures didn't load" error={detail.error} onRetry={() => void detail.refetch()} retrying={detail.isFetching} />
      ) : (
        <div className="grid gap-4 sm:grid-cols-[minmax(0,2fr)_minmax(0,1fr)]">
          <SelectField label="Measure" value={measure} onChange={(e) => setMeasure(e.target.value)}>
            <option value={GRAMS}>Grams</option>
            {portions.map((p, i) => {
              const { head, note } = measureParts(p.measure);
              return (
                <option key={`${p.label}-${i}`} value={String(i)}>
                  {`${head}${note ? `, ${note}` : ''} (${Math.round(gramsPerMeasure(p))} g each)`}
                </option>
              );
            })}
          </SelectField>
          <TextField
            label={portion ? 'How many' : 'Grams'}
            type="text"
            inputMode="decimal"
            value={amountText}
            onChange={(e) => {
              setAmountText(e.target.value);
              setError(undefined);
            }}
            error={error}
            autoFocus
            autoComplete="off"
          />
        </div>
      )}
      <p className="text-sm text-ink-soft tabular-nums" aria-live="polite">
        {preview ? `${formatWeight(grams, unitSystem)} · ${formatKcal(preview.kcal)} · ${formatMacroG(preview.proteinG)} protein` : '\u00a0'}
      </p>
      <div>
        <Button type="submit" disabled={disabled || detail.isPending || detail.isError}>
          Add this line
        </Button>
      </div>
    </form>
  );
}
