import type { ReactNode } from 'react';
import type { Nutrients } from '../../../shared/nutrition';
import { cx } from '../../lib/cx';
import { DataTable } from './table';
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

type Row = { key: string; label: ReactNode; part?: boolean; cells: ReactNode[] };

/** Nutrients down the side, one column per amount (per serving, whole dish, per 100 g). */
export function NutrientTable({ caption, captionHidden, columns, extraRows = [], className }: NutrientTableProps) {
  const rows: Row[] = [
    ...NUTRIENT_ROWS.map((n) => ({ key: n.key, label: n.label, part: n.part, cells: columns.map((c) => n.format(c.values[n.key])) })),
    ...extraRows.map((r) => ({ ...r, part: true })),
  ];
  const extra = new Set(extraRows.map((r) => r.key));
  return (
    <DataTable<Row>
      caption={caption}
      captionHidden={captionHidden}
      look="plain"
      className={className}
      rows={rows}
      rowKey={(r) => r.key}
      columns={[
        {
          key: 'nutrient',
          header: <span className="sr-only">Nutrient</span>,
          rowHeader: true,
          cell: (r) => r.label,
          className: (r) => (r.part ? (extra.has(r.key) ? 'font-semibold text-ink-soft' : 'pl-4 font-semibold text-ink-soft') : 'font-bold text-ink'),
        },
        ...columns.map((c, i) => ({
          key: c.key,
          header: c.header,
          align: 'right' as const,
          headerClassName: 'whitespace-nowrap',
          cell: (r: Row) => r.cells[i],
          className: (r: Row) => cx('whitespace-nowrap', !r.part && 'font-bold'),
        })),
      ]}
    />
  );
}
