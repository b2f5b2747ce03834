import { useCallback, useEffect, useId, useState, type ReactNode } from 'react';
import { cx } from '../../lib/cx';

export interface CheckListItem {
  /** stable across visits: what the checked state is remembered by */
  key: string;
  label: ReactNode;
  /** the amount, shown strong on the right: "533 g" */
  amount?: ReactNode;
  /** a line under the label: "about 2 cups" */
  detail?: ReactNode;
}

export interface CheckListProps {
  /** what the list is, for screen readers and the progress line: "Shopping list" */
  label: string;
  items: CheckListItem[];
  /** localStorage key the checks are kept under; different lists need different keys */
  storageKey: string;
  className?: string;
}

function readChecks(storageKey: string): Set<string> {
  try {
    const raw = window.localStorage.getItem(storageKey);
    const parsed: unknown = raw ? JSON.parse(raw) : [];
    return new Set(Array.isArray(parsed) ? parsed.filter((k): k is string => typeof k === 'string') : []);
  } catch {
    // private mode or a hand-edited value: start with nothing checked
    return new Set();
  }
}

function writeChecks(storageKey: string, checked: Set<string>): void {
  try {
    if (checked.size === 0) window.localStorage.removeItem(storageKey);
    else window.localStorage.setItem(storageKey, JSON.stringify([...checked]));
  } catch {
    // storage full or refused: the checks still work for this visit
  }
}

/** The checked keys of one list, kept in localStorage under `storageKey`. */
function useStoredChecks(storageKey: string) {
  const [state, setState] = useState(() => ({ key: storageKey, checked: readChecks(storageKey) }));
  // Another list (other portions, another version) was opened in the same component.
  const current = state.key === storageKey ? state.checked : readChecks(storageKey);
  if (state.key !== storageKey) setState({ key: storageKey, checked: current });

  // Checks made in another tab of the same list show up here too.
  useEffect(() => {
    const onStorage = (event: StorageEvent) => {
      if (event.key === storageKey) setState({ key: storageKey, checked: readChecks(storageKey) });
    };
    window.addEventListener('storage', onStorage);
    return () => window.removeEventListener('storage', onStorage);
  }, [storageKey]);

  const update = useCallback(
    (change: (checked: Set<string>) => void) => {
      setState((prev) => {
        const next = new Set(prev.key === storageKey ? prev.checked : readChecks(storageKey));
        change(next);
        writeChecks(storageKey, next);
        return { key: storageKey, checked: next };
      });
    },
    [storageKey],
  );
  return { checked: current, update };
}

/** A list to tick off item by item (shopping, packing); the ticks survive a reload. */
export function CheckList({ label, items, storageKey, className }: CheckListProps) {
  const { checked, update } = useStoredChecks(storageKey);
  const baseId = useId();
  const done = items.filter((item) => checked.has(item.key)).length;

  return (
    <div className={cx('flex flex-col gap-3', className)}>
      <div className="flex flex-wrap items-center justify-between gap-2 print:hidden">
        <p className="text-sm font-bold text-ink-soft" aria-live="polite">
          {done === items.length && items.length > 0 ? `All ${items.length} ticked off` : `${done} of ${items.length} ticked off`}
        </p>
        {done > 0 && (
          <button
            type="button"
            onClick={() => update((set) => items.forEach((item) => set.delete(item.key)))}
            className="min-h-9 rounded-pill px-3 text-sm font-bold text-accent underline-offset-2 hover:underline"
          >
            Untick all
          </button>
        )}
      </div>
      <ul aria-label={label} className="flex flex-col divide-y divide-line rounded-field border border-line bg-surface">
        {items.map((item, index) => {
          const isChecked = checked.has(item.key);
          const id = `${baseId}-${index}`;
          return (
            <li key={item.key} className={cx('transition-colors', isChecked && 'bg-herb-50')}>
              <label htmlFor={id} className="flex cursor-pointer items-start gap-3 px-3.5 py-3 print:py-1.5">
                <input
                  id={id}
                  type="checkbox"
                  checked={isChecked}
                  onChange={(event) => {
                    const on = event.target.checked;
                    update((set) => (on ? set.add(item.key) : set.delete(item.key)));
                  }}
                  className="mt-0.5 size-5 shrink-0 accent-herb-600"
                />
                <span className="flex min-w-0 flex-1 flex-col">
                  <span className={cx('font-semibold text-ink', isChecked && 'text-ink-soft line-through decoration-2')}>{item.label}</span>
                  {item.detail && <span className="text-sm text-ink-soft">{item.detail}</span>}
                </span>
                {item.amount && (
                  <span className={cx('shrink-0 text-right font-extrabold tabular-nums', isChecked ? 'text-ink-soft' : 'text-ink')}>{item.amount}</span>
                )}
              </label>
            </li>
          );
        })}
      </ul>
    </div>
  );
}
