import { useEffect, useMemo, useRef, useState } from 'react';
import { Link, useLocation, useNavigate, useSearchParams } from 'react-router';
import type { LineInput } from '../../../shared/schemas/analyze';
import type { VersionDetail } from '../../../shared/schemas/recipes';
import { Alert } from '../../components/ui/alert';
import { Button, buttonClasses } from '../../components/ui/button';
import { ErrorState } from '../../components/ui/error-state';
import { LoadingState } from '../../components/ui/spinner';
import { Card } from '../../components/ui/card';
import { Page } from '../../components/ui/page';
import { AnalysisSection } from '../../features/analysis/components/analysis-section';
import { RecipeInputForm } from '../../features/analysis/components/recipe-input-form';
import { CurrentAnalysisContext } from '../../features/analysis/current-analysis';
import { lineInputs } from '../../features/analysis/kitchen-lines';
import { useKitchen, type Kitchen } from '../../features/analysis/use-kitchen';
import { AddFoodLineForm } from '../../features/foods/components/add-food-line-form';
import { FoodCombobox } from '../../features/foods/components/food-combobox';
import { useCreateRecipe } from '../../features/recipes/api/create-recipe';
import { useRecipe } from '../../features/recipes/api/get-recipe';
import { useRecipeVersion } from '../../features/recipes/api/get-version';
import { useSaveVersion } from '../../features/recipes/api/save-version';
import { positiveInt, recipePath } from '../../features/recipes/recipe-links';
import { LazyRewritePanel } from '../../features/rewrite/components/lazy-rewrite-panel';
import type { RewriteRecipe } from '../../features/rewrite/components/rewrite-panel';
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
  const opening = useOpenFromBook(kitchen, () => setRound((n) => n + 1));
  const [search] = useSearchParams();

  return (
    <Page
      title="Kitchen"
      description="Paste a recipe you love. Hearthswap reads every ingredient line, weighs it in grams, and works out calories, protein, carbs, fat, fiber, sugar and sodium per serving. Then it looks for lighter foods that play the same part in the dish, so the plate stays just as full."
      actions={
        hasLines && (
          <Button
            variant="secondary"
            size="sm"
            onClick={() => {
              kitchen.clear();
              setRound((n) => n + 1);
            }}
          >
            Start a new recipe
          </Button>
        )
      }
    >
      {search.get('account') === 'deleted' && <Alert tone="success">Your account is deleted, with its recipes, foods and sign-ins.</Alert>}
      {opening}
      {kitchen.source && <EditingSavedRecipe kitchen={kitchen} />}
      <div className="grid items-start gap-6 lg:grid-cols-[minmax(0,3fr)_minmax(0,2fr)]">
        <Card
          title="Paste a recipe"
          description={
            hasLines ? 'Analysing pasted text replaces the lines below.' : user ? undefined : 'No account needed to try it; sign in to keep what you make.'
          }
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
        <KitchenRewrite recipe={kitchen.current} unitSystem={unitSystem} kitchen={kitchen} />
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
function KitchenRewrite({ recipe, unitSystem, kitchen }: { recipe: RewriteRecipe | null; unitSystem: UnitSystem; kitchen: Kitchen }) {
  const auth = useAuth();
  const location = useLocation();
  const navigate = useNavigate();
  const { mutateAsync: createRecipe } = useCreateRecipe();
  const { mutateAsync: saveVersion } = useSaveVersion();
  // A recipe created for a draft whose version then failed: a retry adds the version to it, not a second recipe.
  const created = useRef<{ draft: string; id: number } | null>(null);
  const { source, setSource } = kitchen;
  const suggestedTitle = kitchen.textReading?.title ?? undefined;
  const pastedMethod = kitchen.textReading?.method.join('\n') || undefined;
  const editedSinceOpened = source !== null && JSON.stringify(lineInputs(kitchen.lines)) !== source.openedLines;

  const saveAction = useMemo((): RewriteSaveAction => {
    if (auth.status === 'checking') return { kind: 'unavailable', reason: 'Checking your sign-in…' };
    if (auth.status !== 'signed-in' || !auth.user) {
      const signInHref = signInPathFor(location);
      return { kind: 'sign-in', signInHref, signUpHref: signInHref.replace('/sign-in', '/sign-up') };
    }
    if (!hasRole(auth.user, PAGE_ROLES.recipeBook)) {
      return { kind: 'unavailable', reason: 'The recipe book is for home cook accounts; this rewrite stays on this page.' };
    }
    if (source) {
      return {
        kind: 'save',
        into: { title: source.title, nextNumber: source.latestNumber + (editedSinceOpened ? 2 : 1) },
        save: async (draft: RewriteDraft) => {
          // Lines the cook changed first become a version of their own, so the rewrite is compared with them.
          let parent = source.versionNumber;
          if (editedSinceOpened) {
            parent = (
              await saveVersion({
                recipeId: source.recipeId,
                kind: 'edit',
                lines: draft.originalLines,
                servings: draft.servings,
                parentNumber: source.versionNumber,
                note: `Edited in the Kitchen from version ${source.versionNumber}.`,
              })
            ).number;
          }
          const saved = await saveVersion({
            recipeId: source.recipeId,
            kind: 'rewrite',
            lines: draft.rewrittenLines,
            servings: draft.servings,
            targets: draft.targets,
            note: draft.note,
            parentNumber: parent,
          });
          setSource(null);
          navigate(recipePath(source.recipeId, saved.number));
        },
      };
    }
    return {
      kind: 'save',
      suggestedTitle,
      save: async (draft: RewriteDraft) => {
        const key = JSON.stringify([draft.title, draft.servings, draft.originalLines]);
        let id = created.current?.draft === key ? created.current.id : null;
        if (id === null) {
          const recipe = await createRecipe({ title: draft.title, servings: draft.servings, lines: draft.originalLines, method: pastedMethod });
          id = recipe.id;
          created.current = { draft: key, id };
        }
        await saveVersion({ recipeId: id, kind: 'rewrite', lines: draft.rewrittenLines, servings: draft.servings, targets: draft.targets, note: draft.note });
        created.current = null;
        navigate(`/recipes/${id}`);
      },
    };
  }, [auth.status, auth.user, location, createRecipe, saveVersion, navigate, source, editedSinceOpened, setSource, suggestedTitle, pastedMethod]);

  return (
    <LazyRewritePanel
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

/** A stored line as the Kitchen takes it: its food and grams pinned, so the numbers are the saved ones. */
function kitchenLineOf(line: VersionDetail['lines'][number]): LineInput {
  if (line.foodId == null) return { input: line.input };
  return { input: line.input, foodId: line.foodId, ...(line.grams > 0 && { grams: line.grams }) };
}

/**
 * `/?recipe=ID&version=N` (the recipe page's "Edit in the Kitchen"): that version's lines replace the
 * Kitchen's, and the address goes back to plain `/` so a reload keeps the cook's edits.
 */
function useOpenFromBook(kitchen: Kitchen, onOpened: () => void) {
  const [params, setParams] = useSearchParams();
  const recipeId = positiveInt(params.get('recipe'));
  const number = positiveInt(params.get('version'));
  const recipe = useRecipe(recipeId);
  const version = useRecipeVersion(recipeId, number);
  const { openVersion } = kitchen;
  const opened = useRef<string | null>(null);
  useEffect(() => {
    if (recipeId === null || number === null || !recipe.data || !version.data) return;
    const key = `${recipeId}/${number}`;
    if (opened.current === key) return;
    opened.current = key;
    const lines = version.data.lines.map(kitchenLineOf);
    openVersion(lines, version.data.servings, {
      recipeId,
      title: recipe.data.title,
      versionNumber: number,
      latestNumber: recipe.data.latest?.number ?? number,
      openedLines: JSON.stringify(lines),
    });
    onOpened();
    setParams({}, { replace: true });
  }, [recipeId, number, recipe.data, version.data, openVersion, onOpened, setParams]);

  if (recipeId === null || number === null) return null;
  const error = recipe.error ?? version.error;
  if (error)
    return <ErrorState title="That saved version didn't open" error={error} onRetry={() => void (recipe.isError ? recipe.refetch() : version.refetch())} />;
  return <LoadingState label="Bringing the saved version to the Kitchen…" />;
}

/** The Kitchen holds a saved recipe: say which, and save the lines as they are now as its next version. */
function EditingSavedRecipe({ kitchen }: { kitchen: Kitchen }) {
  const source = kitchen.source!;
  const navigate = useNavigate();
  const { mutateAsync: saveVersion, isPending, error } = useSaveVersion();
  const lines = lineInputs(kitchen.lines);
  const edited = JSON.stringify(lines) !== source.openedLines;
  const save = async () => {
    const saved = await saveVersion({
      recipeId: source.recipeId,
      kind: 'edit',
      lines,
      servings: kitchen.servings,
      parentNumber: source.versionNumber,
      note: `Edited in the Kitchen from version ${source.versionNumber}.`,
    });
    kitchen.setSource(null);
    navigate(recipePath(source.recipeId, saved.number));
  };
  return (
    <Alert
      tone="info"
      title={`Editing “${source.title}”, from version ${source.versionNumber}`}
      announce={false}
      action={
        <div className="flex flex-wrap gap-2">
          <Button
            size="sm"
            onClick={() => void save().catch(() => undefined)}
            loading={isPending}
            loadingLabel="Saving…"
            disabled={!edited || lines.length === 0}
          >
            Save my changes as version {source.latestNumber + 1}
          </Button>
          <Link to={recipePath(source.recipeId, source.versionNumber)} className={buttonClasses({ variant: 'secondary', size: 'sm' })}>
            Back to the recipe
          </Link>
        </div>
      }
    >
      {edited
        ? 'Your changes stay here until you save them as a new version; the versions already saved don’t change. Or rewrite it below and save the lighter version.'
        : 'Change a food, a weight or a line below, or rewrite it, then save it as a new version. The versions already saved don’t change.'}
      {error != null && <span className="mt-1 block font-semibold text-beet-700">Not saved: {error instanceof Error ? error.message : 'try again.'}</span>}
    </Alert>
  );
}
