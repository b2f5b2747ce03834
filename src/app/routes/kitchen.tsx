import { useState } from 'react';
import { Button } from '../../components/ui/button';
import { Card } from '../../components/ui/card';
import { Page } from '../../components/ui/page';
import { AnalysisSection } from '../../features/analysis/components/analysis-section';
import { RecipeInputForm } from '../../features/analysis/components/recipe-input-form';
import { CurrentAnalysisContext } from '../../features/analysis/current-analysis';
import { useKitchen } from '../../features/analysis/use-kitchen';
import { AddFoodLineForm } from '../../features/foods/components/add-food-line-form';
import { FoodCombobox } from '../../features/foods/components/food-combobox';
import { unitSystemOf } from '../../lib/user';
import { useAuth } from '../auth-context';

export function KitchenPage() {
  const { user } = useAuth();
  const unitSystem = unitSystemOf(user);
  const kitchen = useKitchen();
  const hasLines = kitchen.lines.length > 0;
  // A new recipe empties the paste box too.
  const [round, setRound] = useState(0);

  return (
    <Page
      title="Kitchen"
      description="Paste a recipe you love. Hearthswap reads every ingredient line, weighs it in grams, and works out calories, protein, carbs, fat, fiber, sugar and sodium per serving. Then it looks for lighter foods that play the same part in the dish, so the plate stays just as full."
      actions={
        hasLines && (
          <Button variant="secondary" size="sm" onClick={() => {
              kitchen.clear();
              setRound((n) => n + 1);
            }}
          >
            Start a new recipe
          </Button>
        )
      }
    >
      <div className="grid items-start gap-6 lg:grid-cols-[minmax(0,3fr)_minmax(0,2fr)]">
        <Card
          title="Paste a recipe"
          description={hasLines ? 'Analysing pasted text replaces the lines below.' : 'Sign-in is not needed to try it.'}
        >
          <RecipeInputForm
            key={round}
            onSubmit={(text, servings) => kitchen.analyseText(text, servings)}
            submitting={kitchen.analysingText}
            defaultText={kitchen.pastedText}
            defaultServings={kitchen.servings}
          />
        </Card>
        <Card
          title="Or build it line by line"
          description="Add a food from the catalogue by its weight or a household measure; the line keeps exactly that food and weight."
        >
          <AddFoodLineForm unitSystem={unitSystem} onAdd={({ input, foodId, grams }) => kitchen.addLine({ input, foodId, grams })} />
        </Card>
      </div>

      <AnalysisSection
        kitchen={kitchen}
        unitSystem={unitSystem}
        foodHref={(id) => `/foods/${id}`}
        renderFoodSearch={({ label, onChoose, onClose }) => (
          <div className="flex flex-col gap-1">
            <FoodCombobox label={label} labelHidden autoFocus onChoose={onChoose} onCancel={onClose} />
            <Button variant="quiet" size="sm" onClick={onClose} className="self-start">
              Keep the current food
            </Button>
          </div>
        )}
      />

      <CurrentAnalysisContext.Provider value={kitchen.current}>
        {/* ───────────────────────────── Rewrite slot ─────────────────────────────
            The rewrite panel goes here. `kitchen.current` (also useCurrentAnalysis() inside this
            provider) is { lines, servings, analysis, updating } or null: the request lines with the
            cook's pins, the servings, and the server's answer to exactly those (see
            src/features/analysis/current-analysis.tsx). Pass it to the panel as props.
            ─────────────────────────────────────────────────────────────────────── */}
        {/* ─────────────────────────── end of rewrite slot ─────────────────────────── */}
      </CurrentAnalysisContext.Provider>
    </Page>
  );
}
