import { NextResponse } from "next/server";
import { changeStatusWithChecks } from "@/db/queries/ready-record";
import { route } from "@/server/http/route";
import { statusChangeWithChecksSchema } from "@/lib/jobs/ready-schemas";

/**
 * Technicians and owners move a job along the workflow; each change is written to the log. Moving to
 * "ready" checks the record first: 409 with `error.checks` unless `{ override: true, reason }` is sent.
 */
export const POST = route({ role: "changeStatus", ids: { id: "That job" }, body: statusChangeWithChecksSchema }, ({ member, ids, body }) =>
  NextResponse.json({ job: changeStatusWithChecks(member, ids.id, body) }),
);
