import type { ReactNode } from 'react';
import type { Nutrients } from '../../../shared/nutrition';
import { cx } from '../../lib/cx';
import { formatKcal, formatMacroG, formatMg } from '../../lib/format';

interface NutrientRow {
  key: keyof Nutrients;
  label: string;
  format: (value: number) => string;
  /** a part of the row above it (saturated fat of fat, fiber and sugars of carbohydrate) */
  part?: boolean;
}

export const NUTRIENT_ROWS: readonly NutrientRow[] = [
  { key: 'kcal', label: 'Energy', format: formatKcal },
  { key: 'proteinG', label: 'Protein', format: formatMacroG },
  { key: 'carbsG', label: 'Carbohydrate', format: formatMacroG },
  { key: 'fiberG', label: 'Fiber', format: formatMacroG, part: true },
  { key: 'sugarG', label: 'Sugars', format: formatMacroG, part: true },
  { key: 'fatG', label: 'Fat', format: formatMacroG },
  { key: 'satFatG', label: 'Saturated fat', format: formatMacroG, part: true },
  { key: 'sodiumMg', label: 'Sodium', format: formatMg },
];

export interface NutrientColumn {
  key: string;
  header: ReactNode;
  values: Nutrients;
}

export interface NutrientTableProps {
  caption: ReactNode;
  captionHidden?: boolean;
  columns: NutrientColumn[];
  /** rows after the nutrients: weight, volume, water… each with one cell per column */
  extraRows?: { key: string; label: ReactNode; cells: ReactNode[] }[];
  className?: string;
}

/** Nutrients down the side, one column per amount (per serving, whole dish, per 100 g). */
export function NutrientTable({ caption, captionHidden, columns, extraRows = [], className }: NutrientTableProps) {
  return (
    <table className={cx('w-full border-collapse text-sm sm:text-base', className)}>
      <caption className={cx('pb-2 text-left font-bold text-ink', captionHidden && 'sr-only')}>{caption}</caption>
      <thead>
        <tr className="border-b-2 border-ink">
          <th scope="col" className="py-1.5 pr-3 text-left text-sm font-bold text-ink-soft">
            <span className="sr-only">Nutrient</span>
          </th>
          {columns.map((c) => (
            <th key={c.key} scope="col" className="py-1.5 pl-3 text-right text-sm font-bold whitespace-nowrap text-ink-soft">
              {c.header}
            </th>
          ))}
        </tr>
      </thead>
      <tbody>
        {NUTRIENT_ROWS.map((row) => (
          <tr key={row.key} className="border-b border-line">
            <th scope="row" className={cx('py-1.5 pr-3 text-left', row.part ? 'pl-4 font-semibold text-ink-soft' : 'font-bold text-ink')}>
              {row.label}
            </th>
            {columns.map((c) => (
              <td key={c.key} className={cx('py-1.5 pl-3 text-right whitespace-nowrap tabular-nums', !row.part && 'font-bold')}>
                {row.format(c.values[row.key])}
              </td>
            ))}
          </tr>
        ))}
        {extraRows.map((row) => (
          <tr key={row.key} className="border-b border-line last:border-b-0">
            <th scope="row" className="py-1.5 pr-3 text-left font-semibold text-ink-soft">
              {row.label}
            </th>
            {row.cells.map((cell, i) => (
              <td key={i} className="py-1.5 pl-3 text-right whitespace-nowrap tabular-nums">
                {cell}
              </td>
            ))}
          </tr>
        ))}
      </tbody>
    </table>
  );
}
