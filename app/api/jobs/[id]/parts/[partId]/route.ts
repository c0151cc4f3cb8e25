import { NextResponse } from "next/server";
import { deletePart, updatePart } from "@/db/queries/parts";
import { route } from "@/server/http/route";
import { partUpdateSchema } from "@/lib/jobs/part-schemas";

const ids = { id: "That job", partId: "That part" };

/** Technicians and owners edit; an apprentice may only record a part as fitted (the query checks which). */
export const PATCH = route({ role: "addNotes", ids, body: partUpdateSchema }, ({ member, ids, body }) =>
  NextResponse.json({ part: updatePart(member, ids.id, ids.partId, body) }),
);

export const DELETE = route({ role: "editJobs", ids }, ({ member, ids }) => {
  deletePart(member, ids.id, ids.partId);
  return NextResponse.json({ deleted: true });
});
