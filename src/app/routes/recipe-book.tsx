import { useEffect, useEffectEvent, useMemo, useRef, useState } from 'react';
import { Link, useLocation, useNavigate, useSearchParams } from 'react-router';
import { ActionToast } from '../../components/ui/action-toast';
import { Button, buttonClasses } from '../../components/ui/button';
import { EmptyState } from '../../components/ui/empty-state';
import { ErrorState } from '../../components/ui/error-state';
import { Page } from '../../components/ui/page';
import { LoadingState } from '../../components/ui/spinner';
import { useToast } from '../../components/ui/toast';
import { isRecipeSort, useRecipes, type RecipeSort } from '../../features/recipes/api/list-recipes';
import { useUndeleteRecipe } from '../../features/recipes/api/undelete-recipe';
import { LazyImportRecipeDialog } from '../../features/recipes/components/lazy-import-recipe-dialog';
import { RecipeList } from '../../features/recipes/components/recipe-list';
import { RecipeListControls } from '../../features/recipes/components/recipe-list-controls';
import { recipePath } from '../../features/recipes/recipe-links';
import { useDebounce } from 'use-debounce';
import { deletedRecipeFrom } from '../../features/recipes/deleted-recipe-state';
import { errorMessage } from '../../lib/api-client';
import { useUnreadComments } from '../../features/clients/api/version-comments';
import { countOf } from '../../lib/words';

function UndoDelete() {
  const location = useLocation();
  const navigate = useNavigate();
  const toast = useToast();
  const undelete = useUndeleteRecipe();
  const deleted = deletedRecipeFrom(location.state);
  if (!deleted) return null;

  // Forget the deletion in history, so going back and forth doesn't offer the undo again.
  const forget = () => navigate(`${location.pathname}${location.search}`, { replace: true, state: null });

  return (
    <ActionToast
      message={<>“{deleted.title}” was deleted.</>}
      actionLabel="Undo"
      busy={undelete.isPending}
      onDismiss={forget}
      onAction={() =>
        undelete.mutate(deleted.id, {
          onSuccess: (recipe) => {
            toast.show(`“${recipe.title}” is back in the book.`, 'success');
            navigate(recipePath(recipe.id), { replace: true });
          },
          onError: (error) => {
            toast.show(`Couldn't bring it back: ${errorMessage(error)}`, 'danger');
            forget();
          },
        })
      }
    />
  );
}

export function RecipeBookPage() {
  const [params, setParams] = useSearchParams();
  const location = useLocation();
  const navigate = useNavigate();
  const toast = useToast();
  const [importing, setImporting] = useState(false);
  // the dialog's code loads at the first opening and stays, so closing it is the dialog's own
  const [importOpened, setImportOpened] = useState(false);
  const openImport = () => {
    setImportOpened(true);
    setImporting(true);
  };
  const [typed, setTyped] = useState(params.get('q') ?? '');
  const sortParam = params.get('sort');
  const sort: RecipeSort = isRecipeSort(sortParam) ? sortParam : 'updated';
  const [q] = useDebounce(typed.trim(), 250);
  const recipes = useRecipes(q, sort);
  const unread = useUnreadComments(true);
  const unreadByRecipe = useMemo(() => new Map(unread.data?.recipes.map((r) => [r.recipeId, r.unread])), [unread.data]);

  // The address can change under the page (the "Recipe book" link, back and forward): follow it.
  const urlQ = params.get('q') ?? '';
  const urlQuery = useRef(urlQ);
  useEffect(() => {
    if (urlQ === urlQuery.current) return;
    urlQuery.current = urlQ;
    setTyped(urlQ);
  }, [urlQ]);

  function updateParams(next: { q?: string; sort?: RecipeSort }) {
    const merged = new URLSearchParams(params);
    const nextQ = next.q ?? q;
    const nextSort = next.sort ?? sort;
    if (nextQ) merged.set('q', nextQ);
    else merged.delete('q');
    if (nextSort !== 'updated') merged.set('sort', nextSort);
    else merged.delete('sort');
    urlQuery.current = nextQ;
    if (merged.toString() === params.toString()) return;
    // Keep what the history entry carries (the undo offer) while the search changes.
    setParams(merged, { replace: true, preventScrollReset: true, state: location.state });
  }

  // The settled search goes into the address, so a reload or a shared link shows the same list.
  // Only a new settled search writes the address, not every change of the address itself.
  const writeSearch = useEffectEvent((settled: string) => updateParams({ q: settled }));
  useEffect(() => {
    writeSearch(q);
  }, [q]);

  const importButton = (
    <Button onClick={openImport} aria-haspopup="dialog">
      Import a recipe
    </Button>
  );

  const bookIsEmpty = recipes.isSuccess && recipes.data.length === 0 && !q;
  let body;
  if (recipes.isPending) {
    body = <LoadingState label="Opening the recipe book…" />;
  } else if (recipes.isError) {
    body = <ErrorState title="The recipe book didn't load" error={recipes.error} onRetry={() => void recipes.refetch()} retrying={recipes.isFetching} />;
  } else if (recipes.data.length === 0 && !q) {
    body = (
      <EmptyState
        title="No recipes in the book yet"
        action={
          <div className="flex flex-wrap justify-center gap-2">
            <Button onClick={openImport} aria-haspopup="dialog">
              Import a recipe
            </Button>
            <Link to="/" className={buttonClasses({ variant: 'secondary' })}>
              Start in the Kitchen
            </Link>
          </div>
        }
      >
        Bring in a recipe you already cook, from a file or by pasting it, or work one out in the Kitchen and keep the version you like. Each recipe you keep
        lands here with every version you saved.
      </EmptyState>
    );
  } else {
    const count = recipes.data.length;
    body = (
      <div className="flex flex-col gap-4">
        <RecipeListControls query={typed} onQueryChange={setTyped} sort={sort} onSortChange={(next) => updateParams({ sort: next })} />
        <p className="text-sm text-ink-soft" aria-live="polite">
          {q ? `${countOf(count, 'recipe')} with “${q}” in the title.` : `${countOf(count, 'recipe')} in the book.`}
          {recipes.isFetching && !recipes.isPending && <span className="ml-2">Updating…</span>}
        </p>
        {count === 0 ? (
          <EmptyState
            title={`No titles with “${q}”`}
            action={
              <Button variant="secondary" onClick={() => setTyped('')}>
                Show every recipe
              </Button>
            }
          >
            Try a shorter word, or check the spelling.
          </EmptyState>
        ) : (
          <RecipeList recipes={recipes.data} caption="Your recipes, with energy and protein per serving of each one's newest version" unread={unreadByRecipe} />
        )}
      </div>
    );
  }

  return (
    <>
      <UndoDelete />
      <Page
        title="Recipe book"
        description="The recipes you keep, each with the versions you saved along the way: the original as written, the lighter rewrites, and your own edits. Figures are per serving of each recipe's newest version."
        actions={bookIsEmpty ? undefined : importButton}
      >
        {body}
      </Page>
      {importOpened && (
        <LazyImportRecipeDialog
          open={importing}
          onClose={() => setImporting(false)}
          onImported={(recipe) => {
            setImporting(false);
            const count = recipe.importedCount ?? 1;
            if (count > 1) return toast.show(`${count} recipes are in the book, each with every version the file kept.`, 'success');
            toast.show(`“${recipe.title}” is in the book, with its ingredients as version 1.`, 'success');
            navigate(recipePath(recipe.id));
          }}
        />
      )}
    </>
  );
}
