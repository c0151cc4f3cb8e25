import Papa from "papaparse";
import { fieldErrors } from "@/lib/field-errors";
import { minorExponent, toDecimalString } from "@/lib/money";
import { partSchema, type PartValues } from "./part-schemas";

/**
 * The parts list as CSV, one part per row under a header. Import is all-or-nothing: any bad row
 * and nothing is added; errors name the row as a spreadsheet numbers it (the header is row 1).
 */

export const CSV_COLUMNS = [
  "designator",
  "kind",
  "original_value",
  "original_rating",
  "replacement_value",
  "replacement_rating",
  "state",
  "quantity",
  "supplier",
  "supplier_part_number",
  "unit_cost",
] as const;

/** Columns whose blank cell is left out: the default ("to-order", 1) or nothing for the ordering details. */
const DEFAULTED = new Set<string>(["state", "quantity", "supplier", "supplier_part_number", "unit_cost"]);

const TO_FIELD: Record<(typeof CSV_COLUMNS)[number], keyof PartValues> = {
  designator: "designator",
  kind: "kind",
  original_value: "originalValue",
  original_rating: "originalRating",
  replacement_value: "replacementValue",
  replacement_rating: "replacementRating",
  state: "state",
  quantity: "quantity",
  supplier: "supplier",
  supplier_part_number: "supplierPartNumber",
  unit_cost: "unitCost",
};

export const MAX_IMPORT_ROWS = 500;

/** A cell a spreadsheet would run as a formula gets a leading apostrophe (CSV injection). */
export function safeCell(v: string | null): string {
  if (!v) return "";
  return /^[=+\-@\t\r]/.test(v) ? `'${v}` : v;
}

type ExportedPart = Omit<PartValues, "unitCost" | "quantity"> & { quantity?: number; unitCostMinor?: number | null };

/** The unit cost column only with `currency` (members who may see prices), as the exact decimal of its minor units. */
export function partsToCsv(parts: ExportedPart[], currency: string | null = null): string {
  const columns = CSV_COLUMNS.filter((c) => currency || c !== "unit_cost");
  const cell = (p: ExportedPart, c: (typeof CSV_COLUMNS)[number]): string | null => {
    if (c === "quantity") return p.quantity === undefined ? null : String(p.quantity);
    if (c === "unit_cost") return p.unitCostMinor == null || !currency ? null : toDecimalString(p.unitCostMinor, minorExponent(currency));
    return (p[TO_FIELD[c] as keyof ExportedPart] as string | null) ?? null;
  };
  const rows = parts.map((p) => columns.map((c) => safeCell(cell(p, c))));
  return Papa.unparse({ fields: [...columns], data: rows }, { newline: "\r\n" });
}

const normaliseHeader = (h: string) =>
  h
    .trim()
    .toLowerCase()
    .replace(/[\s-]+/g, "_");
const unescapeCell = (v: string) => (/^'[=+\-@\t\r]/.test(v) ? v.slice(1) : v);

export type CsvImport = { ok: true; rows: PartValues[] } | { ok: false; message: string; fields: Record<string, string> };

export function parsePartsCsv(text: string): CsvImport {
  const parsed = Papa.parse<Record<string, string>>(text.replace(/^\uFEFF/, ""), {
    header: true,
    skipEmptyLines: false,
    transformHeader: normaliseHeader,
  });
  const headers = parsed.meta.fields ?? [];
  const missing = ["designator", "kind"].filter((h) => !headers.includes(h));
  if (missing.length) {
    return {
      ok: false,
      message: `The header row needs the columns ${missing.join(" and ")} (columns: ${CSV_COLUMNS.join(", ")}).`,
      fields: { header: `Missing column: ${missing.join(", ")}` },
    };
  }
  const unknown = headers.filter((h) => h && !(CSV_COLUMNS as readonly string[]).includes(h));
  if (unknown.length) {
    return {
      ok: false,
      message: `Unknown column${unknown.length > 1 ? "s" : ""}: ${unknown.join(", ")}. Use ${CSV_COLUMNS.join(", ")}.`,
      fields: { header: `Unknown column: ${unknown.join(", ")}` },
    };
  }
  const fields: Record<string, string> = {};
  const rows: PartValues[] = [];
  parsed.data.forEach((record, i) => {
    const rowNumber = i + 2;
    const cells = CSV_COLUMNS.map((c) => (record[c] ?? "").trim());
    if (cells.every((c) => c === "")) return; // blank line
    const candidate: Record<string, string | undefined> = {};
    CSV_COLUMNS.forEach((c, k) => {
      candidate[TO_FIELD[c]] = cells[k] === "" && DEFAULTED.has(c) ? undefined : unescapeCell(cells[k]);
    });
    const result = partSchema.safeParse(candidate);
    if (!result.success) {
      for (const [field, message] of Object.entries(fieldErrors(result.error))) fields[`row.${rowNumber}.${field}`] = `Row ${rowNumber}: ${message}`;
      return;
    }
    rows.push(result.data);
  });
  for (const err of parsed.errors) {
    if (err.code === "UndetectableDelimiter") continue;
    const record = err.row === undefined ? undefined : parsed.data[err.row];
    if (record && Object.values(record).every((v) => (v ?? "").trim() === "")) continue; // a blank line, e.g. the last
    const rowNumber = (err.row ?? 0) + 2;
    fields[`row.${rowNumber}`] ??= `Row ${rowNumber}: ${err.message}`;
  }
  const badRows = new Set(Object.keys(fields).map((k) => k.split(".")[1]));
  if (badRows.size) {
    return { ok: false, message: `${badRows.size} row${badRows.size > 1 ? "s need" : " needs"} attention; nothing was imported.`, fields };
  }
  if (rows.length === 0) return { ok: false, message: "The CSV has a header but no parts.", fields: { csv: "Add at least one part under the header row." } };
  if (rows.length > MAX_IMPORT_ROWS)
    return { ok: false, message: `Import up to ${MAX_IMPORT_ROWS} parts at a time.`, fields: { csv: `This file has ${rows.length} parts.` } };
  return { ok: true, rows };
}
