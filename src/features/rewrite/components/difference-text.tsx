import { cx } from '../../../lib/cx';
import type { Difference } from '../rewrite-words';

const TONE: Record<Difference['tone'], string> = {
  better: 'text-herb-700',
  worse: 'text-beet-700',
  neutral: 'text-ink-soft',
};

// No arrows: an up-arrow on a drop in calories read as "more". A tick for a change that helps the plate.
const MARK: Record<Difference['tone'], string> = { better: '✓', worse: '!', neutral: '' };
const WORDS: Record<Difference['tone'], string> = { better: 'a change for the better', worse: 'a change to watch', neutral: '' };

/**
 * A difference with its sign (− less, + more); colour and the mark (✓ for the better, ! to watch)
 * say whether it helps, and screen readers hear it in words.
 */
export function DifferenceText({ difference, className }: { difference: Difference; className?: string }) {
  return (
    <span className={cx('inline-flex items-baseline gap-1 font-bold whitespace-nowrap tabular-nums', TONE[difference.tone], className)}>
      <span>{difference.text}</span>
      {MARK[difference.tone] && (
        <span aria-hidden="true" className="text-[0.8em]">
          {MARK[difference.tone]}
        </span>
      )}
      {WORDS[difference.tone] && <span className="sr-only">({WORDS[difference.tone]})</span>}
    </span>
  );
}
