import { NextResponse } from "next/server";
import { createPart, listParts } from "@/db/queries/parts";
import { route } from "@/server/http/route";
import { partSchema } from "@/lib/jobs/part-schemas";

export const GET = route({ ids: { id: "That job" } }, ({ member, ids }) => NextResponse.json({ parts: listParts(member, ids.id) }));

export const POST = route({ role: "editJobs", ids: { id: "That job" }, body: partSchema }, ({ member, ids, body }) =>
  NextResponse.json({ part: createPart(member, ids.id, body) }, { status: 201 }),
);
