import { NextResponse } from "next/server";
import { createTubeLineup } from "@/db/queries/tubes";
import { route } from "@/server/http/route";
import { tubeLineupSchema } from "@/lib/jobs/tube-schemas";

/** A set's whole line-up at once, `{ types: "6BE6 6BA6 6AV6 6AQ5 6X4" }`: the new tubes come back. */
export const POST = route({ role: "addNotes", ids: { id: "That job" }, body: tubeLineupSchema }, ({ member, ids, body }) =>
  NextResponse.json(createTubeLineup(member, ids.id, body.types), { status: 201 }),
);
