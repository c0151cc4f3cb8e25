import { formatPlain } from "@/lib/bench/display";
import type { OutputValue } from "@/lib/calc/types";
import { RowsTable, type Column, type Row } from "./rows-table";

const COLUMNS: readonly Column[] = [
  { label: "Shunt", cell: (row) => formatPlain(row.resistance, "Ω", 4) },
  { label: "E12", cell: (row) => formatPlain(row.nearestPreferred, "Ω") },
  { label: "Dissipation", cell: (row) => formatPlain(row.dissipation, "W") },
  {
    label: "Rating",
    cell: (row) =>
      row.suggestedRating === null ? <span title="Above the largest standard rating: see the caution">over 100 W</span> : formatPlain(row.suggestedRating, "W"),
  },
];

/** The heater's number in the string, with its type under it. */
function heater(row: Row, i: number) {
  const n = typeof row.index === "number" ? row.index + 1 : i + 1;
  return (
    <>
      {n}
      {typeof row.type === "string" ? <span className="block font-sans font-normal text-muted">{row.type}</span> : null}
    </>
  );
}

/**
 * The heater string's shunt resistors as a compact table: five narrow columns that fit a 390 px phone
 * without scrolling sideways (the heater's type sits under its number rather than in a column of its own).
 */
export function ShuntsTable({ value }: { value: OutputValue[] }) {
  if (value.length === 0) return <span className="font-sans font-normal text-muted">None: every heater is rated for the string current</span>;
  return (
    <RowsTable
      first="Across heater"
      columns={COLUMNS}
      value={value}
      rowHead={heater}
      dense
      caption="One shunt resistor across each heater rated below the string current"
      testId="shunts-table"
    />
  );
}
