import { z } from "zod";
import { getCalculator } from "@/lib/calc/registry";
import { calculationJson, runCalculator } from "@/lib/calc/run";
import { HttpError, jsonTextResponse } from "@/server/http/errors";
import { route } from "@/server/http/route";

/**
 * Public (signed-out visitors may calculate): validates and recomputes on the server with the very
 * module the browser form uses. Results sent by a client are never trusted.
 */
export const POST = route({ auth: "public", params: ["slug"], body: z.unknown() }, ({ params: { slug }, body }) => {
  const calc = getCalculator(slug);
  if (!calc) throw new HttpError(404, `There is no calculator called "${slug}".`);
  const run = runCalculator(calc, body);
  if (!run.ok) return jsonTextResponse(JSON.stringify({ error: run.error }), 400);
  return jsonTextResponse(calculationJson(calc, run.result));
});
