import { lazy, Suspense } from 'react';
import { LoadingState } from '../../../components/ui/spinner';
import type { RewritePanelProps } from './rewrite-panel';

// The rewrite panel shows only once a recipe is read, so it loads after the Kitchen's first paint
// and keeps the page's first visit inside its script budget.
const RewritePanelModule = lazy(() => import('./rewrite-panel').then((m) => ({ default: m.RewritePanel })));

export function LazyRewritePanel(props: RewritePanelProps) {
  return (
    <Suspense fallback={<LoadingState label="Getting the rewrite ready…" className="min-h-32" />}>
      <RewritePanelModule {...props} />
    </Suspense>
  );
}
