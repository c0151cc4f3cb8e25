import { renderToBuffer } from "@react-pdf/renderer";
import { createElement } from "react";
import { InvoicePdf } from "@/components/invoices/invoice-pdf";
import { getInvoice } from "@/db/queries/invoices";
import { requireMember } from "@/lib/auth/member";
import { handle } from "@/lib/http/api";
import { idParam } from "@/lib/http/ids";

export const runtime = "nodejs";

export const GET = handle(async (_request: Request, { params }: { params: Promise<{ id: string }> }) => {
  const member = await requireMember();
  const invoice = getInvoice(member, idParam((await params).id, "That invoice"));
  const pdf = await renderToBuffer(createElement(InvoicePdf, { invoice }) as Parameters<typeof renderToBuffer>[0]);
  return new Response(new Uint8Array(pdf), {
    headers: {
      "content-type": "application/pdf",
      "content-disposition": `inline; filename="invoice-${invoice.number}.pdf"`,
      "cache-control": "private, no-store",
    },
  });
});
