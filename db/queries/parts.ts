import { and, asc, eq } from "drizzle-orm";
import { alias } from "drizzle-orm/sqlite-core";
import { assertCan, can, type Member } from "@/lib/auth/can";
import { ValidationError, forbidden, notFound } from "@/lib/errors";
import type { PartUpdate, PartValues } from "@/lib/jobs/part-schemas";
import { getDb } from "../client";
import { parts, users } from "../schema";
import { assertJobInWorkshop, touchJob } from "./job-access";
import { newPartColumns, partChangeColumns } from "./part-columns";
import { appendLog } from "./job-log";

/**
 * The replacement list of a job. Reading is for every member; changes are for technicians and owners,
 * except that an apprentice may record a part as fitted, which then waits for a technician's check.
 */

export const partColumns = {
  id: parts.id,
  jobId: parts.jobId,
  designator: parts.designator,
  kind: parts.kind,
  originalValue: parts.originalValue,
  originalRating: parts.originalRating,
  replacementValue: parts.replacementValue,
  replacementRating: parts.replacementRating,
  state: parts.state,
  checkedAt: parts.checkedAt,
  createdAt: parts.createdAt,
  quantity: parts.quantity,
  supplier: parts.supplier,
  supplierPartNumber: parts.supplierPartNumber,
  orderedAt: parts.orderedAt,
  unitCostMinor: parts.unitCostMinor,
  originalValueSi: parts.originalValueSi,
  originalRatingSi: parts.originalRatingSi,
  replacementValueSi: parts.replacementValueSi,
  replacementRatingSi: parts.replacementRatingSi,
};

/** Apprentices never see prices (docs/PRODUCT.md "Users and roles"): the unit cost leaves the row for them. */
function priced<T extends { unitCostMinor: number | null }>(member: Member, row: T): Omit<T, "unitCostMinor"> & { unitCostMinor?: number | null } {
  if (can.seeCharges(member)) return row;
  const { unitCostMinor: _hidden, ...rest } = row;
  return rest;
}

const checker = alias(users, "checker");

export type PartRow = ReturnType<typeof listParts>[number];

/** Each part with the technician who checked its fitting, if one has. */
export function listParts(member: Member, jobId: number) {
  assertJobInWorkshop(member, jobId);
  return getDb()
    .select({ ...partColumns, checkerId: checker.id, checkerName: checker.name })
    .from(parts)
    .leftJoin(checker, eq(checker.id, parts.checkedBy))
    .where(and(eq(parts.jobId, jobId), eq(parts.workshopId, member.workshopId)))
    .orderBy(asc(parts.id))
    .all()
    .map(({ checkerId, checkerName, ...p }) => priced(member, { ...p, checkedBy: checkerId === null ? null : { id: checkerId, name: checkerName ?? "" } }));
}

function assertCanEdit(member: Member) {
  assertCan(member, "editJobs", "edit the parts list");
}

export function createPart(member: Member, jobId: number, input: PartValues) {
  assertCanEdit(member);
  return getDb().transaction((tx) => {
    assertJobInWorkshop(member, jobId, tx);
    const part = tx
      .insert(parts)
      .values({ ...newPartColumns(tx, member.workshopId, input), jobId, workshopId: member.workshopId })
      .returning(partColumns)
      .get();
    touchJob(member, jobId, tx);
    return priced(member, part);
  });
}

/** All rows or none: an import that fails part-way leaves the list as it was. */
export function createParts(member: Member, jobId: number, rows: PartValues[]) {
  assertCanEdit(member);
  return getDb().transaction((tx) => {
    assertJobInWorkshop(member, jobId, tx);
    const created = rows.length
      ? tx
          .insert(parts)
          .values(rows.map((r) => ({ ...newPartColumns(tx, member.workshopId, r, "csv"), jobId, workshopId: member.workshopId })))
          .returning(partColumns)
          .all()
      : [];
    touchJob(member, jobId, tx);
    return created.map((p) => priced(member, p));
  });
}

/**
 * Technicians and owners change anything. An apprentice may only record a part as fitted (`{ state: "fitted" }`);
 * only a technician or owner checks it (`checked`). A technician who records the fitting checks it by doing so.
 */
export function updatePart(member: Member, jobId: number, partId: number, input: PartUpdate) {
  const { checked, ...fields } = input;
  const editor = can.editJobs(member);
  if (!editor) {
    const fittingOnly = fields.state === "fitted" && checked === undefined && Object.entries(fields).every(([k, v]) => k === "state" || v === undefined);
    if (!fittingOnly) throw forbidden("edit the parts list (apprentices may record a part as fitted)");
  }
  return getDb().transaction((tx) => {
    assertJobInWorkshop(member, jobId, tx);
    const before = tx
      .select({ state: parts.state, designator: parts.designator, checkedBy: parts.checkedBy })
      .from(parts)
      .where(and(eq(parts.id, partId), eq(parts.jobId, jobId), eq(parts.workshopId, member.workshopId)))
      .get();
    if (!before) throw notFound("That part");
    const state = fields.state ?? before.state;
    if (checked && state !== "fitted")
      throw new ValidationError("Only a fitted part can be checked.", { checked: "Record the part as fitted before checking it." });
    const changes: Record<string, unknown> = partChangeColumns(tx, member, partId, fields);
    const fitting = fields.state === "fitted" && before.state !== "fitted";
    const check = checked ?? (fitting ? editor : state === "fitted" ? undefined : false);
    if (check === true) Object.assign(changes, { checkedBy: member.userId, checkedAt: new Date() });
    if (check === false) Object.assign(changes, { checkedBy: null, checkedAt: null });
    tx.update(parts)
      .set(changes)
      .where(and(eq(parts.id, partId), eq(parts.jobId, jobId), eq(parts.workshopId, member.workshopId)))
      .run();
    if (fitting) {
      const words = editor ? `recorded as fitted and checked by ${member.name}` : `recorded as fitted by ${member.name}, waiting for a technician's check`;
      appendLog(tx, member, jobId, "part", `Part ${before.designator} ${words}.`, { partId });
    } else if (checked === true && before.checkedBy === null) {
      appendLog(tx, member, jobId, "part", `Part ${before.designator}: fitting checked by ${member.name}.`, { partId });
    } else touchJob(member, jobId, tx);
    const part = listParts(member, jobId).find((p) => p.id === partId)!;
    return part;
  });
}

export function deletePart(member: Member, jobId: number, partId: number) {
  assertCan(member, "editJobs", "remove parts");
  getDb().transaction((tx) => {
    assertJobInWorkshop(member, jobId, tx);
    const gone = tx
      .delete(parts)
      .where(and(eq(parts.id, partId), eq(parts.jobId, jobId), eq(parts.workshopId, member.workshopId)))
      .returning({ id: parts.id })
      .get();
    if (!gone) throw notFound("That part");
    touchJob(member, jobId, tx);
  });
}
