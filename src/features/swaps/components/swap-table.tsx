import { Button } from '../../../components/ui/button';
import type { Swap } from '../../../../shared/schemas/swaps';
import { type RoleLabel, swapFromWords, swapToWords, volumeRatioFigure, volumeRatioWords } from '../../../lib/swap-words';
import { DataTable, headerWithUnit, type TableColumn } from '../../../components/ui/table';
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

function Actions({ swap, roleLabel, onEdit, onDelete }: { swap: Swap; roleLabel: RoleLabel; onEdit: (swap: Swap) => void; onDelete: (swap: Swap) => void }) {
  return (
    <span className="flex gap-1 max-md:justify-end">
      <Button variant="quiet" size="sm" onClick={() => onEdit(swap)}>
        Edit<span className="sr-only"> {swapName(swap, roleLabel)}</span>
      </Button>
      <Button variant="quiet" size="sm" className="text-beet-700" onClick={() => onDelete(swap)}>
        Delete<span className="sr-only"> {swapName(swap, roleLabel)}</span>
      </Button>
    </span>
  );
}

/** A figure of the food swapped in, per 100 g. */
function per100Column(key: string, name: string, figure: (food: NonNullable<Swap['toFood']>) => string): TableColumn<Swap> {
  return {
    key,
    header: headerWithUnit(name, '/ 100 g'),
    align: 'right',
    headerClassName: 'whitespace-nowrap',
    className: 'py-3 font-bold whitespace-nowrap',
    cell: (swap) => (swap.toFood ? figure(swap.toFood) : '—'),
  };
}

/** The coach's library: a table from tablets up, a card per swap on a phone. */
export function SwapTable({ swaps, caption, roleLabel, onEdit, onDelete, onTogglePublished, publishingId }: SwapTableProps) {
  return (
    <DataTable
      caption={caption}
      captionHidden
      cardsBelow="md"
      rows={swaps}
      rowKey={(swap) => swap.id}
      columns={[
        { key: 'from', header: 'Replaces', rowHeader: true, className: 'py-3 font-normal', cell: (swap) => <Replaces swap={swap} roleLabel={roleLabel} /> },
        {
          key: 'to',
          header: 'Use instead',
          cardWide: true,
          className: 'py-3',
          cell: (swap) => (
            <span className="flex flex-col gap-1">
              <span className="font-semibold">{swapToWords(swap)}</span>
              <span className="text-sm text-ink-soft" title={volumeRatioFigure(swap.volumeRatio)}>
                {volumeRatioWords(swap.volumeRatio)}
              </span>
            </span>
          ),
        },
        per100Column('kcal', 'Energy', (food) => formatKcal(food.kcalPer100g)),
        per100Column('protein', 'Protein', (food) => formatMacroG(food.proteinPer100g)),
        {
          key: 'note',
          header: 'Cooking note',
          cardWide: true,
          className: 'py-3 md:max-w-xs',
          cell: (swap) => (
            <span className="flex flex-col gap-1.5">
              {swap.note ? <span className="text-ink">{swap.note}</span> : <span className="text-ink-soft">No note</span>}
              <TagBadges tags={swap.tags} />
            </span>
          ),
        },
        {
          key: 'status',
          header: 'Status',
          cardLabel: false,
          className: 'max-md:self-center',
          cell: (swap) => (
            <PublishSwitch
              published={swap.status === 'published'}
              busy={publishingId === swap.id}
              onToggle={() => onTogglePublished(swap)}
              swapName={swapName(swap, roleLabel)}
            />
          ),
        },
        {
          key: 'actions',
          header: <span className="sr-only">Actions</span>,
          cardLabel: false,
          cell: (swap) => <Actions swap={swap} roleLabel={roleLabel} onEdit={onEdit} onDelete={onDelete} />,
        },
      ]}
    />
  );
}
