import { Badge } from '../../../components/ui/badge';
import { formatGrams } from '../../../lib/format';
import type { PrepWeight } from '../../../../shared/schemas/prep';
import { portionsWord } from '../prep-words';

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
  const cell = compact ? 'px-2 py-1' : 'px-3 py-2.5 sm:px-4';
  return (
    <div className="overflow-x-auto rounded-card border border-line bg-surface print:overflow-visible print:rounded-none print:border-0">
      <table className="w-full border-collapse text-sm sm:text-base">
        <caption className="sr-only">Weights in grams, line for line: one portion and the whole batch of {portionsWord(portions)}</caption>
        <thead>
          <tr className="border-b border-line bg-oat-100 print:bg-transparent">
            <th scope="col" className={`${cell} text-left font-bold`}>
              Ingredient
            </th>
            <th scope="col" className={`${cell} text-right font-bold`}>
              Each portion
            </th>
            <th scope="col" className={`${cell} text-right font-bold`}>
              Whole batch
              <span className="block text-xs font-semibold text-ink-soft">{portionsWord(portions)}</span>
            </th>
          </tr>
        </thead>
        <tbody>
          {perPortion.map((line, i) => (
            <tr key={i} className="border-b border-line last:border-b-0 even:bg-oat-50 print:even:bg-transparent">
              <th scope="row" className={`${cell} text-left font-semibold`}>
                <span className="mr-1.5">{line.food.name}</span>
                {line.food.id === null && (
                  <Badge tone="honey" title="No catalogue food matched this line; it is not in the nutrition figures.">
                    no match
                  </Badge>
                )}
              </th>
              <td className={`${cell} text-right font-extrabold whitespace-nowrap tabular-nums`}>{gramsCell(line)}</td>
              <td className={`${cell} text-right whitespace-nowrap tabular-nums`}>{gramsCell(batch[i])}</td>
            </tr>
          ))}
        </tbody>
        <tfoot className="border-t-2 border-line-strong">
          <tr>
            <th scope="row" className={`${cell} text-left font-bold`}>
              All lines
            </th>
            <td className={`${cell} text-right font-extrabold whitespace-nowrap tabular-nums`}>{formatGrams(totalPortion)}</td>
            <td className={`${cell} text-right font-bold whitespace-nowrap tabular-nums`}>{formatGrams(totalBatch)}</td>
          </tr>
        </tfoot>
      </table>
    </div>
  );
}
