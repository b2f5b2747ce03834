import type { ReactNode } from 'react';
import { cx } from '../../lib/cx';

export type AlertTone = 'info' | 'success' | 'caution' | 'danger';

const TONES: Record<AlertTone, { box: string; mark: string; label: string }> = {
  info: { box: 'bg-oat-100 border-oat-300 text-oat-900', mark: 'bg-oat-700', label: 'Note' },
  success: { box: 'bg-herb-50 border-herb-200 text-herb-900', mark: 'bg-herb-600', label: 'Done' },
  caution: { box: 'bg-honey-50 border-honey-200 text-honey-800', mark: 'bg-honey-600', label: 'Caution' },
  danger: { box: 'bg-beet-50 border-beet-200 text-beet-800', mark: 'bg-beet-600', label: 'Problem' },
};

export interface AlertProps {
  tone?: AlertTone;
  title?: ReactNode;
  children?: ReactNode;
  /** a retry button or a link */
  action?: ReactNode;
  className?: string;
  /** danger alerts interrupt screen readers; pass false for ones present on first render */
  announce?: boolean;
  /** interrupt screen readers whatever the tone (a failed submit shown as a caution) */
  assertive?: boolean;
}

export function Alert({ tone = 'info', title, children, action, className, announce = true, assertive = false }: AlertProps) {
  const style = TONES[tone];
  const role = !announce ? undefined : assertive || tone === 'danger' ? 'alert' : 'status';
  return (
    <div role={role} className={cx('flex gap-3 rounded-field border px-4 py-3', style.box, className)}>
      <span aria-hidden="true" className={cx('mt-2 size-2.5 shrink-0 rounded-pill', style.mark)} />
      <div className="flex min-w-0 flex-1 flex-col gap-1">
        <span className="sr-only">{style.label}: </span>
        {title && <p className="font-bold">{title}</p>}
        {children && <div className="leading-relaxed">{children}</div>}
        {action && <div className="mt-1.5">{action}</div>}
      </div>
    </div>
  );
}
