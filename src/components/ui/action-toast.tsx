import { useEffect, useRef, useState, type ReactNode } from 'react';
import { createPortal } from 'react-dom';
import { cx } from '../../lib/cx';
import { Spinner } from './spinner';
import { useToastRegion } from './toast';

export interface ActionToastProps {
  /** what happened, e.g. "“Baked ziti” was deleted." */
  message: ReactNode;
  /** the one thing the person can do about it, e.g. "Undo" */
  actionLabel: string;
  onAction: () => void;
  /** closes the toast: after `durationMs`, or when Dismiss is pressed */
  onDismiss: () => void;
  /** how long the action stays offered; the count pauses while the pointer or focus is on the toast */
  durationMs?: number;
  busy?: boolean;
  className?: string;
}

/**
 * A toast with one action (undo). It shows in the header's toast strip with the others, so it never
 * covers a button of the page; without a header it is placed where it is rendered.
 */
export function ActionToast({ message, actionLabel, onAction, onDismiss, durationMs = 10_000, busy = false, className }: ActionToastProps) {
  const region = useToastRegion();
  const [paused, setPaused] = useState(false);
  const remaining = useRef(durationMs);
  const dismissRef = useRef(onDismiss);
  useEffect(() => {
    dismissRef.current = onDismiss;
  }, [onDismiss]);

  useEffect(() => {
    if (paused || busy) return;
    const startedAt = Date.now();
    const timer = setTimeout(() => dismissRef.current(), remaining.current);
    return () => {
      clearTimeout(timer);
      remaining.current = Math.max(1500, remaining.current - (Date.now() - startedAt));
    };
  }, [paused, busy]);

  const toast = (
    <div
      role="status"
      data-toast=""
      onMouseEnter={() => setPaused(true)}
      onMouseLeave={() => setPaused(false)}
      onFocus={() => setPaused(true)}
      onBlur={(event) => {
        if (!event.currentTarget.contains(event.relatedTarget as Node | null)) setPaused(false);
      }}
      className={cx(
        'flex w-full flex-wrap items-center gap-x-3 gap-y-2 rounded-field bg-oat-900 px-4 py-2.5 text-oat-50 shadow-pop sm:max-w-xl',
        'print:hidden',
        className,
      )}
    >
      <span className="min-w-0 flex-1">{message}</span>
      <span className="flex items-center gap-1">
        <button
          type="button"
          onClick={onAction}
          disabled={busy}
          aria-busy={busy || undefined}
          className="inline-flex min-h-9 items-center gap-1.5 rounded-pill bg-oat-50 px-3.5 text-sm font-extrabold text-oat-900 hover:bg-ember-100 focus-visible:outline-oat-50 disabled:opacity-80"
        >
          {busy && <Spinner className="size-4" />}
          {actionLabel}
        </button>
        <button
          type="button"
          onClick={onDismiss}
          disabled={busy}
          className="min-h-9 rounded-pill px-2.5 text-sm font-bold underline-offset-2 hover:underline focus-visible:outline-oat-50"
        >
          Dismiss
        </button>
      </span>
    </div>
  );
  return region ? createPortal(toast, region) : toast;
}
