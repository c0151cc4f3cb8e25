import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { calculator, SHIFT_FRACTION, TYPICAL_BIAS } from "@/lib/calc/coupling-cap";
import { calculator as reactance } from "@/lib/calc/reactance";
import { runCalculator } from "@/lib/calc/run";
import { calcRunner, logUniform } from "../helpers/calc";

type Out = { cornerFrequency: number; gridShift: number | null };

const { run, out, fields } = calcRunner<Out>(calculator);
const xc = calcRunner<{ capacitiveReactance: number }>(reactance).out;

describe("coupling-cap: checks against published data", () => {
  it("0.02 µF into a 0.5 MΩ grid resistor: the corner is at 15.9 Hz", () => {
    // Radiotron Designer's Handbook 4th ed., ch. 12: f = 1/(2πC(Rg + Rs)) with Rs neglected; 0.02 µF and 0.5 MΩ are that chapter's usual values (from memory)
    const o = out({ capacitance: "0.02 uF", gridResistance: "500k" });
    expect(o.cornerFrequency).toBeCloseTo(15.915, 3);
    expect(o.gridShift).toBeNull();
  });

  it("the driving stage's output resistance adds to the grid resistor: 0.1 µF, 470 kΩ + 47 kΩ is 3.08 Hz", () => {
    // Terman, Radio Engineers' Handbook, resistance-coupled amplifiers: the series resistance is Rg plus rp ∥ Ra (from memory)
    const o = out({ capacitance: "0.1 mfd", gridResistance: "470k", sourceResistance: "47k" });
    expect(o.cornerFrequency).toBeCloseTo(1 / (2 * Math.PI * 0.1e-6 * 517e3), 9);
    expect(o.cornerFrequency).toBeCloseTo(3.078, 3);
  });

  it("6V6GT with cathode bias: a 1 MΩ grid resistor is above the data sheet's 0.5 MΩ, a caution; 470 kΩ is not", () => {
    // RCA receiving tube manual, 6V6GT: maximum grid-circuit resistance 0.5 MΩ with cathode bias (from memory)
    const over = run({ capacitance: "0.05 uF", gridResistance: "1M", maxGridResistance: "0.5M" });
    expect(over.warnings.some((w) => w.level === "caution" && /above the data sheet's 500 kΩ maximum/.test(w.message))).toBe(true);
    const within = run({ capacitance: "0.05 uF", gridResistance: "470k", maxGridResistance: "0.5M" });
    expect(within.warnings.some((w) => /data sheet's/.test(w.message))).toBe(false);
  });

  it("a leaky capacitor: 5 µA through 470 kΩ pulls the grid 2.35 V positive, a caution against a −12.5 V bias", () => {
    // Ohm's law (ARRL Handbook, electrical fundamentals); 6V6GT class A bias −12.5 V (RCA data sheet, from memory); 1/10 rule: common practice
    const r = run({ capacitance: "0.05 uF", gridResistance: "470k", leakageCurrent: "5 uA" });
    expect(r.outputs.gridShift).toBeCloseTo(2.35, 12);
    expect(r.warnings.some((w) => w.level === "caution" && /2\.35 V positive/.test(w.message))).toBe(true);
    const small = run({ capacitance: "0.05 uF", gridResistance: "470k", leakageCurrent: "1 uA" });
    expect(small.warnings.some((w) => w.level === "caution")).toBe(false);
    expect(small.warnings.some((w) => w.level === "info" && /470 mV positive/.test(w.message))).toBe(true);
    // the same 0.47 V against a small-signal stage's 1.5 V bias is more than a tenth
    const preamp = run({ capacitance: "0.05 uF", gridResistance: "470k", leakageCurrent: "1 uA", biasVoltage: "1.5 V" });
    expect(preamp.warnings.some((w) => w.level === "caution" && /1\.5 V bias you gave/.test(w.message))).toBe(true);
  });
});

describe("coupling-cap: identities and properties", () => {
  const valid = fc.record({ c: logUniform(1e-10, 1e-5), rg: logUniform(1e3, 1e7), rs: fc.oneof(fc.constant(0), logUniform(100, 1e6)) });

  it("property: at the corner the capacitor's reactance (from the reactance calculator) equals Rg + Rs", () => {
    fc.assert(
      fc.property(valid, ({ c, rg, rs }) => {
        const o = out({ capacitance: c, gridResistance: rg, sourceResistance: rs });
        expect(Number.isFinite(o.cornerFrequency) && o.cornerFrequency > 0).toBe(true);
        expect(xc({ frequency: o.cornerFrequency, capacitance: c }).capacitiveReactance / (rg + rs)).toBeCloseTo(1, 9);
        // a voltage divider of R and X_C in quadrature: the grid gets 1/√2 of the signal at the corner
        expect((rg + rs) / Math.hypot(rg + rs, 1 / (2 * Math.PI * o.cornerFrequency * c))).toBeCloseTo(Math.SQRT1_2, 9);
      }),
    );
  });

  it("property: doubling C or R halves the corner; the grid shift is linear in the leakage and never negative", () => {
    fc.assert(
      fc.property(valid, logUniform(1e-9, 1e-4), ({ c, rg, rs }, leak) => {
        const base = out({ capacitance: c, gridResistance: rg, sourceResistance: rs, leakageCurrent: leak });
        expect(out({ capacitance: 2 * c, gridResistance: rg, sourceResistance: rs }).cornerFrequency / base.cornerFrequency).toBeCloseTo(0.5, 9);
        expect(out({ capacitance: c, gridResistance: 2 * rg, sourceResistance: 2 * rs }).cornerFrequency / base.cornerFrequency).toBeCloseTo(0.5, 9);
        expect(base.gridShift! / (leak * rg)).toBeCloseTo(1, 12);
        const r = run({ capacitance: c, gridResistance: rg, leakageCurrent: leak });
        const caution = r.warnings.some((w) => w.level === "caution" && /positive/.test(w.message));
        expect(caution).toBe(leak * rg > SHIFT_FRACTION * TYPICAL_BIAS);
      }),
    );
  });

  it("always the danger caution (the capacitor's other side is at plate voltage); never 'safe'", () => {
    const r = run({ capacitance: "0.02 uF", gridResistance: "470k", leakageCurrent: "0" });
    expect(r.warnings[0].level).toBe("danger");
    expect(r.outputs.gridShift).toBe(0);
    for (const w of r.warnings) expect(w.message).not.toMatch(/\bsafe\b/i);
    expect(r.steps.some((s) => /Grid pulled positive/.test(s.label))).toBe(true);
  });
});

describe("coupling-cap: refusals", () => {
  it("each bad value is refused under its own field", () => {
    expect(fields({ gridResistance: "470k" }).capacitance).toMatch(/required/);
    expect(fields({ capacitance: "0.02", gridResistance: "470k" }).capacitance).toMatch(/not read as farads/);
    expect(fields({ capacitance: "0.02 uF" }).gridResistance).toMatch(/required/);
    expect(fields({ capacitance: "0.02 uF", gridResistance: "470k", leakageCurrent: "-1 uA" }).leakageCurrent).toMatch(/negative/);
    expect(fields({ capacitance: "0.02 uF", gridResistance: "470k", biasVoltage: 0 }).biasVoltage).toMatch(/greater than zero/);
    const bad = fc.constantFrom("abc", "5 V", Number.NaN, Number.NEGATIVE_INFINITY, -5);
    fc.assert(
      fc.property(fc.constantFrom("capacitance", "gridResistance", "sourceResistance", "maxGridResistance"), bad, (name, x) => {
        const r = runCalculator(calculator, { capacitance: "0.02 uF", gridResistance: "470k", [name]: x });
        expect(r.ok).toBe(false);
        if (!r.ok) expect(r.error.fields).toHaveProperty(name);
      }),
    );
  });
});
