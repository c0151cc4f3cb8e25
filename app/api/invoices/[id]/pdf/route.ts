import { renderToBuffer } from "@react-pdf/renderer";
import { createElement } from "react";
import { InvoicePdf } from "@/components/invoices/invoice-pdf";
import { getInvoice } from "@/db/queries/invoices";
import { route } from "@/server/http/route";

export const runtime = "nodejs";

export const GET = route({ role: "seeMoney", ids: { id: "That invoice" } }, async ({ member, ids }) => {
  const invoice = getInvoice(member, ids.id);
  const pdf = await renderToBuffer(createElement(InvoicePdf, { invoice }) as Parameters<typeof renderToBuffer>[0]);
  return new Response(new Uint8Array(pdf), {
    headers: {
      "content-type": "application/pdf",
      "content-disposition": `inline; filename="invoice-${invoice.number}.pdf"`,
      "cache-control": "private, no-store",
    },
  });
});
