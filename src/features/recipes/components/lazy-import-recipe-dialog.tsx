import { lazy, Suspense } from 'react';
import type { ImportRecipeDialogProps } from './import-recipe-dialog';

// The import dialog (with its form checks, react-hook-form and zod) loads when the cook first opens it,
// so the recipe book's first visit does without them.
const ImportRecipeDialogModule = lazy(() => import('./import-recipe-dialog').then((m) => ({ default: m.ImportRecipeDialog })));

export function LazyImportRecipeDialog(props: ImportRecipeDialogProps) {
  return (
    <Suspense fallback={null}>
      <ImportRecipeDialogModule {...props} />
    </Suspense>
  );
}
