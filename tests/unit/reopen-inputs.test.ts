import { expect, test } from "vitest";
import { reopenInputs } from "@/lib/bench/reopen-inputs";
import { getCalculator } from "@/lib/calc/registry";
import { runCalculator } from "@/lib/calc/run";
import { decodeInputs, encodeInputs } from "@/lib/calc/share";

// A saved calculation keeps SI numbers; reopened through the URL they become form text, where a bare
// capacitance is refused. Written with its unit, the same inputs give the same result again.
test("saved SI inputs survive the URL and the form's text, capacitance included", () => {
  const cases: [string, Record<string, unknown>][] = [
    ["bleeder", { capacitance: "32 uF", workingVoltage: "380" }],
    ["time-constant", { resistance: "220k", capacitance: "0.047 mfd", initialVoltage: "350 V" }],
    [
      "supply-ripple",
      { loadCurrent: "60 mA", capacitance: "40 uF", rectifier: "full-wave", stages: [{ kind: "rc", resistance: "470", capacitance: "20 uF" }] },
    ],
  ];
  for (const [slug, typed] of cases) {
    const calc = getCalculator(slug)!;
    const saved = runCalculator(calc, typed);
    if (!saved.ok) throw new Error(saved.error.message);
    const back = decodeInputs(new URLSearchParams(encodeInputs(reopenInputs(calc.inputs, saved.result.inputs))));
    // Without the unit the bare capacitance is refused: the reason for reopenInputs.
    expect(runCalculator(calc, decodeInputs(new URLSearchParams(encodeInputs(saved.result.inputs)))).ok, slug).toBe(false);
    const again = runCalculator(calc, back);
    expect(again.ok && again.result.outputs, slug).toEqual(saved.result.outputs);
  }
});

test("numbers of other kinds and non-numbers are left alone", () => {
  const calc = getCalculator("time-constant")!;
  expect(reopenInputs(calc.inputs, { resistance: 1000, capacitance: 1e-7, initialVoltage: 9 })).toEqual({
    resistance: 1000,
    capacitance: "1e-7 F",
    initialVoltage: 9,
  });
  expect(reopenInputs(calc.inputs, { capacitance: "47 uF" })).toEqual({ capacitance: "47 uF" });
});
