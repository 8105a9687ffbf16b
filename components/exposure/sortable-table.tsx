"use client";

import { useState, type ReactNode } from "react";

/** One column: its header (with unit), how to read a row's value for sorting, and how to show it. */
export interface Column<R> {
  key: string;
  header: string;
  /** Shown after the header, e.g. "people" or "s". */
  unit?: string;
  align?: "left" | "right";
  /** The value sorted on; null sorts last. */
  value: (row: R) => number | string | null;
  render?: (row: R) => ReactNode;
}

type SortState = { key: string; descending: boolean } | null;

function compare(a: number | string | null, b: number | string | null): number {
  if (a === b) return 0;
  if (a === null) return 1;
  if (b === null) return -1;
  return typeof a === "number" && typeof b === "number" ? a - b : String(a).localeCompare(String(b), "en-GB", { numeric: true });
}

/**
 * A table whose columns sort on click (again to reverse), with the header kept in view while the
 * body scrolls. Totals go in `footer`, which never sorts with the rows.
 */
export function SortableTable<R>({
  caption,
  columns,
  rows,
  rowKey,
  footer,
  testId,
}: {
  caption: string;
  columns: Column<R>[];
  rows: R[];
  rowKey: (row: R) => string;
  footer?: ReactNode[];
  testId?: string;
}) {
  const [sort, setSort] = useState<SortState>(null);
  const column = sort && columns.find((c) => c.key === sort.key);
  const sorted = column ? [...rows].sort((a, b) => compare(column.value(a), column.value(b)) * (sort.descending ? -1 : 1)) : rows;
  const toggle = (key: string) =>
    setSort((current) => (current?.key === key ? { key, descending: !current.descending } : { key, descending: columns.find((c) => c.key === key)?.align === "right" }));

  return (
    <div className="max-h-[32rem] overflow-auto rounded-card border border-line bg-surface">
      <table className="w-full border-collapse text-sm" data-testid={testId}>
        <caption className="sr-only">{caption}</caption>
        <thead>
          <tr>
            {columns.map((c) => {
              const active = sort?.key === c.key;
              return (
                <th
                  key={c.key}
                  scope="col"
                  aria-sort={active ? (sort.descending ? "descending" : "ascending") : "none"}
                  className={`sticky top-0 z-10 border-b border-line bg-surface px-3 py-2 font-semibold text-ink-muted ${c.align === "right" ? "text-right" : "text-left"}`}
                >
                  <button type="button" onClick={() => toggle(c.key)} className="inline-flex items-baseline gap-1 hover:text-ink">
                    <span>{c.header}</span>
                    {c.unit && <span className="font-normal">({c.unit})</span>}
                    <span aria-hidden="true">{active ? (sort.descending ? "▾" : "▴") : ""}</span>
                  </button>
                </th>
              );
            })}
          </tr>
        </thead>
        <tbody>
          {sorted.map((row) => (
            <tr key={rowKey(row)} className="border-t border-line">
              {columns.map((c) => (
                <td key={c.key} className={`px-3 py-1.5 ${c.align === "right" ? "text-right tabular-nums" : ""}`}>
                  {c.render ? c.render(row) : c.value(row)}
                </td>
              ))}
            </tr>
          ))}
        </tbody>
        {footer && (
          <tfoot>
            <tr className="border-t-2 border-line-strong font-semibold">
              {footer.map((cell, index) => (
                <td key={index} className={`px-3 py-1.5 ${columns[index]?.align === "right" ? "text-right tabular-nums" : ""}`}>
                  {cell}
                </td>
              ))}
            </tr>
          </tfoot>
        )}
      </table>
    </div>
  );
}
