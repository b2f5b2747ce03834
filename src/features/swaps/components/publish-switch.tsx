import { Spinner } from '../../../components/ui/spinner';
import { cx } from '../../../lib/cx';

/** On: the swap's clients get it. A switch, so its name stays put and only its state changes. */
export function PublishSwitch({ published, busy, onToggle, swapName }: { published: boolean; busy: boolean; onToggle: () => void; swapName: string }) {
  return (
    <button
      type="button"
      role="switch"
      aria-checked={published}
      aria-label={`Publish to clients: ${swapName}`}
      aria-busy={busy || undefined}
      // Not `disabled`: a disabled button drops keyboard focus while the server answers.
      aria-disabled={busy || undefined}
      onClick={() => {
        if (!busy) onToggle();
      }}
      className="group inline-flex min-h-11 items-center gap-2 rounded-pill pr-2 text-sm font-bold whitespace-nowrap aria-disabled:cursor-wait"
    >
      <span
        aria-hidden="true"
        className={cx(
          'relative inline-flex h-6 w-11 shrink-0 items-center rounded-pill border-2 transition-colors',
          published ? 'border-herb-600 bg-herb-600' : 'border-oat-500 bg-oat-200',
        )}
      >
        <span
          className={cx('absolute size-4 rounded-pill bg-white shadow-sm transition-transform', published ? 'translate-x-[1.375rem]' : 'translate-x-0.5')}
        />
      </span>
      <span className={published ? 'text-herb-800' : 'text-ink-soft'}>{published ? 'Published' : 'Draft'}</span>
      {busy && <Spinner className="size-4 text-accent" />}
    </button>
  );
}
