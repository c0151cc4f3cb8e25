import { NextResponse } from "next/server";
import { listJobs } from "@/db/queries/jobs";
import { requireMember } from "@/lib/auth/member";
import { handle } from "@/lib/http/api";

export const GET = handle(async () => {
  const member = await requireMember();
  return NextResponse.json({ jobs: listJobs(member) });
});
