import "server-only";
import { payableByLink, recordPayLinkSession } from "@/db/queries/invoice-links";
import { invoiceForCheckout, recordCheckoutSession } from "@/db/queries/invoices";
import type { Member } from "@/lib/auth/can";
import { ConflictError, DomainError, NotConfiguredError, UpstreamError } from "@/lib/errors";
import { PaymentsNotConfigured, getStripe } from "./stripe";

/** What a Checkout Session is made from: the invoice's stored total, never an amount from the browser. */
interface Payable {
  id: number;
  number: number;
  currency: string;
  totalMinor: number;
  checkoutSessionId: string | null;
  customerEmail: string | null;
  workshopId: number;
  workshopName: string;
}

/**
 * The payment service sends the payer back to /pay/done, whoever started the payment: the owner at the
 * counter or the customer from their link. One live session per invoice serves both, and neither return
 * address carries the pay link's token to the payment service. The page sends a signed-in owner on to the
 * invoice and thanks anyone else.
 */
export const returnUrls = (origin: string, invoiceId: number) => ({
  success_url: `${origin}/pay/done?session={CHECKOUT_SESSION_ID}`,
  cancel_url: `${origin}/pay/done?cancelled=${invoiceId}`,
});

/**
 * One live Checkout Session per invoice: an open one is reused, so an older page can never be paid
 * for an invoice whose session we no longer recognise. A new session is kept only if no other request
 * stored one meanwhile; the loser hands out the winner's page instead (its own session is never paid).
 */
async function sessionUrl(load: () => Payable, origin: string, record: (sessionId: string, previous: string | null) => boolean): Promise<string> {
  let invoice = load();
  let stripe;
  try {
    stripe = getStripe();
  } catch (err) {
    if (err instanceof PaymentsNotConfigured) throw new NotConfiguredError("Card payments are not set up for this Glowbench.");
    throw err;
  }
  try {
    for (let attempt = 0; attempt < 2; attempt++) {
      if (invoice.checkoutSessionId) {
        const existing = await stripe.checkout.sessions.retrieve(invoice.checkoutSessionId);
        if (existing.status === "open" && existing.url) return existing.url;
      }
      const session = await stripe.checkout.sessions.create({
        mode: "payment",
        client_reference_id: String(invoice.id),
        customer_email: invoice.customerEmail ?? undefined,
        metadata: { invoiceId: String(invoice.id), workshopId: String(invoice.workshopId) },
        line_items: [
          {
            quantity: 1,
            price_data: {
              currency: invoice.currency.toLowerCase(),
              unit_amount: invoice.totalMinor,
              product_data: { name: `${invoice.workshopName} — invoice ${invoice.number}` },
            },
          },
        ],
        ...returnUrls(origin, invoice.id),
      });
      if (!session.url) throw new Error("The payment service returned no checkout address.");
      if (record(session.id, invoice.checkoutSessionId)) return session.url;
      invoice = load(); // another request stored its session first: reuse that one
    }
    throw new ConflictError("Another payment page for this invoice opened at the same moment; try again.");
  } catch (err) {
    if (err instanceof DomainError) throw err;
    console.error("Checkout session failed", err);
    throw new UpstreamError("The payment service did not answer; try again in a moment.");
  }
}

/** The owner takes a card payment for an invoice of their own workshop. */
export async function checkoutUrlForInvoice(member: Member, invoiceId: number, origin: string): Promise<string> {
  return sessionUrl(
    () => invoiceForCheckout(member, invoiceId),
    origin,
    (sessionId, previous) => recordCheckoutSession(member, invoiceId, sessionId, previous),
  );
}

/** The customer pays from the e-mailed link; the token is the only credential (404 unknown, 410 paid, void or expired). */
export async function checkoutUrlForPayLink(token: string, origin: string): Promise<string> {
  return sessionUrl(
    () => payableByLink(token),
    origin,
    (sessionId, previous) => recordPayLinkSession(token, sessionId, previous),
  );
}
