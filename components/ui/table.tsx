import type { ReactNode } from "react";

export interface Column<Row> {
  key: string;
  header: string;
  cell: (row: Row) => ReactNode;
  align?: "left" | "right";
  /** What the header cell shows when it is more than its text, e.g. a sort button. */
  headerContent?: ReactNode;
  /** The column the rows are sorted by, announced to screen readers. */
  sorted?: "ascending" | "descending";
}

interface TableProps<Row> {
  caption: string;
  columns: Column<Row>[];
  rows: Row[];
  rowKey: (row: Row) => string;
}

/**
 * A data table that scrolls sideways on a phone instead of squeezing its columns; the scrolling
 * frame takes focus, so the arrow keys scroll it too.
 */
export function Table<Row>({ caption, columns, rows, rowKey }: TableProps<Row>) {
  return (
    <div
      tabIndex={0}
      role="region"
      aria-label={`${caption}, scrolls sideways`}
      className="overflow-x-auto rounded-panel border border-ink-200 bg-white shadow-panel"
    >
      <table className="min-w-full text-left text-sm">
        <caption className="sr-only">{caption}</caption>
        <thead className="bg-ink-100 text-ink-700">
          <tr>
            {columns.map((c) => (
              <th key={c.key} scope="col" aria-sort={c.sorted} className={`px-4 py-3 font-semibold ${c.align === "right" ? "text-right" : ""}`}>
                {c.headerContent ?? c.header}
              </th>
            ))}
          </tr>
        </thead>
        <tbody className="divide-y divide-ink-100">
          {rows.map((row) => (
            <tr key={rowKey(row)}>
              {columns.map((c) => (
                <td key={c.key} className={`px-4 py-3 align-top ${c.align === "right" ? "text-right tabular-nums" : ""}`}>
                  {c.cell(row)}
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
