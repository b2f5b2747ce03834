import { useEffect, useState } from 'react';
import { Link, useParams, useSearchParams } from 'react-router';
import { Alert } from '../../components/ui/alert';
import { Button, buttonClasses } from '../../components/ui/button';
import { ErrorState } from '../../components/ui/error-state';
import { Page } from '../../components/ui/page';
import { PrintSheetStyle, usePrintPart } from '../../components/ui/print-sheet';
import { LoadingState } from '../../components/ui/spinner';
import type { PrepResponse as Prep } from '../../../shared/schemas/prep';
import { usePrep } from '../../features/prep/api/get-prep';
import { useVersionServings } from '../../features/prep/api/get-version-servings';
import { PortionsControl } from '../../features/prep/components/portions-control';
import { PrepRecipeCard } from '../../features/prep/components/prep-recipe-card';
import { PrepSheet } from '../../features/prep/components/prep-sheet';
import { portionsParam, portionsWord, positiveInt, startingPortions, versionLine } from '../../features/prep/prep-words';
import { isApiError } from '../../lib/api-client';
import { useAuth } from '../auth-context';

function portionsMessage(error: unknown): string | undefined {
  if (!isApiError(error) || error.status !== 400) return undefined;
  return error.fieldErrors.portions ?? error.message;
}

function NotFound() {
  return (
    <Page width="narrow" title="This version isn't here" description="The recipe or the version may have been deleted, or the address is mistyped.">
      <div>
        <Link to="/recipes" className={buttonClasses({ variant: 'secondary' })}>
          Open the recipe book
        </Link>
      </div>
    </Page>
  );
}

/** The last prep that loaded for this version, kept on screen while another batch size loads or fails. */
function useShownPrep(data: Prep | undefined, id: number | null, number: number | null): Prep | null {
  const [kept, setKept] = useState<Prep | null>(null);
  if (data && data !== kept) setKept(data);
  if (data) return data;
  return kept && kept.recipe.id === id && kept.version.number === number ? kept : null;
}

export function PrepPage() {
  const params = useParams();
  const [search, setSearch] = useSearchParams();
  const { user } = useAuth();
  const id = positiveInt(params.id);
  const number = positiveInt(params.number);
  const asked = portionsParam(search.get('portions'));
  const view = search.get('view') === 'card' ? 'card' : 'sheet';
  const { print, wrapperProps, partProps } = usePrintPart<'shopping'>();

  // With no batch size in the address, start from the servings the version was written for.
  const servings = useVersionServings(id, number, asked === null);
  useEffect(() => {
    if (asked !== null || !servings.isSuccess) return;
    setSearch(
      (prev) => {
        const next = new URLSearchParams(prev);
        next.set('portions', String(startingPortions(servings.data)));
        return next;
      },
      { replace: true },
    );
  }, [asked, servings.isSuccess, servings.data, setSearch]);

  const prep = usePrep(id, number, asked);
  const shown = useShownPrep(prep.data, id, number);

  const setPortions = (portions: number) =>
    setSearch(
      (prev) => {
        const next = new URLSearchParams(prev);
        next.set('portions', String(portions));
        return next;
      },
      { replace: true },
    );
  const viewHref = (to: 'sheet' | 'card') => {
    const next = new URLSearchParams(search);
    if (to === 'card') next.set('view', 'card');
    else next.delete('view');
    return `?${next}`;
  };

  const notFound = (e: unknown) => isApiError(e) && e.status === 404;
  if (id === null || number === null || notFound(prep.error) || (asked === null && notFound(servings.error))) return <NotFound />;

  const portionsError = portionsMessage(prep.error);
  const control = (
    <>
      <PortionsControl
        portions={asked ?? startingPortions(shown?.version.servings)}
        onChange={setPortions}
        servings={shown?.version.servings ?? servings.data ?? null}
        error={portionsError}
        busy={prep.isFetching && shown !== null}
      />
      {portionsError && shown && <p className="mt-2 text-sm text-ink-soft">Still showing the last batch that worked out: {portionsWord(shown.portions)}.</p>}
    </>
  );

  let body;
  if (shown === null) {
    if (prep.isError && !portionsError) {
      body = <ErrorState title="The batch didn't load" error={prep.error} onRetry={() => void prep.refetch()} retrying={prep.isFetching} />;
    } else if (asked === null && servings.isError) {
      body = <ErrorState title="The recipe didn't load" error={servings.error} onRetry={() => void servings.refetch()} retrying={servings.isFetching} />;
    } else if (portionsError) {
      body = <div className="rounded-card border border-line bg-surface p-4 shadow-card sm:p-5">{control}</div>;
    } else {
      body = <LoadingState label="Scaling the batch…" className="justify-center py-16" />;
    }
  }

  const backToRecipe =
    user?.role === 'cook' && shown ? (
      <Link to={`/recipes/${shown.recipe.id}?version=${shown.version.number}`} className={buttonClasses({ variant: 'quiet', size: 'sm' })}>
        ← Back to the recipe
      </Link>
    ) : null;

  if (shown && view === 'card') {
    return (
      <div {...wrapperProps} className="flex flex-col gap-6">
        <title>{`${shown.recipe.title} · Batch card · Hearthswap`}</title>
        <PrintSheetStyle />
        <div className="mx-auto flex w-full max-w-3xl flex-col gap-4 print:hidden">
          <div className="flex flex-wrap items-center justify-between gap-2">
            <Link to={viewHref('sheet')} className={buttonClasses({ variant: 'secondary', size: 'sm' })}>
              ← Back to the prep sheet
            </Link>
            <Button onClick={() => print()}>Print this card</Button>
          </div>
          <div className="rounded-card border border-line bg-surface p-4 shadow-card">{control}</div>
        </div>
        <PrepRecipeCard prep={shown} />
      </div>
    );
  }

  return (
    <div {...wrapperProps}>
      <PrintSheetStyle />
      <Page
        title={shown ? shown.recipe.title : 'Batch prep'}
        description={shown ? `Batch prep · ${versionLine(shown.version)}` : 'Scale a saved version into a batch.'}
        actions={
          shown && (
            <div className="flex flex-wrap gap-2 print:hidden">
              {backToRecipe}
              <Link to={viewHref('card')} className={buttonClasses({ variant: 'secondary', size: 'sm' })}>
                Recipe card
              </Link>
              <Button variant="secondary" size="sm" onClick={() => print()}>
                Print this page
              </Button>
            </div>
          )
        }
      >
        {body}
        {shown && prep.isError && !portionsError && (
          <Alert
            tone="caution"
            title="The new batch size didn't load"
            className="print:hidden"
            action={
              <Button variant="secondary" size="sm" onClick={() => void prep.refetch()} loading={prep.isFetching}>
                Try again
              </Button>
            }
          >
            Still showing {portionsWord(shown.portions)}.
          </Alert>
        )}
        {shown && (
          <PrepSheet
            prep={shown}
            portionsControl={control}
            onPrintShopping={() => print('shopping')}
            shoppingPartProps={partProps('shopping')}
            shoppingExtraAction={
              user?.role === 'cook' ? (
                <Link
                  to={`/shopping?add=${shown.recipe.id}.${shown.version.number}.${shown.portions}`}
                  className={buttonClasses({ variant: 'quiet', size: 'sm' })}
                >
                  Shop for several recipes
                </Link>
              ) : undefined
            }
          />
        )}
      </Page>
    </div>
  );
}
