import type { Metadata } from "next";
import { redirect } from "next/navigation";
import { JobsPageClient } from "@/components/jobs/jobs-page-client";
import { can, getMember } from "@/lib/auth/member";

export const metadata: Metadata = { title: "Jobs" };

export default async function JobsPage() {
  const member = await getMember();
  if (!member) redirect("/sign-in?next=/jobs");
  return <JobsPageClient workshopName={member.workshopName} canCreate={can.editJobs(member)} />;
}
