import { useEffect, useId, useRef, useState, type ReactNode } from 'react';
import { cx } from '../../lib/cx';

export interface NumberStepperProps {
  label: ReactNode;
  /** the committed value */
  value: number;
  min: number;
  max: number;
  /**
   * Called with every number typed or stepped to. Typed numbers are passed on as typed, even outside
   * min–max or with decimals, so whoever checks them (the server) can say what is wrong.
   */
  onChange: (value: number) => void;
  hint?: ReactNode;
  error?: string;
  /** the unit after the number, e.g. "portions" */
  unit?: string;
  disabled?: boolean;
  className?: string;
}

function StepButton({ label, onClick, disabled, children }: { label: string; onClick: () => void; disabled: boolean; children: ReactNode }) {
  return (
    <button
      type="button"
      aria-label={label}
      onClick={onClick}
      disabled={disabled}
      className="flex size-11 shrink-0 items-center justify-center rounded-pill border border-line-strong bg-surface text-xl font-black text-ink transition-colors hover:bg-oat-100 active:bg-oat-200 disabled:cursor-not-allowed disabled:opacity-40"
    >
      <span aria-hidden="true">{children}</span>
    </button>
  );
}

/** A whole-number field between a minus and a plus button; the field itself takes typing and arrow keys. */
export function NumberStepper({ label, value, min, max, onChange, hint, error, unit, disabled = false, className }: NumberStepperProps) {
  const id = useId();
  // The text is the person's until the committed value changes from outside (a button, the back button).
  const [draft, setDraft] = useState({ text: String(value), forValue: value });
  const text = draft.forValue === value ? draft.text : String(value);

  // Two quick presses step twice, even before the first change has come back as `value`.
  const latest = useRef(value);
  useEffect(() => {
    latest.current = value;
  }, [value]);

  const commit = (next: number) => {
    setDraft({ text: String(next), forValue: next });
    if (next !== latest.current) onChange(next);
    latest.current = next;
  };
  const step = (by: number) => commit(Math.min(max, Math.max(min, Math.round(latest.current) + by)));
  const described = [hint ? `${id}-hint` : '', error ? `${id}-error` : ''].filter(Boolean).join(' ') || undefined;

  return (
    <div className={cx('flex flex-col gap-1.5', className)}>
      <label htmlFor={id} className="font-bold text-ink">
        {label}
      </label>
      <div className="flex items-center gap-2">
        <StepButton label={`One fewer (${min} at least)`} onClick={() => step(-1)} disabled={disabled || value <= min}>
          −
        </StepButton>
        <input
          id={id}
          type="number"
          inputMode="numeric"
          min={min}
          max={max}
          step={1}
          value={text}
          disabled={disabled}
          aria-invalid={error ? true : undefined}
          aria-describedby={described}
          onChange={(event) => {
            const raw = event.target.value;
            const next = Number(raw);
            if (raw.trim() !== '' && Number.isFinite(next)) {
              setDraft({ text: raw, forValue: next });
              if (next !== latest.current) onChange(next);
              latest.current = next;
            } else {
              setDraft({ text: raw, forValue: value });
            }
          }}
          onBlur={() => {
            if (text.trim() === '') setDraft({ text: String(value), forValue: value });
          }}
          className={cx(
            'h-11 w-20 rounded-field border bg-surface px-2 text-center text-lg font-extrabold tabular-nums text-ink transition-colors focus-visible:border-focus disabled:bg-oat-100',
            error ? 'border-beet-600' : 'border-line-strong',
          )}
        />
        <StepButton label={`One more (${max} at most)`} onClick={() => step(1)} disabled={disabled || value >= max}>
          +
        </StepButton>
        {unit && <span className="font-semibold text-ink-soft">{unit}</span>}
      </div>
      {hint && (
        <p id={`${id}-hint`} className="text-sm text-ink-soft">
          {hint}
        </p>
      )}
      {error && (
        <p id={`${id}-error`} role="alert" className="flex items-start gap-1.5 text-sm font-semibold text-beet-700">
          <span aria-hidden="true">●</span>
          <span>{error}</span>
        </p>
      )}
    </div>
  );
}
