import type { PartKind } from "@/lib/vocabulary";
import { lineAmountMinor } from "@/lib/money";
import { PART_KIND_LABELS } from "./part-schemas";

/**
 * The workshop's order list: every part still to order, across jobs, grouped by supplier. Money follows
 * DEVELOPERS.md "Money": a line is quantity × unit cost in integer minor units (lineAmountMinor, with the
 * quantity as thousandths), a group's total is the sum of its lines. A part with no unit cost is counted
 * as unpriced, never as zero; without prices (apprentices) no amount is computed at all.
 */

export interface OrderPart {
  id: number;
  jobId: number;
  jobNumber: number;
  jobTitle: string;
  designator: string;
  kind: PartKind;
  originalValue: string | null;
  originalRating: string | null;
  replacementValue: string | null;
  replacementRating: string | null;
  quantity: number;
  supplier: string | null;
  supplierPartNumber: string | null;
  /** Absent for a member who may not see prices. */
  unitCostMinor?: number | null;
}

export interface OrderLine extends OrderPart {
  description: string;
  /** quantity × unit cost; null when the part has no unit cost or prices are hidden. */
  lineMinor: number | null;
}

export interface OrderGroup {
  /** The supplier as first written; null for parts with no supplier yet. */
  supplier: string | null;
  key: string;
  lines: OrderLine[];
  jobCount: number;
  /** Sum of the priced lines; null when prices are hidden. */
  totalMinor: number | null;
  /** Lines with no unit cost, left out of the total. */
  unpriced: number;
}

/** Suppliers match whatever their case and spacing: "Valve Cellar " and "valve cellar" are one supplier. */
export function supplierKey(name: string | null | undefined): string {
  return (name ?? "").trim().replace(/\s+/g, " ").toLowerCase();
}

/** "Electrolytic 33 µF 250 V": what the supplier is asked for (the replacement, else the original). */
export function describePart(p: Pick<OrderPart, "kind" | "originalValue" | "originalRating" | "replacementValue" | "replacementRating">): string {
  return [PART_KIND_LABELS[p.kind], p.replacementValue ?? p.originalValue, p.replacementRating ?? p.originalRating].filter(Boolean).join(" ");
}

export function lineMinor(quantity: number, unitCostMinor: number | null | undefined): number | null {
  if (unitCostMinor === null || unitCostMinor === undefined) return null;
  return lineAmountMinor({ quantityMilli: quantity * 1000, unitPriceMinor: unitCostMinor });
}

function sum(amounts: number[]): number {
  const total = amounts.reduce((a, b) => a + b, 0);
  if (!Number.isSafeInteger(total)) throw new RangeError("The order total is too large to hold exactly.");
  return total;
}

/** Groups by supplier (named suppliers A–Z, then the parts with none), lines by job number and designator. */
export function groupOrders(parts: readonly OrderPart[], withPrices: boolean): OrderGroup[] {
  const groups = new Map<string, OrderPart[]>();
  for (const p of parts) {
    const key = supplierKey(p.supplier);
    groups.set(key, [...(groups.get(key) ?? []), p]);
  }
  const collator = new Intl.Collator("en", { numeric: true, sensitivity: "base" });
  return [...groups.entries()]
    .sort(([a], [b]) => (a === "" ? 1 : b === "" ? -1 : collator.compare(a, b)))
    .map(([key, members]) => {
      const lines = [...members]
        .sort((a, b) => a.jobNumber - b.jobNumber || collator.compare(a.designator, b.designator))
        .map((p): OrderLine => ({ ...p, description: describePart(p), lineMinor: withPrices ? lineMinor(p.quantity, p.unitCostMinor) : null }));
      const priced = lines.filter((l) => l.lineMinor !== null).map((l) => l.lineMinor as number);
      return {
        supplier: key === "" ? null : members[0].supplier!.trim(),
        key,
        lines,
        jobCount: new Set(lines.map((l) => l.jobId)).size,
        totalMinor: withPrices ? sum(priced) : null,
        unpriced: withPrices ? lines.length - priced.length : 0,
      };
    });
}
