import type { Metadata } from "next";
import { Link } from "@/components/ui/link";
import { OpenFaultsPanel } from "@/components/jobs/faults/open-faults-panel";
import { JobDetails } from "@/components/jobs/job-details";
import { loadJobPage, type JobPageProps } from "@/components/jobs/load-job";
import { LazyReadyMessage as ReadyMessage } from "@/components/jobs/lazy-forms";
import { StatusWorkflow } from "@/components/jobs/status-workflow";
import { Card } from "@/components/ui/card";
import { listFaults } from "@/db/queries/faults";
import { listFiles } from "@/db/queries/files";
import { listParts } from "@/db/queries/parts";
import { listReadings } from "@/db/queries/readings";
import { can } from "@/lib/auth/can";
import { COLLECTION_STATUS } from "@/lib/vocabulary";

export async function generateMetadata({ params }: JobPageProps): Promise<Metadata> {
  const { job } = await loadJobPage((await params).id);
  return { title: job.title };
}

export default async function JobOverviewPage({ params }: JobPageProps) {
  const { member, job } = await loadJobPage((await params).id);
  const parts = listParts(member, job.id);
  const readings = listReadings(member, job.id);
  const files = listFiles(member, job.id);
  const faults = listFaults(member, job.id);
  const stats = [
    { label: "parts to order", value: parts.filter((p) => p.state === "to-order").length, href: "parts" },
    { label: `of ${parts.length} ${parts.length === 1 ? "part" : "parts"} fitted`, value: parts.filter((p) => p.state === "fitted").length, href: "parts" },
    { label: "readings out of tolerance", value: readings.filter((r) => r.verdict !== "within" && r.verdict !== "unknown").length, href: "readings" },
    { label: "photos and schematics", value: files.length, href: "files" },
  ];
  return (
    <div className="grid gap-6 lg:grid-cols-[2fr_1fr]">
      <Card className="lg:col-span-2">
        <h2 className="mb-4 text-lead font-bold">Where it is</h2>
        <StatusWorkflow key={job.status} jobId={job.id} status={job.status} canChange={can.changeStatus(member)} />
      </Card>
      {job.status === COLLECTION_STATUS && can.changeStatus(member) ? (
        <div className="lg:col-span-2">
          <ReadyMessage jobId={job.id} status={job.status} />
        </div>
      ) : null}
      <Card>
        <h2 className="mb-4 text-lead font-bold">The set</h2>
        <JobDetails
          job={job}
          canEdit={can.editJobs(member)}
          canDelete={can.deleteJobs(member)}
          intakePhotos={files.filter((f) => f.kind === "intake").map((f) => ({ id: f.id, name: f.originalName, hasThumbnail: f.hasThumbnail }))}
        />
      </Card>
      <div className="flex flex-col gap-6">
        <Card>
          <h2 className="mb-4 text-lead font-bold">At a glance</h2>
          <ul className="flex flex-col gap-3">
            {stats.map((s) => (
              <li key={s.label}>
                <Link href={`/jobs/${job.id}/${s.href}`} className="flex items-baseline gap-3 hover:underline">
                  <span className="font-mono text-reading">{s.value}</span>
                  <span className="text-muted">{s.label}</span>
                </Link>
              </li>
            ))}
          </ul>
        </Card>
        <OpenFaultsPanel jobId={job.id} faults={faults} />
      </div>
    </div>
  );
}
