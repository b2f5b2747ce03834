import type { Swap } from '../../../../shared/schemas/swaps';
import { type RoleLabel, swapFromWords, swapToWords, volumeRatioWords } from '../../../lib/swap-words';
import { FoodFigures } from '../../../components/ui/food-figures';
import { TagBadges } from '../../../components/ui/tag-badges';

/** A coach's published swaps as their client reads them: what changes, its figures, how to cook it. */
export function PublishedSwapList({ swaps, roleLabel, label }: { swaps: Swap[]; roleLabel: RoleLabel; label: string }) {
  return (
    <ul aria-label={label} className="grid gap-3 lg:grid-cols-2">
      {swaps.map((swap) => (
        <li key={swap.id} className="flex flex-col gap-2.5 rounded-card border border-line bg-surface p-4 shadow-card">
          <p className="flex flex-col gap-0.5">
            <span className="text-sm font-bold tracking-wide text-ink-soft uppercase">{swap.fromRole ? 'For any' : 'Instead of'}</span>
            <span className="font-bold text-ink">{swap.fromRole ? roleLabel(swap.fromRole).toLowerCase() : swapFromWords(swap, roleLabel)}</span>
          </p>
          <p className="flex flex-col gap-0.5">
            <span className="text-sm font-bold tracking-wide text-ink-soft uppercase">Use</span>
            <span className="font-bold text-accent-strong">{swapToWords(swap)}</span>
            {swap.toFood && (
              <span className="text-sm">
                <FoodFigures kcalPer100g={swap.toFood.kcalPer100g} proteinPer100g={swap.toFood.proteinPer100g} showDensity />
              </span>
            )}
            <span className="text-sm text-ink-soft">{volumeRatioWords(swap.volumeRatio)}</span>
          </p>
          {swap.note && (
            <p className="rounded-field bg-honey-50 px-3 py-2 text-ink">
              <span className="font-bold">Cooking note: </span>
              {swap.note}
            </p>
          )}
          <TagBadges tags={swap.tags} />
        </li>
      ))}
    </ul>
  );
}
