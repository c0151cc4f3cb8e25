import { NextResponse } from "next/server";
import { updatePowerUp } from "@/db/queries/power-ups";
import { route } from "@/server/http/route";
import { powerUpOutcomeSchema } from "@/lib/jobs/power-up-schemas";

/** Passed or stopped; passing a session that went over its stop current needs a reason (400, field `reason`). */
export const PATCH = route({ role: "addNotes", ids: { id: "That job", pid: "That power-up session" }, body: powerUpOutcomeSchema }, ({ member, ids, body }) =>
  NextResponse.json({ session: updatePowerUp(member, ids.id, ids.pid, body) }),
);
