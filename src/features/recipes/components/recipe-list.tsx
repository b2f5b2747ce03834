import { Link } from 'react-router';
import type { RecipeSummary } from '../../../../shared/schemas/recipes';
import { formatKcal, formatMacroG } from '../../../lib/format';
import { formatDateTime, formatWhen } from '../../../lib/dates';
import { recipePath } from '../recipe-links';
import { CountBadge, unreadCommentsLabel } from '../../../components/ui/count-badge';
import { DataTable, headerWithUnit } from '../../../components/ui/table';

function perServing(recipe: RecipeSummary) {
  const figures = recipe.latest?.perServing;
  return {
    kcal: figures ? formatKcal(figures.kcal) : '—',
    protein: figures ? formatMacroG(figures.proteinG) : '—',
  };
}

/** The dish's photo as a small square, or an empty plate of the same size so rows line up. */
function Thumbnail({ recipe }: { recipe: RecipeSummary }) {
  const box = 'size-12';
  if (!recipe.thumbnailUrl) return <span aria-hidden="true" className={`${box} shrink-0 rounded-field bg-oat-100`} />;
  return (
    <img src={recipe.thumbnailUrl} alt="" width={240} height={240} loading="lazy" decoding="async" className={`${box} shrink-0 rounded-field object-cover`} />
  );
}

function Updated({ iso }: { iso: string }) {
  return (
    <time dateTime={iso} title={formatDateTime(iso)}>
      {formatWhen(iso)}
    </time>
  );
}

function UnreadBadge({ count }: { count: number }) {
  return <CountBadge count={count} label={unreadCommentsLabel(count)} className="ml-2 align-middle" />;
}

/** Every recipe in the book: a table from tablets up, a card per recipe on a phone. `unread`: unread comments from the coach by recipe id. */
export function RecipeList({ recipes, caption, unread }: { recipes: RecipeSummary[]; caption: string; unread?: ReadonlyMap<number, number> }) {
  return (
    <DataTable
      caption={caption}
      captionHidden
      cardsBelow="sm"
      cardColumns={3}
      rows={recipes}
      rowKey={(recipe) => recipe.id}
      rowClassName={() => 'hover:bg-ember-50'}
      columns={[
        {
          key: 'title',
          header: 'Recipe',
          rowHeader: true,
          className: 'py-3 font-bold',
          cell: (recipe) => (
            <span className="flex items-center gap-3">
              <Thumbnail recipe={recipe} />
              <Link
                to={recipePath(recipe.id)}
                className="min-w-0 rounded-field break-words text-accent-strong underline-offset-2 hover:underline max-sm:text-lg"
              >
                {recipe.title}
              </Link>
              <UnreadBadge count={unread?.get(recipe.id) ?? 0} />
            </span>
          ),
        },
        { key: 'servings', header: 'Servings', align: 'right', className: 'py-3', cell: (recipe) => recipe.servings },
        { key: 'kcal', header: headerWithUnit('Energy', '/ serving'), align: 'right', className: 'py-3 font-bold', cell: (recipe) => perServing(recipe).kcal },
        {
          key: 'protein',
          header: headerWithUnit('Protein', '/ serving'),
          align: 'right',
          className: 'py-3 font-bold',
          cell: (recipe) => perServing(recipe).protein,
        },
        { key: 'versions', header: 'Versions', align: 'right', className: 'py-3', cell: (recipe) => recipe.versionCount },
        {
          key: 'changed',
          header: 'Changed',
          className: 'py-3 whitespace-nowrap text-ink-soft',
          cell: (recipe) => <Updated iso={recipe.updatedAt} />,
        },
      ]}
    />
  );
}
