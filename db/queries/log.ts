import { and, desc, eq } from "drizzle-orm";
import { assertCan, type Member } from "@/lib/auth/can";
import type { LogEntryValues } from "@/lib/jobs/log-schemas";
import { getDb, type DbOrTx } from "../client";
import { logEntries, powerUpSteps, powerUps, users } from "../schema";
import { assertJobInWorkshop, touchJob } from "./job-access";

/** The dated bench log of a job. Every member may write notes and power-up entries; entries are never edited. */

const entryColumns = {
  id: logEntries.id,
  jobId: logEntries.jobId,
  kind: logEntries.kind,
  text: logEntries.text,
  data: logEntries.data,
  createdAt: logEntries.createdAt,
};

/**
 * The one way a line enters a job's Log, called inside the transaction that made the change it tells of.
 * `authorId` is null for the customer's answer and the payment service.
 */
export function insertLogEntry(db: DbOrTx, entry: Omit<typeof logEntries.$inferInsert, "id" | "createdAt">) {
  return db.insert(logEntries).values(entry).returning(entryColumns).get();
}

export function listLog(member: Member, jobId: number) {
  assertJobInWorkshop(member, jobId);
  return getDb()
    .select({
      id: logEntries.id,
      jobId: logEntries.jobId,
      kind: logEntries.kind,
      text: logEntries.text,
      data: logEntries.data,
      createdAt: logEntries.createdAt,
      authorId: users.id,
      authorName: users.name,
    })
    .from(logEntries)
    .leftJoin(users, eq(users.id, logEntries.authorId))
    .where(and(eq(logEntries.jobId, jobId), eq(logEntries.workshopId, member.workshopId)))
    .orderBy(desc(logEntries.createdAt), desc(logEntries.id))
    .all()
    .map(({ authorId, authorName, ...rest }) => ({ ...rest, author: authorId === null ? null : { id: authorId, name: authorName ?? "" } }));
}

export function addLogEntry(member: Member, jobId: number, input: LogEntryValues) {
  assertCan(member, "addNotes", "write in the log");
  return getDb().transaction((tx) => {
    assertJobInWorkshop(member, jobId, tx);
    const data = input.kind === "power-up" ? { supplyVoltage: input.supplyVoltage, currentDrawn: input.currentDrawn } : null;
    const row = insertLogEntry(tx, { jobId, workshopId: member.workshopId, authorId: member.userId, kind: input.kind, text: input.text, data });
    // A power-up written in the Log is also a session of the Power-ups tab, as the bench-record migration made of older ones.
    if (input.kind === "power-up") {
      const session = tx
        .insert(powerUps)
        .values({ jobId, workshopId: member.workshopId, authorId: member.userId, logEntryId: row.id, startedAt: row.createdAt })
        .returning({ id: powerUps.id })
        .get();
      tx.insert(powerUpSteps)
        .values({ powerUpId: session.id, supplyVoltage: input.supplyVoltage, currentDrawn: input.currentDrawn, note: input.text, createdAt: row.createdAt })
        .run();
    }
    touchJob(member, jobId, tx);
    return { ...row, author: { id: member.userId, name: member.name } };
  });
}
