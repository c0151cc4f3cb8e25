import { describe, expect, it } from "vitest";
import { calculators } from "../../lib/calc/registry";
import { runCalculator } from "../../lib/calc/run";
import { samples } from "../bench/samples";

/** compute gives numbers and warnings only; explain adds the working; runCalculator joins them unchanged. */
describe("compute / explain split", () => {
  for (const calc of calculators) {
    it(`${calc.slug}: compute has no steps, explain's steps are what runCalculator returns`, () => {
      const sample = samples[calc.slug];
      expect(sample, `a bench sample for ${calc.slug}`).toBeDefined();
      const parsed = calc.schema.safeParse(sample);
      expect(parsed.success).toBe(true);
      const input = parsed.data;
      const computed = calc.compute(input);
      expect(Object.keys(computed).sort()).toEqual(["outputs", "warnings"]);
      const steps = calc.explain(input, computed.outputs);
      expect(steps.length).toBeGreaterThan(0);
      for (const s of steps) expect(s.latex).not.toMatch(/NaN|Infinity|undefined/);

      const run = runCalculator(calc, sample);
      if (!run.ok) throw new Error(run.error.message);
      expect(Object.keys(run.result).sort()).toEqual(["inputs", "outputs", "references", "slug", "steps", "warnings"]);
      expect(run.result.outputs).toEqual(computed.outputs);
      expect(run.result.warnings).toEqual(computed.warnings);
      expect(run.result.steps).toEqual(steps);
      expect(run.result.slug).toBe(calc.slug);
      expect(Object.keys(run.result.outputs).sort()).toEqual(calc.outputs.map((o) => o.name).sort());
    });
  }
});
