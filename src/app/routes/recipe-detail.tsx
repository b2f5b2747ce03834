import { useEffect, useRef } from 'react';
import { Link, useLocation, useNavigate, useParams, useSearchParams } from 'react-router';
import type { RecipeDetail } from '../../../shared/schemas/recipes';
import { Alert } from '../../components/ui/alert';
import { Button, buttonClasses } from '../../components/ui/button';
import { CountBadge, unreadCommentsLabel } from '../../components/ui/count-badge';
import { Card } from '../../components/ui/card';
import { EmptyState } from '../../components/ui/empty-state';
import { ErrorState } from '../../components/ui/error-state';
import { Page } from '../../components/ui/page';
import { LoadingState } from '../../components/ui/spinner';
import { useToast } from '../../components/ui/toast';
import { useDeleteRecipe } from '../../features/recipes/api/delete-recipe';
import { useDuplicateRecipe } from '../../features/recipes/api/duplicate-recipe';
import { useRecipe } from '../../features/recipes/api/get-recipe';
import { useRestoreVersion } from '../../features/recipes/api/restore-version';
import { isRevisionConflict } from '../../features/recipes/api/update-recipe';
import { ComparePicker } from '../../features/recipes/components/compare-picker';
import { RecipeActions } from '../../features/recipes/components/recipe-actions';
import { RecipeDetailsCard } from '../../features/recipes/components/recipe-details-card';
import { RecipeNotFound } from '../../features/recipes/components/recipe-not-found';
import { RecipeFigures } from '../../features/recipes/components/recipe-figures';
import { RecipePhotoCard } from '../../features/recipes/components/recipe-photo-card';
import { VersionLinesCard } from '../../features/recipes/components/version-lines-card';
import { VersionTimeline } from '../../features/recipes/components/version-timeline';
import type { DeletedRecipeState } from '../../features/recipes/deleted-recipe-state';
import { formatWhen } from '../../lib/dates';
import { positiveInt, recipePath } from '../../features/recipes/recipe-links';
import { errorMessage, isApiError } from '../../lib/api-client';
import { useUnreadComments } from '../../features/clients/api/version-comments';
import { CommentThread } from '../../features/clients/components/comment-thread';
import { useAuth } from '../auth-context';
import { countOf } from '../../lib/words';

const backToBook = (
  <Link to="/recipes" className={buttonClasses({ variant: 'secondary', size: 'sm' })}>
    ← Recipe book
  </Link>
);

function RecipeView({ recipe, onReload }: { recipe: RecipeDetail; onReload: () => Promise<RecipeDetail | undefined> }) {
  const [params, setParams] = useSearchParams();
  const navigate = useNavigate();
  const toast = useToast();
  const duplicate = useDuplicateRecipe();
  const remove = useDeleteRecipe();
  const restore = useRestoreVersion();
  const { user } = useAuth();

  const newest = recipe.versions.at(-1) ?? null;
  const asked = positiveInt(params.get('version'));
  const selected = recipe.versions.find((v) => v.number === asked) ?? newest;

  const linesRef = useRef<HTMLDivElement>(null);
  const commentsRef = useRef<HTMLDivElement>(null);
  const { hash } = useLocation();
  // this page is the cook's own book (PAGE_ROLES.recipeBook); a coach reviews on the client pages
  const ownRecipe = user?.role === 'cook';
  const unread = useUnreadComments(ownRecipe);
  const unreadHere = unread.data?.recipes.find((r) => r.recipeId === recipe.id) ?? null;
  const unreadElsewhere = unreadHere?.versions.find((v) => v.number !== selected?.number) ?? null;
  const showComments = Boolean(selected && user && (user.coachId != null || (unreadHere?.unread ?? 0) > 0));

  // The comment e-mail links to #comments: the thread mounts after the recipe loads, so go there then.
  useEffect(() => {
    if (hash === '#comments' && showComments) commentsRef.current?.scrollIntoView({ block: 'start' });
  }, [hash, showComments]);

  function select(number: number) {
    setParams(number === newest?.number ? {} : { version: String(number) }, { replace: true, preventScrollReset: true });
    // In one column the lines sit below the timeline, out of sight: bring them up.
    const lines = linesRef.current;
    if (lines && lines.getBoundingClientRect().top > window.innerHeight * 0.6) {
      requestAnimationFrame(() => lines.scrollIntoView({ block: 'start', behavior: 'smooth' }));
    }
  }

  function onDelete() {
    remove.mutate(
      { id: recipe.id, revision: recipe.revision },
      {
        onSuccess: () => {
          const state: DeletedRecipeState = { deletedRecipe: { id: recipe.id, title: recipe.title } };
          navigate('/recipes', { state });
        },
        onError: (error) =>
          toast.show(
            isRevisionConflict(error) ? 'This recipe changed elsewhere — reload before deleting it.' : `Not deleted: ${errorMessage(error)}`,
            'danger',
          ),
      },
    );
  }

  function onDuplicate() {
    duplicate.mutate(recipe.id, {
      onSuccess: (copy) => {
        toast.show(`Copied as “${copy.title}”.`, 'success');
        navigate(recipePath(copy.id));
      },
      onError: (error) => toast.show(`Not copied: ${errorMessage(error)}`, 'danger'),
    });
  }

  function onRestore(number: number) {
    restore.mutate(
      { recipeId: recipe.id, number },
      {
        onSuccess: (version) => {
          toast.show(`Version ${number} restored as version ${version.number}, the newest.`, 'success');
          setParams({}, { replace: true, preventScrollReset: true });
        },
        onError: (error) => toast.show(`Not restored: ${errorMessage(error)}`, 'danger'),
      },
    );
  }

  const versionCount = recipe.versions.length;
  return (
    <Page
      title={recipe.title}
      description={
        <>
          {countOf(versionCount, 'version')} saved · changed {formatWhen(recipe.updatedAt).toLowerCase()}
        </>
      }
      actions={
        <RecipeActions
          recipe={recipe}
          version={selected?.number ?? null}
          onDuplicate={onDuplicate}
          duplicating={duplicate.isPending}
          onDelete={onDelete}
          deleting={remove.isPending}
        />
      }
    >
      <div className="-mt-4 flex flex-wrap items-center gap-3">
        {backToBook}
        {unreadHere && <CountBadge count={unreadHere.unread} label={unreadCommentsLabel(unreadHere.unread)} className="text-sm" />}
      </div>
      {unreadElsewhere && (
        <Alert
          tone="info"
          title={`New from your coach on version ${unreadElsewhere.number}`}
          announce={false}
          action={
            <Button
              variant="secondary"
              size="sm"
              onClick={() => {
                select(unreadElsewhere.number);
                requestAnimationFrame(() => commentsRef.current?.scrollIntoView({ block: 'start', behavior: 'smooth' }));
              }}
            >
              Read {unreadElsewhere.unread === 1 ? 'it' : 'them'}
            </Button>
          }
        >
          {unreadElsewhere.unread === 1 ? 'A comment' : `${unreadElsewhere.unread} comments`} you haven't read yet.
        </Alert>
      )}
      <RecipeFigures version={newest} servings={recipe.servings} versionCount={versionCount} />
      {/* The timeline comes before the lines it picks, in reading order and in focus order. */}
      <div className="grid grid-cols-[minmax(0,1fr)] items-start gap-6 lg:grid-cols-[minmax(0,2fr)_minmax(0,3fr)]">
        <div className="flex min-w-0 flex-col gap-6">
          <RecipePhotoCard recipe={recipe} />
          <Card title="Versions" description="Newest first. Restoring copies an older version forward; nothing is lost.">
            <div className="flex flex-col gap-6">
              <VersionTimeline
                versions={recipe.versions}
                selected={selected?.number ?? null}
                onSelect={select}
                onRestore={onRestore}
                restoring={restore.isPending ? (restore.variables?.number ?? null) : null}
              />
              <section aria-labelledby="compare-heading" className="flex flex-col gap-3 border-t border-line pt-5">
                <h3 id="compare-heading" className="font-extrabold text-ink">
                  Compare two versions
                </h3>
                <ComparePicker key={versionCount} recipeId={recipe.id} versions={recipe.versions} />
              </section>
            </div>
          </Card>
        </div>
        <div ref={linesRef} className="flex min-w-0 scroll-mt-24 flex-col gap-6">
          {selected ? (
            <VersionLinesCard recipeId={recipe.id} version={selected} />
          ) : (
            <EmptyState title="No versions yet">This recipe has no saved ingredients.</EmptyState>
          )}
          {selected && user && showComments && (
            <div ref={commentsRef} id="comments" className="scroll-mt-24">
              <Card
                title={`Notes with your coach on version ${selected.number}`}
                description="Your coach reviews the versions you save and can leave a comment here."
              >
                <CommentThread recipeId={recipe.id} number={selected.number} viewerId={user.id} otherName="your coach" ownerView={ownRecipe} />
              </Card>
            </div>
          )}
          <RecipeDetailsCard recipe={recipe} onReload={onReload} />
        </div>
      </div>
    </Page>
  );
}

export function RecipeDetailPage() {
  const { id: idParam } = useParams();
  const id = positiveInt(idParam);
  const recipe = useRecipe(id);

  if (id === null || (recipe.isError && isApiError(recipe.error) && recipe.error.status === 404)) return <RecipeNotFound />;
  if (recipe.isPending) {
    return (
      <Page title="Recipe" actions={backToBook}>
        <LoadingState label="Opening the recipe…" />
      </Page>
    );
  }
  if (recipe.isError && !recipe.data) {
    return (
      <Page title="Recipe" actions={backToBook}>
        <ErrorState title="This recipe didn't load" error={recipe.error} onRetry={() => void recipe.refetch()} retrying={recipe.isFetching} />
      </Page>
    );
  }
  // Keyed by id: going from a recipe to its copy starts the page afresh (no half-done edit carried over).
  const reload = async () => {
    const fresh = await recipe.refetch();
    if (fresh.isError) throw fresh.error;
    return fresh.data;
  };
  return <RecipeView key={recipe.data.id} recipe={recipe.data} onReload={reload} />;
}
