import { useEffect, useState } from 'react';
import { Spinner } from '../../../components/ui/spinner';
import { formatNumber } from '../../../lib/format';

// What the server does, in the order it does it; the step shown follows the time spent (the server sends no progress).
const STEPS: { from: number; text: string }[] = [
  { from: 0, text: 'Reading and weighing every line…' },
  { from: 400, text: 'Finding lighter foods that play the same part…' },
  { from: 1200, text: 'Solving for your targets…' },
  { from: 4000, text: 'Still solving: a hard set of targets takes a few more tries…' },
];

/** A rewrite on its way: what is happening and how long it has taken. */
export function RewriteProgress({ startedAt }: { startedAt: number }) {
  const [now, setNow] = useState(() => Date.now());
  useEffect(() => {
    const timer = setInterval(() => setNow(Date.now()), 200);
    return () => clearInterval(timer);
  }, []);
  const elapsed = Math.max(0, now - startedAt);
  const step = [...STEPS].reverse().find((s) => elapsed >= s.from) ?? STEPS[0];

  return (
    <div className="flex flex-col gap-3 rounded-card border border-line bg-surface p-5 shadow-card">
      <div role="status" className="flex items-center gap-3 font-semibold">
        <Spinner className="text-accent" />
        <span>{step.text}</span>
      </div>
      <div aria-hidden="true" className="h-2 overflow-hidden rounded-pill bg-oat-200">
        <div className="h-full w-1/3 animate-pulse rounded-pill bg-accent" style={{ marginLeft: `${((elapsed / 15) % 100) * 0.67}%` }} />
      </div>
      <p className="text-sm text-ink-soft tabular-nums" aria-hidden="true">
        {formatNumber(elapsed / 1000, 1)} s
      </p>
    </div>
  );
}
