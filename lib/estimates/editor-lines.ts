import { formatQuantity, minorExponent, toDecimalString } from "@/lib/money";
import type { LineKind } from "@/lib/vocabulary";

/** Stored lines back into the editor's typed form ("1.5", "12.50"). */
export function editorLines(
  lines: { kind: LineKind; description: string; quantityMilli: number; unitPriceMinor: number; partId?: number | null }[],
  currency: string,
) {
  const exponent = minorExponent(currency);
  return lines.map((l) => ({
    kind: l.kind,
    description: l.description,
    quantity: formatQuantity(l.quantityMilli),
    unitPrice: l.kind === "labour" ? "" : toDecimalString(l.unitPriceMinor, exponent),
    partId: l.partId ?? null,
  }));
}
