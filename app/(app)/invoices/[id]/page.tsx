import type { Metadata } from "next";
import { Link } from "@/components/ui/link";
import { notFound, redirect } from "next/navigation";
import { LinesTable } from "@/components/estimates/lines-table";
import { InvoiceActions } from "@/components/invoices/invoice-actions";
import { InvoiceDelivery } from "@/components/invoices/invoice-delivery";
import { SendInvoice } from "@/components/invoices/send-invoice";
import { InvoiceStatus } from "@/components/invoices/invoice-status";
import { Card, EmptyState } from "@/components/ui/card";
import { getInvoice } from "@/db/queries/invoices";
import { NotFoundError } from "@/lib/errors";
import { can } from "@/lib/auth/can";
import { getMember } from "@/server/auth/member";
import { parseId } from "@/lib/ids";

export const metadata: Metadata = { title: "Invoice" };

const date = (d: Date | null) => (d ? d.toLocaleDateString("en-GB", { day: "numeric", month: "long", year: "numeric" }) : "");

export default async function InvoicePage({ params, searchParams }: { params: Promise<{ id: string }>; searchParams: Promise<{ paid?: string }> }) {
  const { id } = await params;
  const { paid } = await searchParams;
  const member = await getMember();
  if (!member) redirect(`/sign-in?next=/invoices/${id}`);
  if (!can.seeMoney(member)) {
    return <EmptyState title="Invoices are kept to the owner">Ask the workshop&apos;s owner about this invoice.</EmptyState>;
  }
  let invoice;
  try {
    const invoiceId = parseId(id);
    invoice = invoiceId === null ? null : getInvoice(member, invoiceId);
  } catch (err) {
    if (err instanceof NotFoundError) notFound();
    throw err;
  }
  if (!invoice) notFound();
  return (
    <div className="flex flex-col gap-6">
      <div>
        <p className="text-note">
          <Link href={`/jobs/${invoice.jobId}/estimate`} className="text-note font-bold text-signal underline-offset-4 hover:underline">
            ← {invoice.job.title}
          </Link>
        </p>
        <div className="mt-1 flex flex-wrap items-center gap-4">
          <h1 className="text-title font-bold">Invoice {invoice.number}</h1>
          <InvoiceStatus status={invoice.status} />
        </div>
        <p className="text-muted">
          Issued {date(invoice.issuedAt)}
          {invoice.job.customerName ? ` to ${invoice.job.customerName}` : ""}
          {invoice.paidAt ? ` · paid ${date(invoice.paidAt)}` : ""}
        </p>
      </div>
      {paid && invoice.status === "paid" ? (
        <p role="status" className="rounded-card border border-ok bg-ok-bg p-4 font-bold">
          Payment received. The job&apos;s Log has the entry.
        </p>
      ) : null}
      {paid && invoice.status === "issued" ? (
        <p role="status" className="rounded-card border border-rule bg-caution-bg p-4">
          The payment service has not confirmed this payment yet. Reload in a moment; the invoice turns paid only when it does.
        </p>
      ) : null}
      <Card>
        <LinesTable {...invoice} />
      </Card>
      <InvoiceActions invoiceId={invoice.id} status={invoice.status} />
      {invoice.status !== "void" ? (
        <Card>
          <h2 className="mb-4 text-lead font-bold">With the customer</h2>
          <InvoiceDelivery
            sentTo={invoice.sentTo}
            sentAt={invoice.sentAt}
            viewedAt={invoice.viewedAt}
            paidAt={invoice.paidAt}
            linkExpired={invoice.payLinkExpired}
          />
          {invoice.status === "issued" ? (
            <div className="mt-6">
              <SendInvoice invoiceId={invoice.id} to={invoice.job.customerEmail} again={!!invoice.sentAt} />
            </div>
          ) : null}
        </Card>
      ) : null}
    </div>
  );
}
