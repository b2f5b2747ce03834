import { useEffect, useMemo, useState } from 'react';
import { Link, useSearchParams } from 'react-router';
import { Alert } from '../../components/ui/alert';
import { Button, buttonClasses } from '../../components/ui/button';
import { Card } from '../../components/ui/card';
import { EmptyState } from '../../components/ui/empty-state';
import { ErrorState } from '../../components/ui/error-state';
import { Page } from '../../components/ui/page';
import { PrintSheetStyle, usePrintPart } from '../../components/ui/print-sheet';
import { LoadingState } from '../../components/ui/spinner';
import { useBuildShoppingList } from '../../features/shopping/api/build-shopping-list';
import { useRecipeChoices } from '../../features/shopping/api/list-recipe-choices';
import { BatchPicker } from '../../features/shopping/components/batch-picker';
import { MergedShoppingList } from '../../features/shopping/components/merged-shopping-list';
import { PickedBatches } from '../../features/shopping/components/picked-batches';
import {
  isValidPortions,
  loadPicks,
  MAX_PICKS,
  parsePickParam,
  picksSignature,
  savePicks,
  withPick,
  type ShoppingPick,
} from '../../features/shopping/shopping-picks';
import { isApiError } from '../../lib/api-client';
import { countOf } from '../../lib/words';

/** Server field messages like "items.2.portions" → { 2: message }. */
function pickErrors(error: unknown): Record<number, string> {
  const out: Record<number, string> = {};
  if (!isApiError(error)) return out;
  for (const [field, message] of Object.entries(error.fieldErrors)) {
    const match = field.match(/^items\.(\d+)\./);
    if (match) out[Number(match[1])] = message;
  }
  return out;
}

export function ShoppingListPage() {
  const [search, setSearch] = useSearchParams();
  const choices = useRecipeChoices();
  const build = useBuildShoppingList();
  const { print, wrapperProps, partProps } = usePrintPart<'list'>();
  const [picks, setPicks] = useState<ShoppingPick[]>(() => {
    const stored = loadPicks();
    const added = parsePickParam(search.get('add'));
    return added ? withPick(stored, added) : stored;
  });

  useEffect(() => savePicks(picks), [picks]);
  // The prep page's "add this batch" link has done its work once the batch is on the list.
  useEffect(() => {
    if (!search.has('add')) return;
    setSearch(
      (prev) => {
        const next = new URLSearchParams(prev);
        next.delete('add');
        return next;
      },
      { replace: true },
    );
  }, [search, setSearch]);

  const withVersions = useMemo(() => (choices.data ?? []).filter((r) => r.versionCount > 0), [choices.data]);
  const titles = useMemo(() => (choices.data ? new Map(choices.data.map((r) => [r.id, r.title])) : null), [choices.data]);
  const allValid = picks.length > 0 && picks.every((p) => isValidPortions(p.portions));
  const builtFor = build.data ? picksSignature(build.data.sources) : null;
  const stale = builtFor !== null && builtFor !== picksSignature(picks);

  const change = (update: (prev: ShoppingPick[]) => ShoppingPick[]) => {
    setPicks(update);
    if (build.isError) build.reset();
  };
  const buildList = () => allValid && build.mutate({ items: picks });

  let picker;
  if (choices.isPending) picker = <LoadingState label="Opening your recipe book…" />;
  else if (choices.isError)
    picker = <ErrorState title="Your recipes didn't load" error={choices.error} onRetry={() => void choices.refetch()} retrying={choices.isFetching} />;
  else if (withVersions.length === 0)
    picker = (
      <EmptyState
        title="No saved versions yet"
        action={
          <Link to="/recipes" className={buttonClasses({ variant: 'primary' })}>
            Open the recipe book
          </Link>
        }
      >
        Save a version of a recipe first; then come back to shop for it.
      </EmptyState>
    );
  else picker = <BatchPicker recipes={withVersions} full={picks.length >= MAX_PICKS} onAdd={(pick) => change((prev) => withPick(prev, pick))} />;

  const buildError = build.isError && Object.keys(pickErrors(build.error)).length === 0;

  return (
    <div {...wrapperProps}>
      <PrintSheetStyle />
      <Page
        title="Shopping list"
        description="Pick saved versions and how many portions of each. Hearthswap adds up what to buy across all of them, food by food."
      >
        <div className="grid items-start gap-8 lg:grid-cols-[minmax(0,5fr)_minmax(0,7fr)]">
          <div data-print-part="picks" className="flex min-w-0 flex-col gap-6 print:hidden">
            <Card title="Add a batch" headingLevel={2}>
              {picker}
            </Card>
            <Card
              title="On the list"
              headingLevel={2}
              description={picks.length === 0 ? 'Nothing yet: add a batch above.' : `${countOf(picks.length, 'batch')}.`}
              actions={
                picks.length > 0 && (
                  <Button variant="quiet" size="sm" onClick={() => change(() => [])}>
                    Clear all
                  </Button>
                )
              }
            >
              {picks.length > 0 && (
                <div className="flex flex-col gap-4">
                  <PickedBatches
                    picks={picks}
                    titles={titles}
                    errors={pickErrors(build.error)}
                    onPortions={(index, portions) => change((prev) => prev.map((p, i) => (i === index ? { ...p, portions } : p)))}
                    onRemove={(index) => change((prev) => prev.filter((_, i) => i !== index))}
                  />
                  <Button onClick={buildList} disabled={!allValid} loading={build.isPending} loadingLabel="Adding it up…" fullWidth>
                    {build.data ? 'Build the list again' : 'Build the shopping list'}
                  </Button>
                  {buildError && (
                    <Alert tone="danger" title="The list couldn't be built">
                      {build.error instanceof Error ? build.error.message : 'Please try again.'}
                    </Alert>
                  )}
                </div>
              )}
            </Card>
          </div>

          <div {...partProps('list')} className="flex min-w-0 flex-col gap-4">
            {stale && (
              <Alert
                tone="caution"
                title="Your batches changed since this list was built"
                className="print:hidden"
                action={
                  <Button variant="secondary" size="sm" onClick={buildList} disabled={!allValid} loading={build.isPending}>
                    Build it again
                  </Button>
                }
              />
            )}
            {build.data ? (
              <MergedShoppingList list={build.data} onPrint={() => print('list')} />
            ) : (
              <EmptyState title="The list shows up here" className="print:hidden">
                Add each batch you mean to cook, then build the list. Foods that several recipes share are added together, with how to buy them.
              </EmptyState>
            )}
          </div>
        </div>
      </Page>
    </div>
  );
}
