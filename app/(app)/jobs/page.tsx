import type { Metadata } from "next";
import { redirect } from "next/navigation";
import type { JobPage } from "@/components/jobs/job-list";
import { JobsPageClient } from "@/components/jobs/jobs-page-client";
import { getCustomer } from "@/db/queries/customers";
import { searchJobs } from "@/db/queries/jobs";
import { parseId } from "@/lib/ids";
import { JOB_LIST_PAGE_SIZE, jobListQuerySchema } from "@/lib/jobs/job-schemas";
import { can } from "@/lib/auth/can";
import { getMember } from "@/server/auth/member";

export const metadata: Metadata = { title: "Jobs" };

/** A customer's id to book a set in for (from their page); anything not theirs is ignored. */
function bookingFor(member: Parameters<typeof getCustomer>[0], idText: string | undefined) {
  const id = parseId(idText);
  if (id === null || !can.editJobs(member)) return null;
  try {
    const c = getCustomer(member, id);
    return { id: c.id, name: c.name, email: c.email };
  } catch {
    return null;
  }
}

export default async function JobsPage({ searchParams }: { searchParams: Promise<{ customer?: string }> }) {
  const member = await getMember();
  if (!member) redirect("/sign-in?next=/jobs");
  const bookFor = bookingFor(member, (await searchParams).customer);
  // The same first page GET /api/jobs gives, dates as JSON strings, so the client cache can take it over.
  const page = searchJobs(member, jobListQuerySchema.parse({ pageSize: String(JOB_LIST_PAGE_SIZE) }));
  const firstPage: JobPage = { ...page, jobs: page.jobs.map((j) => ({ ...j, createdAt: j.createdAt.toISOString(), updatedAt: j.updatedAt.toISOString() })) };
  return <JobsPageClient workshopName={member.workshopName} canCreate={can.editJobs(member)} firstPage={firstPage} bookFor={bookFor} />;
}
