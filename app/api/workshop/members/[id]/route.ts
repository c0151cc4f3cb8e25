import { NextResponse } from "next/server";
import { changeMemberRole, removeMember } from "@/db/queries/members";
import { requireMember } from "@/lib/auth/member";
import { assertSameOrigin, handle, parseJson } from "@/lib/http/api";
import { idParam } from "@/lib/http/ids";
import { roleChangeSchema } from "@/lib/workshop/schemas";

type Context = { params: Promise<{ id: string }> };

export const PATCH = handle(async (request: Request, { params }: Context) => {
  const member = await requireMember();
  const id = idParam((await params).id, "That member");
  const { role } = await parseJson(request, roleChangeSchema);
  const updated = changeMemberRole(member, id, role);
  return NextResponse.json({ member: { id: updated.id, name: updated.name, email: updated.email, role: updated.role } });
});

export const DELETE = handle(async (request: Request, { params }: Context) => {
  assertSameOrigin(request);
  const member = await requireMember();
  const removed = removeMember(member, idParam((await params).id, "That member"));
  return NextResponse.json({ removed: { id: removed.id, name: removed.name } });
});
