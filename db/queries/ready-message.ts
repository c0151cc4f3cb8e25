import { and, eq } from "drizzle-orm";
import { COLLECTION_STATUS, JOB_STATUS_LABELS } from "@/lib/vocabulary";
import { notFound } from "@/lib/errors";
import { can, type Member } from "@/lib/auth/can";
import { readySubject, renderReadyMessage } from "@/lib/mail/ready-message";
import { getDb } from "../client";
import { jobs, workshops } from "../schema";
import { insertLogEntry } from "./log";

/**
 * The customer's "ready to collect" message for one job: the draft from the workshop's template, and
 * the log entry once sent. Only at the job's ready state, only to a customer e-mail on the job.
 */

export type ReadyDraft =
  | { canSend: true; to: string; subject: string; text: string }
  | { canSend: false; blocked: "role" | "status" | "no-email"; reason: string; to: string | null; subject: string; text: string };

export function readyMessageDraft(member: Member, jobId: number): ReadyDraft {
  const row = getDb()
    .select({
      title: jobs.title,
      status: jobs.status,
      customerName: jobs.customerName,
      customerEmail: jobs.customerEmail,
      workshopName: workshops.name,
      phone: workshops.contactPhone,
      address: workshops.address,
      template: workshops.readyMessageTemplate,
    })
    .from(jobs)
    .innerJoin(workshops, eq(workshops.id, jobs.workshopId))
    .where(and(eq(jobs.id, jobId), eq(jobs.workshopId, member.workshopId)))
    .get();
  if (!row) throw notFound("That job");
  const text = renderReadyMessage(row.template, {
    customer: row.customerName ?? "there",
    set: row.title,
    workshop: row.workshopName,
    phone: row.phone ?? "",
    address: row.address ?? "",
  });
  const subject = readySubject(row.workshopName, row.title);
  const base = { to: row.customerEmail, subject, text };
  if (!can(member, "changeStatus")) return { canSend: false, blocked: "role", reason: "Technicians and owners send customers their messages.", ...base };
  if (row.status !== COLLECTION_STATUS)
    return {
      canSend: false,
      blocked: "status",
      reason: `The job is at “${JOB_STATUS_LABELS[row.status]}”; the message can go when it reaches “${JOB_STATUS_LABELS[COLLECTION_STATUS]}”.`,
      ...base,
    };
  if (!row.customerEmail) return { canSend: false, blocked: "no-email", reason: "Add the customer's e-mail to the job first.", ...base };
  return { canSend: true, ...base, to: row.customerEmail };
}

export function recordReadyMessageSent(member: Member, jobId: number, sent: { to: string; subject: string; attachment: string }) {
  insertLogEntry(getDb(), {
    jobId,
    workshopId: member.workshopId,
    authorId: member.userId,
    kind: "mail",
    text: `Collection message e-mailed to ${sent.to}, bench sheet attached.`,
    data: sent,
  });
}
