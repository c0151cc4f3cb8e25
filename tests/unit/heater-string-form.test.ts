import { describe, expect, it } from "vitest";
import { initialValues, toRaw } from "@/lib/bench/form-values";
import { calculator } from "@/lib/calc/heater-string";
import { runCalculator } from "@/lib/calc/run";
import type { Calculator } from "@/lib/calc/types";

const calc = calculator as unknown as Calculator;

describe("heater-string form: the pilot lamp", () => {
  it("a lamp typed in the form reaches the calculator as one object, and back", () => {
    const given = {
      lineVoltage: "117 V",
      tubes: ["12BE6", "12BA6", "12AV6", "50C5", "35W4"],
      pilotLamp: { voltage: "6.3", current: "150m", rectifierCurrent: "50m" },
    };
    const form = initialValues(calc.inputs, given);
    expect(form.pilotLamp).toEqual({ voltage: "6.3", current: "150m", rectifierCurrent: "50m" });
    const raw = toRaw(calc, form, "tubes");
    expect(raw.pilotLamp).toEqual(given.pilotLamp);
    const r = runCalculator(calc, raw);
    expect(r.ok && typeof r.result.outputs.pilotLampCurrent).toBe("number");
  });

  it("blank lamp fields send no lamp; a half-filled lamp is refused under its field", () => {
    const blank = initialValues(calc.inputs, { lineVoltage: "117", tubes: ["35W4"] });
    expect(blank.pilotLamp).toEqual({ voltage: "", current: "", rectifierCurrent: "" });
    expect("pilotLamp" in toRaw(calc, blank, "tubes")).toBe(false);
    const half = toRaw(calc, { ...blank, pilotLamp: { voltage: "6.3", current: "", rectifierCurrent: "" } }, "tubes");
    expect(half.pilotLamp).toEqual({ voltage: "6.3", current: "" });
    const r = runCalculator(calc, half);
    expect(!r.ok && r.error.fields["pilotLamp.current"]).toMatch(/required/);
  });

  it("the lamp sits in the folding section and is kept in both entry modes", () => {
    expect(calc.bench.advanced?.fields).toContain("pilotLamp");
    const form = initialValues(calc.inputs, {
      lineVoltage: "117",
      heaters: [{ voltage: "35", current: "150m" }],
      pilotLamp: { voltage: "6.3", current: "150m" },
    });
    expect(toRaw(calc, form, "heaters").pilotLamp).toEqual({ voltage: "6.3", current: "150m" });
  });
});
