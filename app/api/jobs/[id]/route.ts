import { NextResponse } from "next/server";
import { getJobRecord } from "@/db/queries/job-record";
import { deleteJob, updateJob } from "@/db/queries/jobs";
import { requireMember } from "@/lib/auth/member";
import { handle, parseJson } from "@/lib/http/api";
import { idParam, type JobParams } from "@/lib/http/ids";
import { jobUpdateSchema } from "@/lib/jobs/job-schemas";
import { removeStored } from "@/lib/jobs/uploads";

/** GET: the whole record of one job (details, parts, readings with verdicts, calculations, files, log). */
export const GET = handle(async (_request: Request, { params }: JobParams) => {
  const member = await requireMember();
  const jobId = idParam((await params).id, "That job");
  return NextResponse.json(getJobRecord(member, jobId));
});

export const PATCH = handle(async (request: Request, { params }: JobParams) => {
  const member = await requireMember();
  const jobId = idParam((await params).id, "That job");
  const input = await parseJson(request, jobUpdateSchema);
  return NextResponse.json({ job: updateJob(member, jobId, input) });
});

export const DELETE = handle(async (_request: Request, { params }: JobParams) => {
  const member = await requireMember();
  const jobId = idParam((await params).id, "That job");
  const { storedNames } = deleteJob(member, jobId);
  await Promise.all(storedNames.map(removeStored));
  return NextResponse.json({ deleted: true });
});
