import { NextResponse } from "next/server";
import { createReading, listReadings } from "@/db/queries/readings";
import { requireMember } from "@/lib/auth/member";
import { handle, parseJson } from "@/lib/http/api";
import { idParam, type JobParams } from "@/lib/http/ids";
import { readingSchema } from "@/lib/jobs/reading-schemas";

export const GET = handle(async (_request: Request, { params }: JobParams) => {
  const member = await requireMember();
  return NextResponse.json({ readings: listReadings(member, idParam((await params).id, "That job")) });
});

/** Every member, apprentices included, may add a reading; its verdict comes back with it. */
export const POST = handle(async (request: Request, { params }: JobParams) => {
  const member = await requireMember();
  const jobId = idParam((await params).id, "That job");
  const input = await parseJson(request, readingSchema);
  return NextResponse.json({ reading: createReading(member, jobId, input) }, { status: 201 });
});
