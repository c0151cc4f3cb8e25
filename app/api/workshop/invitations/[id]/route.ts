import { NextResponse } from "next/server";
import { revokeInvitation } from "@/db/queries/invitations";
import { requireMember } from "@/lib/auth/member";
import { assertSameOrigin, handle } from "@/lib/http/api";
import { idParam } from "@/lib/http/ids";

export const DELETE = handle(async (request: Request, { params }: { params: Promise<{ id: string }> }) => {
  assertSameOrigin(request);
  const member = await requireMember();
  const revoked = revokeInvitation(member, idParam((await params).id, "That invitation"));
  return NextResponse.json({ revoked });
});
