import { createContext, useCallback, useContext, useEffect, useMemo, useRef, useState, type ReactNode } from 'react';
import { createPortal } from 'react-dom';
import { cx } from '../../lib/cx';

export type ToastTone = 'info' | 'success' | 'danger';

interface Toast {
  id: number;
  tone: ToastTone;
  message: string;
}

interface ToastApi {
  /** shows a short message under the header for a few seconds */
  show: (message: string, tone?: ToastTone) => void;
}

const ToastContext = createContext<ToastApi | null>(null);
/** the element toasts render into (set by <ToastRegion />), and its setter */
const RegionContext = createContext<{ region: HTMLElement | null; setRegion: (el: HTMLElement | null) => void }>({
  region: null,
  setRegion: () => {},
});

const TOAST_MS = 5000;

const TONE_CLASSES: Record<ToastTone, string> = {
  info: 'bg-oat-900 text-oat-50',
  success: 'bg-herb-800 text-herb-50',
  danger: 'bg-beet-800 text-beet-50',
};

/**
 * Toasts live in a strip of the sticky header (<ToastRegion />), never floating over the page: a
 * toast over content sooner or later sits on the button someone is reaching for. The strip grows the
 * header, so the page moves down rather than under it.
 */
export function ToastProvider({ children }: { children: ReactNode }) {
  const [toasts, setToasts] = useState<Toast[]>([]);
  const [region, setRegion] = useState<HTMLElement | null>(null);
  const nextId = useRef(1);
  const timers = useRef(new Map<number, ReturnType<typeof setTimeout>>());

  const dismiss = useCallback((id: number) => {
    setToasts((list) => list.filter((t) => t.id !== id));
    const timer = timers.current.get(id);
    if (timer) clearTimeout(timer);
    timers.current.delete(id);
  }, []);

  const show = useCallback(
    (message: string, tone: ToastTone = 'info') => {
      const id = nextId.current++;
      setToasts((list) => [...list.slice(-2), { id, tone, message }]);
      timers.current.set(
        id,
        setTimeout(() => dismiss(id), TOAST_MS),
      );
    },
    [dismiss],
  );

  useEffect(() => {
    const pending = timers.current;
    return () => pending.forEach((timer) => clearTimeout(timer));
  }, []);

  const api = useMemo(() => ({ show }), [show]);
  const regionApi = useMemo(() => ({ region, setRegion }), [region]);

  const list = toasts.map((toast) => (
    <div
      key={toast.id}
      data-toast=""
      className={cx('flex w-full items-center gap-3 rounded-field px-4 py-2.5 shadow-pop sm:max-w-xl', TONE_CLASSES[toast.tone])}
    >
      <span className="min-w-0 flex-1">{toast.message}</span>
      <button
        type="button"
        onClick={() => dismiss(toast.id)}
        className="min-h-9 rounded-pill px-2 py-0.5 text-sm font-bold underline-offset-2 hover:underline focus-visible:outline-oat-50"
      >
        Dismiss
      </button>
    </div>
  ));

  return (
    <ToastContext.Provider value={api}>
      <RegionContext.Provider value={regionApi}>
        {children}
        {region ? (
          createPortal(list, region)
        ) : (
          // no header on this screen (a crash page): the top edge, where no page content starts
          <div aria-live="polite" className="fixed inset-x-0 top-0 z-50 flex flex-col items-center gap-2 p-2">
            {list}
          </div>
        )}
      </RegionContext.Provider>
    </ToastContext.Provider>
  );
}

/** Where toasts show: put it once in the sticky header, below its navigation row. */
export function ToastRegion({ className }: { className?: string }) {
  const { setRegion } = useContext(RegionContext);
  return (
    <div
      ref={setRegion}
      aria-live="polite"
      aria-atomic="false"
      data-toast-region=""
      className={cx('mx-auto flex max-w-shell flex-col items-center gap-2 px-gutter empty:hidden sm:items-end [&:not(:empty)]:pb-3', className)}
    />
  );
}

/** The toast strip's element, for a toast with its own state (ActionToast); null when no header is shown. */
export function useToastRegion(): HTMLElement | null {
  return useContext(RegionContext).region;
}

export function useToast(): ToastApi {
  const ctx = useContext(ToastContext);
  if (!ctx) throw new Error('useToast must be used inside <ToastProvider>');
  return ctx;
}
