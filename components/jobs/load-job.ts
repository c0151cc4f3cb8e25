import { notFound, redirect } from "next/navigation";
import { cache } from "react";
import { findJob } from "@/db/queries/jobs";
import { getMember } from "@/lib/auth/member";

/** For job pages: the signed-in member and the job, or sign-in / our 404. Cached per request (layout + page). */
export const loadJobPage = cache(async (idText: string, section = "") => {
  const member = await getMember();
  if (!member) redirect(`/sign-in?next=${encodeURIComponent(`/jobs/${idText}${section ? `/${section}` : ""}`)}`);
  if (!/^[1-9]\d{0,15}$/.test(idText)) notFound();
  const job = findJob(member, Number(idText));
  if (!job) notFound();
  return { member, job };
});

export type JobPageProps = { params: Promise<{ id: string }> };
