import type { ReactNode } from 'react';
import { cx } from '../../lib/cx';

export interface EmptyStateProps {
  title: ReactNode;
  children?: ReactNode;
  action?: ReactNode;
  className?: string;
}

/** What a list or page shows when there is nothing in it yet. */
export function EmptyState({ title, children, action, className }: EmptyStateProps) {
  return (
    <div className={cx('flex flex-col items-center gap-3 rounded-card border-2 border-dashed border-oat-300 bg-oat-100/60 px-6 py-10 text-center', className)}>
      <svg aria-hidden="true" viewBox="0 0 48 48" className="size-12 text-oat-500" fill="none">
        <path d="M7 24h34c0 9.4-7.6 17-17 17S7 33.4 7 24Z" stroke="currentColor" strokeWidth="2.5" strokeLinejoin="round" />
        <path d="M4 24h40" stroke="currentColor" strokeWidth="2.5" strokeLinecap="round" />
        <path d="M18 15c0-3 3-3 3-6M26 15c0-3 3-3 3-6" stroke="currentColor" strokeWidth="2.5" strokeLinecap="round" />
      </svg>
      <p className="text-lg font-extrabold text-ink">{title}</p>
      {children && <div className="max-w-prose text-ink-soft">{children}</div>}
      {action && <div className="mt-2">{action}</div>}
    </div>
  );
}
