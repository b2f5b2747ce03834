import { cx } from '../../lib/cx';

/**
 * A count that asks for attention (unread comments): a small filled pill with the number, and the
 * words a screen reader says in its place. Nothing is shown for 0.
 */
export function CountBadge({ count, label, className }: { count: number; label: string; className?: string }) {
  if (count <= 0) return null;
  return (
    <span
      data-count-badge=""
      className={cx(
        'inline-flex min-w-6 items-center justify-center rounded-pill bg-ember-700 px-1.5 py-0.5 text-xs leading-none font-extrabold text-white tabular-nums',
        className,
      )}
    >
      <span aria-hidden="true">{count > 99 ? '99+' : count}</span>
      <span className="sr-only">{label}</span>
    </span>
  );
}

/** "1 unread comment from your coach" / "3 unread comments from your coach" */
export function unreadCommentsLabel(count: number): string {
  return `${count} unread comment${count === 1 ? '' : 's'} from your coach`;
}
