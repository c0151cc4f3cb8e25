import { NextResponse } from "next/server";
import { updateCandidate } from "@/db/queries/faults";
import { route } from "@/server/http/route";
import { candidateUpdateSchema } from "@/lib/jobs/fault-schemas";

const ids = { id: "That job", fid: "That fault", cid: "That candidate" };

/** Status (open, ruled-out, cause) and evidence; the whole fault comes back, its state with it. */
export const PATCH = route({ role: "addNotes", ids, body: candidateUpdateSchema }, ({ member, ids, body }) => {
  const fault = updateCandidate(member, ids.id, ids.fid, ids.cid, body);
  return NextResponse.json({ fault, candidate: fault.candidates.find((c) => c.id === ids.cid) });
});
