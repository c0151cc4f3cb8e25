import { NextResponse } from "next/server";
import { addLogEntry, listLog } from "@/db/queries/log";
import { requireMember } from "@/lib/auth/member";
import { handle, parseJson } from "@/lib/http/api";
import { idParam, type JobParams } from "@/lib/http/ids";
import { logEntrySchema } from "@/lib/jobs/log-schemas";

export const GET = handle(async (_request: Request, { params }: JobParams) => {
  const member = await requireMember();
  return NextResponse.json({ log: listLog(member, idParam((await params).id, "That job")) });
});

/** A note, or a power-up entry with supply voltage and current drawn; any member may write one. */
export const POST = handle(async (request: Request, { params }: JobParams) => {
  const member = await requireMember();
  const jobId = idParam((await params).id, "That job");
  const input = await parseJson(request, logEntrySchema);
  return NextResponse.json({ entry: addLogEntry(member, jobId, input) }, { status: 201 });
});
