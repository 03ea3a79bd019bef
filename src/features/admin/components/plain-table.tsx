import type { ReactNode } from "react";
import { cn } from "../../../lib/cn";

export type PlainColumn<T> = {
  header: string;
  cell: (row: T) => ReactNode;
  /** Right-aligned, tabular figures. */
  numeric?: boolean;
};

type PlainTableProps<T> = {
  caption: string;
  columns: PlainColumn<T>[];
  rows: T[];
  rowKey: (row: T) => string;
};

/** A read-only table for the admin panels: a hidden caption, one header row, one row per item. */
export function PlainTable<T>({ caption, columns, rows, rowKey }: PlainTableProps<T>) {
  return (
    <div className="overflow-x-auto px-5 py-3">
      <table className="w-full border-collapse text-sm">
        <caption className="sr-only">{caption}</caption>
        <thead>
          <tr className="border-b border-line-strong text-left text-xs font-semibold text-ink-soft">
            {columns.map((c) => (
              <th key={c.header} scope="col" className={cn("py-2 pr-3 last:pr-0", c.numeric && "text-right")}>
                {c.header}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {rows.map((row) => (
            <tr key={rowKey(row)} className="border-b border-line last:border-b-0">
              {columns.map((c) => (
                <td key={c.header} className={cn("py-1.5 pr-3 last:pr-0", c.numeric && "text-right font-mono text-[0.82rem] tabular-nums")}>
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
