import { getJob } from "@/db/queries/jobs";
import { listParts } from "@/db/queries/parts";
import { requireMember } from "@/lib/auth/member";
import { handle } from "@/lib/http/api";
import { idParam, type JobParams } from "@/lib/http/ids";
import { partsToCsv } from "@/lib/jobs/parts-csv";
import { downloadName } from "@/lib/jobs/download-name";

/** The parts list as a CSV download, in the columns the import takes back. */
export const GET = handle(async (_request: Request, { params }: JobParams) => {
  const member = await requireMember();
  const jobId = idParam((await params).id, "That job");
  const job = getJob(member, jobId);
  const csv = partsToCsv(listParts(member, jobId));
  return new Response(`\uFEFF${csv}\r\n`, {
    headers: {
      "content-type": "text/csv; charset=utf-8",
      "content-disposition": downloadName("attachment", `parts-job-${job.id}.csv`),
      "cache-control": "private, no-store",
      "x-content-type-options": "nosniff",
    },
  });
});
