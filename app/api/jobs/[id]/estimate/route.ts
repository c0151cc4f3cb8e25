import { NextResponse } from "next/server";
import { getEstimateForJob, saveEstimate } from "@/db/queries/estimates";
import { requireMember } from "@/lib/auth/member";
import { linesSchema } from "@/lib/estimates/schemas";
import { handle, parseJson } from "@/lib/http/api";
import { idParam } from "@/lib/http/ids";

type Ctx = { params: Promise<{ id: string }> };

export const GET = handle(async (_request: Request, { params }: Ctx) => {
  const member = await requireMember();
  return NextResponse.json(getEstimateForJob(member, idParam((await params).id, "That job")));
});

export const PUT = handle(async (request: Request, { params }: Ctx) => {
  const member = await requireMember();
  const jobId = idParam((await params).id, "That job");
  const input = await parseJson(request, linesSchema);
  return NextResponse.json(saveEstimate(member, jobId, input));
});
