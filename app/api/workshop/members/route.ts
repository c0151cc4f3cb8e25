import { NextResponse } from "next/server";
import { listMembers } from "@/db/queries/members";
import { requireMember } from "@/lib/auth/member";
import { handle } from "@/lib/http/api";

export const GET = handle(async () => {
  const member = await requireMember();
  return NextResponse.json({ members: listMembers(member) });
});
