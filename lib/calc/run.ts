import type { Calculator, OutputValue, Reference, Step, Warning } from "./types";

/** The 200 body of POST /api/calculators/{slug}. */
export interface CalculationResponse {
  slug: string;
  inputs: Record<string, unknown>;
  outputs: Record<string, OutputValue>;
  steps: Step[];
  warnings: Warning[];
  references: readonly Reference[];
}

export interface CalculationError {
  message: string;
  fields: Record<string, string>;
}

export type RunResult = { ok: true; result: CalculationResponse } | { ok: false; error: CalculationError };

/**
 * Validate raw inputs with the calculator's schema and compute. Shared by the client form
 * and the route handler, so both give the same answer. Never throws for bad input.
 */
export function runCalculator(calc: Calculator, raw: unknown): RunResult {
  if (raw === null || typeof raw !== "object" || Array.isArray(raw)) {
    return { ok: false, error: { message: "Inputs must be a JSON object.", fields: {} } };
  }
  const parsed = calc.schema.safeParse(raw);
  if (!parsed.success) {
    const fields: Record<string, string> = {};
    for (const issue of parsed.error.issues) {
      const key = issue.path.length ? issue.path.map(String).join(".") : "_";
      fields[key] ??= issue.message;
    }
    const names = Object.keys(fields).filter((k) => k !== "_");
    const message = names.length
      ? `Check ${names.length === 1 ? "this field" : "these fields"}: ${names.join(", ")}.`
      : (fields._ ?? "The inputs are not valid.");
    return { ok: false, error: { message, fields } };
  }
  const input = parsed.data as Record<string, unknown>;
  let outputs: Record<string, OutputValue>;
  let warnings: Warning[];
  let steps: Step[];
  try {
    ({ outputs, warnings } = calc.compute(input));
    steps = calc.explain(input, outputs);
  } catch (err) {
    // A pure compute should not throw for validated input; if it does, answer plainly, never a 500.
    const message = err instanceof Error ? err.message : "These inputs cannot be solved.";
    return { ok: false, error: { message, fields: {} } };
  }
  return {
    ok: true,
    result: { slug: calc.slug, inputs: input, outputs, steps, warnings, references: calc.references },
  };
}

/** JSON of each calculator's static parts, made once: they are the same in every response. */
const staticJson = new WeakMap<Calculator, { slug: string; references: string }>();

/**
 * The 200 body as JSON text, equal to JSON.stringify(result) (tests/calc/response-json.test.ts
 * checks it), with the slug and references serialised once per calculator instead of per request.
 */
export function calculationJson(calc: Calculator, r: CalculationResponse): string {
  let fixed = staticJson.get(calc);
  if (!fixed) {
    fixed = { slug: JSON.stringify(calc.slug), references: JSON.stringify(calc.references) };
    staticJson.set(calc, fixed);
  }
  return (
    `{"slug":${fixed.slug},"inputs":${JSON.stringify(r.inputs)},"outputs":${JSON.stringify(r.outputs)},` +
    `"steps":${JSON.stringify(r.steps)},"warnings":${JSON.stringify(r.warnings)},"references":${fixed.references}}`
  );
}
