import { NextResponse } from "next/server";
import { createPart, listParts } from "@/db/queries/parts";
import { requireMember } from "@/lib/auth/member";
import { handle, parseJson } from "@/lib/http/api";
import { idParam, type JobParams } from "@/lib/http/ids";
import { partSchema } from "@/lib/jobs/part-schemas";

export const GET = handle(async (_request: Request, { params }: JobParams) => {
  const member = await requireMember();
  return NextResponse.json({ parts: listParts(member, idParam((await params).id, "That job")) });
});

export const POST = handle(async (request: Request, { params }: JobParams) => {
  const member = await requireMember();
  const jobId = idParam((await params).id, "That job");
  const input = await parseJson(request, partSchema);
  return NextResponse.json({ part: createPart(member, jobId, input) }, { status: 201 });
});
