"use client";

import { useMemo, useState, type ReactNode } from "react";
import { controlClasses } from "./field";
import { Select, type SelectOption } from "./select";
import { Table, type Column } from "./table";
import { classNames } from "@/lib/class-names";

export interface SortableColumn<Row> extends Column<Row> {
  /** What the column sorts by; a column without it does not sort. */
  sortBy?: (row: Row) => string | number | null;
}

export interface TableFilter<Row> {
  label: string;
  options: SelectOption[];
  valueOf: (row: Row) => string;
}

interface SortableTableProps<Row> {
  caption: string;
  columns: SortableColumn<Row>[];
  rows: Row[];
  rowKey: (row: Row) => string;
  /** The text a search matches against. */
  searchText: (row: Row) => string;
  filters?: TableFilter<Row>[];
  empty: ReactNode;
}

const compare = (a: string | number | null, b: string | number | null) => {
  if (a === null || b === null) return a === b ? 0 : a === null ? 1 : -1;
  return typeof a === "number" && typeof b === "number" ? a - b : String(a).localeCompare(String(b));
};

/** A table the reader can search, filter and sort by any sortable column's header. */
export function SortableTable<Row>({ caption, columns, rows, rowKey, searchText, filters = [], empty }: SortableTableProps<Row>) {
  const [query, setQuery] = useState("");
  const [chosen, setChosen] = useState<string[]>(filters.map(() => ""));
  const [sort, setSort] = useState<{ key: string; descending: boolean } | null>(null);

  const shown = useMemo(() => {
    const words = query.toLowerCase().split(/\s+/).filter(Boolean);
    const kept = rows.filter((row) => {
      const text = searchText(row).toLowerCase();
      return words.every((w) => text.includes(w)) && filters.every((f, i) => chosen[i] === "" || f.valueOf(row) === chosen[i]);
    });
    const column = columns.find((c) => c.key === sort?.key);
    if (!column?.sortBy || !sort) return kept;
    const by = column.sortBy;
    return [...kept].sort((a, b) => compare(by(a), by(b)) * (sort.descending ? -1 : 1));
  }, [rows, query, chosen, sort, columns, filters, searchText]);

  return (
    <div className="space-y-3">
      <div className="flex flex-wrap items-end gap-3">
        <label className="block min-w-[14rem] flex-1 text-sm font-semibold text-ink-800">
          Search
          <input type="search" value={query} onChange={(e) => setQuery(e.target.value)} className={classNames(controlClasses, "mt-1 font-normal")} />
        </label>
        {filters.map((f, i) => (
          <Select
            key={f.label}
            label={f.label}
            options={[{ value: "", label: "All" }, ...f.options]}
            value={chosen[i]}
            onChange={(e) => setChosen((list) => list.map((v, j) => (j === i ? e.target.value : v)))}
          />
        ))}
      </div>
      <p className="text-sm text-ink-500" aria-live="polite">
        Showing {shown.length} of {rows.length}
      </p>
      {shown.length === 0 ? (
        empty
      ) : (
        <Table
          caption={caption}
          rows={shown}
          rowKey={rowKey}
          columns={columns.map((c) => {
            const active = sort?.key === c.key;
            return {
              ...c,
              sorted: active ? (sort.descending ? "descending" : "ascending") : undefined,
              headerContent: c.sortBy ? (
                <button
                  type="button"
                  className="min-h-target font-semibold hover:underline"
                  onClick={() => setSort({ key: c.key, descending: active ? !sort.descending : false })}
                >
                  {c.header} {active ? (sort.descending ? "▼" : "▲") : ""}
                </button>
              ) : undefined,
            };
          })}
        />
      )}
    </div>
  );
}
