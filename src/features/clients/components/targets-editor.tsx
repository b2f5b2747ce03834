import { useRef, useState, type FormEvent } from 'react';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { Card } from '../../../components/ui/card';
import { TextAreaField, TextField } from '../../../components/ui/field';
import { useToast } from '../../../components/ui/toast';
import { errorMessage, isApiError } from '../../../lib/api-client';
import { formatKcal, formatMacroG } from '../../../lib/format';
import { useSaveClientTargets, type Client } from '../api/clients';
import type { BodyUnits } from '../body-units';
import { readNumber } from '../../../lib/read-number';
import {
  applyEstimate,
  MAX_TARGET_NOTE_CHARS,
  targetsErrorsFrom,
  targetsFromValues,
  targetsValues,
  type TargetsErrors,
  type TargetsField,
  type TargetsValues,
} from '../targets-form';
import { TargetEstimator } from './target-estimator';
import { countOf } from '../../../lib/words';

/** Per-meal figures times meals, to set beside the daily targets. */
function DailyCheck({ values }: { values: TargetsValues }) {
  const kcal = readNumber(values.perMealKcal);
  const protein = readNumber(values.perMealProteinG);
  const meals = readNumber(values.mealsPerDay);
  if (!kcal || !protein || !meals || [kcal, protein, meals].some(Number.isNaN)) return null;
  return (
    <p className="text-sm text-ink-soft" aria-live="polite">
      Over {countOf(meals, 'meal')} the per-meal targets come to {formatKcal(kcal * meals)} and {formatMacroG(protein * meals)} protein a day.
    </p>
  );
}

/** The client's targets: estimate them from body stats, adjust, save. */
export function TargetsEditor({ client, defaultUnits }: { client: Client; defaultUnits: BodyUnits }) {
  const save = useSaveClientTargets(client.id);
  const toast = useToast();
  const [values, setValues] = useState<TargetsValues>(() => targetsValues(client.targets));
  const [errors, setErrors] = useState<TargetsErrors>({});
  const [fromEstimate, setFromEstimate] = useState(false);
  const formRef = useRef<HTMLFormElement>(null);

  const set = (field: TargetsField) => (event: { target: { value: string } }) => {
    const value = event.target.value;
    setValues((v) => ({ ...v, [field]: value }));
    if (errors[field]) setErrors((e) => ({ ...e, [field]: undefined }));
  };

  function submit(event: FormEvent) {
    event.preventDefault();
    const result = targetsFromValues(values);
    if (!result.ok) {
      setErrors(result.errors);
      return;
    }
    save.mutate(result.targets, {
      onSuccess: ({ targets }) => {
        setValues(targetsValues(targets));
        setFromEstimate(false);
        toast.show(`Saved ${client.displayName}'s targets. Their rewrites now aim for them.`, 'success');
      },
      onError: (error) => {
        if (isApiError(error)) setErrors(targetsErrorsFrom(error.fieldErrors));
      },
    });
  }

  const numeric = { inputMode: 'decimal' as const, autoComplete: 'off', spellCheck: false };
  const shownErrors = Object.values(errors).some(Boolean);

  return (
    <div className="grid items-start gap-6 lg:grid-cols-2">
      <Card
        title="Estimate from body stats"
        description="Mifflin–St Jeor resting energy, an activity factor and the goal give the daily energy; protein comes from body weight."
      >
        <TargetEstimator
          clientId={client.id}
          defaultUnits={defaultUnits}
          onApply={(estimate, meals) => {
            setValues((v) => applyEstimate(v, estimate, meals));
            setErrors({});
            setFromEstimate(true);
            formRef.current?.scrollIntoView({ block: 'start', behavior: 'smooth' });
            formRef.current?.querySelector('input')?.focus({ preventScroll: true });
          }}
        />
      </Card>

      <Card
        title={`Targets for ${client.displayName}`}
        description={
          client.targets ? 'What their rewrites aim for by default. Change and save them at any time.' : 'None set yet. Estimate them, or type your own.'
        }
      >
        <form ref={formRef} onSubmit={submit} noValidate className="flex scroll-mt-4 flex-col gap-5">
          {fromEstimate && (
            <Alert tone="info" title="Filled in from the estimate">
              Check the numbers against what you know of {client.displayName}, then save.
            </Alert>
          )}
          {save.isError && !shownErrors && (
            <Alert tone="danger" title="The targets weren't saved" assertive>
              {errorMessage(save.error)}
            </Alert>
          )}
          <fieldset className="flex flex-col gap-3">
            <legend className="mb-1 font-bold text-ink">Per meal</legend>
            <div className="grid gap-4 sm:grid-cols-2">
              <TextField label="Energy, at most (kcal)" {...numeric} value={values.perMealKcal} onChange={set('perMealKcal')} error={errors.perMealKcal} />
              <TextField
                label="Protein, at least (g)"
                {...numeric}
                value={values.perMealProteinG}
                onChange={set('perMealProteinG')}
                error={errors.perMealProteinG}
              />
              <TextField label="Fiber, at least (g)" optional {...numeric} value={values.fiberMinG} onChange={set('fiberMinG')} error={errors.fiberMinG} />
              <TextField
                label="Sodium, at most (mg)"
                optional
                {...numeric}
                value={values.sodiumMaxMg}
                onChange={set('sodiumMaxMg')}
                error={errors.sodiumMaxMg}
              />
            </div>
          </fieldset>
          <fieldset className="flex flex-col gap-3">
            <legend className="mb-1 font-bold text-ink">
              A day <span className="ml-1 text-sm font-normal text-ink-soft">(optional)</span>
            </legend>
            <div className="grid grid-cols-3 gap-3 sm:gap-4">
              <TextField label="Energy (kcal)" {...numeric} value={values.kcalPerDay} onChange={set('kcalPerDay')} error={errors.kcalPerDay} />
              <TextField label="Protein (g)" {...numeric} value={values.proteinGPerDay} onChange={set('proteinGPerDay')} error={errors.proteinGPerDay} />
              <TextField
                label="Meals"
                inputMode="numeric"
                autoComplete="off"
                value={values.mealsPerDay}
                onChange={set('mealsPerDay')}
                error={errors.mealsPerDay}
              />
            </div>
            <DailyCheck values={values} />
          </fieldset>
          <TextAreaField
            label="Note to your client"
            optional
            hint="Shown with the targets on their My coach page."
            maxLength={MAX_TARGET_NOTE_CHARS}
            value={values.note}
            onChange={set('note')}
            error={errors.note}
            className="min-h-24"
          />
          <Button type="submit" loading={save.isPending} loadingLabel="Saving…" className="self-start">
            Save targets
          </Button>
        </form>
      </Card>
    </div>
  );
}
