import { NextResponse } from "next/server";
import { createPowerUp, listPowerUps } from "@/db/queries/power-ups";
import { route } from "@/server/http/route";
import { powerUpSchema } from "@/lib/jobs/power-up-schemas";

/** Sessions in the order they were started, each with its steps and warnings. */
export const GET = route({ ids: { id: "That job" } }, ({ member, ids }) => NextResponse.json({ sessions: listPowerUps(member, ids.id) }));

/** Every member may start a bring-up; the checklist is advice, its unticked items come back as cautions. */
export const POST = route({ role: "addNotes", ids: { id: "That job" }, body: powerUpSchema }, ({ member, ids, body }) =>
  NextResponse.json({ session: createPowerUp(member, ids.id, body) }, { status: 201 }),
);
