import { and, eq } from "drizzle-orm";
import { NotFoundError, ValidationError } from "@/lib/errors";
import type { LinesValues } from "@/lib/estimates/schemas";
import { lineAmountMinor, minorExponent, parseMoney, parseQuantityMilli } from "@/lib/money";
import type { LineKind } from "@/lib/vocabulary";
import type { DbOrTx } from "../client";
import { jobs, parts, workshops } from "../schema";

/** Shared by estimates and invoices: the workshop's money settings and typed lines turned into priced lines. */

export interface PricedLineRow {
  kind: LineKind;
  description: string;
  quantityMilli: number;
  unitPriceMinor: number;
  partId: number | null;
  position: number;
}

export function moneySettings(tx: DbOrTx, workshopId: number) {
  const row = tx
    .select({ name: workshops.name, currency: workshops.currency, hourlyRateMinor: workshops.hourlyRateMinor, taxRateBp: workshops.taxRateBp })
    .from(workshops)
    .where(eq(workshops.id, workshopId))
    .get();
  if (!row) throw new NotFoundError("Workshop not found.");
  return row;
}

/** The job's parts that can go on an estimate, scoped to the workshop. */
export function jobPartsForPricing(tx: DbOrTx, workshopId: number, jobId: number) {
  return tx
    .select({
      id: parts.id,
      designator: parts.designator,
      kind: parts.kind,
      replacementValue: parts.replacementValue,
      replacementRating: parts.replacementRating,
      unitCostMinor: parts.unitCostMinor,
    })
    .from(parts)
    .where(and(eq(parts.workshopId, workshopId), eq(parts.jobId, jobId)))
    .all();
}

export function jobInWorkshop(tx: DbOrTx, workshopId: number, jobId: number) {
  return tx
    .select({
      id: jobs.id,
      title: jobs.title,
      equipmentKind: jobs.equipmentKind,
      maker: jobs.maker,
      model: jobs.model,
      year: jobs.year,
      customerName: jobs.customerName,
      customerEmail: jobs.customerEmail,
      status: jobs.status,
    })
    .from(jobs)
    .where(and(eq(jobs.id, jobId), eq(jobs.workshopId, workshopId)))
    .get();
}

/** Typed lines → priced lines; every line that cannot be priced is named in one 400. */
export function priceLines(tx: DbOrTx, workshopId: number, jobId: number, input: LinesValues["lines"]): PricedLineRow[] {
  const settings = moneySettings(tx, workshopId);
  const known = new Map(jobPartsForPricing(tx, workshopId, jobId).map((p) => [p.id, p]));
  const fields: Record<string, string> = {};
  const decimals = minorExponent(settings.currency);
  const rows = input.map((line, i): PricedLineRow => {
    const quantityMilli = parseQuantityMilli(line.quantity) ?? 0;
    let unitPriceMinor = 0;
    let partId: number | null = null;
    const typed = line.unitPrice ? parseMoney(line.unitPrice, settings.currency) : null;
    if (line.unitPrice && typed === null) fields[`lines.${i}.unitPrice`] = `Use at most ${decimals} decimals for ${settings.currency}.`;
    if (line.kind === "labour") {
      if (settings.hourlyRateMinor <= 0) fields[`lines.${i}.kind`] = "Set the workshop's hourly rate first.";
      unitPriceMinor = settings.hourlyRateMinor;
    } else if (line.kind === "part") {
      const part = line.partId ? known.get(line.partId) : undefined;
      if (!part) fields[`lines.${i}.partId`] = "That part is not on this job's Parts list.";
      else {
        partId = part.id;
        unitPriceMinor = typed ?? part.unitCostMinor ?? -1;
        if (unitPriceMinor < 0) fields[`lines.${i}.unitPrice`] = "This part has no unit cost yet; enter a price.";
      }
    } else unitPriceMinor = typed ?? 0;
    return { kind: line.kind, description: line.description, quantityMilli, unitPriceMinor, partId, position: i };
  });
  for (const [i, row] of rows.entries()) {
    try {
      lineAmountMinor(row);
    } catch {
      fields[`lines.${i}.quantity`] ??= "This line is too large.";
    }
  }
  if (Object.keys(fields).length) throw new ValidationError("Some lines need attention.", fields);
  return rows;
}
