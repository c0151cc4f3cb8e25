import { NextResponse } from "next/server";
import { createParts } from "@/db/queries/parts";
import { assertJobInWorkshop } from "@/db/queries/job-access";
import { can, requireMember } from "@/lib/auth/member";
import { forbidden } from "@/lib/auth/errors";
import { HttpError, handle, parseJson } from "@/lib/http/api";
import { idParam, type JobParams } from "@/lib/http/ids";
import { parsePartsCsv } from "@/lib/jobs/parts-csv";
import { partsImportSchema } from "@/lib/jobs/part-schemas";

/** All-or-nothing CSV import: one bad row and nothing is added; the errors name each row. */
export const POST = handle(async (request: Request, { params }: JobParams) => {
  const member = await requireMember();
  const jobId = idParam((await params).id, "That job");
  if (!can.editJobs(member)) throw forbidden("import parts");
  assertJobInWorkshop(member, jobId);
  const { csv } = await parseJson(request, partsImportSchema);
  const parsed = parsePartsCsv(csv);
  if (!parsed.ok) throw new HttpError(400, parsed.message, parsed.fields);
  const parts = createParts(member, jobId, parsed.rows);
  return NextResponse.json({ imported: parts.length, parts }, { status: 201 });
});
