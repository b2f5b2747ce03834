import type { ReactNode } from 'react';
import { cx } from '../../lib/cx';

export interface TableColumn<Row> {
  key: string;
  header: ReactNode;
  cell: (row: Row) => ReactNode;
  /** numbers line up on the right */
  align?: 'left' | 'right';
  /** this column names the row (rendered as a row header) */
  rowHeader?: boolean;
}

export interface DataTableProps<Row> {
  caption: ReactNode;
  /** hide the caption visually while keeping it for screen readers */
  captionHidden?: boolean;
  columns: TableColumn<Row>[];
  rows: Row[];
  rowKey: (row: Row) => string | number;
  footer?: ReactNode;
  className?: string;
}

export function DataTable<Row>({ caption, captionHidden, columns, rows, rowKey, footer, className }: DataTableProps<Row>) {
  const alignClass = (align?: 'left' | 'right') => (align === 'right' ? 'text-right tabular-nums' : 'text-left');
  return (
    <div className={cx('overflow-x-auto rounded-card border border-line bg-surface', className)}>
      <table className="w-full border-collapse text-sm sm:text-base">
        <caption className={cx('px-4 pt-3 text-left font-bold text-ink', captionHidden && 'sr-only')}>{caption}</caption>
        <thead>
          <tr className="border-b border-line bg-oat-100">
            {columns.map((col) => (
              <th key={col.key} scope="col" className={cx('px-4 py-2.5 font-bold text-ink', alignClass(col.align))}>
                {col.header}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {rows.map((row) => (
            <tr key={rowKey(row)} className="border-b border-line last:border-b-0 even:bg-oat-50">
              {columns.map((col) =>
                col.rowHeader ? (
                  <th key={col.key} scope="row" className={cx('px-4 py-2.5 font-semibold', alignClass(col.align))}>
                    {col.cell(row)}
                  </th>
                ) : (
                  <td key={col.key} className={cx('px-4 py-2.5', alignClass(col.align))}>
                    {col.cell(row)}
                  </td>
                ),
              )}
            </tr>
          ))}
        </tbody>
        {footer && <tfoot className="border-t-2 border-line-strong font-bold">{footer}</tfoot>}
      </table>
    </div>
  );
}
