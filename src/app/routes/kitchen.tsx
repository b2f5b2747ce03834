import { useMemo, useRef, useState } from 'react';
import { useLocation, useNavigate } from 'react-router';
import { Button } from '../../components/ui/button';
import { Card } from '../../components/ui/card';
import { Page } from '../../components/ui/page';
import { AnalysisSection } from '../../features/analysis/components/analysis-section';
import { RecipeInputForm } from '../../features/analysis/components/recipe-input-form';
import { CurrentAnalysisContext } from '../../features/analysis/current-analysis';
import { useKitchen } from '../../features/analysis/use-kitchen';
import { AddFoodLineForm } from '../../features/foods/components/add-food-line-form';
import { FoodCombobox } from '../../features/foods/components/food-combobox';
import { useCreateRecipe } from '../../features/recipes/api/create-recipe';
import { useSaveVersion } from '../../features/recipes/api/save-version';
import { RewritePanel, type RewriteRecipe } from '../../features/rewrite/components/rewrite-panel';
import type { RewriteSaveAction } from '../../features/rewrite/components/save-rewrite';
import type { RewriteDraft } from '../../features/rewrite/save-draft';
import { signInPathFor } from '../../lib/safe-redirect';
import type { UnitSystem } from '../../lib/user';
import { hasRole, PAGE_ROLES } from '../access';
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
        addFoodHref="/foods"
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
        <KitchenRewrite recipe={kitchen.current} unitSystem={unitSystem} />
        {/* ─────────────────────────── end of rewrite slot ─────────────────────────── */}
      </CurrentAnalysisContext.Provider>
    </Page>
  );
}

/**
 * The rewrite panel with saving wired to the recipe book: the recipe as written becomes version 1,
 * the rewrite version 2, then the recipe opens. Signed out, the panel asks to sign in first (the
 * Kitchen and the panel keep their state in sessionStorage, so the rewrite is still there after).
 */
function KitchenRewrite({ recipe, unitSystem }: { recipe: RewriteRecipe | null; unitSystem: UnitSystem }) {
  const auth = useAuth();
  const location = useLocation();
  const navigate = useNavigate();
  const { mutateAsync: createRecipe } = useCreateRecipe();
  const { mutateAsync: saveVersion } = useSaveVersion();
  // A recipe created for a draft whose version then failed: a retry adds the version to it, not a second recipe.
  const created = useRef<{ draft: string; id: number } | null>(null);

  const saveAction = useMemo((): RewriteSaveAction => {
    if (auth.status === 'checking') return { kind: 'unavailable', reason: 'Checking your sign-in…' };
    if (auth.status !== 'signed-in' || !auth.user) {
      const signInHref = signInPathFor(location);
      return { kind: 'sign-in', signInHref, signUpHref: signInHref.replace('/sign-in', '/sign-up') };
    }
    if (!hasRole(auth.user, PAGE_ROLES.recipeBook)) {
      return { kind: 'unavailable', reason: 'The recipe book is for home cook accounts; this rewrite stays on this page.' };
    }
    return {
      kind: 'save',
      save: async (draft: RewriteDraft) => {
        const key = JSON.stringify([draft.title, draft.servings, draft.originalLines]);
        let id = created.current?.draft === key ? created.current.id : null;
        if (id === null) {
          const recipe = await createRecipe({ title: draft.title, servings: draft.servings, lines: draft.originalLines });
          id = recipe.id;
          created.current = { draft: key, id };
        }
        await saveVersion({ recipeId: id, kind: 'rewrite', lines: draft.rewrittenLines, servings: draft.servings, targets: draft.targets, note: draft.note });
        created.current = null;
        navigate(`/recipes/${id}`);
      },
    };
  }, [auth.status, auth.user, location, createRecipe, saveVersion, navigate]);

  return (
    <RewritePanel
      recipe={recipe}
      unitSystem={unitSystem}
      signedIn={auth.status === 'signed-in'}
      saveAction={saveAction}
      renderFoodSearch={({ label, onChoose, onClose }) => (
        <div className="flex flex-col gap-1">
          <FoodCombobox label={label} autoFocus onChoose={onChoose} onCancel={onClose} />
          <Button variant="quiet" size="sm" onClick={onClose} className="self-start">
            Never mind
          </Button>
        </div>
      )}
    />
  );
}
