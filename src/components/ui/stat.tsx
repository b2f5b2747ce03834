import type { ReactNode } from 'react';
import { cx } from '../../lib/cx';

export interface StatProps {
  label: ReactNode;
  value: ReactNode;
  /** a line under the value: the unit or what it is measured against */
  note?: ReactNode;
  className?: string;
}

/** One headline figure with its label, for summary strips; place it inside a <dl>. */
export function Stat({ label, value, note, className }: StatProps) {
  return (
    <div className={cx('flex min-w-0 flex-col gap-0.5 rounded-field border border-line bg-surface px-4 py-3', className)}>
      <dt className="text-sm font-bold text-ink-soft">{label}</dt>
      <dd className="text-2xl font-black tabular-nums text-ink">{value}</dd>
      {note && <dd className="text-sm text-ink-soft">{note}</dd>}
    </div>
  );
}
