import type { Member } from "@/lib/auth/can";
import type { LogKind } from "@/lib/vocabulary";
import { touchJob, type Tx } from "./job-access";
import { insertLogEntry } from "./log";

/**
 * Appends one plain-words line to a job's Log from inside the transaction that made the change, and
 * moves the job up the "recently worked on" list. The bench record's tubes, power-ups, faults, parts
 * checks and "ready" overrides all write through here.
 */
export function appendLog(tx: Tx, member: Member, jobId: number, kind: LogKind, text: string, data: Record<string, unknown> | null = null): void {
  insertLogEntry(tx, { jobId, workshopId: member.workshopId, authorId: member.userId, kind, text, data });
  touchJob(member, jobId, tx);
}
