import type { ReactNode } from "react";
import type { OutputValue } from "@/lib/calc/types";

export type Row = Record<string, OutputValue>;

/** A column after the first: its heading and what each row shows in it. */
export type Column = { label: string; cell: (row: Row) => ReactNode };

const join = (...parts: (string | false)[]) => parts.filter(Boolean).join(" ") || undefined;

/**
 * A list output as a table: the first column numbers the rows (step 1, 2, …), the others are the
 * columns given. `dense` is for a phone-width table of many columns: narrower gaps, ruled rows,
 * headings at the foot of their cells.
 */
export function RowsTable({
  first,
  columns,
  value,
  rowHead = (_, i) => i + 1,
  dense = false,
  caption,
  testId,
}: {
  first: string;
  columns: readonly Column[];
  value: OutputValue[];
  rowHead?: (row: Row, i: number) => ReactNode;
  dense?: boolean;
  caption?: string;
  testId?: string;
}) {
  const gap = dense ? "pr-2" : "pr-3";
  const heads = [first, ...columns.map((c) => c.label)];
  return (
    <table className="mt-1 w-full text-right text-note" data-testid={testId}>
      {caption ? <caption className="sr-only">{caption}</caption> : null}
      <thead className="font-sans text-muted">
        <tr>
          {heads.map((label, j) => (
            <th key={label} scope="col" className={join(j < heads.length - 1 && gap, j === 0 && "text-left", dense && "align-bottom", "font-normal")}>
              {label}
            </th>
          ))}
        </tr>
      </thead>
      <tbody>
        {value.map((s, i) => {
          const row = s as Row;
          return (
            <tr key={i} className={dense ? "border-t border-rule/60 align-top" : undefined}>
              <th scope="row" className={join(dense && "py-1", gap, "text-left")}>
                {rowHead(row, i)}
              </th>
              {columns.map((c, j) => (
                <td key={c.label} className={join(dense && "py-1", j < columns.length - 1 && gap)}>
                  {c.cell(row)}
                </td>
              ))}
            </tr>
          );
        })}
      </tbody>
    </table>
  );
}
