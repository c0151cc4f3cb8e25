import { describe, expect, it } from "vitest";
import { calculators } from "../../lib/calc/registry";
import { calculationJson, runCalculator } from "../../lib/calc/run";
import { samples } from "../bench/samples";

// The route sends calculationJson (static parts serialised once per calculator); it must be
// byte for byte what JSON.stringify of the response object would give.
describe("calculationJson", () => {
  it.each(calculators.map((c) => [c.slug, c] as const))("equals JSON.stringify for %s, twice in a row", (_slug, calc) => {
    const run = runCalculator(calc, samples[calc.slug]);
    expect(run.ok).toBe(true);
    if (!run.ok) return;
    expect(calculationJson(calc, run.result)).toBe(JSON.stringify(run.result));
    expect(calculationJson(calc, run.result)).toBe(JSON.stringify(run.result)); // from the cache
    expect(JSON.parse(calculationJson(calc, run.result))).toEqual(run.result);
  });
});
