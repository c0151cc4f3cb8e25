import { describe, expect, it } from "vitest";
import { initialValues, toRaw } from "@/lib/bench/form-values";
import { runCalculator } from "@/lib/calc/run";
import { calculator } from "@/lib/calc/supply-ripple";
import { calculator as triode } from "@/lib/calc/triode-stage";
import type { Calculator } from "@/lib/calc/types";

const calc = calculator as unknown as Calculator;

describe("supply-ripple form: stages with their own current and choke resistance", () => {
  it("a stage's current and an LC stage's choke resistance survive the form both ways", () => {
    const given = {
      loadCurrent: "60 mA",
      capacitance: "40 uF",
      rectifier: "full-wave",
      stages: [
        { kind: "lc", inductance: "8 H", capacitance: "20 uF", resistance: "220", current: "60 mA" },
        { kind: "rc", resistance: "22k", capacitance: "10 uF", current: "3 mA" },
      ],
    };
    const form = initialValues(calc.inputs, given);
    const stages = form.stages as Record<string, string>[];
    // The winding sits in its own form field, so switching a stage to RC never turns 220 Ω into its resistor.
    expect(stages[0]).toMatchObject({ kind: "lc", chokeResistance: "220", resistance: "", current: "60 mA" });
    expect(stages[1]).toMatchObject({ kind: "rc", resistance: "22k", chokeResistance: "", current: "3 mA" });
    expect(toRaw(calc, form).stages).toEqual(given.stages);
  });

  it("blank current and choke resistance are left out, so the calculator's stated defaults apply", () => {
    const form = initialValues(calc.inputs, {
      loadCurrent: "60 mA",
      capacitance: "40 uF",
      rectifier: "full-wave",
      stages: [{ kind: "lc", inductance: "8 H", capacitance: "20 uF" }],
    });
    const raw = toRaw(calc, form);
    expect(raw.stages).toEqual([{ kind: "lc", inductance: "8 H", capacitance: "20 uF" }]);
    const r = runCalculator(calc, raw);
    expect(r.ok).toBe(true);
  });

  it("the worked example runs through the form and shows the 5Y3GT's reservoir limit", () => {
    const raw = toRaw(calc, initialValues(calc.inputs, calc.bench.example));
    const r = runCalculator(calc, raw);
    if (!r.ok) throw new Error(JSON.stringify(r.error));
    expect(r.result.warnings.some((w) => w.level === "caution" && /20 µF the 5Y3GT data sheet allows/.test(w.message))).toBe(true);
    expect(r.result.warnings.some((w) => w.level === "danger")).toBe(true);
  });

  it("the triode example solves, and is neither cut off nor bottomed", () => {
    const t = triode as unknown as Calculator;
    const r = runCalculator(t, toRaw(t, initialValues(t.inputs, t.bench.example)));
    if (!r.ok) throw new Error(JSON.stringify(r.error));
    expect(typeof r.result.outputs.plateToChassisVoltage).toBe("number");
    expect(r.result.warnings.some((w) => /cut-off|bottomed/.test(w.message))).toBe(false);
  });
});
