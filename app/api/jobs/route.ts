import { NextResponse } from "next/server";
import { createJob, searchJobs } from "@/db/queries/jobs";
import { route } from "@/server/http/route";
import { jobCreateSchema, jobListQuerySchema } from "@/lib/jobs/job-schemas";

/** GET: one page of the workshop's jobs, `{ jobs, total, page, pageSize }`; without parameters the 50 most recently worked on. */
export const GET = route({ query: jobListQuerySchema }, ({ member, query }) => NextResponse.json(searchJobs(member, query)));

export const POST = route({ role: "editJobs", body: jobCreateSchema }, ({ member, body }) =>
  NextResponse.json({ job: createJob(member, body) }, { status: 201 }),
);
