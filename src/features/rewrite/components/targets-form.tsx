import { useState, type ReactNode } from 'react';
import { Controller, useWatch, type UseFormReturn } from 'react-hook-form';
import { DIET_FLAGS, type DietFlag } from '../../../../shared/food';
import type { AnalyzedLine } from '../../../../shared/schemas/analyze';
import { OBJECTIVES } from '../../../../shared/schemas/rewrite';
import { Badge } from '../../../components/ui/badge';
import { Button } from '../../../components/ui/button';
import { CheckboxField } from '../../../components/ui/checkbox-field';
import { ChoiceCards, TextField } from '../../../components/ui/field';
import { formatGrams, formatKcal, formatMacroG } from '../../../lib/format';
import {
  DIET_WORDS,
  MAX_VOLUME_TOLERANCE_PCT,
  OBJECTIVE_WORDS,
  type DefaultTargets,
  type OptionalTarget,
  type RewriteFormInput,
  type RewriteFormValues,
} from '../rewrite-form';

export interface FoodSearchArgs {
  label: string;
  onChoose: (food: { id: number; name: string }) => void;
  onClose: () => void;
}

export interface TargetsFormProps {
  form: UseFormReturn<RewriteFormInput, unknown, RewriteFormValues>;
  /** the analysed lines, in recipe order, for the locks */
  lines: AnalyzedLine[];
  defaults: DefaultTargets;
  /** the two main targets still hold the suggested values */
  usingDefaults: boolean;
  onUseDefaults: () => void;
  onSubmit: () => void;
  submitting: boolean;
  /** why the button waits (the analysis is updating), or null */
  waitingFor: string | null;
  renderFoodSearch?: (args: FoodSearchArgs) => ReactNode;
}

const OPTIONAL_FIELDS: { name: OptionalTarget; label: string; unit: string; hint: string }[] = [
  { name: 'fiberMinG', label: 'Fiber, at least', unit: 'g', hint: 'For fullness.' },
  { name: 'fatMaxG', label: 'Fat, at most', unit: 'g', hint: 'All fat.' },
  { name: 'satFatMaxG', label: 'Saturated fat, at most', unit: 'g', hint: 'Part of the fat.' },
  { name: 'sodiumMaxMg', label: 'Sodium, at most', unit: 'mg', hint: 'Salt, cheese, sauces.' },
  { name: 'sugarMaxG', label: 'Sugars, at most', unit: 'g', hint: 'Sauces, sweeteners.' },
];

const UNIT_WORDS: Record<string, string> = { g: 'grams', mg: 'milligrams', kcal: 'kcal' };

/** The visible label, with the unit the box shows beside it spoken too. */
function FieldLabel({ text, unit }: { text: string; unit: string }) {
  return (
    <>
      {text}
      <span className="sr-only"> ({unit})</span>
    </>
  );
}

function Unit({ children }: { children: ReactNode }) {
  return (
    <span aria-hidden="true" className="pr-2 text-sm font-bold text-ink-soft">
      {children}
    </span>
  );
}

function defaultsNote(defaults: DefaultTargets, usingDefaults: boolean, onUseDefaults: () => void) {
  const values = `${formatMacroG(defaults.proteinMinG)} protein, ${formatKcal(defaults.kcalMax)}`;
  if (!usingDefaults) {
    return (
      <span className="flex flex-wrap items-center gap-x-2">
        <span>You set these. The suggestion is {values}.</span>
        <Button variant="quiet" size="sm" onClick={onUseDefaults} className="underline underline-offset-2">
          Use the suggestion
        </Button>
      </span>
    );
  }
  return defaults.source.kind === 'coach' ? (
    <span>
      <Badge tone="herb">From your coach</Badge> {defaults.source.coachName}’s targets for one meal.
    </span>
  ) : (
    <span>Suggested from the dish as written: 30 % more protein and 20 % fewer calories per serving.</span>
  );
}

/** The cook's wishes for the rewrite: targets per serving, how much may change, what to keep or leave out. */
export function TargetsForm({ form, lines, defaults, usingDefaults, onUseDefaults, onSubmit, submitting, waitingFor, renderFoodSearch }: TargetsFormProps) {
  const {
    register,
    control,
    formState: { errors },
  } = form;
  const [searching, setSearching] = useState(false);
  // Open from the start when a limit is already set (a restored rewrite); the cook toggles it after that.
  const [limitsOpen, setLimitsOpen] = useState(() => OPTIONAL_FIELDS.some((f) => (form.getValues(`targets.${f.name}`) ?? '') !== ''));
  const excluded = useWatch({ control, name: 'excludedFoods' });
  const hiddenError = OPTIONAL_FIELDS.some((f) => errors.targets?.[f.name]);
  // An error in a hidden field opens the limits once, when it appears (adjusted while rendering, not in an effect).
  const [hiddenErrorShown, setHiddenErrorShown] = useState(false);
  if (hiddenError !== hiddenErrorShown) {
    setHiddenErrorShown(hiddenError);
    if (hiddenError) setLimitsOpen(true);
  }

  return (
    <form
      noValidate
      onSubmit={(event) => {
        event.preventDefault();
        onSubmit();
      }}
      className="flex flex-col gap-6"
      aria-describedby="rewrite-form-note"
    >
      <p id="rewrite-form-note" className="sr-only">
        Every target is per serving.
      </p>
      <div className="grid gap-6 lg:grid-cols-2">
        <div className="flex flex-col gap-6">
          <fieldset className="flex flex-col gap-3">
            <legend className="mb-1 text-lg font-extrabold">Targets per serving</legend>
            <div className="grid grid-cols-2 gap-4">
              <TextField
                label={<FieldLabel text="Protein, at least" unit="grams" />}
                inputMode="decimal"
                autoComplete="off"
                trailing={<Unit>g</Unit>}
                className="pr-10!"
                error={errors.targets?.proteinMinG?.message}
                {...register('targets.proteinMinG')}
              />
              <TextField
                label={<FieldLabel text="Calories, at most" unit="kcal" />}
                inputMode="decimal"
                autoComplete="off"
                trailing={<Unit>kcal</Unit>}
                className="pr-14!"
                error={errors.targets?.kcalMax?.message}
                {...register('targets.kcalMax')}
              />
            </div>
            <p className="text-sm text-ink-soft" aria-live="polite">
              {defaultsNote(defaults, usingDefaults, onUseDefaults)}
            </p>
            <details
              className="rounded-field border border-line bg-oat-50 px-4 py-2"
              open={limitsOpen}
              onToggle={(event) => setLimitsOpen(event.currentTarget.open)}
            >
              <summary className="min-h-9 cursor-pointer py-1.5 font-bold">
                More limits <span className="ml-1.5 text-sm font-normal text-ink-soft">(optional: fiber, fat, saturated fat, sodium, sugars)</span>
              </summary>
              <div className="grid grid-cols-2 gap-4 pt-2 pb-3 sm:grid-cols-3">
                {OPTIONAL_FIELDS.map((field) => (
                  <TextField
                    key={field.name}
                    label={<FieldLabel text={field.label} unit={UNIT_WORDS[field.unit]} />}
                    hint={field.hint}
                    inputMode="decimal"
                    autoComplete="off"
                    placeholder="No limit"
                    trailing={<Unit>{field.unit}</Unit>}
                    className={field.unit === 'mg' ? 'pr-12!' : 'pr-10!'}
                    error={errors.targets?.[field.name]?.message}
                    {...register(`targets.${field.name}`)}
                  />
                ))}
              </div>
            </details>
          </fieldset>

          <fieldset className="flex flex-col gap-3">
            <legend className="mb-1 text-lg font-extrabold">How much may change</legend>
            <div className="grid grid-cols-2 gap-4">
              <TextField
                label={<FieldLabel text="Dish volume" unit="percent, up or down" />}
                hint={`How far the dish may grow or shrink, 0–${MAX_VOLUME_TOLERANCE_PCT} %.`}
                inputMode="decimal"
                autoComplete="off"
                trailing={<Unit>± %</Unit>}
                className="pr-14!"
                error={errors.volumeTolerancePct?.message}
                {...register('volumeTolerancePct')}
              />
              <TextField
                label="Swaps, at most"
                hint="Leave empty for no limit."
                inputMode="numeric"
                autoComplete="off"
                placeholder="No limit"
                error={errors.maxSwaps?.message}
                {...register('maxSwaps')}
              />
            </div>
          </fieldset>

          <ChoiceCards
            legend={<span className="text-lg font-extrabold">Aim for</span>}
            hint="Once the targets are met, what the rewrite should make the most of."
            columns={1}
            options={OBJECTIVES.map((value) => ({ value, label: OBJECTIVE_WORDS[value].label, description: OBJECTIVE_WORDS[value].description }))}
            inputProps={register('objective')}
            error={errors.objective?.message}
          />
        </div>

        <div className="flex flex-col gap-6">
          <fieldset className="flex flex-col gap-1">
            <legend className="mb-1 text-lg font-extrabold">Keep as written</legend>
            <p className="mb-1 text-sm text-ink-soft">A ticked line keeps its food and its amount exactly.</p>
            <Controller
              control={control}
              name="lockedLines"
              render={({ field }) => (
                <ul className="flex flex-col">
                  {lines.map((line, index) => {
                    const usable = line.food !== null && line.grams > 0;
                    const checked = field.value.includes(index);
                    return (
                      <li key={index}>
                        <CheckboxField
                          label={line.input}
                          description={
                            usable ? `${line.food?.name} · ${formatGrams(line.grams)}` : 'Not read as a food with an amount, so the rewrite leaves it as it is.'
                          }
                          disabled={!usable}
                          checked={usable && checked}
                          onBlur={field.onBlur}
                          onChange={(event) =>
                            field.onChange(event.target.checked ? [...field.value, index].sort((a, b) => a - b) : field.value.filter((i) => i !== index))
                          }
                        />
                      </li>
                    );
                  })}
                </ul>
              )}
            />
          </fieldset>

          <fieldset className="flex flex-col gap-2">
            <legend className="mb-1 text-lg font-extrabold">Foods to leave out</legend>
            <p className="text-sm text-ink-soft">The rewrite never swaps to these. You can also leave out a food from the list of changes.</p>
            <Controller
              control={control}
              name="excludedFoods"
              render={({ field }) => (
                <>
                  {excluded.length > 0 ? (
                    <ul className="flex flex-wrap gap-2" aria-label="Foods left out">
                      {field.value.map((food) => (
                        <li
                          key={food.id}
                          className="flex items-center gap-1 rounded-pill border border-line-strong bg-surface py-0.5 pr-1 pl-3 text-sm font-semibold"
                        >
                          {food.name}
                          <button
                            type="button"
                            onClick={() => field.onChange(field.value.filter((f) => f.id !== food.id))}
                            className="inline-flex size-8 items-center justify-center rounded-pill text-ink-soft hover:bg-oat-100 hover:text-ink"
                            aria-label={`Allow ${food.name} again`}
                          >
                            <span aria-hidden="true">×</span>
                          </button>
                        </li>
                      ))}
                    </ul>
                  ) : (
                    <p className="text-sm font-semibold text-ink-soft">None left out.</p>
                  )}
                  {renderFoodSearch &&
                    (searching ? (
                      renderFoodSearch({
                        label: 'Food to leave out',
                        onChoose: (food) => {
                          if (!field.value.some((f) => f.id === food.id)) field.onChange([...field.value, { id: food.id, name: food.name }]);
                          setSearching(false);
                        },
                        onClose: () => setSearching(false),
                      })
                    ) : (
                      <Button variant="secondary" size="sm" className="self-start" onClick={() => setSearching(true)}>
                        Leave out a food…
                      </Button>
                    ))}
                </>
              )}
            />
          </fieldset>

          <fieldset className="flex flex-col gap-1">
            <legend className="mb-1 text-lg font-extrabold">Diet</legend>
            <p className="mb-1 text-sm text-ink-soft">Swaps only to foods that fit every ticked diet. Lines you keep are not checked.</p>
            <Controller
              control={control}
              name="diet"
              render={({ field }) => (
                <div className="grid grid-cols-2 gap-x-2">
                  {DIET_FLAGS.map((flag: DietFlag) => (
                    <CheckboxField
                      key={flag}
                      label={DIET_WORDS[flag]}
                      checked={field.value.includes(flag)}
                      onBlur={field.onBlur}
                      onChange={(event) => field.onChange(event.target.checked ? [...field.value, flag] : field.value.filter((f) => f !== flag))}
                    />
                  ))}
                </div>
              )}
            />
          </fieldset>
        </div>
      </div>

      <div className="flex flex-wrap items-center gap-x-4 gap-y-2 border-t border-line pt-5">
        <Button type="submit" size="lg" loading={submitting} loadingLabel="Rewriting…" disabled={waitingFor !== null}>
          Rewrite
        </Button>
        <p className="text-sm text-ink-soft" aria-live="polite">
          {waitingFor ?? 'Swaps and amounts are chosen to meet every target per serving while the dish stays the same size.'}
        </p>
      </div>
    </form>
  );
}
