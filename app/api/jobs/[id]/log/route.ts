import { NextResponse } from "next/server";
import { addLogEntry, listLog } from "@/db/queries/log";
import { route } from "@/server/http/route";
import { logEntrySchema } from "@/lib/jobs/log-schemas";

export const GET = route({ ids: { id: "That job" } }, ({ member, ids }) => NextResponse.json({ log: listLog(member, ids.id) }));

/** A note, or a power-up entry with supply voltage and current drawn; any member may write one. */
export const POST = route({ role: "addNotes", ids: { id: "That job" }, body: logEntrySchema }, ({ member, ids, body }) =>
  NextResponse.json({ entry: addLogEntry(member, ids.id, body) }, { status: 201 }),
);
