import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { calculator } from "@/lib/calc/bleeder";
import { texQuantity } from "@/lib/calc/format";
import { runCalculator } from "@/lib/calc/run";
import { E12 } from "@/lib/calc/tables/preferred-values";
import { calculator as timeConstant } from "@/lib/calc/time-constant";
import { calcRunner, logUniform } from "../helpers/calc";

type Out = {
  maxResistance: number;
  suggestedResistance: number;
  bleederCurrent: number;
  dissipation: number;
  suggestedRating: number | null;
};

const { run, out } = calcRunner<Out>(calculator);

/** Is x a member of E12 (any decade)? */
function isE12(x: number): boolean {
  const mantissa = x / 10 ** Math.floor(Math.log10(x) + 1e-12);
  return E12.some((m) => Math.abs(m - mantissa) < 1e-9 * m);
}

/** Voltage left after `elapsed`, from the separate time-constant calculator. */
function residual(r: number, c: number, v0: number, elapsed: number): number {
  const res = runCalculator(timeConstant, { resistance: r, capacitance: c, initialVoltage: v0, elapsed });
  if (!res.ok) throw new Error(JSON.stringify(res.error));
  return res.result.outputs.voltageAtElapsed as number;
}

describe("bleeder: published checks", () => {
  it("defaults to IEC 60204-1 §6.2.4: 60 V within 5 s, and the result meets it at +5%", () => {
    // IEC 60204-1 §6.2.4: residual voltage ≤ 60 V within 5 s after disconnection — from memory
    const r = run({ capacitance: "100 uF", workingVoltage: "450 V" });
    expect(r.inputs).toMatchObject({ safeVoltage: 60, maxTime: 5, tolerance: 0.05 });
    const o = r.outputs as unknown as Out;
    expect(residual(o.suggestedResistance * 1.05, 100e-6, 450, 5)).toBeLessThanOrEqual(60);
    // and the next E12 value up (27 kΩ here) would not meet it at +5%
    expect(o.suggestedResistance).toBe(22e3);
    expect(residual(27e3 * 1.05, 100e-6, 450, 5)).toBeGreaterThan(60);
  });

  it("five time constants: a working voltage of 60·e⁵ V needs RC = 1 s for 5 s", () => {
    // ARRL Handbook, electrical fundamentals: after 5τ a capacitor holds e^-5 ≈ 0.7% of its voltage — from memory
    const o = out({ capacitance: "10 uF", workingVoltage: 60 * Math.exp(5), tolerance: 0 });
    expect(o.maxResistance * 10e-6).toBeCloseTo(1, 12);
  });

  it("the suggested value is an IEC 60063 E12 member, the largest that meets the time at +tolerance", () => {
    // IEC 60063, E12 series: 1.0 1.2 1.5 1.8 2.2 2.7 3.3 3.9 4.7 5.6 6.8 8.2
    const o = out({ capacitance: "40uF", workingVoltage: 350, tolerance: 0.1 });
    expect(isE12(o.suggestedResistance)).toBe(true);
    expect(o.suggestedResistance * 1.1).toBeLessThanOrEqual(o.maxResistance);
    const i = E12.findIndex((m) => Math.abs(m - o.suggestedResistance / 10 ** Math.floor(Math.log10(o.suggestedResistance))) < 1e-9);
    const nextUp = i === E12.length - 1 ? 10 ** (Math.floor(Math.log10(o.suggestedResistance)) + 1) : E12[i + 1] * 10 ** Math.floor(Math.log10(o.suggestedResistance));
    expect(nextUp * 1.1).toBeGreaterThan(o.maxResistance);
  });
});

describe("bleeder: identities and arithmetic", () => {
  it("worked example: 100 µF at 450 V", () => {
    const o = out({ capacitance: "100 uF", workingVoltage: 450 });
    const maxR = 5 / (100e-6 * Math.log(450 / 60)); // ≈ 24.8 kΩ
    expect(o.maxResistance).toBeCloseTo(maxR, 6);
    expect(o.bleederCurrent).toBeCloseTo(450 / 22e3, 12);
    expect(o.dissipation).toBeCloseTo((450 * 450) / 22e3, 9); // ≈ 9.2 W
    expect(o.suggestedRating).toBe(20); // next standard rating ≥ 18.4 W
  });

  it("P = VI = I²R = V²/R", () => {
    const o = out({ capacitance: "47uF", workingVoltage: 300 });
    const r = o.suggestedResistance;
    expect(o.dissipation).toBeCloseTo(300 * o.bleederCurrent, 9);
    expect(o.dissipation).toBeCloseTo(o.bleederCurrent ** 2 * r, 9);
  });

  it("shows the stored energy ½CV² as a step", () => {
    const r = run({ capacitance: "100uF", workingVoltage: 400 });
    const step = r.steps.find((s) => /energy/i.test(s.label));
    expect(step?.latex).toContain(texQuantity(0.5 * 100e-6 * 400 * 400, "J")); // 8 J
  });

  it("always warns of danger and that a bleeder can fail open", () => {
    const r = run({ capacitance: "1uF", workingVoltage: 100 });
    expect(r.warnings.some((w) => w.level === "danger")).toBe(true);
    expect(r.warnings.some((w) => w.level === "caution" && /fail open/i.test(w.message) && /meter/i.test(w.message))).toBe(true);
  });

  it("cites IEC 60204-1 §6.2.4", () => {
    expect(calculator.references.some((ref) => /60204-1/.test(ref.title) && /6\.2\.4/.test(ref.detail))).toBe(true);
  });
});

describe("bleeder: validation", () => {
  it("rejects a working voltage at or below the safe voltage under workingVoltage", () => {
    for (const workingVoltage of [60, 40]) {
      const r = runCalculator(calculator, { capacitance: "100uF", workingVoltage });
      expect(r.ok).toBe(false);
      if (!r.ok) expect(r.error.fields.workingVoltage).toMatch(/above the safe voltage/);
    }
  });

  it("rejects a tolerance given with a unit", () => {
    const r = runCalculator(calculator, { capacitance: "100uF", workingVoltage: 300, tolerance: "5 V" });
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.error.fields.tolerance).toBeTruthy();
  });
});

describe("bleeder: properties", () => {
  const valid = fc.record({
    capacitance: logUniform(1e-12, 10),
    safeVoltage: logUniform(1e-3, 1e3),
    ratio: logUniform(1.001, 1e3),
    maxTime: logUniform(1e-3, 1e4),
    tolerance: fc.double({ min: 0, max: 0.5, noNaN: true }),
  });

  it("finite outputs; the suggestion meets the time at +tolerance", () => {
    fc.assert(
      fc.property(valid, (v) => {
        const workingVoltage = Math.min(1e6, v.safeVoltage * v.ratio * 1.0000001);
        fc.pre(workingVoltage >= v.safeVoltage * 1.001);
        const o = out({ capacitance: v.capacitance, safeVoltage: v.safeVoltage, workingVoltage, maxTime: v.maxTime, tolerance: v.tolerance });
        for (const x of [o.maxResistance, o.suggestedResistance, o.bleederCurrent, o.dissipation]) expect(Number.isFinite(x)).toBe(true);
        expect(o.suggestedResistance * (1 + v.tolerance)).toBeLessThanOrEqual(o.maxResistance);
        expect(o.suggestedResistance).toBeGreaterThan(o.maxResistance / (1 + v.tolerance) / 1.25); // E12 steps are < 22%
        expect(o.suggestedRating === null || Number.isFinite(o.suggestedRating)).toBe(true);
      }),
    );
  });

  const bad = fc.oneof(fc.double({ max: 0, noNaN: true }), fc.constant("x"), fc.constant("3 H"), fc.constant(Number.NaN));

  it("bad input gives ok:false with a message under the field", () => {
    fc.assert(
      fc.property(fc.constantFrom("capacitance", "workingVoltage", "safeVoltage", "maxTime"), bad, (name, value) => {
        const r = runCalculator(calculator, { capacitance: "100uF", workingVoltage: 450, [name]: value });
        expect(r.ok).toBe(false);
        if (!r.ok) expect(typeof r.error.fields[name]).toBe("string");
      }),
    );
  });

  it("a missing required field is named", () => {
    for (const name of ["capacitance", "workingVoltage"]) {
      const raw: Record<string, unknown> = { capacitance: "100uF", workingVoltage: 450 };
      delete raw[name];
      const r = runCalculator(calculator, raw);
      expect(r.ok).toBe(false);
      if (!r.ok) expect(r.error.fields[name]).toMatch(/required/);
    }
  });
});
