import "server-only";
import { invoiceForCheckout, recordCheckoutSession } from "@/db/queries/invoices";
import type { Member } from "@/lib/auth/can";
import { DomainError, NotConfiguredError, UpstreamError } from "@/lib/errors";
import { PaymentsNotConfigured, getStripe } from "./stripe";

/**
 * One live Checkout Session per invoice: an open one is reused, so an older page can never be paid
 * for an invoice whose session we no longer recognise. The amount is the invoice's stored total.
 */
export async function checkoutUrlForInvoice(member: Member, invoiceId: number, origin: string): Promise<string> {
  const invoice = invoiceForCheckout(member, invoiceId);
  let stripe;
  try {
    stripe = getStripe();
  } catch (err) {
    if (err instanceof PaymentsNotConfigured) throw new NotConfiguredError("Card payments are not set up for this Glowbench.");
    throw err;
  }
  try {
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
          price_data: { currency: invoice.currency.toLowerCase(), unit_amount: invoice.totalMinor, product_data: { name: `${member.workshopName} — invoice ${invoice.number}` } },
        },
      ],
      success_url: `${origin}/invoices/${invoice.id}?paid=1`,
      cancel_url: `${origin}/invoices/${invoice.id}`,
    });
    if (!session.url) throw new Error("The payment service returned no checkout address.");
    recordCheckoutSession(member, invoice.id, session.id);
    return session.url;
  } catch (err) {
    if (err instanceof DomainError) throw err;
    console.error("Checkout session failed", err);
    throw new UpstreamError("The payment service did not answer; try again in a moment.");
  }
}
