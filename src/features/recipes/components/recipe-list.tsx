import { Link } from 'react-router';
import type { RecipeSummary } from '../../../../shared/schemas/recipes';
import { formatKcal, formatMacroG } from '../../../lib/format';
import { formatDateTime, formatWhen } from '../../../lib/dates';
import { recipePath } from '../recipe-links';
import { CountBadge, unreadCommentsLabel } from '../../../components/ui/count-badge';
import { countOf } from '../../../lib/words';

function perServing(recipe: RecipeSummary) {
  const figures = recipe.latest?.perServing;
  return {
    kcal: figures ? formatKcal(figures.kcal) : '—',
    protein: figures ? formatMacroG(figures.proteinG) : '—',
  };
}

function versionsText(count: number): string {
  return `${countOf(count, 'version')}`;
}

/** The dish's photo as a small square, or an empty plate of the same size so rows line up. */
function Thumbnail({ recipe, size }: { recipe: RecipeSummary; size: 'sm' | 'md' }) {
  const box = size === 'sm' ? 'size-12' : 'size-16';
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

/** Every recipe in the book: a table from tablets up, a list of cards on a phone. */
function UnreadBadge({ count }: { count: number }) {
  return <CountBadge count={count} label={unreadCommentsLabel(count)} className="ml-2 align-middle" />;
}

/** `unread`: unread comments from the coach by recipe id, shown beside the title. */
export function RecipeList({ recipes, caption, unread }: { recipes: RecipeSummary[]; caption: string; unread?: ReadonlyMap<number, number> }) {
  return (
    <>
      <div className="hidden overflow-x-auto rounded-card border border-line bg-surface sm:block">
        <table className="w-full border-collapse text-base">
          <caption className="sr-only">{caption}</caption>
          <thead>
            <tr className="border-b border-line bg-oat-100 text-left">
              <th scope="col" className="px-4 py-2.5 font-bold">
                Recipe
              </th>
              <th scope="col" className="px-4 py-2.5 text-right font-bold">
                Servings
              </th>
              <th scope="col" className="px-4 py-2.5 text-right font-bold">
                Energy <span className="font-semibold text-ink-soft">/ serving</span>
              </th>
              <th scope="col" className="px-4 py-2.5 text-right font-bold">
                Protein <span className="font-semibold text-ink-soft">/ serving</span>
              </th>
              <th scope="col" className="px-4 py-2.5 text-right font-bold">
                Versions
              </th>
              <th scope="col" className="px-4 py-2.5 font-bold">
                Changed
              </th>
            </tr>
          </thead>
          <tbody>
            {recipes.map((recipe) => {
              const figures = perServing(recipe);
              return (
                <tr key={recipe.id} className="border-b border-line last:border-b-0 even:bg-oat-50 hover:bg-ember-50">
                  <th scope="row" className="px-4 py-3 text-left font-bold">
                    <span className="flex items-center gap-3">
                      <Thumbnail recipe={recipe} size="sm" />
                      <Link to={recipePath(recipe.id)} className="rounded-field text-accent-strong underline-offset-2 hover:underline">
                        {recipe.title}
                      </Link>
                      <UnreadBadge count={unread?.get(recipe.id) ?? 0} />
                    </span>
                  </th>
                  <td className="px-4 py-3 text-right tabular-nums">{recipe.servings}</td>
                  <td className="px-4 py-3 text-right font-bold tabular-nums">{figures.kcal}</td>
                  <td className="px-4 py-3 text-right font-bold tabular-nums">{figures.protein}</td>
                  <td className="px-4 py-3 text-right tabular-nums">{recipe.versionCount}</td>
                  <td className="px-4 py-3 whitespace-nowrap text-ink-soft">
                    <Updated iso={recipe.updatedAt} />
                  </td>
                </tr>
              );
            })}
          </tbody>
        </table>
      </div>

      <ul aria-label={caption} className="flex flex-col gap-3 sm:hidden">
        {recipes.map((recipe) => {
          const figures = perServing(recipe);
          return (
            <li key={recipe.id}>
              <Link to={recipePath(recipe.id)} className="flex flex-col gap-2 rounded-card border border-line bg-surface p-4 shadow-card active:bg-oat-100">
                <span className="flex items-center gap-3">
                  <Thumbnail recipe={recipe} size="md" />
                  <span className="min-w-0 text-lg font-extrabold break-words text-accent-strong">
                    {recipe.title}
                    <UnreadBadge count={unread?.get(recipe.id) ?? 0} />
                  </span>
                </span>
                <span className="flex flex-wrap gap-x-4 gap-y-1 text-sm">
                  <span>
                    <strong className="tabular-nums">{figures.kcal}</strong> · <strong className="tabular-nums">{figures.protein}</strong> protein
                    <span className="text-ink-soft"> per serving</span>
                  </span>
                </span>
                <span className="flex flex-wrap gap-x-3 text-sm text-ink-soft">
                  <span>{recipe.servings} servings</span>
                  <span aria-hidden="true">·</span>
                  <span>{versionsText(recipe.versionCount)}</span>
                  <span aria-hidden="true">·</span>
                  <Updated iso={recipe.updatedAt} />
                </span>
              </Link>
            </li>
          );
        })}
      </ul>
    </>
  );
}
