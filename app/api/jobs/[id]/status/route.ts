import { NextResponse } from "next/server";
import { changeJobStatus } from "@/db/queries/jobs";
import { route } from "@/server/http/route";
import { statusChangeSchema } from "@/lib/jobs/job-schemas";

/** Technicians and owners move a job along the workflow; each change is written to the log. */
export const POST = route({ role: "changeStatus", ids: { id: "That job" }, body: statusChangeSchema }, ({ member, ids, body }) =>
  NextResponse.json({ job: changeJobStatus(member, ids.id, body.status) }),
);
