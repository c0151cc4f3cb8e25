import { NextResponse } from "next/server";
import { revokeInvitation } from "@/db/queries/invitations";
import { route } from "@/server/http/route";

export const DELETE = route({ role: "manageMembers", ids: { id: "That invitation" } }, ({ member, ids }) =>
  NextResponse.json({ revoked: revokeInvitation(member, ids.id) }),
);
