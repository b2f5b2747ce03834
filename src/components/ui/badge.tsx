import type { ReactNode } from 'react';
import { cx } from '../../lib/cx';

export type BadgeTone = 'neutral' | 'herb' | 'honey' | 'ember' | 'beet';

const TONES: Record<BadgeTone, string> = {
  neutral: 'bg-oat-100 text-oat-800 border-oat-200',
  herb: 'bg-herb-50 text-herb-800 border-herb-200',
  honey: 'bg-honey-50 text-honey-800 border-honey-200',
  ember: 'bg-ember-50 text-ember-800 border-ember-200',
  beet: 'bg-beet-50 text-beet-800 border-beet-200',
};

/** A short tag beside a name: a role, a diet flag, "check this match". */
export function Badge({ tone = 'neutral', children, className, title }: { tone?: BadgeTone; children: ReactNode; className?: string; title?: string }) {
  return (
    <span
      title={title}
      className={cx('inline-flex items-center gap-1 rounded-pill border px-2.5 py-0.5 text-xs font-bold whitespace-nowrap', TONES[tone], className)}
    >
      {children}
    </span>
  );
}
