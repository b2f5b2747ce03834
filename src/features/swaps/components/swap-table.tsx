import { Button } from '../../../components/ui/button';
import type { Swap } from '../../../../shared/schemas/swaps';
import { type RoleLabel, swapFromWords, swapToWords, volumeRatioFigure, volumeRatioWords } from '../../../lib/swap-words';
import { FoodFigures } from '../../../components/ui/food-figures';
import { PublishSwitch } from './publish-switch';
import { TagBadges } from '../../../components/ui/tag-badges';
import { formatKcal, formatMacroG } from '../../../lib/format';

export interface SwapTableProps {
  swaps: Swap[];
  caption: string;
  roleLabel: RoleLabel;
  onEdit: (swap: Swap) => void;
  onDelete: (swap: Swap) => void;
  onTogglePublished: (swap: Swap) => void;
  /** the swap whose publish switch is waiting for the server */
  publishingId: number | null;
}

function swapName(swap: Swap, roleLabel: RoleLabel): string {
  return `${swapFromWords(swap, roleLabel)} to ${swapToWords(swap)}`;
}

function Replaces({ swap, roleLabel }: { swap: Swap; roleLabel: RoleLabel }) {
  return (
    <span className="flex flex-col">
      <span className="font-bold text-ink">{swapFromWords(swap, roleLabel)}</span>
      {swap.fromRole && <span className="text-sm font-normal text-ink-soft">every food in the role</span>}
    </span>
  );
}

/** The coach's library: a table from tablets up, a list of cards on a phone. */
export function SwapTable({ swaps, caption, roleLabel, onEdit, onDelete, onTogglePublished, publishingId }: SwapTableProps) {
  return (
    <>
      <div className="hidden overflow-x-auto rounded-card border border-line bg-surface md:block">
        <table className="w-full border-collapse text-base">
          <caption className="sr-only">{caption}</caption>
          <thead>
            <tr className="border-b border-line bg-oat-100 text-left">
              <th scope="col" className="px-4 py-2.5 font-bold">
                Replaces
              </th>
              <th scope="col" className="px-4 py-2.5 font-bold">
                Use instead
              </th>
              <th scope="col" className="px-4 py-2.5 text-right font-bold whitespace-nowrap">
                Energy <span className="font-semibold text-ink-soft">/ 100 g</span>
              </th>
              <th scope="col" className="px-4 py-2.5 text-right font-bold whitespace-nowrap">
                Protein <span className="font-semibold text-ink-soft">/ 100 g</span>
              </th>
              <th scope="col" className="px-4 py-2.5 font-bold">
                Cooking note
              </th>
              <th scope="col" className="px-4 py-2.5 font-bold">
                Status
              </th>
              <th scope="col" className="px-4 py-2.5 font-bold">
                <span className="sr-only">Actions</span>
              </th>
            </tr>
          </thead>
          <tbody>
            {swaps.map((swap) => (
              <tr key={swap.id} className="border-b border-line align-top last:border-b-0 even:bg-oat-50">
                <th scope="row" className="px-4 py-3 text-left font-normal">
                  <Replaces swap={swap} roleLabel={roleLabel} />
                </th>
                <td className="px-4 py-3">
                  <span className="flex flex-col gap-1">
                    <span className="font-semibold">{swapToWords(swap)}</span>
                    <span className="text-sm text-ink-soft" title={volumeRatioFigure(swap.volumeRatio)}>
                      {volumeRatioWords(swap.volumeRatio)}
                    </span>
                  </span>
                </td>
                <td className="px-4 py-3 text-right font-bold whitespace-nowrap tabular-nums">{swap.toFood ? formatKcal(swap.toFood.kcalPer100g) : '—'}</td>
                <td className="px-4 py-3 text-right font-bold whitespace-nowrap tabular-nums">
                  {swap.toFood ? formatMacroG(swap.toFood.proteinPer100g) : '—'}
                </td>
                <td className="max-w-xs px-4 py-3">
                  <span className="flex flex-col gap-1.5">
                    {swap.note ? <span className="text-ink">{swap.note}</span> : <span className="text-ink-soft">No note</span>}
                    <TagBadges tags={swap.tags} />
                  </span>
                </td>
                <td className="px-4 py-2">
                  <PublishSwitch
                    published={swap.status === 'published'}
                    busy={publishingId === swap.id}
                    onToggle={() => onTogglePublished(swap)}
                    swapName={swapName(swap, roleLabel)}
                  />
                </td>
                <td className="px-4 py-2.5">
                  <span className="flex gap-1">
                    <Button variant="quiet" size="sm" onClick={() => onEdit(swap)}>
                      Edit<span className="sr-only"> {swapName(swap, roleLabel)}</span>
                    </Button>
                    <Button variant="quiet" size="sm" className="text-beet-700" onClick={() => onDelete(swap)}>
                      Delete<span className="sr-only"> {swapName(swap, roleLabel)}</span>
                    </Button>
                  </span>
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>

      <ul aria-label={caption} className="flex flex-col gap-3 md:hidden">
        {swaps.map((swap) => (
          <li key={swap.id} className="flex flex-col gap-3 rounded-card border border-line bg-surface p-4 shadow-card">
            <div className="flex flex-col gap-0.5">
              <Replaces swap={swap} roleLabel={roleLabel} />
              <span className="text-ink">
                <span aria-hidden="true" className="text-accent">
                  →{' '}
                </span>
                <span className="sr-only">replaced with </span>
                <span className="font-semibold">{swapToWords(swap)}</span>
              </span>
              {swap.toFood && (
                <span className="text-sm">
                  <FoodFigures kcalPer100g={swap.toFood.kcalPer100g} proteinPer100g={swap.toFood.proteinPer100g} />
                </span>
              )}
              <span className="text-sm text-ink-soft">{volumeRatioWords(swap.volumeRatio)}</span>
            </div>
            {swap.note && <p className="rounded-field bg-oat-100 px-3 py-2 text-ink">{swap.note}</p>}
            <TagBadges tags={swap.tags} />
            <div className="flex flex-wrap items-center justify-between gap-2 border-t border-line pt-2">
              <PublishSwitch
                published={swap.status === 'published'}
                busy={publishingId === swap.id}
                onToggle={() => onTogglePublished(swap)}
                swapName={swapName(swap, roleLabel)}
              />
              <span className="flex gap-1">
                <Button variant="secondary" size="sm" onClick={() => onEdit(swap)}>
                  Edit<span className="sr-only"> {swapName(swap, roleLabel)}</span>
                </Button>
                <Button variant="quiet" size="sm" className="text-beet-700" onClick={() => onDelete(swap)}>
                  Delete<span className="sr-only"> {swapName(swap, roleLabel)}</span>
                </Button>
              </span>
            </div>
          </li>
        ))}
      </ul>
    </>
  );
}
