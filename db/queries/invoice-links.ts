import { and, asc, eq, isNull } from "drizzle-orm";
import { assertCan, type Member } from "@/lib/auth/can";
import { hashToken, newToken } from "@/lib/auth/tokens";
import { ConflictError, GoneError, NotFoundError, notFound } from "@/lib/errors";
import { getDb, type DbOrTx } from "../client";
import { invoiceLines, invoices, jobs, workshops } from "../schema";
import { sameSession } from "./invoices";
import { insertLogEntry } from "./log";

/**
 * The customer's pay link: the owner e-mails an issued invoice with a link the customer opens without an
 * account. Like the estimate link, the token is 32 random bytes of which only the SHA-256 is stored, it
 * expires, and it is used once: once the invoice is paid the link only says thank you. Sending again
 * retires the older link. Log entries carry no amounts (apprentices read the Log).
 */

export const PAY_LINK_DAYS = 30;

const NOT_VALID = "This link is not valid. Ask the workshop to send the invoice again.";

function ownInvoice(tx: DbOrTx, member: Member, invoiceId: number) {
  const row = tx
    .select({
      id: invoices.id,
      number: invoices.number,
      status: invoices.status,
      jobId: invoices.jobId,
      customerEmail: jobs.customerEmail,
      customerName: jobs.customerName,
    })
    .from(invoices)
    .innerJoin(jobs, eq(jobs.id, invoices.jobId))
    .where(and(eq(invoices.id, invoiceId), eq(invoices.workshopId, member.workshopId)))
    .get();
  if (!row) throw notFound("That invoice");
  return row;
}

/**
 * A fresh pay link for an issued invoice; any older one stops working at once, and "viewed" starts over
 * for the new e-mail. Returns the token for the e-mail only: it is never stored or answered in an API response.
 */
export function issuePayLink(member: Member, invoiceId: number) {
  assertCan(member, "seeMoney", "send invoices");
  return getDb().transaction((tx) => {
    const invoice = ownInvoice(tx, member, invoiceId);
    if (invoice.status === "paid") throw new ConflictError("This invoice is already paid; there is nothing to send.");
    if (invoice.status === "void") throw new ConflictError("This invoice is void; issue a new one to send.");
    if (!invoice.customerEmail) throw new ConflictError("Add the customer's e-mail to the job before sending the invoice.");
    const { token, hash } = newToken();
    const expiresAt = new Date(Date.now() + PAY_LINK_DAYS * 86_400_000);
    tx.update(invoices)
      .set({ payTokenHash: hash, payTokenExpiresAt: expiresAt, viewedAt: null })
      .where(and(eq(invoices.id, invoiceId), eq(invoices.status, "issued")))
      .run();
    return { token, expiresAt, to: invoice.customerEmail, customerName: invoice.customerName, number: invoice.number, jobId: invoice.jobId };
  });
}

/** After the mail server took the message: when and to whom, for the owner's invoice page and the Log. */
export function recordInvoiceSent(member: Member, invoiceId: number, to: string) {
  assertCan(member, "seeMoney", "send invoices");
  const sentAt = new Date();
  getDb().transaction((tx) => {
    const invoice = ownInvoice(tx, member, invoiceId);
    tx.update(invoices).set({ sentTo: to, sentAt }).where(eq(invoices.id, invoiceId)).run();
    insertLogEntry(tx, {
      jobId: invoice.jobId,
      workshopId: member.workshopId,
      authorId: member.userId,
      kind: "invoice",
      text: `Invoice ${invoice.number} e-mailed to ${to} with a link to pay by card.`,
      data: { invoiceId, event: "sent" },
    });
  });
  return sentAt;
}

function byToken(tx: DbOrTx, token: string) {
  return tx
    .select({
      invoice: invoices,
      workshop: { name: workshops.name, contactEmail: workshops.contactEmail, contactPhone: workshops.contactPhone },
      job: { title: jobs.title, equipmentKind: jobs.equipmentKind, year: jobs.year, customerName: jobs.customerName, customerEmail: jobs.customerEmail },
    })
    .from(invoices)
    .innerJoin(workshops, eq(workshops.id, invoices.workshopId))
    .innerJoin(jobs, eq(jobs.id, invoices.jobId))
    .where(eq(invoices.payTokenHash, hashToken(token)))
    .get();
}

const expired = (at: Date | null) => !at || at.getTime() < Date.now();

/**
 * What the customer's page shows. The first open of a link is recorded (viewedAt, and a line in the Log);
 * a paid invoice shows only its thanks, a void or expired link only whom to ask.
 */
export function openPayLink(token: string) {
  return getDb().transaction((tx) => {
    const row = byToken(tx, token);
    if (!row) return { state: "unknown" as const };
    const { invoice, workshop, job } = row;
    if (invoice.status === "paid") return { state: "paid" as const, workshop, number: invoice.number, paidAt: invoice.paidAt };
    if (invoice.status === "void") return { state: "void" as const, workshop, number: invoice.number };
    if (expired(invoice.payTokenExpiresAt)) return { state: "expired" as const, workshop, number: invoice.number };
    // The null guard makes the first open the only one that writes, however many arrive at once.
    const first = tx
      .update(invoices)
      .set({ viewedAt: new Date() })
      .where(and(eq(invoices.id, invoice.id), isNull(invoices.viewedAt)))
      .run();
    if (first.changes === 1) {
      insertLogEntry(tx, {
        jobId: invoice.jobId,
        workshopId: invoice.workshopId,
        authorId: null,
        kind: "invoice",
        text: `Invoice ${invoice.number} opened by the customer.`,
        data: { invoiceId: invoice.id, event: "viewed" },
      });
    }
    const lines = tx.select().from(invoiceLines).where(eq(invoiceLines.invoiceId, invoice.id)).orderBy(asc(invoiceLines.position)).all();
    return {
      state: "open" as const,
      workshop,
      job: { title: job.title, equipmentKind: job.equipmentKind, year: job.year, customerName: job.customerName },
      invoice: {
        number: invoice.number,
        issuedAt: invoice.issuedAt,
        expiresAt: invoice.payTokenExpiresAt!,
        currency: invoice.currency,
        taxRateBp: invoice.taxRateBp,
        subtotalMinor: invoice.subtotalMinor,
        taxMinor: invoice.taxMinor,
        totalMinor: invoice.totalMinor,
        lines: lines.map(({ id, kind, description, quantityMilli, unitPriceMinor, amountMinor }) => ({
          id,
          kind,
          description,
          quantityMilli,
          unitPriceMinor,
          amountMinor,
        })),
      },
    };
  });
}

/** What checkout needs for the link's invoice: 404 for an unknown token, 410 once paid, void or expired. */
export function payableByLink(token: string) {
  const row = byToken(getDb(), token);
  if (!row) throw new NotFoundError(NOT_VALID);
  const { invoice } = row;
  if (invoice.status === "paid") throw new GoneError("This invoice is already paid. Thank you.");
  if (invoice.status === "void") throw new GoneError("The workshop has cancelled this invoice; there is nothing to pay.");
  if (expired(invoice.payTokenExpiresAt)) throw new GoneError("This link has expired. Ask the workshop for a new one.");
  return {
    id: invoice.id,
    number: invoice.number,
    currency: invoice.currency,
    totalMinor: invoice.totalMinor,
    checkoutSessionId: invoice.checkoutSessionId,
    customerEmail: row.job.customerEmail,
    workshopId: invoice.workshopId,
    workshopName: row.workshop.name,
  };
}

/** Remembers the Checkout Session made from the link, while the link still names an unpaid invoice whose session is still `previous`. */
export function recordPayLinkSession(token: string, sessionId: string, previous: string | null): boolean {
  return (
    getDb()
      .update(invoices)
      .set({ checkoutSessionId: sessionId })
      .where(and(eq(invoices.payTokenHash, hashToken(token)), eq(invoices.status, "issued"), sameSession(previous)))
      .run().changes === 1
  );
}

/** Where the payment service sends the payer back: which invoice the session paid, and whether it has landed. */
export function invoiceForReturn(sessionId: string) {
  return getDb()
    .select({ id: invoices.id, workshopId: invoices.workshopId, number: invoices.number, status: invoices.status, workshopName: workshops.name })
    .from(invoices)
    .innerJoin(workshops, eq(workshops.id, invoices.workshopId))
    .where(eq(invoices.checkoutSessionId, sessionId))
    .get();
}
