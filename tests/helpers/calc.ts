import fc from "fast-check";
import { runCalculator } from "@/lib/calc/run";
import type { Calculator } from "@/lib/calc/types";

/** Test shorthands for one calculator: run it (throwing on refusal), read its outputs, or read its field messages. */
export function calcRunner<O>(calculator: Calculator) {
  const run = (raw: Record<string, unknown>) => {
    const r = runCalculator(calculator, raw);
    if (!r.ok) throw new Error(JSON.stringify(r.error));
    return r.result;
  };
  const out = (raw: Record<string, unknown>) => run(raw).outputs as unknown as O;
  const fields = (raw: Record<string, unknown>): Record<string, string> => {
    const r = runCalculator(calculator, raw);
    if (r.ok) throw new Error("expected a refusal");
    return r.error.fields;
  };
  return { run, out, fields };
}

/** Values spread evenly on a log scale between lo and hi, as component values are. */
export const logUniform = (lo: number, hi: number) =>
  fc.double({ min: Math.log10(lo), max: Math.log10(hi), noNaN: true }).map((e) => Math.min(hi, Math.max(lo, 10 ** e)));
