import type { CSSProperties, ReactNode } from 'react';
import { cx } from '../../lib/cx';

type ClassFor<Row> = string | ((row: Row, index: number) => string | undefined);

export interface TableColumn<Row> {
  key: string;
  header: ReactNode;
  cell: (row: Row, index: number) => ReactNode;
  /** numbers line up on the right */
  align?: 'left' | 'right';
  /** this column names the row (rendered as a row header, and as the title of its phone card) */
  rowHeader?: boolean;
  /** classes of this column's cells (width, weight, wrapping), fixed or per row */
  className?: ClassFor<Row>;
  headerClassName?: string;
  /** the label above the value on a phone card; the header unless given; false for none */
  cardLabel?: ReactNode | false;
  /** the value takes the card's whole width (the row header always does) */
  cardWide?: boolean;
  /** where the value sits on the card (CSS order; ignored by the table layout) */
  cardOrder?: number;
}

/** A row at the foot (totals): a label in the row-header column and cells by column key. */
export interface TableFooterRow {
  key: string;
  label: ReactNode;
  cells: Record<string, ReactNode>;
  className?: string;
}

export interface DataTableProps<Row> {
  caption: ReactNode;
  /** hide the caption visually while keeping it for screen readers */
  captionHidden?: boolean;
  columns: TableColumn<Row>[];
  rows: readonly Row[];
  rowKey: (row: Row, index: number) => string | number;
  rowClassName?: (row: Row, index: number) => string | undefined;
  footer?: TableFooterRow[];
  /** boxed: a bordered panel with a tinted header row; plain: a ruled list of figures inside a card */
  look?: 'boxed' | 'plain';
  /** every other row tinted (boxed tables, unless told) */
  striped?: boolean;
  /** cell padding: roomy for lists to read, snug for lines of a version, tight for print */
  density?: 'roomy' | 'snug' | 'tight';
  /** below this width each row turns into a card built from the same columns (labels from their headers) */
  cardsBelow?: 'sm' | 'md';
  /** how many values sit side by side on a phone card */
  cardColumns?: 2 | 3;
  /** a table wider than a phone scrolls inside a focusable region with this name */
  scrollLabel?: string;
  className?: string;
  tableClassName?: string;
}

// One set of literal classes per breakpoint, so Tailwind sees every class it must generate.
const CARDS = {
  sm: {
    table: 'max-sm:block',
    head: 'max-sm:hidden',
    body: 'max-sm:flex max-sm:flex-col max-sm:gap-3',
    row: 'max-sm:grid max-sm:gap-x-4 max-sm:gap-y-2 max-sm:rounded-card max-sm:border max-sm:border-line max-sm:bg-surface max-sm:p-4 max-sm:shadow-card',
    foot: 'max-sm:mt-3 max-sm:block max-sm:rounded-card max-sm:border-2 max-sm:border-line-strong max-sm:bg-oat-100',
    footRow: 'max-sm:grid max-sm:grid-cols-3 max-sm:gap-x-4 max-sm:gap-y-1 max-sm:p-4 max-sm:not-last:pb-0',
    cell: 'max-sm:block max-sm:p-0 max-sm:text-left max-sm:whitespace-normal',
    wide: 'max-sm:col-span-full',
    columns: { 2: 'max-sm:grid-cols-2', 3: 'max-sm:grid-cols-3' },
    footWide: 'max-sm:col-span-3',
    empty: 'max-sm:hidden',
    label: 'mb-0.5 block text-xs font-bold tracking-wide text-ink-soft uppercase sm:hidden',
    box: 'max-sm:overflow-visible max-sm:rounded-none max-sm:border-0 max-sm:bg-transparent',
    stripe: 'sm:even:bg-oat-50',
  },
  md: {
    table: 'max-md:block',
    head: 'max-md:hidden',
    body: 'max-md:flex max-md:flex-col max-md:gap-3',
    row: 'max-md:grid max-md:gap-x-4 max-md:gap-y-2 max-md:rounded-card max-md:border max-md:border-line max-md:bg-surface max-md:p-4 max-md:shadow-card',
    foot: 'max-md:mt-3 max-md:block max-md:rounded-card max-md:border-2 max-md:border-line-strong max-md:bg-oat-100',
    footRow: 'max-md:grid max-md:grid-cols-3 max-md:gap-x-4 max-md:gap-y-1 max-md:p-4 max-md:not-last:pb-0',
    cell: 'max-md:block max-md:p-0 max-md:text-left max-md:whitespace-normal',
    wide: 'max-md:col-span-full',
    columns: { 2: 'max-md:grid-cols-2', 3: 'max-md:grid-cols-3' },
    footWide: 'max-md:col-span-3',
    empty: 'max-md:hidden',
    label: 'mb-0.5 block text-xs font-bold tracking-wide text-ink-soft uppercase md:hidden',
    box: 'max-md:overflow-visible max-md:rounded-none max-md:border-0 max-md:bg-transparent',
    stripe: 'md:even:bg-oat-50',
  },
} as const;

const PAD = {
  roomy: 'px-4 py-2.5',
  snug: 'px-3 py-2',
  tight: 'px-2 py-1',
} as const;
const PLAIN_PAD = 'px-2 py-1.5 first:pl-0 last:pr-0';

const alignClass = (align?: 'left' | 'right') => (align === 'right' ? 'text-right tabular-nums' : 'text-left');

function classFor<Row>(value: ClassFor<Row> | undefined, row: Row, index: number): string | undefined {
  return typeof value === 'function' ? value(row, index) : value;
}

/**
 * Every table of the app: a caption, column headers with scope, a row header naming each row, totals at the foot; from the
 * same columns, an optional card per row on a phone (`cardsBelow`), each value under its column's label.
 */
export function DataTable<Row>({
  caption,
  captionHidden,
  columns,
  rows,
  rowKey,
  rowClassName,
  footer,
  look = 'boxed',
  striped = look === 'boxed',
  density = 'roomy',
  cardsBelow,
  cardColumns = 2,
  scrollLabel,
  className,
  tableClassName,
}: DataTableProps<Row>) {
  const cards = cardsBelow ? CARDS[cardsBelow] : null;
  const pad = look === 'plain' ? PLAIN_PAD : PAD[density];
  const order = (col: TableColumn<Row>): CSSProperties | undefined => (cards && col.cardOrder !== undefined ? { order: col.cardOrder } : undefined);
  const label = (col: TableColumn<Row>) => {
    if (!cards || col.rowHeader || col.cardLabel === false) return null;
    return (
      <span aria-hidden="true" className={cards.label}>
        {col.cardLabel ?? col.header}
      </span>
    );
  };
  const rowHeaderIndex = Math.max(
    0,
    columns.findIndex((c) => c.rowHeader),
  );

  return (
    <div
      className={cx('overflow-x-auto', look === 'boxed' && 'rounded-card border border-line bg-surface', look === 'boxed' && cards?.box, className)}
      {...(scrollLabel ? { tabIndex: 0, role: 'region', 'aria-label': scrollLabel } : {})}
    >
      <table className={cx('w-full border-collapse text-sm sm:text-base', cards?.table, tableClassName)}>
        <caption className={cx('text-left font-bold text-ink', look === 'plain' ? 'pb-2' : 'px-4 pt-3', captionHidden && 'sr-only')}>{caption}</caption>
        <thead className={cards?.head}>
          <tr className={look === 'plain' ? 'border-b-2 border-ink text-sm text-ink-soft' : 'border-b border-line bg-oat-100'}>
            {columns.map((col) => (
              <th key={col.key} scope="col" className={cx(pad, 'font-bold', alignClass(col.align), col.headerClassName)}>
                {col.header}
              </th>
            ))}
          </tr>
        </thead>
        <tbody className={cards?.body}>
          {rows.map((row, index) => (
            <tr
              key={rowKey(row, index)}
              className={cx(
                'border-b border-line align-top',
                'last:border-b-0',
                striped && (cards?.stripe ?? 'even:bg-oat-50'),
                cards?.row,
                cards?.columns[cardColumns],
                rowClassName?.(row, index),
              )}
            >
              {columns.map((col) => {
                const cellClass = cx(
                  pad,
                  alignClass(col.align),
                  cards?.cell,
                  (col.rowHeader || col.cardWide) && cards?.wide,
                  classFor(col.className, row, index),
                );
                return col.rowHeader ? (
                  <th key={col.key} scope="row" className={cellClass} style={order(col)}>
                    {col.cell(row, index)}
                  </th>
                ) : (
                  <td key={col.key} className={cellClass} style={order(col)}>
                    {label(col)}
                    {col.cell(row, index)}
                  </td>
                );
              })}
            </tr>
          ))}
        </tbody>
        {footer && footer.length > 0 && (
          <tfoot className={cx('border-t-2 border-line-strong', cards?.foot)}>
            {footer.map((foot) => (
              <tr key={foot.key} className={cx(cards?.footRow, foot.className)}>
                {columns.map((col, i) => {
                  if (i === rowHeaderIndex)
                    return (
                      <th key={col.key} scope="row" className={cx(pad, 'text-left font-bold', cards?.cell, cards?.footWide)}>
                        {foot.label}
                      </th>
                    );
                  const value = foot.cells[col.key];
                  return (
                    <td
                      key={col.key}
                      className={cx(pad, alignClass(col.align), col.align === 'right' && 'whitespace-nowrap', cards?.cell, value === undefined && cards?.empty)}
                    >
                      {value !== undefined && label(col)}
                      {value}
                    </td>
                  );
                })}
              </tr>
            ))}
          </tfoot>
        )}
      </table>
    </div>
  );
}

/** A column header with its unit in a softer weight: "Energy / serving". */
export function headerWithUnit(name: string, unit: string): ReactNode {
  return (
    <>
      {name} <span className="font-semibold text-ink-soft normal-case">{unit}</span>
    </>
  );
}
