import { NextResponse } from "next/server";
import { createFault, listFaults } from "@/db/queries/faults";
import { route } from "@/server/http/route";
import { faultSchema } from "@/lib/jobs/fault-schemas";

/** Faults with their candidates in test order and their state (open, found, fixed). */
export const GET = route({ ids: { id: "That job" } }, ({ member, ids }) => NextResponse.json({ faults: listFaults(member, ids.id) }));

export const POST = route({ role: "addNotes", ids: { id: "That job" }, body: faultSchema }, ({ member, ids, body }) =>
  NextResponse.json({ fault: createFault(member, ids.id, body) }, { status: 201 }),
);
