import { NextResponse } from "next/server";
import { deleteReading, updateReading } from "@/db/queries/readings";
import { can, requireMember } from "@/lib/auth/member";
import { forbidden } from "@/lib/auth/errors";
import { handle, parseJson } from "@/lib/http/api";
import { idParam } from "@/lib/http/ids";
import { readingSchema } from "@/lib/jobs/reading-schemas";

type Params = { params: Promise<{ id: string; readingId: string }> };

/** Technicians and owners correct a reading by sending it whole again. */
export const PATCH = handle(async (request: Request, { params }: Params) => {
  const member = await requireMember();
  if (!can.editJobs(member)) throw forbidden("change readings");
  const { id, readingId } = await params;
  const input = await parseJson(request, readingSchema);
  return NextResponse.json({ reading: updateReading(member, idParam(id, "That job"), idParam(readingId, "That reading"), input) });
});

export const DELETE = handle(async (_request: Request, { params }: Params) => {
  const member = await requireMember();
  const { id, readingId } = await params;
  deleteReading(member, idParam(id, "That job"), idParam(readingId, "That reading"));
  return NextResponse.json({ deleted: true });
});
