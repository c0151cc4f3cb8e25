import type { Metadata } from "next";
import { EstimateSection } from "@/components/estimates/estimate-section";
import { loadJobPage, type JobPageProps } from "@/components/jobs/load-job";

export const metadata: Metadata = { title: "Estimate" };

/** The job's Estimate tab: the estimate (owners, technicians) and, for the owner, its invoice. */
export default async function JobEstimatePage({ params }: JobPageProps) {
  const { member, job } = await loadJobPage((await params).id, "estimate");
  return <EstimateSection member={member} jobId={job.id} />;
}
