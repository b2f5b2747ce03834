import { Link } from 'react-router';
import type { MyFood } from '../../../../shared/schemas/foods';
import { Badge } from '../../../components/ui/badge';
import { Button } from '../../../components/ui/button';
import { formatKcal, formatMacroG, formatMg } from '../../../lib/format';
import { roleWords } from '../food-words';

export interface MyFoodsListProps {
  foods: MyFood[];
  onEdit: (food: MyFood) => void;
  onDelete: (food: MyFood) => void;
  deletingId: number | null;
}

function servingWords(food: MyFood) {
  const amount = food.servingSizeG !== null ? `${food.servingSizeG} g` : food.servingSizeMl !== null ? `${food.servingSizeMl} mL` : '';
  return food.servingLabel ? `${food.servingLabel} (${amount})` : amount;
}

/** Your label foods, then your coach's: per serving as the label prints it. */
export function MyFoodsList({ foods, onEdit, onDelete, deletingId }: MyFoodsListProps) {
  return (
    <ul className="flex flex-col divide-y divide-line overflow-hidden rounded-card border border-line bg-surface" aria-label="My foods">
      {foods.map((food) => (
        <li key={food.id} className="grid gap-3 px-4 py-3 sm:grid-cols-[minmax(0,1fr)_auto] sm:items-center">
          <div className="flex min-w-0 flex-col gap-1">
            <span className="flex flex-wrap items-center gap-2">
              <Link to={`/foods/${food.id}`} className="font-bold text-ink underline-offset-2 hover:underline">
                {food.name}
              </Link>
              {food.owner === 'coach' && <Badge tone="honey">From your coach</Badge>}
              {food.roles
                .filter((r) => r !== 'other')
                .map((r) => (
                  <Badge key={r}>{roleWords(r)}</Badge>
                ))}
            </span>
            <span className="text-sm text-ink-soft tabular-nums">
              {servingWords(food)}: {formatKcal(food.label.kcal ?? (food.per100g.kcal * (food.servingSizeG ?? 100)) / 100)} ·{' '}
              {formatMacroG(food.label.proteinG)} protein · {formatMacroG(food.label.carbsG)} carbs · {formatMacroG(food.label.fatG)} fat ·{' '}
              {formatMg(food.label.sodiumMg ?? 0)} sodium
            </span>
          </div>
          {food.owner === 'you' && (
            <div className="flex gap-2">
              <Button size="sm" variant="secondary" onClick={() => onEdit(food)} aria-label={`Edit ${food.name}`}>
                Edit
              </Button>
              <Button
                size="sm"
                variant="danger"
                onClick={() => onDelete(food)}
                loading={deletingId === food.id}
                loadingLabel="Deleting…"
                aria-label={`Delete ${food.name}`}
              >
                Delete
              </Button>
            </div>
          )}
        </li>
      ))}
    </ul>
  );
}
