import { useId, useState, type ReactNode } from 'react';
import { Spinner } from '../../../components/ui/spinner';
import { errorMessage } from '../../../lib/api-client';
import { cx } from '../../../lib/cx';
import { formatKcal, formatMacroG } from '../../../lib/format';
import { useFoodSearch, type FoodSearchHit } from '../api/search-foods';
import { foodGroupWords } from '../food-words';
import { useDebounce } from 'use-debounce';
import { countOf } from '../../../lib/words';

const SEARCH_DEBOUNCE_MS = 250;
const OPTIONS_SHOWN = 8;

export interface FoodComboboxProps {
  label: ReactNode;
  hint?: ReactNode;
  onChoose: (food: FoodSearchHit) => void;
  placeholder?: string;
  autoFocus?: boolean;
  className?: string;
  /** hide the label visually (a compact place like a table cell) */
  labelHidden?: boolean;
  /** Escape in an empty box: the cook gives up searching */
  onCancel?: () => void;
}

/**
 * A search box that offers catalogue foods as you type (the ARIA combobox pattern):
 * Arrow keys move through the offers, Enter chooses, Escape closes the list and then clears the box.
 */
export function FoodCombobox({ label, hint, onChoose, placeholder = 'Search the catalogue…', autoFocus, className, labelHidden, onCancel }: FoodComboboxProps) {
  const id = useId();
  const listId = `${id}-list`;
  const [text, setText] = useState('');
  const [open, setOpen] = useState(false);
  const [active, setActive] = useState(-1);
  const [query] = useDebounce(text.trim(), SEARCH_DEBOUNCE_MS);
  const search = useFoodSearch(query, OPTIONS_SHOWN);
  const results = query && text.trim() ? (search.data?.results ?? []) : [];
  const expanded = open && results.length > 0;

  function choose(hit: FoodSearchHit) {
    onChoose(hit);
    setText('');
    setOpen(false);
    setActive(-1);
  }

  const status = !text.trim()
    ? ''
    : search.isError
      ? errorMessage(search.error)
      : search.isFetching || query !== text.trim()
        ? 'Searching…'
        : search.isSuccess && results.length === 0
          ? `Nothing in the catalogue for “${query}”.`
          : open && results.length > 0
            ? `${countOf(results.length, 'food')} offered; use the arrow keys to choose.`
            : '';

  return (
    <div className={cx('relative flex flex-col gap-1.5', className)}>
      <label htmlFor={id} className={cx('font-bold text-ink', labelHidden && 'sr-only')}>
        {label}
      </label>
      {hint && (
        <p id={`${id}-hint`} className="text-sm text-ink-soft">
          {hint}
        </p>
      )}
      <div className="relative">
        <input
          id={id}
          role="combobox"
          type="text"
          value={text}
          autoFocus={autoFocus}
          autoComplete="off"
          spellCheck={false}
          placeholder={placeholder}
          aria-expanded={expanded}
          aria-controls={listId}
          aria-autocomplete="list"
          aria-activedescendant={expanded && active >= 0 ? `${id}-opt-${active}` : undefined}
          aria-describedby={cx(hint ? `${id}-hint` : '', `${id}-status`) || undefined}
          onChange={(e) => {
            setText(e.target.value);
            setOpen(true);
            setActive(-1);
          }}
          onFocus={() => setOpen(true)}
          onBlur={() => setOpen(false)}
          onKeyDown={(e) => {
            if (e.key === 'ArrowDown') {
              e.preventDefault();
              setOpen(true);
              setActive((a) => Math.min(results.length - 1, a + 1));
            } else if (e.key === 'ArrowUp') {
              e.preventDefault();
              setActive((a) => Math.max(-1, a - 1));
            } else if (e.key === 'Enter') {
              if (expanded) {
                e.preventDefault();
                const hit = results[active >= 0 ? active : 0];
                if (hit) choose(hit);
              }
            } else if (e.key === 'Escape') {
              if (expanded) {
                e.preventDefault();
                setOpen(false);
              } else if (text) {
                e.preventDefault();
                setText('');
              } else if (onCancel) {
                e.preventDefault();
                onCancel();
              }
            }
          }}
          className="block w-full rounded-field border border-line-strong bg-surface px-3.5 py-2.5 pr-10 text-base text-ink placeholder:text-oat-600 focus-visible:border-focus"
        />
        {search.isFetching && text.trim() && (
          <span className="absolute inset-y-0 right-3 flex items-center text-accent">
            <Spinner className="size-4" />
          </span>
        )}
        <ul
          id={listId}
          role="listbox"
          aria-label="Foods found"
          hidden={!expanded}
          className="absolute inset-x-0 top-full z-30 mt-1 max-h-80 overflow-y-auto rounded-field border border-line bg-surface py-1 shadow-pop"
        >
          {results.map((hit, index) => (
            <li
              key={hit.id}
              id={`${id}-opt-${index}`}
              role="option"
              aria-selected={index === active}
              // Keep focus in the input so the click lands before the list closes on blur.
              onMouseDown={(e) => e.preventDefault()}
              onClick={() => choose(hit)}
              onMouseMove={() => setActive(index)}
              className={cx('flex cursor-pointer flex-col px-3.5 py-2', index === active ? 'bg-ember-50' : 'hover:bg-oat-50')}
            >
              <span className="font-semibold text-ink">{hit.name}</span>
              <span className="text-sm text-ink-soft tabular-nums">
                {[foodGroupWords(hit.foodGroup), `${formatKcal(hit.kcalPer100g)} · ${formatMacroG(hit.proteinPer100g)} protein per 100 g`]
                  .filter(Boolean)
                  .join(' · ')}
              </span>
            </li>
          ))}
        </ul>
      </div>
      <p id={`${id}-status`} aria-live="polite" className="sr-only">
        {status}
      </p>
      {text.trim() && query === text.trim() && (search.isError || (search.isSuccess && results.length === 0)) && (
        <p aria-hidden="true" className={cx('text-sm', search.isError ? 'font-semibold text-beet-700' : 'text-ink-soft')}>
          {status}
        </p>
      )}
    </div>
  );
}
