import { renderToBuffer } from "@react-pdf/renderer";
import { createElement } from "react";
import { InvoicePdf } from "./invoice-pdf";

/** The invoice as PDF bytes: what the owner downloads and what the customer's e-mail carries, from one document. */
export async function renderInvoicePdf(invoice: Parameters<typeof InvoicePdf>[0]["invoice"]): Promise<Buffer> {
  return renderToBuffer(createElement(InvoicePdf, { invoice }) as Parameters<typeof renderToBuffer>[0]);
}
