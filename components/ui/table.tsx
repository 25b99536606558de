import type { ReactNode } from "react";
import { classNames } from "@/lib/class-names";
import { ScrollFrame } from "./scroll-frame";

export interface Column<Row> {
  key: string;
  header: string;
  cell: (row: Row) => ReactNode;
  align?: "left" | "right";
  /** What the header cell shows when it is more than its text, e.g. a sort button. */
  headerContent?: ReactNode;
  /** The column the rows are sorted by, announced to screen readers. */
  sorted?: "ascending" | "descending";
  /** Long text (specs, notes, names) that wraps within a readable width; other columns keep each value on one line. */
  wrap?: boolean;
}

interface TableProps<Row> {
  caption: string;
  columns: Column<Row>[];
  rows: Row[];
  rowKey: (row: Row) => string;
}

const cellClasses = (c: Column<unknown>) =>
  classNames(c.align === "right" && "text-right tabular-nums", c.wrap ? "min-w-[12rem] max-w-[24rem]" : "whitespace-nowrap");

/** A data table that scrolls sideways on a phone, with a hint while columns are out of sight, instead of squeezing its columns. */
export function Table<Row>({ caption, columns, rows, rowKey }: TableProps<Row>) {
  return (
    <ScrollFrame label={caption}>
      <table className="min-w-full text-left text-sm">
        <caption className="sr-only">{caption}</caption>
        <thead className="bg-ink-100 text-ink-700">
          <tr>
            {columns.map((c) => (
              <th key={c.key} scope="col" aria-sort={c.sorted} className={classNames("px-4 py-3 font-semibold", cellClasses(c as Column<unknown>))}>
                {c.headerContent ?? c.header}
              </th>
            ))}
          </tr>
        </thead>
        <tbody className="divide-y divide-ink-100">
          {rows.map((row) => (
            <tr key={rowKey(row)}>
              {columns.map((c) => (
                <td key={c.key} className={classNames("px-4 py-3 align-top", cellClasses(c as Column<unknown>))}>
                  {c.cell(row)}
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
    </ScrollFrame>
  );
}
