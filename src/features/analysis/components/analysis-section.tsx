import { useEffect, useRef, type ReactNode } from 'react';
import { incompleteLineNumbers } from '../../../../shared/line-status';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { EmptyState } from '../../../components/ui/empty-state';
import { IncompleteTotalsAlert } from '../../../components/ui/incomplete-totals-alert';
import { ErrorState } from '../../../components/ui/error-state';
import { LoadingState, Spinner } from '../../../components/ui/spinner';
import type { UnitSystem } from '../../../lib/user';
import type { Kitchen } from '../use-kitchen';
import { AnalysisLines, type FoodSearchSlotArgs } from './analysis-lines';
import { DishPanels, ServingHeadline } from './dish-figures';
import { DISH_TYPE_WORDS } from '../../../../shared/culinary/infer-dish';
import { ServingsField } from './servings-field';
import { SetAsideNote } from './set-aside-note';
import { countOf } from '../../../lib/words';

export interface AnalysisSectionProps {
  kitchen: Kitchen;
  unitSystem: UnitSystem;
  renderFoodSearch?: (args: FoodSearchSlotArgs) => ReactNode;
  foodHref?: (id: number) => string;
  addFoodHref?: string;
}

/** What Hearthswap read from the recipe: every line, its food and weight, and the dish per serving. */
export function AnalysisSection({ kitchen, unitSystem, renderFoodSearch, foodHref, addFoodHref }: AnalysisSectionProps) {
  const headingRef = useRef<HTMLHeadingElement>(null);
  const { analysis, lines, pastesAnswered } = kitchen;

  // A freshly pasted recipe: take keyboard and screen-reader users to what was read.
  useEffect(() => {
    if (pastesAnswered === 0) return;
    headingRef.current?.focus({ preventScroll: true });
    headingRef.current?.scrollIntoView({ behavior: 'smooth', block: 'start' });
  }, [pastesAnswered]);

  const heading = (
    <h2 ref={headingRef} id="kitchen-analysis" tabIndex={-1} className="scroll-mt-24 text-2xl font-extrabold focus:outline-none">
      What’s in it
    </h2>
  );

  if (lines.length === 0) {
    return (
      <section aria-labelledby="kitchen-analysis" className="flex flex-col gap-4">
        {heading}
        {kitchen.analysingText ? (
          <LoadingState label="Reading and weighing every line…" />
        ) : kitchen.error != null ? (
          <ErrorState title="The recipe wasn't analysed" error={kitchen.error} onRetry={kitchen.retry} />
        ) : (
          <EmptyState title="Nothing on the board yet">
            Paste an ingredient list and press Analyse recipe, or add foods one by one. Every line shows up here with its weight in grams, and the dish with its
            calories and protein per serving.
          </EmptyState>
        )}
      </section>
    );
  }

  return (
    <section aria-labelledby="kitchen-analysis" className="flex flex-col gap-5">
      <div className="flex flex-wrap items-end justify-between gap-4">
        <div className="flex flex-col gap-1">
          {heading}
          <p className="text-ink-soft">{countOf(lines.length, 'line')}. Change a food or a weight and the numbers follow.</p>
        </div>
        <div className="flex flex-wrap items-end gap-4">
          <p aria-live="polite" className="flex min-h-9 items-center gap-2 text-sm font-semibold text-ink-soft">
            {kitchen.analysing && analysis && (
              <>
                <Spinner className="size-4 text-accent" /> Updating the numbers…
              </>
            )}
          </p>
          <ServingsField servings={kitchen.servings} onChange={kitchen.setServings} />
        </div>
      </div>

      {kitchen.error != null && (
        <ErrorState title={analysis ? 'The numbers didn’t update' : "The recipe wasn't analysed"} error={kitchen.error} onRetry={kitchen.retry} />
      )}

      {analysis ? <ServingHeadline analysis={analysis} /> : kitchen.error == null && <LoadingState label="Reading and weighing every line…" />}

      {analysis && !kitchen.stale && (
        <IncompleteTotalsAlert lineNumbers={incompleteLineNumbers(analysis.lines.map((l) => ({ food: l.food, grams: l.grams })))} />
      )}
      {kitchen.textReading && <SetAsideNote reading={kitchen.textReading} servings={kitchen.servings} onUseServings={kitchen.setServings} />}
      {kitchen.removed && (
        <Alert
          tone="info"
          title="Line removed"
          action={
            <Button variant="secondary" size="sm" onClick={kitchen.undoRemove}>
              Undo
            </Button>
          }
        >
          “{kitchen.removed.input}” is out of the recipe.
        </Alert>
      )}
      {analysis?.dishType && (
        <p className="text-sm text-ink-soft">
          Hearthswap reads this as <strong className="text-ink">{DISH_TYPE_WORDS[analysis.dishType]}</strong> and says under each food what it does in the dish.
          Salt, spices, leaveners, extracts, aromatics and cooking liquids are kept as written in a rewrite; pick another job for a line to let the rewrite
          change it.
        </p>
      )}

      <AnalysisLines
        lines={lines}
        analysedLine={kitchen.analysedLine}
        unitSystem={unitSystem}
        stale={kitchen.stale}
        totals={analysis ? { grams: analysis.totalGrams, kcal: analysis.totals.kcal, proteinG: analysis.totals.proteinG } : null}
        onChooseFood={kitchen.chooseFood}
        onSetGrams={kitchen.setGrams}
        onSetRole={kitchen.setRole}
        onRemove={kitchen.removeLine}
        renderFoodSearch={renderFoodSearch}
        foodHref={foodHref}
        addFoodHref={addFoodHref}
      />

      {analysis && <DishPanels analysis={analysis} unitSystem={unitSystem} />}
    </section>
  );
}
