import { incompleteTotalsMessage } from '../../../shared/line-status';
import { Alert } from './alert';

/** The banner every view of a recipe shows while some line has no food or weighs 0 g. */
export function IncompleteTotalsAlert({ lineNumbers, className }: { lineNumbers: readonly number[]; className?: string }) {
  const message = incompleteTotalsMessage(lineNumbers);
  if (!message) return null;
  return (
    <Alert tone="caution" title="The totals are incomplete" announce={false} className={className}>
      {message}
    </Alert>
  );
}
