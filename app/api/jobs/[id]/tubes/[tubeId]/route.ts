import { NextResponse } from "next/server";
import { deleteTube, updateTube } from "@/db/queries/tubes";
import { route } from "@/server/http/route";
import { tubeUpdateSchema } from "@/lib/jobs/tube-schemas";

const ids = { id: "That job", tubeId: "That tube" };

/** Recording a test, a verdict or a substitute is for every member; removing a tube is not. */
export const PATCH = route({ role: "addNotes", ids, body: tubeUpdateSchema }, ({ member, ids, body }) =>
  NextResponse.json({ tube: updateTube(member, ids.id, ids.tubeId, body) }),
);

export const DELETE = route({ role: "editJobs", ids }, ({ member, ids }) => {
  deleteTube(member, ids.id, ids.tubeId);
  return NextResponse.json({ deleted: true });
});
