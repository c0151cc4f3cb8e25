import { Link } from "@/components/ui/link";
import { Card, EmptyState } from "@/components/ui/card";
import { getEstimateForJob } from "@/db/queries/estimates";
import { listInvoicesForJob } from "@/db/queries/invoices";
import { can, type Member } from "@/lib/auth/can";
import { editorLines } from "@/lib/estimates/editor-lines";
import { EstimateStatus } from "./estimate-status";
import { LinesEditor } from "./lines-editor";
import { LinesTable } from "./lines-table";
import { SendEstimateButton } from "./send-estimate-button";
import { InvoicePanel } from "@/components/invoices/invoice-panel";

/** The job's Estimate section: prepared by technicians and owners; invoices below it for the owner only. */
export function EstimateSection({ member, jobId }: { member: Member; jobId: number }) {
  if (!can.prepareEstimates(member)) {
    return (
      <EmptyState title="Prices are kept to the owner and technicians">
        Estimates and invoices are not shown to apprentices. Ask a technician if the customer has approved the work.
      </EmptyState>
    );
  }
  const { job, settings, parts, estimate } = getEstimateForJob(member, jobId);
  const editable = !estimate || estimate.status !== "approved";
  const initial = editorLines(estimate?.lines ?? [], settings.currency);
  return (
    <div className="flex flex-col gap-6">
      <Card>
        <div className="mb-4 flex flex-wrap items-center justify-between gap-3">
          <h2 className="text-lead font-bold">Estimate</h2>
          {estimate ? <EstimateStatus status={estimate.status} /> : null}
        </div>
        {settings.hourlyRateMinor <= 0 ? (
          <p className="mb-4 rounded-chip bg-caution-bg p-3">
            The workshop has no hourly rate yet, so labour lines cannot be priced. The owner sets it under{" "}
            <Link href="/workshop" className="underline">
              Workshop
            </Link>
            .
          </p>
        ) : null}
        {editable ? (
          <LinesEditor
            initial={initial}
            parts={parts}
            currency={settings.currency}
            hourlyRateMinor={settings.hourlyRateMinor}
            taxRateBp={settings.taxRateBp}
            url={`/api/jobs/${jobId}/estimate`}
            method="PUT"
            submitLabel={estimate ? "Save the estimate" : "Save the estimate as a draft"}
          />
        ) : (
          <>
            <LinesTable {...estimate!} />
            <p className="mt-3 text-muted">The customer approved this estimate; changes go on the invoice.</p>
          </>
        )}
        {estimate && estimate.lines.length > 0 && estimate.status !== "approved" ? (
          <div className="mt-6 border-t border-rule pt-4">
            {job.customerEmail ? (
              <SendEstimateButton jobId={jobId} again={estimate.status !== "draft"} />
            ) : (
              <p className="text-muted">Add the customer&apos;s e-mail to the job to send this estimate for approval.</p>
            )}
          </div>
        ) : null}
      </Card>
      {can.seeMoney(member) ? (
        <InvoicePanel
          member={member}
          jobId={jobId}
          jobStatus={job.status}
          invoices={listInvoicesForJob(member, jobId)}
          estimate={estimate}
          settings={settings}
          parts={parts}
        />
      ) : null}
    </div>
  );
}
