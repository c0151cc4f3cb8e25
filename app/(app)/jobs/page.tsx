import type { Metadata } from "next";
import { redirect } from "next/navigation";
import { EmptyState } from "@/components/ui/card";
import { JOB_STATUS_LABELS, EQUIPMENT_KIND_LABELS } from "@/db/enums";
import { listJobs } from "@/db/queries/jobs";
import { getMember } from "@/lib/auth/member";

export const metadata: Metadata = { title: "Jobs" };

export default async function JobsPage() {
  const member = await getMember();
  if (!member) redirect("/sign-in?next=/jobs");
  const jobs = listJobs(member);
  return (
    <>
      <h1 className="text-title font-bold">Jobs</h1>
      <p className="mb-6 mt-1 text-muted">Sets on the bench at {member.workshopName}.</p>
      {jobs.length === 0 ? (
        <EmptyState title="No sets on the bench yet">Book in the first set to start its record.</EmptyState>
      ) : (
        <ul className="divide-y divide-rule rounded-card border border-rule bg-panel">
          {jobs.map((j) => (
            <li key={j.id} className="flex flex-wrap items-baseline gap-x-4 px-5 py-4">
              <span className="font-bold">{j.title}</span>
              <span className="text-muted">{EQUIPMENT_KIND_LABELS[j.equipmentKind]}</span>
              <span className="ml-auto text-note font-bold">{JOB_STATUS_LABELS[j.status]}</span>
            </li>
          ))}
        </ul>
      )}
    </>
  );
}
