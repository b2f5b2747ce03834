import { useId, useState, type FormEvent } from 'react';
import { ROLES } from '../../../../shared/food';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { Card } from '../../../components/ui/card';
import { TextAreaField, TextField } from '../../../components/ui/field';
import { SelectField } from '../../../components/ui/select-field';
import { errorMessage, isApiError } from '../../../lib/api-client';
import { readRequiredNumber } from '../../../lib/read-number';
import type { Swap } from '../../../../shared/schemas/swaps';
import { useCreateSwap, useUpdateSwap } from '../api/swaps';
import type { RenderFoodSearch } from '../food-search-slot';
import { type RoleLabel, volumeRatioWords } from '../../../lib/swap-words';
import {
  draftFromSwap,
  emptySwapDraft,
  MAX_NOTE_CHARS,
  swapDraftErrorsFrom,
  swapRequestFromDraft,
  type PickedFood,
  type SwapDraft,
  type SwapDraftErrors,
} from '../swap-draft';
import { ChosenFoodField } from './chosen-food-field';
import { LabelFoodDialog } from './label-food-dialog';

export interface SwapEditorProps {
  /** the swap being edited; null adds a new one */
  swap: Swap | null;
  /** a new swap starts with this food to use instead (one just added from a label) */
  initialToFood?: PickedFood | null;
  renderFoodSearch: RenderFoodSearch;
  roleLabel: RoleLabel;
  onSaved: (swap: Swap, isNew: boolean) => void;
  onCancel: () => void;
}

/** Add or edit one approved swap: what it replaces, what goes in instead, how to cook it. */
export function SwapEditor({ swap, initialToFood = null, renderFoodSearch, roleLabel, onSaved, onCancel }: SwapEditorProps) {
  const id = useId();
  const isNew = swap === null;
  const [draft, setDraft] = useState<SwapDraft>(() => (swap ? draftFromSwap(swap) : { ...emptySwapDraft(), toFood: initialToFood }));
  const [errors, setErrors] = useState<SwapDraftErrors>({});
  const [labelOpen, setLabelOpen] = useState(false);
  const create = useCreateSwap();
  const update = useUpdateSwap();
  const saving = create.isPending || update.isPending;
  const failure = create.error ?? update.error;

  function change<K extends keyof SwapDraft>(key: K, value: SwapDraft[K]) {
    setDraft((d) => ({ ...d, [key]: value }));
    setErrors((e) => {
      const field = key === 'fromKind' ? null : key;
      return field && field in e ? { ...e, [field]: undefined } : e;
    });
  }

  function submit(event: FormEvent) {
    event.preventDefault();
    const result = swapRequestFromDraft(draft, { isNew });
    if (!result.ok) {
      setErrors(result.errors);
      return;
    }
    const handlers = {
      onSuccess: (saved: Swap) => onSaved(saved, isNew),
      onError: (error: unknown) => {
        if (isApiError(error)) setErrors(swapDraftErrorsFrom(error.fieldErrors, draft.fromKind));
      },
    };
    if (isNew) create.mutate(result.request, handlers);
    else update.mutate({ id: swap.id, input: result.request }, handlers);
  }

  const ratio = readRequiredNumber(draft.volumeRatio);
  const errorCount = Object.values(errors).filter(Boolean).length;

  return (
    <Card
      title={isNew ? 'Add a swap' : 'Edit the swap'}
      description="Say what it replaces — one food, or every food that plays a role such as melting cheese — and what goes in instead."
    >
      <form onSubmit={submit} noValidate className="flex flex-col gap-6" aria-describedby={errorCount ? `${id}-summary` : undefined}>
        {errorCount > 0 && (
          <Alert tone="danger" title="Check the fields marked below" assertive>
            <span id={`${id}-summary`}>{errorCount === 1 ? 'One thing needs' : `${errorCount} things need`} another look before the swap can be saved.</span>
          </Alert>
        )}
        {failure && errorCount === 0 && (
          <Alert tone="danger" title="The swap wasn't saved" assertive>
            {errorMessage(failure)}
          </Alert>
        )}

        <fieldset className="flex flex-col gap-3">
          <legend className="mb-1.5 font-bold text-ink">It replaces</legend>
          <div className="flex flex-wrap gap-x-6 gap-y-2">
            {(
              [
                ['food', 'One food'],
                ['role', 'Every food in a role'],
              ] as const
            ).map(([value, text]) => (
              <label key={value} className="flex min-h-11 cursor-pointer items-center gap-2 font-semibold">
                <input
                  type="radio"
                  name={`${id}-from-kind`}
                  value={value}
                  checked={draft.fromKind === value}
                  onChange={() => change('fromKind', value)}
                  className="size-4 accent-ember-600"
                />
                {text}
              </label>
            ))}
          </div>
          {draft.fromKind === 'food' ? (
            <ChosenFoodField
              label="Food it replaces"
              food={draft.fromFood}
              onChange={(food) => change('fromFood', food)}
              renderFoodSearch={renderFoodSearch}
              error={errors.fromFood}
            />
          ) : (
            <SelectField
              label="Role it covers"
              hint="Any food of this role in a client's recipe can take the swap."
              value={draft.fromRole}
              onChange={(e) => change('fromRole', e.target.value)}
              error={errors.fromRole}
            >
              <option value="">Choose a role…</option>
              {ROLES.map((role) => (
                <option key={role} value={role}>
                  {roleLabel(role)}
                </option>
              ))}
            </SelectField>
          )}
        </fieldset>

        <div className="flex flex-col gap-2">
          <ChosenFoodField
            label="Use instead"
            food={draft.toFood}
            onChange={(food) => change('toFood', food)}
            renderFoodSearch={renderFoodSearch}
            error={errors.toFood}
          />
          <p className="text-sm text-ink-soft">
            Not in the catalogue?{' '}
            <button type="button" onClick={() => setLabelOpen(true)} className="font-bold text-accent-strong underline underline-offset-2">
              Add it from a label
            </button>
          </p>
        </div>

        <TextField
          label="Volume ratio"
          hint="Cups of the new food for each cup of the old. 1 keeps the dish's volume; 1.25 adds a quarter more."
          inputMode="decimal"
          autoComplete="off"
          value={draft.volumeRatio}
          onChange={(e) => change('volumeRatio', e.target.value)}
          error={errors.volumeRatio}
          className="sm:max-w-40"
        />
        {!errors.volumeRatio && Number.isFinite(ratio) && ratio > 0 && (
          <p className="-mt-4 text-sm text-ink-soft" aria-live="polite">
            {volumeRatioWords(ratio)}
          </p>
        )}

        <TextAreaField
          label="Cooking note"
          optional
          hint="What the cook should do differently, e.g. “bake 5 minutes longer for melt”. It shows beside the swap in every rewrite."
          value={draft.note}
          maxLength={MAX_NOTE_CHARS}
          onChange={(e) => change('note', e.target.value)}
          error={errors.note}
          className="min-h-24"
        />

        <TextField
          label="Tags"
          optional
          hint="Separate with commas, e.g. high-protein, freezer-friendly."
          autoComplete="off"
          value={draft.tags}
          onChange={(e) => change('tags', e.target.value)}
          error={errors.tags}
        />

        {isNew && (
          <label className="flex cursor-pointer items-start gap-3">
            <input
              type="checkbox"
              checked={draft.publishNow}
              onChange={(e) => change('publishNow', e.target.checked)}
              className="mt-1.5 size-4 accent-ember-600"
            />
            <span className="flex flex-col">
              <span className="font-bold">Publish to my clients now</span>
              <span className="text-sm text-ink-soft">Otherwise it stays a draft only you can see until you publish it.</span>
            </span>
          </label>
        )}

        <div className="flex flex-wrap gap-2">
          <Button type="submit" loading={saving} loadingLabel="Saving…">
            {isNew ? 'Add the swap' : 'Save changes'}
          </Button>
          <Button variant="secondary" onClick={onCancel} disabled={saving}>
            Cancel
          </Button>
        </div>
      </form>

      <LabelFoodDialog
        open={labelOpen}
        onClose={() => setLabelOpen(false)}
        roleLabel={roleLabel}
        onCreated={(food) => {
          change('toFood', { id: food.id, name: food.name, kcalPer100g: food.per100g.kcal, proteinPer100g: food.per100g.proteinG });
          setLabelOpen(false);
        }}
      />
    </Card>
  );
}
