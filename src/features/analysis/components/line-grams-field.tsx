import { useEffect, useId, useRef, useState } from 'react';
import { cx } from '../../../lib/cx';
import { everydayWeight } from '../../../lib/format';
import type { UnitSystem } from '../../../lib/user';
import { readGrams } from '../amount-words';

const COMMIT_DELAY_MS = 700;

function gramsText(grams: number): string {
  return String(Math.round(grams * 10) / 10);
}

/** A line without an amount shows an empty field to type into, not "0". */
function shownGrams(grams: number | null, needsAmount = false): string {
  return grams === null || (needsAmount && grams === 0) ? '' : gramsText(grams);
}

export interface LineGramsFieldProps {
  /** grams the line weighs now (the server's answer or the cook's pin) */
  grams: number | null;
  label: string;
  unitSystem: UnitSystem;
  /** the line has no amount yet: draw the eye to the field */
  needsAmount?: boolean;
  onCommit: (grams: number) => void;
}

/**
 * Grams of one line, editable: the new weight is sent once the cook stops typing (or leaves the
 * field, or presses Enter), and the household measure beside it follows what was typed.
 */
export function LineGramsField({ grams, label, unitSystem, needsAmount, onCommit }: LineGramsFieldProps) {
  const id = useId();
  const [text, setText] = useState(shownGrams(grams, needsAmount));
  const [error, setError] = useState<string | null>(null);
  const focused = useRef(false);
  const timer = useRef<ReturnType<typeof setTimeout> | null>(null);
  const committed = useRef(grams);

  // A new answer from the server shows unless the cook is typing.
  useEffect(() => {
    committed.current = grams;
    if (!focused.current) {
      setText(shownGrams(grams, needsAmount));
      setError(null);
    }
  }, [grams, needsAmount]);

  useEffect(() => () => void (timer.current && clearTimeout(timer.current)), []);

  function commit(value: string) {
    if (timer.current) clearTimeout(timer.current);
    timer.current = null;
    // Leaving an empty field that had no amount is not a mistake.
    if (value.trim() === '' && !committed.current) {
      setError(null);
      return;
    }
    const read = readGrams(value);
    if ('error' in read) {
      setError(read.error);
      return;
    }
    setError(null);
    if (committed.current !== null && Math.abs(read.grams - committed.current) < 0.05) return;
    committed.current = read.grams;
    onCommit(read.grams);
  }

  const typed = readGrams(text);
  const everyday = 'grams' in typed ? everydayWeight(typed.grams, unitSystem) : null;

  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={id} className="sr-only">
        {label}
      </label>
      <div className="flex flex-wrap items-center gap-x-2 gap-y-0.5">
        <div className="relative w-28 shrink-0">
          <input
            id={id}
            type="text"
            inputMode="decimal"
            autoComplete="off"
            value={text}
            placeholder={needsAmount ? '0' : undefined}
            aria-invalid={error ? true : undefined}
            aria-describedby={error ? `${id}-error` : undefined}
            onFocus={() => (focused.current = true)}
            onChange={(e) => {
              const value = e.target.value;
              setText(value);
              if (timer.current) clearTimeout(timer.current);
              timer.current = setTimeout(() => commit(value), COMMIT_DELAY_MS);
            }}
            onBlur={(e) => {
              focused.current = false;
              commit(e.target.value);
            }}
            onKeyDown={(e) => {
              if (e.key === 'Enter') {
                e.preventDefault();
                commit(e.currentTarget.value);
              }
            }}
            className={cx(
              'block w-full rounded-field border bg-surface py-2 pr-8 pl-3 text-right text-base tabular-nums text-ink focus-visible:border-focus',
              error ? 'border-beet-600' : needsAmount ? 'border-honey-600 bg-honey-50 ring-2 ring-honey-200' : 'border-line-strong',
            )}
          />
          <span aria-hidden="true" className="pointer-events-none absolute inset-y-0 right-3 flex items-center text-ink-soft">
            g
          </span>
        </div>
        {everyday && <span className="text-sm whitespace-nowrap text-ink-soft tabular-nums">{everyday}</span>}
      </div>
      {error && (
        <p id={`${id}-error`} className="text-sm font-semibold text-beet-700">
          {error}
        </p>
      )}
    </div>
  );
}
