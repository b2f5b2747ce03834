import { lazy, Suspense } from 'react';
import { LoadingState } from '../../../components/ui/spinner';
import type { BeforeAfterChartProps } from './before-after-chart';

// The charting library is the largest part of the Kitchen; it loads with the first rewrite, not with the page.
const BeforeAfterChartModule = lazy(() => import('./before-after-chart').then((m) => ({ default: m.BeforeAfterChart })));

export function LazyBeforeAfterChart(props: BeforeAfterChartProps) {
  return (
    <Suspense fallback={<LoadingState label="Drawing the chart…" className="min-h-64" />}>
      <BeforeAfterChartModule {...props} />
    </Suspense>
  );
}
