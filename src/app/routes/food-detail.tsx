import { Link, useLocation, useParams } from 'react-router';
import { EmptyState } from '../../components/ui/empty-state';
import { ErrorState } from '../../components/ui/error-state';
import { Page } from '../../components/ui/page';
import { LoadingState } from '../../components/ui/spinner';
import { buttonClasses } from '../../components/ui/button';
import { useFood } from '../../features/foods/api/get-food';
import { FoodDetailView } from '../../features/foods/components/food-detail-view';
import { isApiError } from '../../lib/api-client';
import { unitSystemOf } from '../../lib/user';
import { useAuth } from '../auth-context';

function backToSearch(state: unknown): string {
  const q = state && typeof state === 'object' && 'fromSearch' in state ? (state as { fromSearch: unknown }).fromSearch : null;
  return typeof q === 'string' && q ? `/foods?${new URLSearchParams({ q })}` : '/foods';
}

export function FoodDetailPage() {
  const { id: idParam } = useParams();
  const location = useLocation();
  const { user } = useAuth();
  const id = /^\d+$/.test(idParam ?? '') ? Number(idParam) : null;
  const food = useFood(id);
  const back = (
    <Link to={backToSearch(location.state)} className={buttonClasses({ variant: 'secondary', size: 'sm' })}>
      ← Back to the search
    </Link>
  );

  if (id === null || (food.isError && isApiError(food.error) && food.error.status === 404)) {
    return (
      <Page title="Food not found" actions={back}>
        <EmptyState title="No such food in the catalogue">The address may be mistyped, or the food was removed. Search the catalogue instead.</EmptyState>
      </Page>
    );
  }
  if (food.isPending) {
    return (
      <Page title="Food" actions={back}>
        <LoadingState label="Opening the food…" />
      </Page>
    );
  }
  if (food.isError) {
    return (
      <Page title="Food" actions={back}>
        <ErrorState title="This food didn't load" error={food.error} onRetry={() => void food.refetch()} retrying={food.isFetching} />
      </Page>
    );
  }
  return (
    <Page title={food.data.name} actions={back}>
      <FoodDetailView food={food.data} unitSystem={unitSystemOf(user)} />
    </Page>
  );
}
