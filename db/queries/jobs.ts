import { and, asc, desc, eq, inArray, or, sql, type AnyColumn, type SQL } from "drizzle-orm";
import { FIRST_JOB_STATUS, JOB_STATUS_LABELS, type JobStatus } from "@/lib/vocabulary";
import { assertCan, type Member } from "@/lib/auth/can";
import { notFound } from "@/lib/errors";
import type { JobCreate, JobListQuery, JobUpdate } from "@/lib/jobs/job-schemas";
import { getDb } from "../client";
import { files, jobs } from "../schema";
import { resolveJobCustomer } from "./customers";
import { assertJobInWorkshop } from "./job-access";
import { nextJobNumber } from "./job-numbers";
import { insertLogEntry } from "./log";

/** Jobs: every query here is scoped to the member's workshop and checks the role itself. */

const listColumns = {
  id: jobs.id,
  number: jobs.number,
  title: jobs.title,
  equipmentKind: jobs.equipmentKind,
  maker: jobs.maker,
  model: jobs.model,
  year: jobs.year,
  customerName: jobs.customerName,
  customerId: jobs.customerId,
  status: jobs.status,
  createdAt: jobs.createdAt,
  updatedAt: jobs.updatedAt,
};

const detailColumns = { ...listColumns, customerEmail: jobs.customerEmail, notes: jobs.notes, serialNumber: jobs.serialNumber, accessories: jobs.accessories };

const SORT_COLUMNS = {
  updatedAt: jobs.updatedAt,
  createdAt: jobs.createdAt,
  title: sql`${jobs.title} collate nocase`,
  status: jobs.status,
  equipmentKind: jobs.equipmentKind,
  customerName: sql`${jobs.customerName} collate nocase`,
  year: jobs.year,
} as const;

/** LIKE pattern that matches the text literally (no user wildcards). */
function likePattern(text: string): string {
  return `%${text.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
}

/** One page of the workshop's jobs with filters, search and sorting done in SQL. */
export function searchJobs(member: Member, q: JobListQuery) {
  const db = getDb();
  const where: SQL[] = [eq(jobs.workshopId, member.workshopId)];
  if (q.status?.length) where.push(q.status.length === 1 ? eq(jobs.status, q.status[0]) : inArray(jobs.status, q.status));
  if (q.kind) where.push(eq(jobs.equipmentKind, q.kind));
  if (q.q) {
    const p = likePattern(q.q);
    const like = (col: AnyColumn) => sql`${col} like ${p} escape '\\'`;
    // "12" or "Job 12" also finds job number 12.
    const number = /^(?:job\s*)?(\d{1,9})$/i.exec(q.q);
    where.push(
      or(
        like(jobs.title),
        like(jobs.maker),
        like(jobs.model),
        like(jobs.customerName),
        like(jobs.customerEmail),
        ...(number ? [eq(jobs.number, Number(number[1]))] : []),
      )!,
    );
  }
  const condition = and(...where);
  const order = q.dir === "asc" ? asc : desc;
  const rows = db
    .select(listColumns)
    .from(jobs)
    .where(condition)
    .orderBy(order(SORT_COLUMNS[q.sort]), order(jobs.id))
    .limit(q.pageSize)
    .offset((q.page - 1) * q.pageSize)
    .all();
  const total =
    db
      .select({ n: sql<number>`count(*)` })
      .from(jobs)
      .where(condition)
      .get()?.n ?? 0;
  return { jobs: rows, total, page: q.page, pageSize: q.pageSize };
}

export function findJob(member: Member, jobId: number) {
  return getDb()
    .select(detailColumns)
    .from(jobs)
    .where(and(eq(jobs.id, jobId), eq(jobs.workshopId, member.workshopId)))
    .get();
}

export function getJob(member: Member, jobId: number) {
  const job = findJob(member, jobId);
  if (!job) throw notFound("That job");
  return job;
}

export function createJob(member: Member, input: JobCreate) {
  assertCan(member, "editJobs", "book in jobs");
  return getDb().transaction((tx) => {
    const { customerId, customerName, customerEmail, customerPhone, ...fields } = input;
    const customer = resolveJobCustomer(tx, member, { customerId, customerName, customerEmail, customerPhone }) ?? {
      customerId: null,
      customerName: null,
      customerEmail: null,
    };
    const job = tx
      .insert(jobs)
      .values({ ...fields, ...customer, number: nextJobNumber(tx, member.workshopId), workshopId: member.workshopId, status: FIRST_JOB_STATUS })
      .returning(detailColumns)
      .get();
    insertLogEntry(tx, {
      jobId: job.id,
      workshopId: member.workshopId,
      authorId: member.userId,
      kind: "status",
      text: `${JOB_STATUS_LABELS[FIRST_JOB_STATUS]}: ${job.title}.`,
      data: { to: FIRST_JOB_STATUS },
    });
    return job;
  });
}

export function updateJob(member: Member, jobId: number, input: JobUpdate) {
  assertCan(member, "editJobs", "edit job details");
  getJob(member, jobId);
  return getDb().transaction((tx) => {
    const { customerId, customerName, customerEmail, customerPhone, ...fields } = input;
    const changes = Object.fromEntries(Object.entries(fields).filter(([, v]) => v !== undefined));
    const customer = resolveJobCustomer(tx, member, { customerId, customerName, customerEmail, customerPhone });
    return tx
      .update(jobs)
      .set({ ...changes, ...customer, updatedAt: sql`(unixepoch('subsec') * 1000)` })
      .where(and(eq(jobs.id, jobId), eq(jobs.workshopId, member.workshopId)))
      .returning(detailColumns)
      .get()!;
  });
}

/** Moves a job along the workflow and writes the change to its log, in one transaction. */
export function changeJobStatus(member: Member, jobId: number, status: JobStatus) {
  assertCan(member, "changeStatus", "change a job's status");
  return getDb().transaction((tx) => {
    const before = tx
      .select({ status: jobs.status })
      .from(jobs)
      .where(and(eq(jobs.id, jobId), eq(jobs.workshopId, member.workshopId)))
      .get();
    if (!before) throw notFound("That job");
    const job = tx
      .update(jobs)
      .set({ status, updatedAt: sql`(unixepoch('subsec') * 1000)` })
      .where(and(eq(jobs.id, jobId), eq(jobs.workshopId, member.workshopId)))
      .returning(detailColumns)
      .get()!;
    if (before.status !== status) {
      insertLogEntry(tx, {
        jobId,
        workshopId: member.workshopId,
        authorId: member.userId,
        kind: "status",
        text: `Status: ${JOB_STATUS_LABELS[before.status]} → ${JOB_STATUS_LABELS[status]}.`,
        data: { from: before.status, to: status },
      });
    }
    return job;
  });
}

/** Owners only. Parts, readings, calculations, files and log go with it (foreign-key cascade). */
export function deleteJob(member: Member, jobId: number): { storedNames: string[] } {
  assertCan(member, "deleteJobs");
  return getDb().transaction((tx) => {
    assertJobInWorkshop(member, jobId, tx);
    const stored = tx
      .select({ storedName: files.storedName })
      .from(files)
      .where(and(eq(files.jobId, jobId), eq(files.workshopId, member.workshopId)))
      .all();
    tx.delete(jobs)
      .where(and(eq(jobs.id, jobId), eq(jobs.workshopId, member.workshopId)))
      .run();
    return { storedNames: stored.map((r) => r.storedName) };
  });
}
