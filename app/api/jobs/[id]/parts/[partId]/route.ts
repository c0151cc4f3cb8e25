import { NextResponse } from "next/server";
import { deletePart, updatePart } from "@/db/queries/parts";
import { requireMember } from "@/lib/auth/member";
import { handle, parseJson } from "@/lib/http/api";
import { idParam } from "@/lib/http/ids";
import { partUpdateSchema } from "@/lib/jobs/part-schemas";

type Params = { params: Promise<{ id: string; partId: string }> };

export const PATCH = handle(async (request: Request, { params }: Params) => {
  const member = await requireMember();
  const { id, partId } = await params;
  const input = await parseJson(request, partUpdateSchema);
  return NextResponse.json({ part: updatePart(member, idParam(id, "That job"), idParam(partId, "That part"), input) });
});

export const DELETE = handle(async (_request: Request, { params }: Params) => {
  const member = await requireMember();
  const { id, partId } = await params;
  deletePart(member, idParam(id, "That job"), idParam(partId, "That part"));
  return NextResponse.json({ deleted: true });
});
