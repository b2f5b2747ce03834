import { DataTable } from '../../../components/ui/table';
import { Badge } from '../../../components/ui/badge';
import { formatGrams } from '../../../lib/format';
import type { PrepWeight } from '../../../../shared/schemas/prep';
import { portionsWord } from '../prep-words';
import { foodWords } from '../../../lib/shopping-items';

export interface WeightsTableProps {
  perPortion: PrepWeight[];
  batch: PrepWeight[];
  portions: number;
  /** the card's tighter print layout */
  compact?: boolean;
}

function gramsCell(weight: PrepWeight | undefined) {
  if (!weight) return '—';
  if (weight.food.id === null && weight.grams === 0) return <span className="text-ink-soft">not weighed</span>;
  return formatGrams(weight.grams);
}

/** Each line of the version twice over: grams for one portion and grams for the whole batch. */
export function WeightsTable({ perPortion, batch, portions, compact = false }: WeightsTableProps) {
  const totalPortion = perPortion.reduce((sum, w) => sum + w.grams, 0);
  const totalBatch = batch.reduce((sum, w) => sum + w.grams, 0);
  return (
    <DataTable
      caption={`Weights in grams, line for line: one portion and the whole batch of ${portionsWord(portions)}`}
      captionHidden
      density={compact ? 'tight' : 'snug'}
      className="print:overflow-visible print:rounded-none print:border-0"
      rowClassName={() => 'print:even:bg-transparent'}
      rows={perPortion}
      rowKey={(_, i) => i}
      columns={[
        {
          key: 'food',
          header: 'Ingredient',
          rowHeader: true,
          className: 'font-semibold sm:px-4',
          cell: (line) => (
            <>
              <span className="mr-1.5" title={line.food.id === null ? undefined : line.food.name}>
                {foodWords(line.food)}
              </span>
              {line.food.id === null && (
                <Badge tone="honey" title="No catalogue food matched this line; it is not in the nutrition figures.">
                  no match
                </Badge>
              )}
            </>
          ),
        },
        { key: 'portion', header: 'Each portion', align: 'right', className: 'font-extrabold whitespace-nowrap sm:px-4', cell: (line) => gramsCell(line) },
        {
          key: 'batch',
          header: (
            <>
              Whole batch
              <span className="block text-xs font-semibold text-ink-soft">{portionsWord(portions)}</span>
            </>
          ),
          align: 'right',
          className: 'whitespace-nowrap sm:px-4',
          cell: (_, i) => gramsCell(batch[i]),
        },
      ]}
      footer={[
        {
          key: 'all',
          label: 'All lines',
          cells: { portion: <span className="font-extrabold">{formatGrams(totalPortion)}</span>, batch: formatGrams(totalBatch) },
        },
      ]}
    />
  );
}
