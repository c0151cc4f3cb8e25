import { and, asc, eq } from "drizzle-orm";
import { can, type Member } from "@/lib/auth/can";
import { forbidden, notFound } from "@/lib/errors";
import { judgeReading } from "@/lib/jobs/reading-verdict";
import type { ReadingValues } from "@/lib/jobs/reading-schemas";
import { getDb } from "../client";
import { readings } from "../schema";
import { assertJobInWorkshop, touchJob } from "./job-access";

/** Resistor survey and voltage test points. Every member may add readings; fixing or removing one is for technicians and owners. */

const readingColumns = {
  id: readings.id,
  jobId: readings.jobId,
  kind: readings.kind,
  designator: readings.designator,
  partDesignators: readings.partDesignators,
  nominal: readings.nominal,
  measured: readings.measured,
  tolerance: readings.tolerance,
  createdAt: readings.createdAt,
};

type StoredReading = { kind: "resistor" | "voltage"; nominal: number; measured: number | null; tolerance: number };

function withVerdict<R extends StoredReading>(row: R) {
  return { ...row, ...judgeReading(row) };
}

export type ReadingRow = ReturnType<typeof listReadings>[number];

export function listReadings(member: Member, jobId: number) {
  assertJobInWorkshop(member, jobId);
  return getDb()
    .select(readingColumns)
    .from(readings)
    .where(and(eq(readings.jobId, jobId), eq(readings.workshopId, member.workshopId)))
    .orderBy(asc(readings.id))
    .all()
    .map(withVerdict);
}

/** An open resistor ("open", "OL") is stored as a null measurement. */
function toRow(input: ReadingValues) {
  return {
    kind: input.kind,
    designator: input.designator,
    // Only a voltage is compared with the ratings of the parts it was taken across.
    partDesignators: input.kind === "voltage" ? (input.partDesignators ?? null) : null,
    nominal: input.nominal,
    measured: input.measured === "open" ? null : input.measured,
    tolerance: input.tolerance,
  };
}

export function createReading(member: Member, jobId: number, input: ReadingValues) {
  if (!can.addNotes(member)) throw forbidden("add readings");
  return getDb().transaction((tx) => {
    assertJobInWorkshop(member, jobId, tx);
    const row = tx
      .insert(readings)
      .values({ ...toRow(input), jobId, workshopId: member.workshopId })
      .returning(readingColumns)
      .get();
    touchJob(member, jobId, tx);
    return withVerdict(row);
  });
}

export function updateReading(member: Member, jobId: number, readingId: number, input: ReadingValues) {
  if (!can.editJobs(member)) throw forbidden("change readings");
  return getDb().transaction((tx) => {
    assertJobInWorkshop(member, jobId, tx);
    const row = tx
      .update(readings)
      .set(toRow(input))
      .where(and(eq(readings.id, readingId), eq(readings.jobId, jobId), eq(readings.workshopId, member.workshopId)))
      .returning(readingColumns)
      .get();
    if (!row) throw notFound("That reading");
    touchJob(member, jobId, tx);
    return withVerdict(row);
  });
}

export function deleteReading(member: Member, jobId: number, readingId: number) {
  if (!can.editJobs(member)) throw forbidden("remove readings");
  getDb().transaction((tx) => {
    assertJobInWorkshop(member, jobId, tx);
    const gone = tx
      .delete(readings)
      .where(and(eq(readings.id, readingId), eq(readings.jobId, jobId), eq(readings.workshopId, member.workshopId)))
      .returning({ id: readings.id })
      .get();
    if (!gone) throw notFound("That reading");
    touchJob(member, jobId, tx);
  });
}
