import { cx } from '../../lib/cx';

export interface ProgressBarProps {
  /** 0..1 */
  value: number;
  /** what is progressing, read out with the percentage: "Uploading the photo" */
  label: string;
  /** show "42%" beside the bar */
  showPercent?: boolean;
  className?: string;
}

/** How far a long task (an upload) has come. */
export function ProgressBar({ value, label, showPercent = true, className }: ProgressBarProps) {
  const percent = Math.round(Math.min(1, Math.max(0, Number.isFinite(value) ? value : 0)) * 100);
  return (
    <div className={cx('flex items-center gap-3', className)}>
      <div
        role="progressbar"
        aria-label={label}
        aria-valuemin={0}
        aria-valuemax={100}
        aria-valuenow={percent}
        aria-valuetext={`${percent}%`}
        className="h-2.5 flex-1 overflow-hidden rounded-pill bg-oat-200"
      >
        <div className="h-full rounded-pill bg-accent transition-[width] duration-150" style={{ width: `${percent}%` }} />
      </div>
      {showPercent && <span className="w-11 text-right text-sm font-bold tabular-nums text-ink-soft">{percent}%</span>}
    </div>
  );
}
