import { useId, useState, type FormEvent } from 'react';
import { ACTIVITY_LEVELS, GOALS, type ActivityLevel, type Goal } from '../../../../shared/schemas/targets';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/field';
import { SelectField } from '../../../components/ui/select-field';
import { cx } from '../../../lib/cx';
import { errorMessage, isApiError } from '../../../lib/api-client';
import { useBodyStats, useSaveBodyStats } from '../api/body-stats';
import { useEstimateTargets, type TargetEstimate } from '../api/estimate-targets';
import { LoadingState } from '../../../components/ui/spinner';
import { formatDay } from '../../../lib/dates';
import type { BodyUnits } from '../body-units';
import { emptyEstimate, estimateErrorsFrom, estimateInput, estimateValuesFrom, type EstimateErrors, type EstimateValues } from '../estimate-form';
import { EstimateSummary } from './estimate-summary';

const ACTIVITY_WORDS: Record<ActivityLevel, string> = {
  sedentary: 'Sedentary: desk work',
  light: 'Light: 1–3 workouts a week',
  moderate: 'Moderate: 3–5 workouts a week',
  very: 'Very active: 6–7 a week',
  extra: 'Extra: physical job and training',
};

const GOAL_WORDS: Record<Goal, string> = { lose: 'Lose fat', maintain: 'Keep their weight', gain: 'Gain muscle' };

export interface TargetEstimatorProps {
  clientId: number;
  defaultUnits: BodyUnits;
  /** fill the targets form with this estimate */
  onApply: (estimate: TargetEstimate, mealsPerDay: number) => void;
}

/**
 * Body stats and goal in, daily and per-meal energy and protein out. The stats of each estimate are
 * saved for the client on the server, so the form opens with them on any device.
 */
export function TargetEstimator({ clientId, defaultUnits, onApply }: TargetEstimatorProps) {
  const saved = useBodyStats(clientId);
  if (saved.isPending) return <LoadingState label="Loading their body stats…" />;
  const stats = saved.data?.stats ?? null;
  return (
    // mounted once the saved stats are known: they are the form's starting values
    <EstimatorForm
      clientId={clientId}
      initial={stats ? estimateValuesFrom(stats) : emptyEstimate(defaultUnits)}
      savedAt={saved.data?.updatedAt ?? null}
      loadError={saved.isError ? saved.error : null}
      onApply={onApply}
    />
  );
}

interface EstimatorFormProps {
  clientId: number;
  initial: EstimateValues;
  savedAt: string | null;
  loadError: unknown;
  onApply: TargetEstimatorProps['onApply'];
}

function EstimatorForm({ clientId, initial, savedAt, loadError, onApply }: EstimatorFormProps) {
  const id = useId();
  const estimate = useEstimateTargets();
  const saveStats = useSaveBodyStats(clientId);
  const [values, setValues] = useState<EstimateValues>(initial);
  const [errors, setErrors] = useState<EstimateErrors>({});
  const [estimatedFor, setEstimatedFor] = useState<number | null>(null);

  const set =
    (field: keyof EstimateValues, errorField: keyof EstimateErrors = field as keyof EstimateErrors) =>
    (event: { target: { value: string } }) => {
      const value = event.target.value;
      setValues((v) => ({ ...v, [field]: value }));
      if (errors[errorField]) setErrors((e) => ({ ...e, [errorField]: undefined }));
    };

  function submit(event: FormEvent) {
    event.preventDefault();
    const result = estimateInput(values);
    if (!result.ok) {
      setErrors(result.errors);
      return;
    }
    setErrors({});
    estimate.mutate(result.input, {
      onSuccess: () => {
        setEstimatedFor(result.input.mealsPerDay);
        saveStats.mutate({ ...result.input, units: values.units });
      },
      onError: (error) => {
        if (isApiError(error)) setErrors(estimateErrorsFrom(error.fieldErrors));
      },
    });
  }

  const numeric = { inputMode: 'decimal' as const, autoComplete: 'off', spellCheck: false };
  const result = estimate.data;
  const serverFailure = estimate.isError && Object.values(errors).every((e) => !e);

  return (
    <div className="flex flex-col gap-5">
      <Alert tone="caution" title="For healthy adults only" announce={false}>
        Estimates, not medical advice. For a medical condition, pregnancy, an eating disorder or anyone under 18, targets belong with a physician or registered
        dietitian.
      </Alert>
      {loadError !== null && (
        <Alert tone="caution" title="Their saved body stats didn't load" announce={false}>
          {errorMessage(loadError)} The form starts empty; estimating saves what you enter.
        </Alert>
      )}
      <form onSubmit={submit} noValidate className="flex flex-col gap-4">
        <fieldset className="flex flex-col gap-2" aria-describedby={errors.sex ? `${id}-sex-error` : undefined}>
          <legend className="mb-1 font-bold text-ink">Sex for the estimate</legend>
          <div className="flex flex-wrap gap-x-6">
            {(['female', 'male'] as const).map((sex) => (
              <label key={sex} className="flex min-h-11 cursor-pointer items-center gap-2 font-semibold">
                <input type="radio" name={`${id}-sex`} value={sex} checked={values.sex === sex} onChange={set('sex')} className="size-4 accent-ember-600" />
                {sex === 'female' ? 'Female' : 'Male'}
              </label>
            ))}
          </div>
          {errors.sex && (
            <p id={`${id}-sex-error`} className="text-sm font-semibold text-beet-700">
              <span aria-hidden="true">● </span>
              {errors.sex}
            </p>
          )}
        </fieldset>

        <fieldset className="flex flex-col gap-2">
          <legend className="sr-only">Units for height and weight</legend>
          <div className="inline-flex self-start rounded-pill border border-line-strong bg-surface p-1">
            {(
              [
                ['us', 'ft, in, lb'],
                ['metric', 'cm, kg'],
              ] as const
            ).map(([units, label]) => (
              <label
                key={units}
                className={cx(
                  'cursor-pointer rounded-pill px-3.5 py-1.5 text-sm font-bold has-[:focus-visible]:outline-3 has-[:focus-visible]:outline-focus',
                  values.units === units ? 'bg-ink text-canvas' : 'text-ink-soft hover:bg-oat-100',
                )}
              >
                <input
                  type="radio"
                  name={`${id}-units`}
                  value={units}
                  checked={values.units === units}
                  onChange={() => {
                    setValues((v) => ({ ...v, units }));
                    setErrors((e) => ({ ...e, height: undefined, weight: undefined }));
                  }}
                  className="sr-only"
                />
                {label}
              </label>
            ))}
          </div>
        </fieldset>

        <div className="grid gap-4 sm:grid-cols-2">
          <TextField label="Age (years)" inputMode="numeric" autoComplete="off" value={values.ageYears} onChange={set('ageYears')} error={errors.ageYears} />
          {values.units === 'metric' ? (
            <TextField label="Weight (kg)" {...numeric} value={values.weightKg} onChange={set('weightKg', 'weight')} error={errors.weight} />
          ) : (
            <TextField label="Weight (lb)" {...numeric} value={values.weightLb} onChange={set('weightLb', 'weight')} error={errors.weight} />
          )}
        </div>
        {values.units === 'metric' ? (
          <TextField
            label="Height (cm)"
            {...numeric}
            value={values.heightCm}
            onChange={set('heightCm', 'height')}
            error={errors.height}
            containerClassName="sm:max-w-[calc(50%-0.5rem)]"
          />
        ) : (
          <fieldset className="flex flex-col gap-1.5" aria-describedby={errors.height ? `${id}-height-error` : undefined}>
            <legend className="mb-1.5 font-bold text-ink">Height</legend>
            <div className="grid grid-cols-2 gap-4">
              <TextField
                label="Feet"
                inputMode="numeric"
                autoComplete="off"
                value={values.heightFeet}
                onChange={set('heightFeet', 'height')}
                aria-invalid={errors.height ? true : undefined}
              />
              <TextField
                label="Inches"
                {...numeric}
                value={values.heightInches}
                onChange={set('heightInches', 'height')}
                aria-invalid={errors.height ? true : undefined}
              />
            </div>
            {errors.height && (
              <p id={`${id}-height-error`} className="text-sm font-semibold text-beet-700">
                <span aria-hidden="true">● </span>
                {errors.height}
              </p>
            )}
          </fieldset>
        )}
        <SelectField label="How active" value={values.activity} onChange={set('activity')} error={errors.activity}>
          {ACTIVITY_LEVELS.map((level) => (
            <option key={level} value={level}>
              {ACTIVITY_WORDS[level]}
            </option>
          ))}
        </SelectField>
        <div className="grid gap-4 sm:grid-cols-2">
          <SelectField label="Goal" value={values.goal} onChange={set('goal')} error={errors.goal}>
            {GOALS.map((goal) => (
              <option key={goal} value={goal}>
                {GOAL_WORDS[goal]}
              </option>
            ))}
          </SelectField>
          <TextField
            label="Meals a day"
            inputMode="numeric"
            autoComplete="off"
            value={values.mealsPerDay}
            onChange={set('mealsPerDay')}
            error={errors.mealsPerDay}
          />
        </div>
        {serverFailure && (
          <Alert tone="danger" title="No estimate" assertive>
            {errorMessage(estimate.error)}
          </Alert>
        )}
        <Button type="submit" variant="secondary" loading={estimate.isPending} loadingLabel="Estimating…" className="self-start">
          Estimate
        </Button>
        <p className="-mt-2 text-sm text-ink-soft" aria-live="polite">
          {saveStats.isError
            ? `These stats weren't saved: ${errorMessage(saveStats.error)}`
            : saveStats.isPending
              ? 'Saving these stats…'
              : savedAt
                ? `Stats saved ${formatDay(saveStats.data?.updatedAt ?? savedAt)}; each estimate saves them for this client, on any device.`
                : 'Each estimate saves these stats for this client, so they are here next time, on any device.'}
        </p>
      </form>

      {result && estimatedFor !== null && (
        <section aria-label="The estimate" className="flex flex-col gap-4 border-t border-line pt-5" aria-live="polite">
          <EstimateSummary estimate={result} mealsPerDay={estimatedFor} />
          <Button onClick={() => onApply(result, estimatedFor)} className="self-start">
            Use these as the targets
          </Button>
          <p className="-mt-2 text-sm text-ink-soft">Fills in the targets form, rounded to whole numbers; nothing is saved until you save it.</p>
        </section>
      )}
    </div>
  );
}
