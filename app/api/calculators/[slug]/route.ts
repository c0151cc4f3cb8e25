import { getCalculator } from "@/lib/calc/registry";
import { calculationJson, runCalculator } from "@/lib/calc/run";
import { HttpError, handle, jsonTextResponse, readJsonBody } from "@/lib/http/api";

/**
 * Public (signed-out visitors may calculate): validates and recomputes on the server with the very
 * module the browser form uses. Results sent by a client are never trusted.
 */
export const POST = handle(async (request: Request, { params }: { params: Promise<{ slug: string }> }) => {
  const { slug } = await params;
  const calc = getCalculator(slug);
  if (!calc) throw new HttpError(404, `There is no calculator called "${slug}".`);
  const body = await readJsonBody(request);
  const run = runCalculator(calc, body);
  if (!run.ok) return jsonTextResponse(JSON.stringify({ error: run.error }), 400);
  return jsonTextResponse(calculationJson(calc, run.result));
});
