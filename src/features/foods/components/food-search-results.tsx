import type { KeyboardEvent, Ref } from 'react';
import { Link } from 'react-router';
import { Badge } from '../../../components/ui/badge';
import { formatKcal, formatMacroG, formatNumber } from '../../../lib/format';
import type { FoodSearchHit } from '../api/search-foods';
import { foodGroupWords, proteinPer100KcalOfHit } from '../food-words';

export interface FoodSearchResultsProps {
  results: FoodSearchHit[];
  foodHref: (id: number) => string;
  /** state handed to the detail page's location, e.g. the search to return to */
  linkState?: unknown;
  listRef?: Ref<HTMLUListElement>;
  /** Arrow Up on the first result: back to the search box */
  onLeaveTop?: () => void;
}

/** Moves focus between the result links with the arrow keys. */
function moveFocus(event: KeyboardEvent<HTMLUListElement>, onLeaveTop?: () => void) {
  if (event.key !== 'ArrowDown' && event.key !== 'ArrowUp') return;
  const links = Array.from(event.currentTarget.querySelectorAll<HTMLAnchorElement>('a[data-result]'));
  const at = links.indexOf(document.activeElement as HTMLAnchorElement);
  if (at === -1) return;
  event.preventDefault();
  if (event.key === 'ArrowUp' && at === 0) onLeaveTop?.();
  else links[Math.max(0, Math.min(links.length - 1, at + (event.key === 'ArrowDown' ? 1 : -1)))]?.focus();
}

export function FoodSearchResults({ results, foodHref, linkState, listRef, onLeaveTop }: FoodSearchResultsProps) {
  return (
    <ul
      ref={listRef}
      onKeyDown={(e) => moveFocus(e, onLeaveTop)}
      className="flex flex-col divide-y divide-line overflow-hidden rounded-card border border-line bg-surface"
    >
      {results.map((hit) => {
        const group = foodGroupWords(hit.foodGroup);
        return (
          <li key={hit.id}>
            <Link
              data-result
              to={foodHref(hit.id)}
              state={linkState}
              className="group grid gap-x-6 gap-y-2 px-4 py-3 hover:bg-oat-50 focus-visible:bg-oat-50 sm:grid-cols-[minmax(0,1fr)_auto] sm:items-center"
            >
              <span className="flex min-w-0 flex-col gap-0.5">
                <span className="font-bold text-ink underline-offset-2 group-hover:underline">{hit.name}</span>
                <span className="flex flex-wrap items-center gap-2 text-sm text-ink-soft">
                  {group && <span>{group}</span>}
                  {hit.branded && <Badge>Brand or restaurant</Badge>}
                  {hit.owner === 'you' && <Badge tone="herb">Your food</Badge>}
                  {hit.owner === 'coach' && <Badge tone="honey">From your coach</Badge>}
                </span>
              </span>
              <dl className="grid grid-cols-3 gap-3 text-sm tabular-nums sm:w-[26rem]">
                <div className="flex flex-col">
                  <dt className="text-ink-soft">Energy / 100 g</dt>
                  <dd className="font-bold">{formatKcal(hit.kcalPer100g)}</dd>
                </div>
                <div className="flex flex-col">
                  <dt className="text-ink-soft">Protein / 100 g</dt>
                  <dd className="font-bold">{formatMacroG(hit.proteinPer100g)}</dd>
                </div>
                <div className="flex flex-col">
                  <dt className="text-ink-soft">Protein / 100 kcal</dt>
                  <dd className="font-bold">{formatNumber(proteinPer100KcalOfHit(hit), 1)} g</dd>
                </div>
              </dl>
            </Link>
          </li>
        );
      })}
    </ul>
  );
}
