import type { Metadata } from "next";
import { redirect } from "next/navigation";
import { Notice } from "@/components/customer/notice";
import { invoiceForReturn } from "@/db/queries/invoice-links";
import { can } from "@/lib/auth/can";
import { parseId } from "@/lib/ids";
import { getMember } from "@/server/auth/member";

export const metadata: Metadata = { title: "Payment", robots: { index: false, follow: false }, referrer: "no-referrer" };
export const dynamic = "force-dynamic";

/**
 * Where the payment service sends the payer back (server/payments/checkout.ts). The owner who took the payment
 * at the counter goes on to the invoice; a customer paying from their link is thanked. The session id says
 * which invoice; it shows no more than the workshop's name and the invoice number.
 */
export default async function PaymentDonePage({ searchParams }: { searchParams: Promise<{ session?: string | string[]; cancelled?: string | string[] }> }) {
  const { session, cancelled } = await searchParams;
  const member = await getMember();
  const owner = member && can.seeMoney(member) ? member : null;

  if (typeof cancelled === "string") {
    const invoiceId = parseId(cancelled);
    if (owner && invoiceId !== null) redirect(`/invoices/${invoiceId}`);
    return (
      <Notice title="No payment was taken">Nothing has been charged. When you are ready, open the link in the workshop&apos;s e-mail again to pay.</Notice>
    );
  }

  const paid = typeof session === "string" && /^[\w-]{1,200}$/.test(session) ? invoiceForReturn(session) : undefined;
  if (!paid)
    return (
      <Notice title="This page has nothing to show">If you have just paid, the workshop will have your payment; the e-mailed link shows it as paid.</Notice>
    );
  if (owner && owner.workshopId === paid.workshopId) redirect(`/invoices/${paid.id}?paid=1`);
  if (paid.status === "paid") {
    return (
      <Notice title="Paid, thank you" testId="paid">
        {paid.workshopName} has your payment for invoice {paid.number}. There is nothing more to do; you can close this page.
      </Notice>
    );
  }
  return (
    <Notice title="Thank you: your payment is on its way">
      The card service is confirming it with {paid.workshopName} now. You do not need to pay again; the link in the e-mail will show the invoice as paid once it
      lands.
    </Notice>
  );
}
