import { NextResponse } from "next/server";
import { createTube, listTubes } from "@/db/queries/tubes";
import { route } from "@/server/http/route";
import { tubeSchema } from "@/lib/jobs/tube-schemas";

/** `{ tubes, seriesString }`: each tube with its substitute's differences from the built-in tube data. */
export const GET = route({ ids: { id: "That job" } }, ({ member, ids }) => NextResponse.json(listTubes(member, ids.id)));

/** Every member, apprentices included, may add a tube and its test result. */
export const POST = route({ role: "addNotes", ids: { id: "That job" }, body: tubeSchema }, ({ member, ids, body }) =>
  NextResponse.json({ tube: createTube(member, ids.id, body) }, { status: 201 }),
);
