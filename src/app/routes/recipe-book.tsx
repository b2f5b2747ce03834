import { Link } from 'react-router';
import { buttonClasses } from '../../components/ui/button';
import { EmptyState } from '../../components/ui/empty-state';
import { Page } from '../../components/ui/page';

export function RecipeBookPage() {
  return (
    <Page
      title="Recipe book"
      description="The recipes you keep, each with the versions you saved along the way: the original, the lighter rewrites, and the one you settled on. From here you can scale a version into a week of batch prep with gram weights per portion and a shopping list."
    >
      <EmptyState
        title="No recipes saved yet"
        action={
          <Link to="/" className={buttonClasses()}>
            Start in the Kitchen
          </Link>
        }
      >
        Analyse a recipe in the Kitchen, keep the version you like, and it lands here.
      </EmptyState>
    </Page>
  );
}
