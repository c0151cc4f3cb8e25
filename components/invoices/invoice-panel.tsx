import { Link } from "@/components/ui/link";
import { Card } from "@/components/ui/card";
import { editorLines } from "@/lib/estimates/editor-lines";
import { LinesEditor, type EditorPart } from "@/components/estimates/lines-editor";
import { COLLECTION_STATUS, JOB_STATUS_LABELS, type JobStatus } from "@/lib/vocabulary";
import type { getEstimateForJob } from "@/db/queries/estimates";
import type { listInvoicesForJob } from "@/db/queries/invoices";
import type { Member } from "@/lib/auth/can";
import { formatMoney } from "@/lib/money";
import { InvoiceStatus } from "./invoice-status";

/** The owner's invoices for a job, and — once the set is ready — the invoice to issue, from the approved estimate plus changes. */
export function InvoicePanel({
  jobId,
  jobStatus,
  invoices,
  estimate,
  settings,
  parts,
}: {
  member: Member;
  jobId: number;
  jobStatus: JobStatus;
  invoices: ReturnType<typeof listInvoicesForJob>;
  estimate: ReturnType<typeof getEstimateForJob>["estimate"];
  settings: { currency: string; hourlyRateMinor: number; taxRateBp: number };
  parts: EditorPart[];
}) {
  const standing = invoices.find((i) => i.status !== "void");
  const ready = jobStatus === COLLECTION_STATUS || jobStatus === "returned";
  return (
    <Card>
      <h2 className="mb-4 text-lead font-bold">Invoice</h2>
      {invoices.length ? (
        <ul className="mb-4 divide-y divide-rule rounded-card border border-rule">
          {invoices.map((i) => (
            <li key={i.id} className="flex flex-wrap items-center gap-4 px-4 py-3">
              <Link href={`/invoices/${i.id}`} className="font-bold underline">
                Invoice {i.number}
              </Link>
              <InvoiceStatus status={i.status} />
              {i.status === "issued" && i.sentAt ? (
                <span className="text-note text-muted">{i.viewedAt ? "e-mailed, opened by the customer" : "e-mailed, not opened yet"}</span>
              ) : null}
              <span className="ml-auto font-mono">{formatMoney(i.totalMinor, i.currency)}</span>
            </li>
          ))}
        </ul>
      ) : null}
      {standing ? null : ready ? (
        <>
          <p className="mb-4 text-muted">
            {estimate?.status === "approved"
              ? "These are the approved estimate's lines; change them to match the work done, then issue."
              : "There is no approved estimate; enter the lines to invoice."}
          </p>
          <LinesEditor
            initial={estimate?.status === "approved" ? editorLines(estimate.lines, settings.currency) : []}
            parts={parts}
            currency={settings.currency}
            hourlyRateMinor={settings.hourlyRateMinor}
            taxRateBp={settings.taxRateBp}
            url={`/api/jobs/${jobId}/invoices`}
            method="POST"
            submitLabel="Issue the invoice"
            afterSave="open-invoice"
          />
        </>
      ) : (
        <p className="text-muted">
          The invoice is issued once the set is “{JOB_STATUS_LABELS[COLLECTION_STATUS]}”; it is now “{JOB_STATUS_LABELS[jobStatus]}”.
        </p>
      )}
    </Card>
  );
}
