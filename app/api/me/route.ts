import { NextResponse } from "next/server";
import { requireMember } from "@/lib/auth/member";
import { handle } from "@/lib/http/api";

export const GET = handle(async () => {
  const m = await requireMember();
  return NextResponse.json({
    user: { id: m.userId, email: m.email, name: m.name },
    workshop: { id: m.workshopId, name: m.workshopName },
    role: m.role,
  });
});
