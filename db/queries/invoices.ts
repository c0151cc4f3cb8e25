import { and, asc, desc, eq, inArray, isNull, sql } from "drizzle-orm";
import { assertCan, type Member } from "@/lib/auth/can";
import type { LinesValues } from "@/lib/estimates/schemas";
import { ConflictError, notFound } from "@/lib/errors";
import { computeTotals } from "@/lib/money";
import { COLLECTION_STATUS, JOB_STATUS_LABELS } from "@/lib/vocabulary";
import { getDb } from "../client";
import { estimateLines, estimates, invoiceLines, invoices, jobs, workshops } from "../schema";
import { touchJob } from "./job-access";
import { insertLogEntry } from "./log";
import { jobInWorkshop, priceLines, type PricedLineRow } from "./money-lines";

/**
 * Invoices are the owner's alone (docs/PRODUCT.md: technicians and apprentices never see them). Numbers run per
 * workshop without gaps: the counter is bumped inside the same transaction that inserts the invoice.
 */

const INVOICEABLE = [COLLECTION_STATUS, "returned"] as const;

export function listInvoicesForJob(member: Member, jobId: number) {
  assertCan(member, "seeMoney", "see invoices");
  if (!jobInWorkshop(getDb(), member.workshopId, jobId)) throw notFound("That job");
  return getDb()
    .select({
      id: invoices.id,
      number: invoices.number,
      status: invoices.status,
      currency: invoices.currency,
      totalMinor: invoices.totalMinor,
      issuedAt: invoices.issuedAt,
      paidAt: invoices.paidAt,
      sentAt: invoices.sentAt,
      viewedAt: invoices.viewedAt,
    })
    .from(invoices)
    .where(and(eq(invoices.workshopId, member.workshopId), eq(invoices.jobId, jobId)))
    .orderBy(desc(invoices.number))
    .all();
}

export function getInvoice(member: Member, invoiceId: number) {
  assertCan(member, "seeMoney", "see invoices");
  const db = getDb();
  const row = db
    .select({
      invoice: invoices,
      workshop: { name: workshops.name, contactEmail: workshops.contactEmail, contactPhone: workshops.contactPhone, address: workshops.address },
    })
    .from(invoices)
    .innerJoin(workshops, eq(workshops.id, invoices.workshopId))
    .where(and(eq(invoices.id, invoiceId), eq(invoices.workshopId, member.workshopId)))
    .get();
  if (!row) throw notFound("That invoice");
  const lines = db.select().from(invoiceLines).where(eq(invoiceLines.invoiceId, invoiceId)).orderBy(asc(invoiceLines.position)).all();
  const job = jobInWorkshop(db, member.workshopId, row.invoice.jobId)!;
  // Neither the payment session nor the pay link's hash leaves the server.
  const { checkoutSessionId: _session, payTokenHash: _pay, ...invoice } = row.invoice;
  const payLinkExpired = !!invoice.payTokenExpiresAt && invoice.payTokenExpiresAt.getTime() < Date.now();
  return { ...invoice, payLinkExpired, lines, job, workshop: row.workshop };
}

function approvedEstimateLines(tx: Pick<ReturnType<typeof getDb>, "select">, workshopId: number, jobId: number) {
  const approved = tx
    .select({ id: estimates.id })
    .from(estimates)
    .where(and(eq(estimates.workshopId, workshopId), eq(estimates.jobId, jobId), eq(estimates.status, "approved")))
    .orderBy(desc(estimates.id))
    .limit(1)
    .get();
  if (!approved) return null;
  const lines = tx.select().from(estimateLines).where(eq(estimateLines.estimateId, approved.id)).orderBy(asc(estimateLines.position)).all();
  return {
    estimateId: approved.id,
    lines: lines.map(({ kind, description, quantityMilli, unitPriceMinor, partId, position }): PricedLineRow => ({
      kind,
      description,
      quantityMilli,
      unitPriceMinor,
      partId,
      position,
    })),
  };
}

/** Issue the job's invoice: from the given lines (the estimate plus changes) or the approved estimate as it stands. */
export function issueInvoice(member: Member, jobId: number, input: { lines?: LinesValues["lines"] }) {
  assertCan(member, "seeMoney", "issue invoices");
  const id = getDb().transaction((tx) => {
    const job = jobInWorkshop(tx, member.workshopId, jobId);
    if (!job) throw notFound("That job");
    if (!(INVOICEABLE as readonly string[]).includes(job.status))
      throw new ConflictError(`Invoice a job once it is “${JOB_STATUS_LABELS[COLLECTION_STATUS]}”: finished and ready for its owner.`);
    const open = tx
      .select({ number: invoices.number })
      .from(invoices)
      .where(and(eq(invoices.workshopId, member.workshopId), eq(invoices.jobId, jobId), inArray(invoices.status, ["issued", "paid"])))
      .get();
    if (open) throw new ConflictError(`This job already has invoice ${open.number}; void it before issuing another.`);
    const approved = approvedEstimateLines(tx, member.workshopId, jobId);
    const lines = input.lines ? priceLines(tx, member.workshopId, jobId, input.lines) : approved?.lines;
    if (!lines?.length) throw new ConflictError("There is no approved estimate to invoice; enter the lines to invoice.");
    // The counter and the invoice move together: a failure below rolls the number back, so there are no gaps.
    const counter = tx
      .update(workshops)
      .set({ lastInvoiceNumber: sql`${workshops.lastInvoiceNumber} + 1` })
      .where(eq(workshops.id, member.workshopId))
      .returning({ number: workshops.lastInvoiceNumber, currency: workshops.currency, taxRateBp: workshops.taxRateBp })
      .get();
    const totals = computeTotals(lines, counter.taxRateBp);
    const invoice = tx
      .insert(invoices)
      .values({
        jobId,
        workshopId: member.workshopId,
        estimateId: approved?.estimateId ?? null,
        number: counter.number,
        currency: counter.currency,
        taxRateBp: counter.taxRateBp,
        subtotalMinor: totals.subtotalMinor,
        taxMinor: totals.taxMinor,
        totalMinor: totals.totalMinor,
        issuedAt: new Date(),
      })
      .returning({ id: invoices.id })
      .get();
    tx.insert(invoiceLines)
      .values(
        lines.map((l, i) => ({
          invoiceId: invoice.id,
          kind: l.kind,
          description: l.description,
          quantityMilli: l.quantityMilli,
          unitPriceMinor: l.unitPriceMinor,
          amountMinor: totals.lines[i],
          position: i,
        })),
      )
      .run();
    // No amounts in the Log: apprentices read it.
    insertLogEntry(tx, {
      jobId,
      workshopId: member.workshopId,
      authorId: member.userId,
      kind: "invoice",
      text: `Invoice ${counter.number} issued.`,
      data: { invoiceId: invoice.id, event: "issued" },
    });
    touchJob(member, jobId, tx);
    return invoice.id;
  });
  return getInvoice(member, id);
}

export function voidInvoice(member: Member, invoiceId: number) {
  assertCan(member, "seeMoney", "void invoices");
  getDb().transaction((tx) => {
    const invoice = tx
      .select()
      .from(invoices)
      .where(and(eq(invoices.id, invoiceId), eq(invoices.workshopId, member.workshopId)))
      .get();
    if (!invoice) throw notFound("That invoice");
    if (invoice.status !== "issued") throw new ConflictError(invoice.status === "paid" ? "A paid invoice cannot be voided." : "This invoice is already void.");
    tx.update(invoices).set({ status: "void" }).where(eq(invoices.id, invoiceId)).run();
    insertLogEntry(tx, {
      jobId: invoice.jobId,
      workshopId: member.workshopId,
      authorId: member.userId,
      kind: "invoice",
      text: `Invoice ${invoice.number} voided.`,
      data: { invoiceId, event: "void" },
    });
  });
  return getInvoice(member, invoiceId);
}

/** What checkout needs, for the owner only; includes the current session id, never sent to the browser. */
export function invoiceForCheckout(member: Member, invoiceId: number) {
  assertCan(member, "seeMoney", "take payments");
  const invoice = getDb()
    .select({
      id: invoices.id,
      number: invoices.number,
      status: invoices.status,
      currency: invoices.currency,
      totalMinor: invoices.totalMinor,
      checkoutSessionId: invoices.checkoutSessionId,
      customerEmail: jobs.customerEmail,
      workshopId: invoices.workshopId,
      workshopName: workshops.name,
    })
    .from(invoices)
    .innerJoin(jobs, eq(jobs.id, invoices.jobId))
    .innerJoin(workshops, eq(workshops.id, invoices.workshopId))
    .where(and(eq(invoices.id, invoiceId), eq(invoices.workshopId, member.workshopId)))
    .get();
  if (!invoice) throw notFound("That invoice");
  if (invoice.status !== "issued") throw new ConflictError(invoice.status === "paid" ? "This invoice is already paid." : "This invoice is void.");
  return invoice;
}

/**
 * Stores a new session id only if the invoice still has the one the caller saw (`previous`): of two payment
 * pages opened at once, one is kept and the other caller is told to use it. False when it lost.
 */
export function recordCheckoutSession(member: Member, invoiceId: number, sessionId: string, previous: string | null): boolean {
  assertCan(member, "seeMoney", "take payments");
  return (
    getDb()
      .update(invoices)
      .set({ checkoutSessionId: sessionId })
      .where(and(eq(invoices.id, invoiceId), eq(invoices.workshopId, member.workshopId), eq(invoices.status, "issued"), sameSession(previous)))
      .run().changes === 1
  );
}

/** The compare half of recordCheckoutSession's compare-and-set; the pay link's recorder uses it too. */
export const sameSession = (previous: string | null) => (previous === null ? isNull(invoices.checkoutSessionId) : eq(invoices.checkoutSessionId, previous));
