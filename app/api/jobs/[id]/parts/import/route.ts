import { NextResponse } from "next/server";
import { createParts } from "@/db/queries/parts";
import { assertJobInWorkshop } from "@/db/queries/job-access";
import { HttpError } from "@/server/http/errors";
import { route } from "@/server/http/route";
import { parsePartsCsv } from "@/lib/jobs/parts-csv";
import { partsImportSchema } from "@/lib/jobs/part-schemas";

/** All-or-nothing CSV import: one bad row and nothing is added; the errors name each row. */
export const POST = route({ role: "editJobs", ids: { id: "That job" }, body: partsImportSchema }, ({ member, ids: { id: jobId }, body: { csv } }) => {
  assertJobInWorkshop(member, jobId);
  const parsed = parsePartsCsv(csv);
  if (!parsed.ok) throw new HttpError(400, parsed.message, parsed.fields);
  const parts = createParts(member, jobId, parsed.rows);
  return NextResponse.json({ imported: parts.length, parts }, { status: 201 });
});
