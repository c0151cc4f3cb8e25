import { NextResponse } from "next/server";
import { createJob, searchJobs } from "@/db/queries/jobs";
import { requireMember } from "@/lib/auth/member";
import { handle, parseJson, parseQuery } from "@/lib/http/api";
import { jobCreateSchema, jobListQuerySchema } from "@/lib/jobs/job-schemas";

/** GET: one page of the workshop's jobs, `{ jobs, total, page, pageSize }`; without parameters the 50 most recently worked on. */
export const GET = handle(async (request: Request) => {
  const member = await requireMember();
  const query = parseQuery(request, jobListQuerySchema);
  return NextResponse.json(searchJobs(member, query));
});

export const POST = handle(async (request: Request) => {
  const member = await requireMember();
  const input = await parseJson(request, jobCreateSchema);
  return NextResponse.json({ job: createJob(member, input) }, { status: 201 });
});
