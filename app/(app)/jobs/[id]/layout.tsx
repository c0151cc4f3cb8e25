import { Link } from "@/components/ui/link";
import type { ReactNode } from "react";
import { HighVoltageNote } from "@/components/jobs/high-voltage-note";
import { JobTabs } from "@/components/jobs/job-tabs";
import { loadJobPage } from "@/components/jobs/load-job";
import { StatusBadge } from "@/components/jobs/status-badge";
import { EQUIPMENT_KIND_LABELS } from "@/lib/vocabulary";

export default async function JobLayout({ children, params }: { children: ReactNode; params: Promise<{ id: string }> }) {
  const { job } = await loadJobPage((await params).id);
  const facts = [EQUIPMENT_KIND_LABELS[job.equipmentKind], job.maker, job.model, job.year].filter(Boolean).join(" · ");
  return (
    <div className="flex flex-col gap-5">
      <div>
        <Link href="/jobs" className="gb-no-print text-note font-bold text-signal underline-offset-4 hover:underline">
          ← All jobs
        </Link>
        <div className="mt-2 flex flex-wrap items-start justify-between gap-4">
          <div className="min-w-0">
            <h1 className="text-title font-bold" data-testid="job-title">
              {job.title}
            </h1>
            <p className="mt-1 flex flex-wrap items-center gap-x-3 gap-y-1 text-muted">
              <span className="font-mono text-note text-ink">Job {job.number}</span>
              <span>{facts}</span>
              {job.customerName ? (
                <span>
                  for{" "}
                  {job.customerId ? (
                    <Link href={`/customers/${job.customerId}`} className="text-signal underline-offset-4 hover:underline">
                      {job.customerName}
                    </Link>
                  ) : (
                    job.customerName
                  )}
                </span>
              ) : null}
              <StatusBadge status={job.status} />
            </p>
          </div>
          <a
            href={`/api/jobs/${job.id}/bench-sheet`}
            download
            className="gb-no-print inline-flex min-h-11 items-center gap-2 rounded-chip border border-rule bg-panel px-4 font-bold hover:bg-sunk"
          >
            Bench sheet (PDF)
          </a>
        </div>
      </div>
      <HighVoltageNote compact />
      <JobTabs jobId={job.id} />
      <div>{children}</div>
    </div>
  );
}
