import { NextResponse } from "next/server";
import { deleteReading, updateReading } from "@/db/queries/readings";
import { route } from "@/server/http/route";
import { readingSchema } from "@/lib/jobs/reading-schemas";

const ids = { id: "That job", readingId: "That reading" };

/** Technicians and owners correct a reading by sending it whole again. */
export const PATCH = route({ role: "editJobs", ids, body: readingSchema }, ({ member, ids, body }) =>
  NextResponse.json({ reading: updateReading(member, ids.id, ids.readingId, body) }),
);

export const DELETE = route({ role: "editJobs", ids }, ({ member, ids }) => {
  deleteReading(member, ids.id, ids.readingId);
  return NextResponse.json({ deleted: true });
});
