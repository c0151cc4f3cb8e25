import { NextResponse } from "next/server";
import { getCharges, updateCharges } from "@/db/queries/workshop";
import { requireMember, requireRole } from "@/lib/auth/member";
import { handle, parseJson } from "@/lib/http/api";
import { chargesSchema } from "@/lib/workshop/charges-schema";

export const GET = handle(async () => {
  const member = await requireMember();
  return NextResponse.json({ charges: getCharges(member) });
});

export const PATCH = handle(async (request: Request) => {
  // Role first, so a technician or apprentice learns nothing about the rules from a 400.
  const member = await requireRole(["owner"], "change the workshop's charges");
  const input = await parseJson(request, chargesSchema);
  return NextResponse.json({ charges: updateCharges(member, input) });
});
