import { and, eq } from "drizzle-orm";
import { getDb } from "../client";
import { invoices, paymentEvents } from "../schema";
import { insertLogEntry } from "./log";

/**
 * Applies verified payment-service events. Called only by the webhook route after the SDK has checked the
 * signature. The event id goes into payment_events in the same transaction as the state change, so a
 * redelivered event changes nothing.
 */

export interface CompletedSession {
  id: string;
  payment_status: string;
  amount_total: number | null;
  currency: string | null;
  metadata: Record<string, string> | null;
}

export type ApplyResult = "paid" | "duplicate" | "ignored";

export function applyCheckoutCompleted(eventId: string, eventType: string, session: CompletedSession): ApplyResult {
  return getDb().transaction((tx) => {
    const seen = tx.select({ id: paymentEvents.id }).from(paymentEvents).where(eq(paymentEvents.id, eventId)).get();
    if (seen) return "duplicate";
    const invoiceId = Number(session.metadata?.invoiceId);
    const workshopId = Number(session.metadata?.workshopId);
    // The session must be the one we created for this invoice in this workshop, for its exact amount.
    const invoice =
      Number.isSafeInteger(invoiceId) && Number.isSafeInteger(workshopId)
        ? tx
            .select()
            .from(invoices)
            .where(and(eq(invoices.id, invoiceId), eq(invoices.workshopId, workshopId), eq(invoices.checkoutSessionId, session.id)))
            .get()
        : undefined;
    tx.insert(paymentEvents)
      .values({ id: eventId, type: eventType, invoiceId: invoice?.id ?? null })
      .run();
    if (!invoice || invoice.status !== "issued") return "ignored";
    if (
      session.payment_status !== "paid" ||
      session.amount_total !== invoice.totalMinor ||
      session.currency?.toLowerCase() !== invoice.currency.toLowerCase()
    ) {
      return "ignored";
    }
    const paidAt = new Date();
    tx.update(invoices)
      .set({ status: "paid", paidAt })
      .where(and(eq(invoices.id, invoice.id), eq(invoices.status, "issued")))
      .run();
    insertLogEntry(tx, {
      jobId: invoice.jobId,
      workshopId: invoice.workshopId,
      authorId: null,
      kind: "invoice",
      text: `Invoice ${invoice.number} paid by card.`,
      data: { invoiceId: invoice.id, event: "paid", paymentEventId: eventId },
    });
    return "paid";
  });
}
