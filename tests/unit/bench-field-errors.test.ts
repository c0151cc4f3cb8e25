import { toNestErrors } from "@hookform/resolvers";
import type { FieldValues, ResolverOptions } from "react-hook-form";
import { describe, expect, it, vi } from "vitest";
import { errorAt, runFieldErrors } from "@/lib/bench/errors";
import { runCalculator } from "@/lib/calc/run";
import { calculator as ripple } from "@/lib/calc/supply-ripple";
import { calculator as timeConstant } from "@/lib/calc/time-constant";
import type { Calculator } from "@/lib/calc/types";

/** The Bench parses a keystroke once: the run behind the result also gives the form its field messages. */

const options = { fields: {}, shouldUseNativeValidation: false } as unknown as ResolverOptions<FieldValues>;

describe("field messages from the run", () => {
  it("a bad stage value reaches its own field, nested as the form reads it, with the run's own message", () => {
    const calc = ripple as unknown as Calculator;
    const spy = vi.spyOn(calc.schema, "safeParse");
    const run = runCalculator(calc, { loadCurrent: "60 mA", capacitance: "40 uF", stages: [{ kind: "rc", resistance: "470", capacitance: "lots" }] });
    const nested = toNestErrors(runFieldErrors(run), options);
    expect(spy).toHaveBeenCalledTimes(1);
    spy.mockRestore();
    if (run.ok) throw new Error("expected a refusal");
    expect(errorAt(nested, "stages.0.capacitance")).toBeTruthy();
    expect(errorAt(nested, "stages.0.capacitance")!.toLowerCase()).toBe(run.error.fields["stages.0.capacitance"].toLowerCase());
    expect(errorAt(nested, "loadCurrent")).toBeUndefined();
  });

  it("a cross-field rule lands on the field it names; a valid run gives no messages", () => {
    const calc = timeConstant as unknown as Calculator;
    const bad = runCalculator(calc, { resistance: "220k", capacitance: "47 uF", initialVoltage: "30 V", targetVoltage: "350 V" });
    const errors = runFieldErrors(bad);
    expect(Object.keys(errors)).toContain("targetVoltage");
    expect(Object.keys(errors)).not.toContain("_");
    expect(runFieldErrors(runCalculator(calc, calc.bench.example))).toEqual({});
    expect(runFieldErrors(null)).toEqual({});
  });
});
