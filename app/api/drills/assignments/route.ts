import { NextResponse } from "next/server";
import { createAssignment, listAssignments } from "@/db/queries/drills";
import { drillAssignmentSchema, drillMemberQuerySchema } from "@/lib/drills/schemas";
import { route } from "@/server/http/route";

/** An apprentice's own sets of drills; owners and technicians see every set in the workshop (`?member=` for one apprentice). */
export const GET = route({ role: "doDrills", query: drillMemberQuerySchema }, ({ member, query }) =>
  NextResponse.json({ assignments: listAssignments(member, { apprentice: query.member }) }),
);

/** Owners and technicians: `{ apprentice, kinds, count?, due, note? }` or `{ apprentice, calculationId, due }` → 201 `{ assignment }`. */
export const POST = route({ role: "assignDrills", body: drillAssignmentSchema }, ({ member, body }) =>
  NextResponse.json({ assignment: createAssignment(member, body) }, { status: 201 }),
);
