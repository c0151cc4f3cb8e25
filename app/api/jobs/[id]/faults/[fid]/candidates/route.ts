import { NextResponse } from "next/server";
import { addCandidate } from "@/db/queries/faults";
import { route } from "@/server/http/route";
import { candidateSchema } from "@/lib/jobs/fault-schemas";

/** A candidate cause, added at the end of the test order. */
export const POST = route({ role: "addNotes", ids: { id: "That job", fid: "That fault" }, body: candidateSchema }, ({ member, ids, body }) =>
  NextResponse.json({ candidate: addCandidate(member, ids.id, ids.fid, body) }, { status: 201 }),
);
