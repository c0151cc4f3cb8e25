import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { texQuantity } from "@/lib/calc/format";
import { runCalculator } from "@/lib/calc/run";
import { calculator } from "@/lib/calc/time-constant";
import { calcRunner, logUniform } from "../helpers/calc";

type Out = { timeConstant: number; fiveTau: number; timeToTarget: number | null; voltageAtElapsed: number | null };

const { run, out } = calcRunner<Out>(calculator);

/** Log-uniform positive number in [lo, hi]. */

describe("time-constant: published checks", () => {
  it("1 MΩ with 1 µF gives a one-second time constant", () => {
    // ARRL Handbook, electrical fundamentals (RC time constant: τ in seconds = R in megohms × C in microfarads) — from memory
    const o = out({ resistance: "1M", capacitance: "1uF", initialVoltage: 100 });
    expect(o.timeConstant).toBeCloseTo(1, 12);
    expect(o.fiveTau).toBeCloseTo(5, 12);
  });

  it("the discharge table: 36.8% after 1τ, 13.5% after 2τ, 5.0% after 3τ, 1.8% after 4τ, 0.7% after 5τ", () => {
    // ARRL Handbook, electrical fundamentals, RC discharge curve / time-constant table — from memory
    const table: [number, number][] = [
      [1, 0.368],
      [2, 0.135],
      [3, 0.05],
      [4, 0.018],
      [5, 0.0067],
    ];
    for (const [n, fraction] of table) {
      const o = out({ resistance: "100k", capacitance: "10 uF", initialVoltage: 1000, elapsed: n * 1.0 });
      expect(o.voltageAtElapsed! / 1000).toBeCloseTo(fraction, n === 5 ? 4 : 3);
    }
  });

  it("a capacitor needs about 4.6 τ to fall to 1% of its voltage", () => {
    // Radiotron Designer's Handbook 4th ed., transients in CR circuits: e^-4.6 ≈ 0.01 — from memory
    const o = out({ resistance: "220k", capacitance: "40uF", initialVoltage: 400, targetVoltage: 4 });
    expect(o.timeToTarget! / o.timeConstant).toBeCloseTo(4.6, 1);
  });
});

describe("time-constant: identities", () => {
  it("V(τ) = V0/e", () => {
    const o = out({ resistance: "470k", capacitance: "47uF", initialVoltage: 450, elapsed: 470e3 * 47e-6 });
    expect(o.voltageAtElapsed).toBeCloseTo(450 / Math.E, 9);
  });

  it("timeToTarget for V0/e is τ", () => {
    const o = out({ resistance: "4k7", capacitance: "100n", initialVoltage: 300, targetVoltage: 300 / Math.E });
    expect(o.timeToTarget).toBeCloseTo(o.timeConstant, 15);
    expect(o.timeConstant).toBeCloseTo(4.7e-4, 15);
  });

  it("discharging for timeToTarget lands on the target voltage", () => {
    const first = out({ resistance: "330k", capacitance: "16uF", initialVoltage: 350, targetVoltage: 30 });
    const second = out({ resistance: "330k", capacitance: "16uF", initialVoltage: 350, elapsed: first.timeToTarget });
    expect(second.voltageAtElapsed).toBeCloseTo(30, 9);
  });

  it("shows the stored energy ½CV² as a step", () => {
    const r = run({ resistance: "1M", capacitance: "50uF", initialVoltage: 400 });
    const energyStep = r.steps.find((s) => /energy/i.test(s.label));
    expect(energyStep?.latex).toContain(texQuantity(0.5 * 50e-6 * 400 * 400, "J")); // 4 J
  });

  it("blank optional fields give null outputs", () => {
    const o = out({ resistance: "1k", capacitance: "1uF", initialVoltage: 10, targetVoltage: "", elapsed: null });
    expect(o.timeToTarget).toBeNull();
    expect(o.voltageAtElapsed).toBeNull();
  });

  it("adds the danger warning above 50 V and not below", () => {
    const high = run({ resistance: "1M", capacitance: "1uF", initialVoltage: "250 V" });
    const low = run({ resistance: "1M", capacitance: "1uF", initialVoltage: "12 V" });
    expect(high.warnings.some((w) => w.level === "danger")).toBe(true);
    expect(low.warnings.some((w) => w.level === "danger")).toBe(false);
  });
});

describe("time-constant: validation", () => {
  it("rejects a target at or above the initial voltage with a message under targetVoltage", () => {
    for (const targetVoltage of [300, 400]) {
      const r = runCalculator(calculator, { resistance: "1M", capacitance: "1uF", initialVoltage: 300, targetVoltage });
      expect(r.ok).toBe(false);
      if (!r.ok) expect(r.error.fields.targetVoltage).toMatch(/below the initial voltage/);
    }
  });

  it("rejects a capacitance given in volts", () => {
    const r = runCalculator(calculator, { resistance: "1M", capacitance: "47 V", initialVoltage: 300 });
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.error.fields.capacitance).toMatch(/capacitance/);
  });
});

describe("time-constant: properties", () => {
  const valid = fc.record({
    resistance: logUniform(1e-6, 1e15),
    capacitance: logUniform(1e-14, 10), // 0.01 pF to 10 F: the unit parser refuses anything beyond (lib/calc/unit-limits.ts)
    initialVoltage: logUniform(1e-6, 1e7),
    targetFraction: fc.double({ min: 1e-9, max: 0.999999, noNaN: true }),
    elapsed: fc.oneof(fc.constant(0), logUniform(1e-12, 1e9)),
  });

  it("never yields NaN or Infinity for valid input, and the discharge is monotonic", () => {
    fc.assert(
      fc.property(valid, (v) => {
        const targetVoltage = Math.max(1e-9, v.initialVoltage * v.targetFraction);
        fc.pre(targetVoltage < v.initialVoltage);
        const o = out({ ...v, targetVoltage, targetFraction: undefined });
        for (const x of [o.timeConstant, o.fiveTau, o.timeToTarget, o.voltageAtElapsed]) {
          expect(Number.isFinite(x)).toBe(true);
        }
        expect(o.voltageAtElapsed!).toBeLessThanOrEqual(v.initialVoltage);
        expect(o.timeToTarget!).toBeGreaterThan(0);
      }),
    );
  });

  const field = fc.constantFrom("resistance", "capacitance", "initialVoltage");
  const bad = fc.oneof(
    fc.double({ max: 0, noNaN: true }),
    fc.constant("abc"),
    fc.constant(""),
    fc.constant(undefined),
    fc.constant("5 A"),
    fc.constant(Number.POSITIVE_INFINITY),
  );

  it("any bad required field gives ok:false with a message under its name", () => {
    fc.assert(
      fc.property(field, bad, (name, value) => {
        const raw: Record<string, unknown> = { resistance: "10k", capacitance: "10uF", initialVoltage: 100, [name]: value };
        const r = runCalculator(calculator, raw);
        expect(r.ok).toBe(false);
        if (!r.ok) expect(typeof r.error.fields[name]).toBe("string");
      }),
    );
  });

  it("a negative or zero target or a negative elapsed time is rejected under its name", () => {
    fc.assert(
      fc.property(fc.constantFrom("targetVoltage", "elapsed"), fc.double({ max: -1e-9, noNaN: true }), (name, value) => {
        const r = runCalculator(calculator, { resistance: "10k", capacitance: "10uF", initialVoltage: 100, [name]: value });
        expect(r.ok).toBe(false);
        if (!r.ok) expect(typeof r.error.fields[name]).toBe("string");
      }),
    );
  });
});
