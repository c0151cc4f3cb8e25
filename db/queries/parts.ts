import { and, asc, eq } from "drizzle-orm";
import { assertCan, type Member } from "@/lib/auth/can";
import { notFound } from "@/lib/errors";
import type { PartUpdate, PartValues } from "@/lib/jobs/part-schemas";
import { getDb } from "../client";
import { parts } from "../schema";
import { assertJobInWorkshop, touchJob } from "./job-access";

/** The replacement list of a job. Reading is for every member; changes are for technicians and owners. */

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
  createdAt: parts.createdAt,
};

export type PartRow = ReturnType<typeof listParts>[number];

export function listParts(member: Member, jobId: number) {
  assertJobInWorkshop(member, jobId);
  return getDb()
    .select(partColumns)
    .from(parts)
    .where(and(eq(parts.jobId, jobId), eq(parts.workshopId, member.workshopId)))
    .orderBy(asc(parts.id))
    .all();
}

function assertCanEdit(member: Member) {
  assertCan(member, "editJobs", "edit the parts list");
}

export function createPart(member: Member, jobId: number, input: PartValues) {
  assertCanEdit(member);
  return getDb().transaction((tx) => {
    assertJobInWorkshop(member, jobId, tx);
    const part = tx.insert(parts).values({ ...input, jobId, workshopId: member.workshopId }).returning(partColumns).get();
    touchJob(member, jobId, tx);
    return part;
  });
}

/** All rows or none: an import that fails part-way leaves the list as it was. */
export function createParts(member: Member, jobId: number, rows: PartValues[]) {
  assertCanEdit(member);
  return getDb().transaction((tx) => {
    assertJobInWorkshop(member, jobId, tx);
    const created = rows.length
      ? tx.insert(parts).values(rows.map((r) => ({ ...r, jobId, workshopId: member.workshopId }))).returning(partColumns).all()
      : [];
    touchJob(member, jobId, tx);
    return created;
  });
}

export function updatePart(member: Member, jobId: number, partId: number, input: PartUpdate) {
  assertCanEdit(member);
  return getDb().transaction((tx) => {
    assertJobInWorkshop(member, jobId, tx);
    const changes = Object.fromEntries(Object.entries(input).filter(([, v]) => v !== undefined));
    const part = tx
      .update(parts)
      .set(changes)
      .where(and(eq(parts.id, partId), eq(parts.jobId, jobId), eq(parts.workshopId, member.workshopId)))
      .returning(partColumns)
      .get();
    if (!part) throw notFound("That part");
    touchJob(member, jobId, tx);
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
