import { NextResponse } from "next/server";
import { getDrill } from "@/db/queries/drills";
import { route } from "@/server/http/route";

/** One drill: its problem, and once answered (`result`) the judgement and the working. */
export const GET = route({ role: "doDrills", ids: { id: "That drill" } }, ({ member, ids }) => NextResponse.json(getDrill(member, ids.id)));
