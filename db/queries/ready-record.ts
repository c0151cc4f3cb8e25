import { and, eq, inArray } from "drizzle-orm";
import type { SQLiteColumn } from "drizzle-orm/sqlite-core";
import { assertCan, type Member } from "@/lib/auth/can";
import { notFound } from "@/lib/errors";
import { faultState } from "@/lib/jobs/fault-state";
import { ReadyChecksError, readyChecks, type ReadyIssue, type ReadyRecord } from "@/lib/jobs/ready-checks";
import type { StatusChangeWithChecks } from "@/lib/jobs/ready-schemas";
import { COLLECTION_STATUS, JOB_STATUS_LABELS } from "@/lib/vocabulary";
import { getDb, type Db } from "../client";
import { faultCandidates, faults, jobs, parts, powerUps } from "../schema";
import { assertJobInWorkshop, type Tx } from "./job-access";
import { appendLog } from "./job-log";
import { changeJobStatus } from "./jobs";

/** The checks before "ready" (lib/jobs/ready-checks.ts) against the stored record, and the way past them with a reason. */

function readyRecord(member: Member, jobId: number, db: Db | Tx): ReadyRecord {
  const scope = (t: { jobId: SQLiteColumn; workshopId: SQLiteColumn }) => and(eq(t.jobId, jobId), eq(t.workshopId, member.workshopId));
  const faultRows = db.select({ id: faults.id, symptom: faults.symptom, resolution: faults.resolution }).from(faults).where(scope(faults)).all();
  const candidates = faultRows.length
    ? db
        .select({ faultId: faultCandidates.faultId, status: faultCandidates.status })
        .from(faultCandidates)
        .where(
          inArray(
            faultCandidates.faultId,
            faultRows.map((f) => f.id),
          ),
        )
        .all()
    : [];
  return {
    parts: db.select({ designator: parts.designator, state: parts.state }).from(parts).where(scope(parts)).all(),
    faults: faultRows.map((f) => ({
      symptom: f.symptom,
      state: faultState({ resolution: f.resolution, candidates: candidates.filter((c) => c.faultId === f.id) }),
    })),
    powerUps: db.select({ outcome: powerUps.outcome }).from(powerUps).where(scope(powerUps)).all(),
  };
}

/** What is still undone before the job goes to its customer; empty when nothing is. */
export function readyIssues(member: Member, jobId: number, db: Db | Tx = getDb()): ReadyIssue[] {
  assertJobInWorkshop(member, jobId, db);
  return readyChecks(readyRecord(member, jobId, db));
}

export interface Override {
  override?: boolean;
  reason?: string | null;
}

/**
 * Refuses with the list of checks (409) unless an owner or technician goes on with a reason. Returns the
 * checks that were overridden, for `recordReadyOverride` once the step is done.
 */
export function assertReadyOrOverride(member: Member, jobId: number, input: Override, db: Db | Tx = getDb()): ReadyIssue[] {
  assertCan(member, "changeStatus", "pass the checks before ready");
  const issues = readyIssues(member, jobId, db);
  if (issues.length && !(input.override && input.reason)) throw new ReadyChecksError(issues);
  return issues;
}

/** The reason and the checks it overrode go to the Log; `what` names the step ("Ready message sent"). */
export function recordReadyOverride(member: Member, jobId: number, issues: readonly ReadyIssue[], reason: string, what: string, tx?: Tx): void {
  if (!issues.length) return;
  const write = (t: Tx) =>
    appendLog(t, member, jobId, "status", `${what} with checks still open — ${issues.map((i) => i.message).join(" ")} Reason: ${reason}`, {
      override: true,
      reason,
      checks: issues.map((i) => i.id),
    });
  if (tx) write(tx);
  else getDb().transaction(write);
}

/** The status change of POST /api/jobs/{id}/status: moving to the collection status ("at-the-counter") passes the checks first. */
export function changeStatusWithChecks(member: Member, jobId: number, input: StatusChangeWithChecks) {
  if (input.status !== COLLECTION_STATUS) return changeJobStatus(member, jobId, input.status);
  assertCan(member, "changeStatus", "change a job's status");
  return getDb().transaction((tx) => {
    const now = tx
      .select({ status: jobs.status })
      .from(jobs)
      .where(and(eq(jobs.id, jobId), eq(jobs.workshopId, member.workshopId)))
      .get();
    if (!now) throw notFound("That job");
    const issues = now.status === COLLECTION_STATUS ? [] : assertReadyOrOverride(member, jobId, input, tx);
    // changeJobStatus opens its own transaction: inside this one it runs as a savepoint.
    const job = changeJobStatus(member, jobId, COLLECTION_STATUS);
    recordReadyOverride(member, jobId, issues, input.reason ?? "", `Moved to “${JOB_STATUS_LABELS[COLLECTION_STATUS]}”`, tx);
    return job;
  });
}
