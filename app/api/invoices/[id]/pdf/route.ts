import { renderInvoicePdf } from "@/components/invoices/render-invoice-pdf";
import { getInvoice } from "@/db/queries/invoices";
import { route } from "@/server/http/route";

export const runtime = "nodejs";

export const GET = route({ role: "seeMoney", ids: { id: "That invoice" } }, async ({ member, ids }) => {
  const invoice = getInvoice(member, ids.id);
  const pdf = await renderInvoicePdf(invoice);
  return new Response(new Uint8Array(pdf), {
    headers: {
      "content-type": "application/pdf",
      "content-disposition": `inline; filename="invoice-${invoice.number}.pdf"`,
      "cache-control": "private, no-store",
    },
  });
});
