import { Link } from 'react-router';
import { buttonClasses } from '../../../components/ui/button';
import { EmptyState } from '../../../components/ui/empty-state';
import { Page } from '../../../components/ui/page';

/** A recipe id that isn't one of the cook's recipes (mistyped, deleted, or someone else's). */
export function RecipeNotFound() {
  return (
    <Page
      title="Recipe not found"
      actions={
        <Link to="/recipes" className={buttonClasses({ variant: 'secondary', size: 'sm' })}>
          ← Recipe book
        </Link>
      }
    >
      <EmptyState title="This recipe isn't in your book">
        The address may be mistyped, or the recipe was deleted. Your recipe book lists every recipe you keep.
      </EmptyState>
    </Page>
  );
}
