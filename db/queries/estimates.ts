import { and, asc, desc, eq } from "drizzle-orm";
import { assertCan, type Member } from "@/lib/auth/can";
import { hashToken, newToken } from "@/lib/auth/tokens";
import type { AnswerInput, LinesValues } from "@/lib/estimates/schemas";
import { ConflictError, GoneError, NotFoundError, notFound } from "@/lib/errors";
import { computeTotals, formatMoney } from "@/lib/money";
import { getDb, type DbOrTx } from "../client";
import { estimateLines, estimates, users, workshops } from "../schema";
import { insertLogEntry } from "./log";
import { jobInWorkshop, jobPartsForPricing, moneySettings, priceLines } from "./money-lines";

/**
 * Estimates: prepared by technicians and owners (never apprentices, who see no prices), sent to the customer
 * as a single-use, expiring link whose token is stored only as its SHA-256, and answered without an account.
 */

export const APPROVAL_LINK_DAYS = 14;

function latestEstimate(tx: DbOrTx, workshopId: number, jobId: number) {
  return tx
    .select()
    .from(estimates)
    .where(and(eq(estimates.workshopId, workshopId), eq(estimates.jobId, jobId)))
    .orderBy(desc(estimates.id))
    .limit(1)
    .get();
}

function linesOf(tx: DbOrTx, estimateId: number) {
  return tx.select().from(estimateLines).where(eq(estimateLines.estimateId, estimateId)).orderBy(asc(estimateLines.position)).all();
}

function withTotals<E extends { taxRateBp: number }, L extends { quantityMilli: number; unitPriceMinor: number }>(estimate: E, lines: L[]) {
  const totals = computeTotals(lines, estimate.taxRateBp);
  return {
    ...estimate,
    lines: lines.map((l, i) => ({ ...l, amountMinor: totals.lines[i] })),
    subtotalMinor: totals.subtotalMinor,
    taxMinor: totals.taxMinor,
    totalMinor: totals.totalMinor,
  };
}

/** The job's estimate (latest), its priced lines and totals, plus what the editor needs. */
export function getEstimateForJob(member: Member, jobId: number) {
  assertCan(member, "prepareEstimates", "see estimates");
  const db = getDb();
  const job = jobInWorkshop(db, member.workshopId, jobId);
  if (!job) throw notFound("That job");
  const settings = moneySettings(db, member.workshopId);
  const current = latestEstimate(db, member.workshopId, jobId);
  const { approvalTokenHash: _hash, ...estimate } = current ?? ({} as NonNullable<typeof current>);
  return {
    job,
    settings,
    parts: jobPartsForPricing(db, member.workshopId, jobId),
    estimate: current ? withTotals(estimate, linesOf(db, current.id)) : null,
  };
}

/** Save the editor's lines. Approved estimates stay as the customer saw them; a sent one returns to draft. */
export function saveEstimate(member: Member, jobId: number, input: LinesValues) {
  assertCan(member, "prepareEstimates", "prepare estimates");
  getDb().transaction((tx) => {
    if (!jobInWorkshop(tx, member.workshopId, jobId)) throw notFound("That job");
    const settings = moneySettings(tx, member.workshopId);
    const priced = priceLines(tx, member.workshopId, jobId, input.lines);
    let current = latestEstimate(tx, member.workshopId, jobId);
    if (current?.status === "approved") throw new ConflictError("The customer approved this estimate; put further changes on the invoice.");
    const values = {
      status: "draft" as const,
      currency: settings.currency,
      taxRateBp: settings.taxRateBp,
      approvalTokenHash: null,
      tokenExpiresAt: null,
      respondedAt: null,
    };
    if (current) tx.update(estimates).set(values).where(eq(estimates.id, current.id)).run();
    else
      current = tx
        .insert(estimates)
        .values({ ...values, jobId, workshopId: member.workshopId, createdBy: member.userId })
        .returning()
        .get();
    tx.delete(estimateLines).where(eq(estimateLines.estimateId, current.id)).run();
    if (priced.length)
      tx.insert(estimateLines)
        .values(priced.map((p) => ({ ...p, estimateId: current!.id })))
        .run();
  });
  return getEstimateForJob(member, jobId);
}

/**
 * Mark the estimate sent with a fresh token (any older link stops working) and log it. Returns the token
 * for the e-mail only; it is never stored or answered in an API response.
 */
export function issueApprovalLink(member: Member, jobId: number) {
  assertCan(member, "prepareEstimates", "send estimates");
  return getDb().transaction((tx) => {
    const job = jobInWorkshop(tx, member.workshopId, jobId);
    if (!job) throw notFound("That job");
    const current = latestEstimate(tx, member.workshopId, jobId);
    if (!current) throw new ConflictError("Save an estimate before sending it.");
    if (current.status === "approved") throw new ConflictError("The customer has already approved this estimate.");
    if (!job.customerEmail) throw new ConflictError("Add the customer's e-mail to the job before sending the estimate.");
    const lines = linesOf(tx, current.id);
    if (!lines.length) throw new ConflictError("Add at least one line before sending the estimate.");
    const { token, hash } = newToken();
    const expiresAt = new Date(Date.now() + APPROVAL_LINK_DAYS * 86_400_000);
    tx.update(estimates)
      .set({ status: "sent", approvalTokenHash: hash, tokenExpiresAt: expiresAt, respondedAt: null })
      .where(eq(estimates.id, current.id))
      .run();
    const total = formatMoney(withTotals(current, lines).totalMinor, current.currency);
    // Log entries carry no amounts: apprentices read the Log and never see prices.
    insertLogEntry(tx, {
      jobId,
      workshopId: member.workshopId,
      authorId: member.userId,
      kind: "estimate",
      text: `Estimate sent to ${job.customerEmail} for approval.`,
      data: { estimateId: current.id, event: "sent" },
    });
    return { token, expiresAt, job, total, workshopName: member.workshopName };
  });
}

/** What the customer's link shows. The token is the only credential; a wrong, used or expired one shows nothing priced. */
export function findEstimateByToken(token: string) {
  const db = getDb();
  const row = db
    .select({ estimate: estimates, workshopName: workshops.name, contactEmail: workshops.contactEmail, contactPhone: workshops.contactPhone })
    .from(estimates)
    .innerJoin(workshops, eq(workshops.id, estimates.workshopId))
    .where(eq(estimates.approvalTokenHash, hashToken(token)))
    .get();
  if (!row) return { state: "unknown" as const };
  const { estimate } = row;
  if (estimate.status !== "sent")
    return { state: "answered" as const, status: estimate.status, respondedAt: estimate.respondedAt, workshopName: row.workshopName };
  if (!estimate.tokenExpiresAt || estimate.tokenExpiresAt.getTime() < Date.now())
    return { state: "expired" as const, workshopName: row.workshopName, contactEmail: row.contactEmail };
  const job = jobInWorkshop(db, estimate.workshopId, estimate.jobId)!;
  const { approvalTokenHash: _h, ...safe } = estimate;
  return {
    state: "open" as const,
    workshop: { name: row.workshopName, contactEmail: row.contactEmail, contactPhone: row.contactPhone },
    job: { title: job.title, equipmentKind: job.equipmentKind, year: job.year, customerName: job.customerName },
    estimate: withTotals(safe, linesOf(db, estimate.id)),
  };
}

/** The customer's answer: once only, before expiry; logged on the job. Returns who to tell. */
export function answerEstimate(token: string, decision: AnswerInput["decision"], note?: string) {
  return getDb().transaction((tx) => {
    const estimate = tx
      .select()
      .from(estimates)
      .where(eq(estimates.approvalTokenHash, hashToken(token)))
      .get();
    if (!estimate) throw new NotFoundError("This link is not valid. Ask the workshop to send the estimate again.");
    if (estimate.status !== "sent") throw new GoneError("This estimate has already been answered.");
    if (!estimate.tokenExpiresAt || estimate.tokenExpiresAt.getTime() < Date.now())
      throw new GoneError("This link has expired. Ask the workshop for a new one.");
    const status = decision === "approve" ? "approved" : "declined";
    const respondedAt = new Date();
    // The status guard makes a concurrent second answer update nothing.
    const changed = tx
      .update(estimates)
      .set({ status, respondedAt })
      .where(and(eq(estimates.id, estimate.id), eq(estimates.status, "sent")))
      .run();
    if (changed.changes !== 1) throw new GoneError("This estimate has already been answered.");
    const job = jobInWorkshop(tx, estimate.workshopId, estimate.jobId)!;
    const who = job.customerName ?? "The customer";
    const text = `${who} ${status} the estimate.${note ? ` Their note: “${note}”` : ""}`;
    insertLogEntry(tx, {
      jobId: estimate.jobId,
      workshopId: estimate.workshopId,
      authorId: null,
      kind: "estimate",
      text,
      data: { estimateId: estimate.id, event: status },
    });
    const preparer = estimate.createdBy
      ? tx.select({ email: users.email, name: users.name }).from(users).where(eq(users.id, estimate.createdBy)).get()
      : undefined;
    return { status, text, job, preparer, workshopId: estimate.workshopId };
  });
}
