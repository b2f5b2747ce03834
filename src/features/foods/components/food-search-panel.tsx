import { useEffect, useId, useRef, useState } from 'react';
import { EmptyState } from '../../../components/ui/empty-state';
import { ErrorState } from '../../../components/ui/error-state';
import { Spinner, LoadingState } from '../../../components/ui/spinner';
import { cx } from '../../../lib/cx';
import { useFoodSearch } from '../api/search-foods';
import { useDebounce } from 'use-debounce';
import { FoodSearchResults } from './food-search-results';
import { countOf } from '../../../lib/words';

const SEARCH_DEBOUNCE_MS = 300;
const RESULTS_SHOWN = 20;

export interface FoodSearchPanelProps {
  /** the query the page starts with (e.g. from the address bar) */
  initialQuery?: string;
  /** the settled query, for the page to keep in the address bar */
  onQueryChange?: (query: string) => void;
  foodHref: (id: number) => string;
  linkState?: unknown;
}

/** The catalogue search of the Foods page: a search box and the foods it finds, with their density of protein. */
export function FoodSearchPanel({ initialQuery = '', onQueryChange, foodHref, linkState }: FoodSearchPanelProps) {
  const inputId = useId();
  const [text, setText] = useState(initialQuery);
  const [query] = useDebounce(text.trim(), SEARCH_DEBOUNCE_MS);
  const search = useFoodSearch(query, RESULTS_SHOWN);
  const inputRef = useRef<HTMLInputElement>(null);
  const listRef = useRef<HTMLUListElement>(null);

  const reportQuery = useRef(onQueryChange);
  useEffect(() => {
    reportQuery.current = onQueryChange;
  });
  useEffect(() => reportQuery.current?.(query), [query]);

  const results = search.data?.results ?? [];
  const showingStale = search.isPlaceholderData || query !== text.trim();

  return (
    <div className="flex flex-col gap-5">
      <div role="search" className="flex flex-col gap-1.5">
        <label htmlFor={inputId} className="font-bold text-ink">
          Search the catalogue
        </label>
        <p id={`${inputId}-hint`} className="text-sm text-ink-soft">
          Type a food the way a recipe writes it. Arrow down moves into the results.
        </p>
        <div className="relative">
          <input
            ref={inputRef}
            id={inputId}
            type="search"
            value={text}
            onChange={(e) => setText(e.target.value)}
            onKeyDown={(e) => {
              if (e.key === 'ArrowDown') {
                const first = listRef.current?.querySelector<HTMLAnchorElement>('a[data-result]');
                if (first) {
                  e.preventDefault();
                  first.focus();
                }
              }
            }}
            aria-describedby={`${inputId}-hint`}
            placeholder="sharp cheddar, ground turkey, whole milk…"
            autoComplete="off"
            spellCheck={false}
            className="block w-full rounded-field border border-line-strong bg-surface px-3.5 py-2.5 pr-11 text-lg [&::-webkit-search-cancel-button]:appearance-none text-ink placeholder:text-oat-600 focus-visible:border-focus"
          />
          {search.isFetching && (
            <span className="absolute inset-y-0 right-3 flex items-center text-accent">
              <Spinner className="size-5" />
            </span>
          )}
        </div>
      </div>

      <p className="sr-only" aria-live="polite">
        {query && search.isSuccess && !search.isPlaceholderData ? `${countOf(results.length, 'food')} found for ${query}.` : ''}
      </p>

      {!query ? (
        <EmptyState title="No food looked up yet">
          Search by a name as a recipe would write it, such as “sharp cheddar” or “ground turkey”, to see what 100 g holds and how much a cup or a slice weighs.
        </EmptyState>
      ) : search.isError ? (
        <ErrorState title="The search didn't answer" error={search.error} onRetry={() => void search.refetch()} retrying={search.isFetching} />
      ) : search.isPending ? (
        <LoadingState label="Looking through the catalogue…" />
      ) : results.length === 0 ? (
        <EmptyState title={`Nothing in the catalogue for “${query}”`}>
          Try fewer words or the plain name of the food: “cheddar” rather than “extra-aged farmhouse cheddar”.
        </EmptyState>
      ) : (
        <div className={cx('transition-opacity', showingStale && 'opacity-60')}>
          <FoodSearchResults results={results} foodHref={foodHref} linkState={linkState} listRef={listRef} onLeaveTop={() => inputRef.current?.focus()} />
        </div>
      )}
    </div>
  );
}
