import { and, eq } from "drizzle-orm";
import type { Member } from "@/lib/auth/can";
import { ValidationError, notFound } from "@/lib/errors";
import type { PartUpdate, PartValues } from "@/lib/jobs/part-schemas";
import { readPartValues } from "@/lib/jobs/part-values";
import { minorExponent, parseMoney } from "@/lib/money";
import type { DbOrTx } from "../client";
import { parts, workshops } from "../schema";

/**
 * From what a parts form or CSV sends to the columns a part row stores: the typed unit cost in minor
 * units of the workshop's currency (parseMoney, never a float), the value and rating texts read into
 * SI beside them, and the date a part was ordered. Used by db/queries/parts.ts inside its transactions.
 */

type Columns = Partial<typeof parts.$inferInsert>;

function workshopCurrency(tx: DbOrTx, workshopId: number): string {
  return tx.select({ currency: workshops.currency }).from(workshops).where(eq(workshops.id, workshopId)).get()?.currency ?? "GBP";
}

/** "1.20" → 120 (GBP); null clears; a price with more decimals than the currency has is refused, naming `field`. */
function costMinor(tx: DbOrTx, workshopId: number, text: string | null, field: string, label = ""): number | null {
  if (text === null) return null;
  const currency = workshopCurrency(tx, workshopId);
  const minor = parseMoney(text, currency);
  if (minor === null)
    throw new ValidationError("Some fields need attention.", {
      [field]: `${label}Enter a price like 1.20, with at most ${minorExponent(currency)} decimals for ${currency}.`,
    });
  return minor;
}

/** A new part's row; `field` names a bad unit cost (a CSV import: "csv", with the designator in the message). */
export function newPartColumns(tx: DbOrTx, workshopId: number, input: PartValues, field = "unitCost") {
  const { unitCost, ...rest } = input;
  const row = {
    ...rest,
    quantity: rest.quantity ?? 1,
    unitCostMinor: unitCost === undefined ? null : costMinor(tx, workshopId, unitCost, field, field === "unitCost" ? "" : `${input.designator}: `),
    orderedAt: rest.state === "ordered" ? new Date() : null,
  };
  return {
    ...row,
    ...readPartValues({
      kind: row.kind,
      originalValue: row.originalValue ?? null,
      originalRating: row.originalRating ?? null,
      replacementValue: row.replacementValue ?? null,
      replacementRating: row.replacementRating ?? null,
    }),
  };
}

/**
 * The columns a PATCH changes: only what was sent, with the SI values read again whenever a text or the
 * kind changes (from the stored row for what was not sent), and orderedAt following the state.
 */
export function partChangeColumns(tx: DbOrTx, member: Member, partId: number, fields: Omit<PartUpdate, "checked">): Columns {
  const { unitCost, ...rest } = fields;
  const changes: Columns = Object.fromEntries(Object.entries(rest).filter(([, v]) => v !== undefined));
  if (unitCost !== undefined) changes.unitCostMinor = costMinor(tx, member.workshopId, unitCost, "unitCost");
  const texts = ["kind", "originalValue", "originalRating", "replacementValue", "replacementRating"] as const;
  const current = tx
    .select({
      kind: parts.kind,
      originalValue: parts.originalValue,
      originalRating: parts.originalRating,
      replacementValue: parts.replacementValue,
      replacementRating: parts.replacementRating,
      state: parts.state,
    })
    .from(parts)
    .where(and(eq(parts.id, partId), eq(parts.workshopId, member.workshopId)))
    .get();
  if (!current) throw notFound("That part");
  if (texts.some((k) => fields[k] !== undefined)) {
    const merged = Object.fromEntries(texts.map((k) => [k, fields[k] !== undefined ? fields[k] : current[k]])) as unknown as Parameters<
      typeof readPartValues
    >[0];
    Object.assign(changes, readPartValues(merged));
  }
  // Ordered now when it leaves "to order" for "ordered"; back to "to order" forgets the order; fitting keeps the date.
  if (fields.state === "ordered" && current.state === "to-order") changes.orderedAt = new Date();
  if (fields.state === "to-order") changes.orderedAt = null;
  return changes;
}
