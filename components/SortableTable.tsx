"use client";
// A table whose column headers sort it (click again to reverse); the sort is announced with aria-sort.
import { useMemo, useState, type ReactNode } from "react";

export type Column<T> = {
  key: string;
  header: string;
  /** The value to sort by; strings compare naturally ("T10" after "T9"). */
  sortValue: (row: T) => string | number;
  render?: (row: T) => ReactNode;
  align?: "left" | "right";
};

type Props<T> = { caption: string; columns: Column<T>[]; rows: T[]; rowKey: (row: T) => string; initialSort?: string };

const collator = new Intl.Collator(undefined, { numeric: true, sensitivity: "base" });

function compare(a: string | number, b: string | number): number {
  if (typeof a === "number" && typeof b === "number") return a - b;
  return collator.compare(String(a), String(b));
}

export function SortableTable<T>({ caption, columns, rows, rowKey, initialSort }: Props<T>) {
  const [sort, setSort] = useState<{ key: string; dir: 1 | -1 }>({ key: initialSort ?? columns[0].key, dir: 1 });

  const sorted = useMemo(() => {
    const column = columns.find((c) => c.key === sort.key) ?? columns[0];
    // Ties keep the order of the column to the left, so the table reads predictably.
    const tieBreak = columns[0];
    return [...rows].sort((a, b) => sort.dir * compare(column.sortValue(a), column.sortValue(b)) || compare(tieBreak.sortValue(a), tieBreak.sortValue(b)));
  }, [rows, columns, sort]);

  function toggle(key: string) {
    setSort((s) => (s.key === key ? { key, dir: s.dir === 1 ? -1 : 1 } : { key, dir: 1 }));
  }

  return (
    <div className="overflow-x-auto rounded-lg border border-ink/10">
      <table className="w-full min-w-[36rem] border-collapse text-left">
        <caption className="sr-only">{caption}, sortable by any column</caption>
        <thead className="bg-paper-sunk">
          <tr>
            {columns.map((c) => {
              const active = sort.key === c.key;
              return (
                <th key={c.key} scope="col" aria-sort={active ? (sort.dir === 1 ? "ascending" : "descending") : "none"} className="p-0">
                  <button
                    type="button"
                    onClick={() => toggle(c.key)}
                    className={`flex min-h-11 w-full items-center gap-1 px-3 font-semibold text-ink hover:bg-paper ${c.align === "right" ? "justify-end" : ""}`}
                  >
                    {c.header}
                    <span aria-hidden="true" className={active ? "text-turf-dark" : "text-ink-faint"}>
                      {active ? (sort.dir === 1 ? "▲" : "▼") : "↕"}
                    </span>
                  </button>
                </th>
              );
            })}
          </tr>
        </thead>
        <tbody>
          {sorted.map((row) => (
            <tr key={rowKey(row)} className="border-t border-ink/10 odd:bg-paper-raised even:bg-paper">
              {columns.map((c) => (
                <td key={c.key} className={`whitespace-nowrap px-3 py-2.5 ${c.align === "right" ? "text-right tabular-nums" : ""}`}>
                  {c.render ? c.render(row) : c.sortValue(row)}
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
