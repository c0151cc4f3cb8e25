import type { Metadata } from "next";
import { redirect } from "next/navigation";
import type { JobPage } from "@/components/jobs/job-list";
import { JobsPageClient } from "@/components/jobs/jobs-page-client";
import { searchJobs } from "@/db/queries/jobs";
import { JOB_LIST_PAGE_SIZE, jobListQuerySchema } from "@/lib/jobs/job-schemas";
import { can } from "@/lib/auth/can";
import { getMember } from "@/server/auth/member";

export const metadata: Metadata = { title: "Jobs" };

export default async function JobsPage() {
  const member = await getMember();
  if (!member) redirect("/sign-in?next=/jobs");
  // The same first page GET /api/jobs gives, dates as JSON strings, so the client cache can take it over.
  const page = searchJobs(member, jobListQuerySchema.parse({ pageSize: String(JOB_LIST_PAGE_SIZE) }));
  const firstPage: JobPage = { ...page, jobs: page.jobs.map((j) => ({ ...j, createdAt: j.createdAt.toISOString(), updatedAt: j.updatedAt.toISOString() })) };
  return <JobsPageClient workshopName={member.workshopName} canCreate={can.editJobs(member)} firstPage={firstPage} />;
}
