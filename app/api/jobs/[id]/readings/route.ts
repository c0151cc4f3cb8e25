import { NextResponse } from "next/server";
import { createReading, listReadings } from "@/db/queries/readings";
import { route } from "@/server/http/route";
import { readingSchema } from "@/lib/jobs/reading-schemas";

export const GET = route({ ids: { id: "That job" } }, ({ member, ids }) => NextResponse.json({ readings: listReadings(member, ids.id) }));

/** Every member, apprentices included, may add a reading; its verdict comes back with it. */
export const POST = route({ role: "addNotes", ids: { id: "That job" }, body: readingSchema }, ({ member, ids, body }) =>
  NextResponse.json({ reading: createReading(member, ids.id, body) }, { status: 201 }),
);
