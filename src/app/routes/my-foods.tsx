import { useState } from 'react';
import type { MyFood, SavedFoodResponse } from '../../../shared/schemas/foods';
import { Alert } from '../../components/ui/alert';
import { Button } from '../../components/ui/button';
import { Card } from '../../components/ui/card';
import { EmptyState } from '../../components/ui/empty-state';
import { ErrorState } from '../../components/ui/error-state';
import { Page } from '../../components/ui/page';
import { LoadingState } from '../../components/ui/spinner';
import { errorMessage } from '../../lib/api-client';
import { useDeleteLabelFood } from '../../features/foods/api/delete-label-food';
import { useMyFoods } from '../../features/foods/api/my-foods';
import { LabelFoodForm } from '../../features/foods/components/label-food-form';
import { MyFoodsList } from '../../features/foods/components/my-foods-list';

type Editing = { food: MyFood | null } | null;

export function MyFoodsPage() {
  const foods = useMyFoods();
  const remove = useDeleteLabelFood();
  const [editing, setEditing] = useState<Editing>(null);
  const [notice, setNotice] = useState<{ tone: 'success' | 'caution'; text: string } | null>(null);

  function saved(result: SavedFoodResponse) {
    setEditing(null);
    setNotice(
      result.warnings.length > 0
        ? { tone: 'caution', text: `Saved “${result.name}”. ${result.warnings.join(' ')}` }
        : { tone: 'success', text: `Saved “${result.name}”: recipes that name it now use it, and rewrites can offer it as a swap.` },
    );
  }

  function confirmDelete(food: MyFood) {
    if (!window.confirm(`Delete “${food.name}”? Saved recipe versions that use it keep their numbers.`)) return;
    remove.mutate(food.id, {
      onSuccess: ({ hidden }) =>
        setNotice({
          tone: 'success',
          text: hidden ? `“${food.name}” is gone from your foods; the saved versions that use it keep it.` : `Deleted “${food.name}”.`,
        }),
    });
  }

  return (
    <Page
      title="My foods"
      description="The packaged foods you really buy — the lighter tortilla, the turkey pepperoni, the protein pasta — entered from their Nutrition Facts panel. Recipes that name them use them first, weighed by the label's own measure, and rewrites offer them as swaps."
      actions={
        editing === null && (
          <Button onClick={() => setEditing({ food: null })} aria-label="Add a food from its label">
            Add a food
          </Button>
        )
      }
    >
      <div className="flex flex-col gap-6">
        {notice && (
          <Alert tone={notice.tone} title={notice.tone === 'success' ? 'Done' : 'Saved, with a question'}>
            {notice.text}
          </Alert>
        )}
        {remove.isError && (
          <Alert tone="danger" title="The food wasn't deleted">
            {errorMessage(remove.error)}
          </Alert>
        )}
        {editing && (
          <Card title={editing.food ? `Edit ${editing.food.name}` : 'Add a food from its label'}>
            <LabelFoodForm key={editing.food?.id ?? 'new'} food={editing.food} onSaved={saved} onCancel={() => setEditing(null)} />
          </Card>
        )}
        {foods.isPending ? (
          <LoadingState label="Loading your foods…" />
        ) : foods.isError ? (
          <ErrorState error={foods.error} onRetry={() => void foods.refetch()} retrying={foods.isFetching} />
        ) : foods.data.length === 0 ? (
          editing === null && (
            <EmptyState title="No foods of your own yet" action={<Button onClick={() => setEditing({ food: null })}>Add your first food</Button>}>
              Snap the Nutrition Facts panel of something you buy every week, check the numbers, and save it.
            </EmptyState>
          )
        ) : (
          <MyFoodsList
            foods={foods.data}
            onEdit={(food) => {
              setNotice(null);
              setEditing({ food });
            }}
            onDelete={confirmDelete}
            deletingId={remove.isPending ? (remove.variables ?? null) : null}
          />
        )}
        <p className="text-sm text-ink-soft">
          Values are per serving exactly as printed; Hearthswap keeps them per 100 g. Not medical advice: check allergens on every package.
        </p>
      </div>
    </Page>
  );
}
