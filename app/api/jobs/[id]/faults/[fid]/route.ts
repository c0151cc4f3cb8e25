import { NextResponse } from "next/server";
import { updateFault } from "@/db/queries/faults";
import { route } from "@/server/http/route";
import { faultUpdateSchema } from "@/lib/jobs/fault-schemas";

/** The repair as done (`resolution`), by anyone who may add to the record; it needs a candidate marked as the cause. */
export const PATCH = route({ role: "addNotes", ids: { id: "That job", fid: "That fault" }, body: faultUpdateSchema }, ({ member, ids, body }) =>
  NextResponse.json({ fault: updateFault(member, ids.id, ids.fid, body) }),
);
