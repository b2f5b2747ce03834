import { cx } from '../../../lib/cx';
import type { Difference } from '../rewrite-words';

const TONE: Record<Difference['tone'], string> = {
  better: 'text-herb-700',
  worse: 'text-beet-700',
  neutral: 'text-ink-soft',
};

const MARK: Record<Difference['tone'], string> = { better: '▲', worse: '▼', neutral: '' };

/**
 * A difference with its sign and, for screen readers, its direction in words; colour and the mark
 * (▲ helps the dish, ▼ works against it) say the same for a glance.
 */
export function DifferenceText({ difference, className }: { difference: Difference; className?: string }) {
  const helps = difference.tone === 'better' ? 'better' : difference.tone === 'worse' ? 'worse' : '';
  return (
    <span className={cx('inline-flex items-baseline gap-1 font-bold whitespace-nowrap tabular-nums', TONE[difference.tone], className)}>
      {MARK[difference.tone] && (
        <span aria-hidden="true" className="text-[0.7em]">
          {MARK[difference.tone]}
        </span>
      )}
      <span>{difference.text}</span>
      {difference.direction !== 'same' && <span className="sr-only">({difference.direction}{helps && `, ${helps}`})</span>}
    </span>
  );
}
