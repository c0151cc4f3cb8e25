import { NextResponse } from "next/server";
import { createDrill } from "@/db/queries/drills";
import { describeDrillKinds } from "@/lib/drills";
import { drillCreateSchema } from "@/lib/drills/schemas";
import { route } from "@/server/http/route";

/** The drill kinds, one or more per calculator. For members only, like every drills route. */
export const GET = route({ role: "doDrills" }, () => NextResponse.json({ kinds: describeDrillKinds() }));

/**
 * `{ slug }`, `{ kind }` or `{ calculationId }` → 201 `{ id, slug, kind, title, prompt, given, asked, danger, caution, … }`.
 * The expected answer stays on the server until the drill is answered.
 */
export const POST = route({ role: "doDrills", body: drillCreateSchema }, ({ member, body }) => NextResponse.json(createDrill(member, body), { status: 201 }));
