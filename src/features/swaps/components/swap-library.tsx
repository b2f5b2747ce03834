import { useEffect, useMemo, useRef, useState } from 'react';
import { ROLES } from '../../../../shared/food';
import { Button } from '../../../components/ui/button';
import { ConfirmDialog } from '../../../components/ui/dialog';
import { EmptyState } from '../../../components/ui/empty-state';
import { ErrorState } from '../../../components/ui/error-state';
import { LoadingState } from '../../../components/ui/spinner';
import { useToast } from '../../../components/ui/toast';
import { errorMessage } from '../../../lib/api-client';
import type { Swap } from '../../../../shared/schemas/swaps';
import { useDeleteSwap, useSetSwapPublished, useSwaps } from '../api/swaps';
import type { RenderFoodSearch } from '../food-search-slot';
import { type RoleLabel, swapFromWords, swapToWords } from '../../../lib/swap-words';
import type { PickedFood } from '../swap-draft';
import { filterSwaps, hasSwapFilters, NO_SWAP_FILTERS, rolesInUse, type SwapFilters } from '../swap-filters';
import { LabelFoodDialog } from './label-food-dialog';
import { SwapEditor } from './swap-editor';
import { SwapFilterBar } from './swap-filter-bar';
import { SwapTable } from './swap-table';
import { countOf } from '../../../lib/words';

type Editing = { mode: 'new'; toFood: PickedFood | null; round: number } | { mode: 'edit'; swap: Swap };

export interface SwapLibraryProps {
  renderFoodSearch: RenderFoodSearch;
  roleLabel: RoleLabel;
}

/** The coach's approved swaps: find, add, edit, publish and delete them. */
export function SwapLibrary({ renderFoodSearch, roleLabel }: SwapLibraryProps) {
  const swaps = useSwaps();
  const toast = useToast();
  const publish = useSetSwapPublished();
  const remove = useDeleteSwap();
  const [filters, setFilters] = useState<SwapFilters>(NO_SWAP_FILTERS);
  const [editing, setEditing] = useState<Editing | null>(null);
  const [deleting, setDeleting] = useState<Swap | null>(null);
  const [labelOpen, setLabelOpen] = useState(false);
  const editorRef = useRef<HTMLDivElement>(null);
  const addButtonRef = useRef<HTMLSpanElement>(null);

  // Newest first by when they were added, so publishing or editing one doesn't move it under the pointer.
  const all = useMemo(() => [...(swaps.data ?? [])].sort((a, b) => b.id - a.id), [swaps.data]);
  const shown = useMemo(() => filterSwaps(all, filters, roleLabel), [all, filters, roleLabel]);
  const roles = useMemo(() => rolesInUse(all, ROLES), [all]);
  const published = all.filter((s) => s.status === 'published').length;

  const editorKey = editing ? (editing.mode === 'edit' ? `edit-${editing.swap.id}` : `new-${editing.round}`) : '';
  useEffect(() => {
    if (!editorKey) return;
    const el = editorRef.current;
    el?.scrollIntoView({ block: 'start', behavior: 'smooth' });
    el?.querySelector<HTMLElement>('input, select, textarea')?.focus({ preventScroll: true });
  }, [editorKey]);

  const name = (swap: Swap) => `${swapFromWords(swap, roleLabel)} → ${swapToWords(swap)}`;

  function startNew(toFood: PickedFood | null = null) {
    setEditing((e) => ({ mode: 'new', toFood, round: (e?.mode === 'new' ? e.round : 0) + 1 }));
  }

  function closeEditor() {
    setEditing(null);
    addButtonRef.current?.querySelector('button')?.focus();
  }

  function togglePublished(swap: Swap) {
    const next = swap.status !== 'published';
    publish.mutate(
      { id: swap.id, published: next },
      {
        onSuccess: (saved) =>
          toast.show(
            next ? `Published ${name(saved)}. Your clients' rewrites try it first.` : `${name(saved)} is a draft again; clients no longer get it.`,
            'success',
          ),
        onError: (error) => toast.show(`Couldn't change it: ${errorMessage(error)}`, 'danger'),
      },
    );
  }

  return (
    <div className="flex flex-col gap-6">
      <div className="flex flex-wrap items-center justify-between gap-3">
        <p className="text-ink-soft" aria-live="polite">
          {swaps.isSuccess && (all.length === 0 ? 'Nothing in the library yet.' : `${countOf(all.length, 'swap')}, ${published} published to your clients.`)}
        </p>
        <div className="flex flex-wrap gap-2">
          <Button variant="secondary" onClick={() => setLabelOpen(true)}>
            Add a food from a label
          </Button>
          <span ref={addButtonRef} className="contents">
            <Button onClick={() => startNew()}>Add a swap</Button>
          </span>
        </div>
      </div>

      {editing && (
        <div ref={editorRef} className="scroll-mt-4">
          <SwapEditor
            key={editorKey}
            swap={editing.mode === 'edit' ? editing.swap : null}
            initialToFood={editing.mode === 'new' ? editing.toFood : null}
            renderFoodSearch={renderFoodSearch}
            roleLabel={roleLabel}
            onCancel={closeEditor}
            onSaved={(saved, isNew) => {
              toast.show(
                isNew ? `Added ${name(saved)}${saved.status === 'published' ? ' and published it' : ' as a draft'}.` : `Saved ${name(saved)}.`,
                'success',
              );
              closeEditor();
            }}
          />
        </div>
      )}

      {swaps.isPending ? (
        <LoadingState label="Opening your swap library…" />
      ) : swaps.isError ? (
        <ErrorState title="Your swap library didn't load" error={swaps.error} onRetry={() => void swaps.refetch()} retrying={swaps.isFetching} />
      ) : all.length === 0 ? (
        <EmptyState title="No approved swaps yet" action={!editing && <Button onClick={() => startNew()}>Add your first swap</Button>}>
          A swap names the food it replaces — or a whole role such as melting cheese — the lighter food to use instead, and a cooking note such as “bake 5
          minutes longer for melt”. Publish it and your clients' rewrites try it first.
        </EmptyState>
      ) : (
        <section aria-labelledby="swap-list-heading" className="flex flex-col gap-4">
          <h2 id="swap-list-heading" className="sr-only">
            Your swaps
          </h2>
          <SwapFilterBar filters={filters} onChange={setFilters} roles={roles} roleLabel={roleLabel} />
          <p className="text-sm font-semibold text-ink-soft" aria-live="polite">
            {hasSwapFilters(filters) ? `Showing ${shown.length} of ${all.length} swaps.` : ''}
          </p>
          {shown.length === 0 ? (
            <EmptyState
              title="No swap matches these filters"
              action={
                <Button variant="secondary" onClick={() => setFilters(NO_SWAP_FILTERS)}>
                  Clear filters
                </Button>
              }
            />
          ) : (
            <SwapTable
              swaps={shown}
              caption="Your approved swaps"
              roleLabel={roleLabel}
              onEdit={(swap) => setEditing({ mode: 'edit', swap })}
              onDelete={setDeleting}
              onTogglePublished={togglePublished}
              publishingId={publish.isPending ? (publish.variables?.id ?? null) : null}
            />
          )}
        </section>
      )}

      <ConfirmDialog
        open={deleting !== null}
        title="Delete this swap?"
        confirmLabel="Delete the swap"
        destructive
        busy={remove.isPending}
        onCancel={() => setDeleting(null)}
        onConfirm={() => {
          if (!deleting) return;
          const gone = deleting;
          remove.mutate(gone.id, {
            onSuccess: () => {
              toast.show(`Deleted ${name(gone)}.`, 'success');
              setDeleting(null);
              if (editing?.mode === 'edit' && editing.swap.id === gone.id) setEditing(null);
            },
            onError: (error) => toast.show(`Couldn't delete it: ${errorMessage(error)}`, 'danger'),
          });
        }}
      >
        {deleting && (
          <p>
            <strong className="text-ink">{name(deleting)}</strong> leaves your library
            {deleting.status === 'published' ? ' and your clients stop getting it in their rewrites' : ''}. Recipes they already saved keep the foods they
            chose.
          </p>
        )}
      </ConfirmDialog>

      <LabelFoodDialog
        open={labelOpen}
        onClose={() => setLabelOpen(false)}
        roleLabel={roleLabel}
        onCreated={(food) => {
          setLabelOpen(false);
          toast.show(`Added ${food.name}. It's ready to use in a swap.`, 'success');
          startNew({ id: food.id, name: food.name, kcalPer100g: food.per100g.kcal, proteinPer100g: food.per100g.proteinG });
        }}
      />
    </div>
  );
}
