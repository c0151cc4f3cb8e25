import { NextResponse } from "next/server";
import { addPowerUpStep } from "@/db/queries/power-ups";
import { route } from "@/server/http/route";
import { powerUpStepSchema } from "@/lib/jobs/power-up-schemas";

/** One step of the bring-up; current above the session's stop current comes back with a danger warning. */
export const POST = route({ role: "addNotes", ids: { id: "That job", pid: "That power-up session" }, body: powerUpStepSchema }, ({ member, ids, body }) =>
  NextResponse.json({ step: addPowerUpStep(member, ids.id, ids.pid, body) }, { status: 201 }),
);
