import { NextResponse } from "next/server";
import { changeMemberRole, removeMember } from "@/db/queries/members";
import { route } from "@/server/http/route";
import { roleChangeSchema } from "@/lib/workshop/schemas";

const ids = { id: "That member" };

export const PATCH = route({ role: "manageMembers", ids, body: roleChangeSchema }, ({ member, ids, body }) => {
  const updated = changeMemberRole(member, ids.id, body.role);
  return NextResponse.json({ member: { id: updated.id, name: updated.name, email: updated.email, role: updated.role } });
});

export const DELETE = route({ role: "manageMembers", ids }, ({ member, ids }) => {
  const removed = removeMember(member, ids.id);
  return NextResponse.json({ removed: { id: removed.id, name: removed.name } });
});
