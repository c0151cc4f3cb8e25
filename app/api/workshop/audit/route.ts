import { NextResponse } from "next/server";
import { listAuditEvents } from "@/db/queries/audit";
import { requireMember } from "@/lib/auth/member";
import { handle } from "@/lib/http/api";

export const GET = handle(async () => {
  const member = await requireMember();
  return NextResponse.json({ events: listAuditEvents(member) });
});
