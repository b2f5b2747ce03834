import { useEffect, useId, useRef, useState } from 'react';
import { Button } from '../../../components/ui/button';
import { SERVINGS_MAX } from '../recipe-input';

const COMMIT_DELAY_MS = 500;

/** How many servings the dish makes, with steppers; a change is sent once the cook stops clicking or typing. */
export function ServingsField({ servings, onChange }: { servings: number; onChange: (servings: number) => void }) {
  const id = useId();
  const [text, setText] = useState(String(servings));
  const [shownServings, setShownServings] = useState(servings);
  const timer = useRef<ReturnType<typeof setTimeout> | null>(null);
  const latest = useRef(servings);

  // A new figure from above replaces what the box shows (adjusted while rendering, not in an effect).
  if (shownServings !== servings) {
    setShownServings(servings);
    setText(String(servings));
  }
  useEffect(() => {
    latest.current = servings;
  }, [servings]);
  useEffect(() => () => void (timer.current && clearTimeout(timer.current)), []);

  const value = Number(text);
  const valid = Number.isInteger(value) && value >= 1 && value <= SERVINGS_MAX;

  function schedule(next: string) {
    setText(next);
    if (timer.current) clearTimeout(timer.current);
    const n = Number(next);
    if (!Number.isInteger(n) || n < 1 || n > SERVINGS_MAX || n === latest.current) return;
    timer.current = setTimeout(() => {
      latest.current = n;
      onChange(n);
    }, COMMIT_DELAY_MS);
  }

  const step = (by: number) => schedule(String(Math.min(SERVINGS_MAX, Math.max(1, (valid ? value : latest.current) + by))));

  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={id} className="text-sm font-bold text-ink">
        Servings
      </label>
      <div className="flex items-center gap-1.5">
        <Button variant="secondary" size="sm" onClick={() => step(-1)} disabled={valid && value <= 1} aria-label="One serving fewer">
          −
        </Button>
        <input
          id={id}
          type="text"
          inputMode="numeric"
          value={text}
          onChange={(e) => schedule(e.target.value.replace(/[^\d]/g, ''))}
          aria-invalid={valid ? undefined : true}
          aria-describedby={valid ? undefined : `${id}-error`}
          className="w-16 rounded-field border border-line-strong bg-surface px-2 py-1.5 text-center text-base font-bold tabular-nums focus-visible:border-focus"
        />
        <Button variant="secondary" size="sm" onClick={() => step(1)} disabled={valid && value >= SERVINGS_MAX} aria-label="One serving more">
          +
        </Button>
      </div>
      {!valid && (
        <p id={`${id}-error`} className="text-sm font-semibold text-beet-700">
          From 1 to {SERVINGS_MAX}.
        </p>
      )}
    </div>
  );
}
