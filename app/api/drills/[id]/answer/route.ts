import { NextResponse } from "next/server";
import { answerDrill } from "@/db/queries/drills";
import { drillAnswerSchema } from "@/lib/drills/schemas";
import { route } from "@/server/http/route";

/**
 * `{ answer }` (a number in SI, or text such as "1.5k" or "250 mW") → `{ correct, verdict, expected, tolerance, steps, … }`.
 * One answer per drill (409 after); an answer that cannot be read is a 400 and leaves the drill open.
 */
export const POST = route({ role: "doDrills", ids: { id: "That drill" }, body: drillAnswerSchema }, ({ member, ids, body }) =>
  NextResponse.json(answerDrill(member, ids.id, body.answer)),
);
