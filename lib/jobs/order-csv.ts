import Papa from "papaparse";
import { minorExponent, toDecimalString } from "@/lib/money";
import { lineMinor, type OrderGroup } from "./order-list";
import { safeCell } from "./parts-csv";

/**
 * The order list as CSV for a supplier's order form: one row per supplier part number (the same number
 * on several jobs is one row with the quantities added), or per part where no number is known yet, with
 * the jobs and designators it is for. Prices (exact decimal text of the minor units) only with `currency`.
 */

export const ORDER_CSV_COLUMNS = ["supplier", "supplier_part_number", "description", "quantity", "unit_cost", "line_total", "for"] as const;

interface CsvRow {
  supplier: string;
  number: string;
  description: string;
  quantity: number;
  unitCostMinor: number | null | undefined;
  refs: string[];
}

function rowsOf(group: OrderGroup): CsvRow[] {
  const rows = new Map<string, CsvRow>();
  group.lines.forEach((l, i) => {
    const number = l.supplierPartNumber?.trim() ?? "";
    // Same number and same price: one line on the form. Anything else stays a line of its own.
    const key = number ? `${number.toLowerCase()}|${l.unitCostMinor ?? ""}` : `#${i}`;
    const ref = `Job ${l.jobNumber} ${l.designator}`;
    const row = rows.get(key);
    if (row) {
      row.quantity += l.quantity;
      row.refs.push(ref);
    } else
      rows.set(key, { supplier: group.supplier ?? "", number, description: l.description, quantity: l.quantity, unitCostMinor: l.unitCostMinor, refs: [ref] });
  });
  return [...rows.values()];
}

export function orderGroupsToCsv(groups: readonly OrderGroup[], currency: string | null): string {
  const exponent = currency ? minorExponent(currency) : 0;
  const money = (minor: number | null | undefined) => (minor === null || minor === undefined ? "" : toDecimalString(minor, exponent));
  const columns = ORDER_CSV_COLUMNS.filter((c) => currency || (c !== "unit_cost" && c !== "line_total"));
  const data = groups.flatMap(rowsOf).map((r) => {
    const cells: Record<(typeof ORDER_CSV_COLUMNS)[number], string> = {
      supplier: r.supplier,
      supplier_part_number: r.number,
      description: r.description,
      quantity: String(r.quantity),
      unit_cost: money(r.unitCostMinor),
      line_total: money(lineMinor(r.quantity, r.unitCostMinor)),
      for: r.refs.join(", "),
    };
    return columns.map((c) => safeCell(cells[c]));
  });
  return Papa.unparse({ fields: [...columns], data }, { newline: "\r\n" });
}
