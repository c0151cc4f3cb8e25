import { NextResponse } from "next/server";
import { getJobRecord } from "@/db/queries/job-record";
import { deleteJob, updateJob } from "@/db/queries/jobs";
import { route } from "@/server/http/route";
import { jobUpdateSchema } from "@/lib/jobs/job-schemas";
import { removeStored } from "@/server/files/uploads";

const ids = { id: "That job" };

/** GET: the whole record of one job (details, parts, readings with verdicts, calculations, files, log). */
export const GET = route({ ids }, ({ member, ids }) => NextResponse.json(getJobRecord(member, ids.id)));

export const PATCH = route({ role: "editJobs", ids, body: jobUpdateSchema }, ({ member, ids, body }) =>
  NextResponse.json({ job: updateJob(member, ids.id, body) }),
);

export const DELETE = route({ role: "deleteJobs", ids }, async ({ member, ids }) => {
  const { storedNames } = deleteJob(member, ids.id);
  await Promise.all(storedNames.map(removeStored));
  return NextResponse.json({ deleted: true });
});
