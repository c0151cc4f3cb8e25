import { and, asc, eq, inArray, isNotNull, sql } from "drizzle-orm";
import { assertCan, can, type Member } from "@/lib/auth/can";
import { ConflictError, NotFoundError, ValidationError } from "@/lib/errors";
import { groupOrders, supplierKey, type OrderPart } from "@/lib/jobs/order-list";
import type { MarkOrdered } from "@/lib/jobs/order-schemas";
import { getDb } from "../client";
import { jobs, parts, workshops } from "../schema";
import { touchJob } from "./job-access";
import { insertLogEntry } from "./log";

/**
 * The workshop-wide order list (lib/jobs/order-list.ts): every part still to order across its jobs.
 * Every member reads it; apprentices get it without prices (no unit cost, no totals). Marking a
 * supplier's group ordered is for technicians and owners, in one transaction that writes each job's Log.
 */

/** The workshop's currency for a member who may see prices, else null (no price leaves the server). */
export function priceCurrency(member: Member): string | null {
  if (!can.seeCharges(member)) return null;
  return getDb().select({ currency: workshops.currency }).from(workshops).where(eq(workshops.id, member.workshopId)).get()?.currency ?? null;
}

function partsToOrder(member: Member, withPrices: boolean): OrderPart[] {
  return getDb()
    .select({
      id: parts.id,
      jobId: parts.jobId,
      jobNumber: jobs.number,
      jobTitle: jobs.title,
      designator: parts.designator,
      kind: parts.kind,
      originalValue: parts.originalValue,
      originalRating: parts.originalRating,
      replacementValue: parts.replacementValue,
      replacementRating: parts.replacementRating,
      quantity: parts.quantity,
      supplier: parts.supplier,
      supplierPartNumber: parts.supplierPartNumber,
      unitCostMinor: parts.unitCostMinor,
    })
    .from(parts)
    .innerJoin(jobs, and(eq(jobs.id, parts.jobId), eq(jobs.workshopId, member.workshopId)))
    .where(and(eq(parts.workshopId, member.workshopId), eq(parts.state, "to-order")))
    .orderBy(asc(jobs.number), asc(parts.id))
    .all()
    .map(({ unitCostMinor, ...p }) => (withPrices ? { ...p, unitCostMinor } : p));
}

/** The suppliers the workshop has used, for the Parts tab's suggestions: one spelling each, A–Z. */
export function listSuppliers(member: Member): string[] {
  const rows = getDb()
    .select({ supplier: sql<string>`min(trim(${parts.supplier}))` })
    .from(parts)
    .where(and(eq(parts.workshopId, member.workshopId), isNotNull(parts.supplier)))
    .groupBy(sql`lower(trim(${parts.supplier}))`)
    .all();
  return rows.map((r) => r.supplier).sort((a, b) => a.localeCompare(b, "en", { sensitivity: "base" }));
}

export function getOrderList(member: Member) {
  const currency = priceCurrency(member);
  const groups = groupOrders(partsToOrder(member, currency !== null), currency !== null);
  return { currency, groups };
}

/**
 * Marks the parts a member saw in one supplier's group as ordered. Every id must be this workshop's (else
 * 404), still to order (else 409: the list moved on since it was loaded) and with that supplier (else 400):
 * otherwise nothing changes. Each job's Log says what was ordered from whom.
 */
export function markGroupOrdered(member: Member, input: MarkOrdered) {
  assertCan(member, "editJobs", "mark parts ordered");
  const ids = [...new Set(input.partIds)];
  return getDb().transaction((tx) => {
    const rows = tx
      .select({
        id: parts.id,
        jobId: parts.jobId,
        jobNumber: jobs.number,
        designator: parts.designator,
        quantity: parts.quantity,
        state: parts.state,
        supplier: parts.supplier,
      })
      .from(parts)
      .innerJoin(jobs, eq(jobs.id, parts.jobId))
      .where(and(eq(parts.workshopId, member.workshopId), inArray(parts.id, ids)))
      .all();
    if (rows.length !== ids.length)
      throw new NotFoundError("Some of these parts were not found in your workshop; reload the order list.", { partIds: "Reload the order list." });
    const moved = rows.filter((r) => r.state !== "to-order");
    if (moved.length) {
      const which = moved.map((r) => `${r.designator} (Job ${r.jobNumber})`).join(", ");
      throw new ConflictError(`${which} ${moved.length > 1 ? "are" : "is"} no longer to order; reload the order list and try again.`, {
        partIds: "Reload the order list.",
      });
    }
    const key = supplierKey(input.supplier);
    const elsewhere = rows.filter((r) => supplierKey(r.supplier) !== key);
    if (elsewhere.length)
      throw new ValidationError(`${elsewhere.map((r) => r.designator).join(", ")} ${elsewhere.length > 1 ? "are" : "is"} not from ${input.supplier}.`, {
        partIds: `Send only ${input.supplier}'s parts.`,
      });
    const now = new Date();
    tx.update(parts)
      .set({ state: "ordered", orderedAt: now })
      .where(and(eq(parts.workshopId, member.workshopId), inArray(parts.id, ids)))
      .run();
    const byJob = new Map<number, typeof rows>();
    for (const r of rows) byJob.set(r.jobId, [...(byJob.get(r.jobId) ?? []), r]);
    for (const [jobId, jobRows] of byJob) {
      const list = jobRows.map((r) => `${r.designator} ×${r.quantity}`).join(", ");
      insertLogEntry(tx, {
        jobId,
        workshopId: member.workshopId,
        authorId: member.userId,
        kind: "part",
        text: `Ordered from ${rows[0].supplier?.trim()}: ${list}.`,
        data: { supplier: rows[0].supplier, partIds: jobRows.map((r) => r.id) },
      });
      touchJob(member, jobId, tx);
    }
    return { ordered: rows.length, jobs: [...new Set(rows.map((r) => r.jobNumber))].sort((a, b) => a - b) };
  });
}
