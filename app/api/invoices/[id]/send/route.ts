import { NextResponse } from "next/server";
import { renderInvoicePdf } from "@/components/invoices/render-invoice-pdf";
import { issuePayLink, recordInvoiceSent } from "@/db/queries/invoice-links";
import { getInvoice } from "@/db/queries/invoices";
import { sendInvoiceSchema } from "@/lib/invoices/schemas";
import { formatMoney } from "@/lib/money";
import { HttpError } from "@/server/http/errors";
import { publicOrigin } from "@/server/http/public-origin";
import { route } from "@/server/http/route";
import { sendInvoiceMail } from "@/server/mail/invoice-mail";

export const runtime = "nodejs";

/**
 * The owner e-mails an issued invoice: its PDF and a fresh single-use link to pay by card (an older link
 * stops working). The token is only ever in that e-mail; the answer says to whom and until when.
 */
export const POST = route({ role: "seeMoney", ids: { id: "That invoice" }, body: sendInvoiceSchema }, async ({ request, member, ids, body }) => {
  const base = publicOrigin(request); // before the link is issued: a server that cannot address it refuses first
  const invoice = getInvoice(member, ids.id);
  // Rendered before the new link retires the old one, so a failure here leaves the customer's link working.
  const pdf = invoice.status === "issued" ? await renderInvoicePdf(invoice) : Buffer.alloc(0);
  const link = issuePayLink(member, ids.id); // refuses a paid or void invoice, or a job without the customer's e-mail
  try {
    await sendInvoiceMail({
      workshopId: member.workshopId,
      to: link.to,
      customerName: link.customerName,
      workshopName: invoice.workshop.name,
      jobTitle: invoice.job.title,
      number: invoice.number,
      total: formatMoney(invoice.totalMinor, invoice.currency),
      link: `${base}/pay/${link.token}`,
      expiresAt: link.expiresAt,
      note: body.note || undefined,
      pdf,
    });
  } catch (err) {
    console.error("Invoice e-mail failed", err);
    throw new HttpError(502, "The invoice could not be e-mailed; check the mail settings and send it again.");
  }
  const sentAt = recordInvoiceSent(member, ids.id, link.to);
  return NextResponse.json({ sentTo: link.to, sentAt, expiresAt: link.expiresAt });
});
