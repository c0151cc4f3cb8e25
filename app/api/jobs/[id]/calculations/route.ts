import { NextResponse } from "next/server";
import { listCalculations, saveCalculation } from "@/db/queries/calculations";
import { requireMember } from "@/lib/auth/member";
import { handle, parseJson } from "@/lib/http/api";
import { idParam, type JobParams } from "@/lib/http/ids";
import { calculationSaveSchema } from "@/lib/jobs/calculation-schemas";

export const GET = handle(async (_request: Request, { params }: JobParams) => {
  const member = await requireMember();
  return NextResponse.json({ calculations: listCalculations(member, idParam((await params).id, "That job")) });
});

/** `{ slug, inputs, note? }` → 201 `{ calculation }`, recomputed on the server; the client's outputs are never stored. */
export const POST = handle(async (request: Request, { params }: JobParams) => {
  const member = await requireMember();
  const jobId = idParam((await params).id, "That job");
  const input = await parseJson(request, calculationSaveSchema);
  return NextResponse.json({ calculation: saveCalculation(member, jobId, input) }, { status: 201 });
});
