import { and, eq, sql } from "drizzle-orm";
import type { Member } from "@/lib/auth/can";
import { notFound } from "@/lib/errors";
import { getDb, type DbOrTx } from "../client";
import { jobs } from "../schema";

/** Shared by the job-area query modules: the job must be in the member's workshop, else NotFoundError. */

export type { Tx } from "../client";

export function assertJobInWorkshop(member: Member, jobId: number, db: DbOrTx = getDb()): void {
  const row = db
    .select({ id: jobs.id })
    .from(jobs)
    .where(and(eq(jobs.id, jobId), eq(jobs.workshopId, member.workshopId)))
    .get();
  if (!row) throw notFound("That job");
}

/** Any change to a job's record moves it up the "recently worked on" list. */
export function touchJob(member: Member, jobId: number, db: DbOrTx = getDb()): void {
  db.update(jobs)
    .set({ updatedAt: sql`(unixepoch('subsec') * 1000)` })
    .where(and(eq(jobs.id, jobId), eq(jobs.workshopId, member.workshopId)))
    .run();
}
