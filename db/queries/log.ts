import { and, desc, eq } from "drizzle-orm";
import { assertCan, type Member } from "@/lib/auth/can";
import type { LogEntryValues } from "@/lib/jobs/log-schemas";
import { getDb } from "../client";
import { logEntries, users } from "../schema";
import { assertJobInWorkshop, touchJob } from "./job-access";

/** The dated bench log of a job. Every member may write notes and power-up entries; entries are never edited. */

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

export type LogRow = ReturnType<typeof listLog>[number];

export function addLogEntry(member: Member, jobId: number, input: LogEntryValues) {
  assertCan(member, "addNotes", "write in the log");
  return getDb().transaction((tx) => {
    assertJobInWorkshop(member, jobId, tx);
    const data = input.kind === "power-up" ? { supplyVoltage: input.supplyVoltage, currentDrawn: input.currentDrawn } : null;
    const row = tx
      .insert(logEntries)
      .values({ jobId, workshopId: member.workshopId, authorId: member.userId, kind: input.kind, text: input.text, data })
      .returning({ id: logEntries.id, jobId: logEntries.jobId, kind: logEntries.kind, text: logEntries.text, data: logEntries.data, createdAt: logEntries.createdAt })
      .get();
    touchJob(member, jobId, tx);
    return { ...row, author: { id: member.userId, name: member.name } };
  });
}
