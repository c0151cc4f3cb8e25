import { notFound, redirect } from "next/navigation";
import { cache } from "react";
import { findJob } from "@/db/queries/jobs";
import { getMember } from "@/server/auth/member";
import { parseId } from "@/lib/ids";

/** For job pages: the signed-in member and the job, or sign-in / our 404. Cached per request (layout + page). */
export const loadJobPage = cache(async (idText: string, section = "") => {
  const member = await getMember();
  if (!member) redirect(`/sign-in?next=${encodeURIComponent(`/jobs/${idText}${section ? `/${section}` : ""}`)}`);
  const id = parseId(idText);
  if (id === null) notFound();
  const job = findJob(member, id);
  if (!job) notFound();
  return { member, job };
});

export type JobPageProps = { params: Promise<{ id: string }> };
