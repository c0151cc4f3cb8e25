import type { Metadata } from "next";
import Link from "next/link";
import { notFound, redirect } from "next/navigation";
import { EstimateSection } from "@/components/estimates/estimate-section";
import { jobInWorkshop } from "@/db/queries/money-lines";
import { getDb } from "@/db/client";
import { getMember } from "@/lib/auth/member";

export const metadata: Metadata = { title: "Estimate" };

export default async function JobEstimatePage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const member = await getMember();
  if (!member) redirect(`/sign-in?next=/jobs/${id}/estimate`);
  const jobId = /^[1-9]\d{0,12}$/.test(id) ? Number(id) : 0;
  const job = jobId ? jobInWorkshop(getDb(), member.workshopId, jobId) : undefined;
  if (!job) notFound();
  return (
    <>
      <p className="text-note">
        <Link href={`/jobs/${job.id}`} className="text-muted underline">
          ← {job.title}
        </Link>
      </p>
      <h1 className="mb-6 mt-1 text-title font-bold">Estimate and invoice</h1>
      <EstimateSection member={member} jobId={job.id} />
    </>
  );
}
