import { zodResolver } from '@hookform/resolvers/zod';
import type { LineFunction } from '../../../../shared/culinary/types';
import { useCallback, useEffect, useMemo, useRef, useState, type ReactNode } from 'react';
import { useForm, useWatch, type Path } from 'react-hook-form';
import type { AnalyzeResponse, LineInput } from '../../../../shared/schemas/analyze';
import type { RewriteRequest } from '../../../../shared/schemas/rewrite';
import type { Suggestion } from '../../../../shared/rewrite/types';
import { Alert } from '../../../components/ui/alert';
import { Card } from '../../../components/ui/card';
import { ErrorState } from '../../../components/ui/error-state';
import { errorMessage, isApiError } from '../../../lib/api-client';
import { cx } from '../../../lib/cx';
import { applyServerFieldErrors } from '../../../lib/form-errors';
import type { UnitSystem } from '../../../lib/user';
import { useCoachMealTargets } from '../api/get-coach-targets';
import { useRewriteRecipe } from '../api/rewrite-recipe';
import {
  carryLocks,
  defaultTargets,
  initialFormInput,
  recipeSignature,
  requestSignature,
  rewriteFormSchema,
  rewriteRequestFor,
  suggestionFields,
  type RewriteFormInput,
  type RewriteFormValues,
} from '../rewrite-form';
import { loadRewrite, saveRewrite, sessionStore } from '../rewrite-storage';
import { infeasibleDetailsOf, type RewriteAnswer } from '../rewrite-types';
import { rewriteDraft } from '../save-draft';
import { InfeasibleView } from './infeasible-view';
import { ModelDisclosure } from './model-disclosure';
import { RewriteProgress } from './rewrite-progress';
import { RewriteResult, SkippedLinesNote } from './rewrite-result';
import { SaveRewrite, type RewriteSaveAction } from './save-rewrite';
import { TargetsForm, type FoodSearchArgs } from './targets-form';

/** The Kitchen's current analysis, as the page hands it over: the lines as sent, the servings, the answer. */
export interface RewriteRecipe {
  lines: LineInput[];
  servings: number;
  analysis: AnalyzeResponse;
  /** a newer analysis is on its way */
  updating: boolean;
  /** what the cook says lines do, by line index, over Hearthswap's reading */
  lineRoles?: Partial<Record<number, LineFunction>>;
}

export interface RewritePanelProps {
  /** null: nothing analysed yet, and the panel shows nothing */
  recipe: RewriteRecipe | null;
  unitSystem: UnitSystem;
  /** signed in: the coach's per-meal targets become the defaults when there are any */
  signedIn: boolean;
  saveAction: RewriteSaveAction;
  /** a catalogue search for leaving a food out, rendered by the page */
  renderFoodSearch?: (args: FoodSearchArgs) => ReactNode;
}

type Outcome =
  | { request: RewriteRequest; signature: string; answer: RewriteAnswer; error?: undefined }
  | { request: RewriteRequest; signature: string; answer?: undefined; error: unknown };

const SERVER_FIELDS: readonly Path<RewriteFormInput>[] = [
  'targets.proteinMinG',
  'targets.kcalMax',
  'targets.fiberMinG',
  'targets.fatMaxG',
  'targets.satFatMaxG',
  'targets.sodiumMaxMg',
  'targets.sugarMaxG',
  'volumeTolerancePct',
  'maxSwaps',
  'lockedLines',
  'excludedFoods',
  'diet',
  'objective',
];

/** Targets for the analysed recipe, the rewrite against them, and saving it. */
export function RewritePanel(props: RewritePanelProps) {
  if (!props.recipe) return null;
  return <RewritePanelBody {...props} recipe={props.recipe} />;
}

function RewritePanelBody({ recipe, unitSystem, signedIn, saveAction, renderFoodSearch }: RewritePanelProps & { recipe: RewriteRecipe }) {
  const coach = useCoachMealTargets(signedIn);
  const coachTargets = signedIn ? (coach.data ?? null) : null;
  const perServing = recipe.analysis.perServing;
  const defaults = useMemo(() => defaultTargets(perServing, coachTargets), [perServing, coachTargets]);
  const recipeKey = recipeSignature(recipe);

  const [stored] = useState(() => loadRewrite(sessionStore(), recipeKey));
  const form = useForm<RewriteFormInput, unknown, RewriteFormValues>({
    resolver: zodResolver(rewriteFormSchema),
    defaultValues: stored?.values ?? initialFormInput(defaults),
  });
  const { getValues, setValue } = form;

  // The suggested targets follow the dish (and the coach's answer) until the cook types their own.
  const applied = useRef(defaults);
  useEffect(() => {
    const previous = applied.current;
    applied.current = defaults;
    if (previous.proteinMinG === defaults.proteinMinG && previous.kcalMax === defaults.kcalMax) return;
    const { proteinMinG, kcalMax } = getValues('targets');
    if (proteinMinG === String(previous.proteinMinG) && kcalMax === String(previous.kcalMax)) {
      setValue('targets.proteinMinG', String(defaults.proteinMinG));
      setValue('targets.kcalMax', String(defaults.kcalMax));
    }
  }, [defaults, getValues, setValue]);

  // Locks stay on their lines when lines come and go.
  const lineTexts = useMemo(() => recipe.lines.map((l) => l.input), [recipe.lines]);
  const previousTexts = useRef(lineTexts);
  useEffect(() => {
    const before = previousTexts.current;
    previousTexts.current = lineTexts;
    if (before === lineTexts || JSON.stringify(before) === JSON.stringify(lineTexts)) return;
    setValue('lockedLines', carryLocks(getValues('lockedLines'), before, lineTexts));
  }, [lineTexts, getValues, setValue]);

  const watchedTargets = useWatch({ control: form.control, name: 'targets' });
  const usingDefaults = watchedTargets.proteinMinG === String(defaults.proteinMinG) && watchedTargets.kcalMax === String(defaults.kcalMax);

  const [outcome, setOutcome] = useState<Outcome | null>(() => (stored?.last ? { ...stored.last, signature: requestSignature(stored.last.request) } : null));
  const mutation = useRewriteRecipe();
  const { mutate } = mutation;
  const inFlight = useRef<AbortController | null>(null);
  const [startedAt, setStartedAt] = useState(0);
  const [answers, setAnswers] = useState(0);
  useEffect(() => () => inFlight.current?.abort(), []);

  const run = useCallback(
    (values: RewriteFormValues) => {
      const request = rewriteRequestFor(recipe, values);
      const signature = requestSignature(request);
      inFlight.current?.abort();
      const controller = new AbortController();
      inFlight.current = controller;
      setStartedAt(Date.now());
      mutate(
        { request, signal: controller.signal },
        {
          onSuccess: (answer) => {
            if (controller.signal.aborted) return;
            setOutcome({ request, signature, answer });
            setAnswers((n) => n + 1);
          },
          onError: (error) => {
            if (controller.signal.aborted) return;
            applyServerFieldErrors(error, form.setError, SERVER_FIELDS);
            setOutcome({ request, signature, error });
            setAnswers((n) => n + 1);
          },
        },
      );
    },
    [recipe, mutate, form.setError],
  );
  const { handleSubmit } = form;
  const submit = useCallback(() => handleSubmit(run)(), [handleSubmit, run]);

  const watchedAll = useWatch({ control: form.control });
  useEffect(() => {
    saveRewrite(sessionStore(), {
      recipe: recipeKey,
      values: getValues(),
      last: outcome?.answer ? { request: outcome.request, answer: outcome.answer } : null,
    });
  }, [watchedAll, outcome, recipeKey, getValues]);

  // A new answer: take keyboard and screen-reader users to it.
  const resultHeading = useRef<HTMLHeadingElement>(null);
  useEffect(() => {
    if (answers === 0) return;
    resultHeading.current?.focus({ preventScroll: true });
    resultHeading.current?.scrollIntoView({ behavior: 'smooth', block: 'start' });
  }, [answers]);

  const applySuggestion = (s: Suggestion) => {
    for (const field of suggestionFields(s)) setValue(field.name, field.value, { shouldDirty: true });
    void submit();
  };

  const exclude = (food: { id: number; name: string }) => {
    const list = getValues('excludedFoods');
    if (!list.some((f) => f.id === food.id)) setValue('excludedFoods', [...list, food]);
    void submit();
  };

  const pending = mutation.isPending;
  const stale = outcome !== null && recipeSignature(outcome.request) !== recipeKey;
  const infeasible = outcome?.error !== undefined ? infeasibleDetailsOf(outcome.error) : null;

  return (
    <>
      <section aria-labelledby="rewrite-heading" className="flex flex-col gap-4">
        <div className="flex flex-col gap-1">
          <h2 id="rewrite-heading" className="text-2xl font-extrabold">
            Make it lighter
          </h2>
          <p className="max-w-measure text-ink-soft">
            Set what one serving should give you. Hearthswap looks for lighter foods that play the same part in the dish and works out the amounts, so the pan
            holds about as much as before.
          </p>
        </div>
        <Card>
          <TargetsForm
            form={form}
            lines={recipe.analysis.lines}
            defaults={defaults}
            usingDefaults={usingDefaults}
            onUseDefaults={() => {
              setValue('targets.proteinMinG', String(defaults.proteinMinG), { shouldValidate: form.formState.isSubmitted });
              setValue('targets.kcalMax', String(defaults.kcalMax), { shouldValidate: form.formState.isSubmitted });
            }}
            onSubmit={() => void submit()}
            submitting={pending}
            waitingFor={recipe.updating ? 'Waiting for the numbers of your latest edit…' : null}
            renderFoodSearch={renderFoodSearch}
          />
        </Card>
      </section>

      {(outcome || pending) && (
        <section aria-labelledby="rewrite-result-heading" aria-busy={pending || undefined} className="flex flex-col gap-5">
          <h2 ref={resultHeading} id="rewrite-result-heading" tabIndex={-1} className="scroll-mt-24 text-2xl font-extrabold focus:outline-none">
            {infeasible ? 'Out of reach, for now' : outcome && !outcome.answer && !pending ? 'The rewrite' : 'The lighter version'}
          </h2>
          {pending && <RewriteProgress startedAt={startedAt} />}
          {outcome && (
            <div className={cx('flex flex-col gap-6 transition-opacity', pending && 'opacity-50')}>
              {stale && (
                <Alert tone="caution" announce={false}>
                  The recipe has changed since this rewrite. Press Rewrite to match the lines and servings as they are now.
                </Alert>
              )}
              {outcome.answer ? (
                <>
                  <RewriteResult request={outcome.request} answer={outcome.answer} unitSystem={unitSystem} onExclude={exclude} busy={pending} />
                  <Card title="Keep it" headingLevel={3}>
                    <SaveRewrite
                      action={saveAction}
                      stale={stale}
                      draftFor={(title) => (outcome.answer ? rewriteDraft(title, outcome.request, outcome.answer) : null)}
                    />
                  </Card>
                </>
              ) : infeasible ? (
                <Card>
                  <InfeasibleView
                    message={errorMessage(outcome.error)}
                    details={infeasible}
                    targets={outcome.request.targets}
                    onApply={applySuggestion}
                    applying={pending}
                  />
                  {infeasible.skippedLines.length > 0 && (
                    <div className="mt-5">
                      <SkippedLinesNote skipped={infeasible.skippedLines} />
                    </div>
                  )}
                </Card>
              ) : isApiError(outcome.error) && outcome.error.code === 'nothing_to_rewrite' ? (
                <Alert tone="caution" title="Nothing to rewrite yet">
                  {errorMessage(outcome.error)} Pick a food for the lines above, or give them an amount.
                </Alert>
              ) : (
                <ErrorState title="The rewrite didn’t finish" error={outcome.error} onRetry={() => void submit()} retrying={pending} />
              )}
              {(outcome.answer || infeasible) && <ModelDisclosure request={outcome.request} signature={outcome.signature} />}
            </div>
          )}
        </section>
      )}
    </>
  );
}
