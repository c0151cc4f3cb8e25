import { NextResponse } from "next/server";
import { changeJobStatus } from "@/db/queries/jobs";
import { requireMember } from "@/lib/auth/member";
import { handle, parseJson } from "@/lib/http/api";
import { idParam, type JobParams } from "@/lib/http/ids";
import { statusChangeSchema } from "@/lib/jobs/job-schemas";

/** Technicians and owners move a job along the workflow; each change is written to the log. */
export const POST = handle(async (request: Request, { params }: JobParams) => {
  const member = await requireMember();
  const jobId = idParam((await params).id, "That job");
  const { status } = await parseJson(request, statusChangeSchema);
  return NextResponse.json({ job: changeJobStatus(member, jobId, status) });
});
