import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { breakdownVolts, calculator, gapForVolts } from "@/lib/calc/arc-clearance";
import { runCalculator } from "@/lib/calc/run";
import { calcRunner, logUniform } from "../helpers/calc";

type Out = {
  relativeAirDensity: number;
  breakdownVoltage: number | null;
  willArc: boolean | null;
  minimumGap: number;
  recommendedClearance: number;
};

const { run, out } = calcRunner<Out>(calculator);

describe("arc-clearance: published checks", () => {
  it("a 1 cm uniform gap in standard air breaks down at about 30 kV", () => {
    // Kuffel, Zaengl & Kuffel, High Voltage Engineering Fundamentals, 2nd ed., ch. 5: the breakdown strength of
    // air in a 1 cm uniform gap at 20 °C and 760 torr is about 30 kV/cm — from memory.
    const o = out({ peakVoltage: "10 kV", gap: "1 cm" });
    expect(o.breakdownVoltage!).toBeGreaterThan(29e3);
    expect(o.breakdownVoltage!).toBeLessThan(32e3);
    // and by the book's fitted constants, 24.22 + 6.08 kV
    expect(o.breakdownVoltage!).toBeCloseTo(30.3e3, 6);
  });

  it("relative air density is 1 at standard conditions (101.325 kPa, 20 °C)", () => {
    // Kuffel, Zaengl & Kuffel, 2nd ed., ch. 5, definition of relative air density — from memory
    expect(out({ peakVoltage: 1000 }).relativeAirDensity).toBe(1);
    expect(out({ peakVoltage: 1000, pressure: "101.325 kPa", temperature: "20 °C" }).relativeAirDensity).toBeCloseTo(1, 12);
    // half the pressure halves δ
    expect(out({ peakVoltage: 1000, pressure: "50.6625 kPa" }).relativeAirDensity).toBeCloseTo(0.5, 12);
  });

  it("Paschen's law: breakdown depends only on the product of density and gap", () => {
    // Kuffel, Zaengl & Kuffel, 2nd ed., ch. 5, Paschen's law V_b = f(pd) at constant temperature — from memory
    const a = out({ peakVoltage: 1000, gap: "4 mm", pressure: 101325 });
    const b = out({ peakVoltage: 1000, gap: "8 mm", pressure: 101325 / 2 });
    const c = out({ peakVoltage: 1000, gap: "2 mm", pressure: 2 * 101325 });
    expect(b.breakdownVoltage!).toBeCloseTo(a.breakdownVoltage!, 6);
    expect(c.breakdownVoltage!).toBeCloseTo(a.breakdownVoltage!, 6);
  });
});

describe("arc-clearance: identities", () => {
  it("inverse consistency: the breakdown of the minimum gap is the peak voltage", () => {
    for (const v of [400, 5e3, 25e3, 250e3]) {
      const o = out({ peakVoltage: v, pressure: "90 kPa", temperature: "35 °C" });
      const back = out({ peakVoltage: v, gap: o.minimumGap, pressure: "90 kPa", temperature: "35 °C" });
      expect(back.breakdownVoltage! / v).toBeCloseTo(1, 10);
    }
  });

  it("the minimum gap solves 24.22 x² + 6.08 x = V_kV for x = √(δd)", () => {
    const o = out({ peakVoltage: "18 kV" });
    const x = Math.sqrt(o.minimumGap * 100);
    expect(24.22 * x * x + 6.08 * x).toBeCloseTo(18, 10);
  });

  it("recommended clearance is the safety factor times the minimum gap", () => {
    const o = out({ peakVoltage: "12 kV", safetyFactor: 3 });
    expect(o.recommendedClearance).toBeCloseTo(3 * o.minimumGap, 15);
  });

  it("willArc follows peak ≥ breakdown", () => {
    expect(out({ peakVoltage: "35 kV", gap: "1 cm" }).willArc).toBe(true);
    expect(out({ peakVoltage: "25 kV", gap: "1 cm" }).willArc).toBe(false);
    const none = out({ peakVoltage: "25 kV" });
    expect(none.willArc).toBeNull();
    expect(none.breakdownVoltage).toBeNull();
  });

  it("warm, thin air breaks down sooner", () => {
    const sea = out({ peakVoltage: 1, gap: "5 mm" });
    const hill = out({ peakVoltage: 1, gap: "5 mm", pressure: "70 kPa", temperature: "40 °C" });
    expect(hill.breakdownVoltage!).toBeLessThan(sea.breakdownVoltage!);
  });

  it("always warns of danger and states the limits plainly", () => {
    const r = run({ peakVoltage: 500 });
    expect(r.warnings.some((w) => w.level === "danger")).toBe(true);
    const c = r.warnings.find((w) => w.level === "caution" && /IEC 60664-1/.test(w.message));
    expect(c?.message).toMatch(/sharp points/i);
    expect(c?.message).toMatch(/humidity/);
    expect(c?.message).toMatch(/non-uniform/);
    expect(c?.message).toMatch(/never a guarantee/);
  });

  it("cautions when the gap is down near the Paschen minimum", () => {
    const r = run({ peakVoltage: 600, gap: "40 um" });
    expect(r.warnings.some((w) => w.level === "caution" && /Paschen/.test(w.message))).toBe(true);
    const wide = run({ peakVoltage: "20 kV", gap: "1 cm" });
    expect(wide.warnings.some((w) => /Paschen/.test(w.message))).toBe(false);
  });
});

describe("arc-clearance: validation", () => {
  it("rejects gaps below 10 µm, non-positive gaps, absurd pressure, sub-zero kelvin and a factor below 1", () => {
    const cases: [Record<string, unknown>, string][] = [
      [{ peakVoltage: 1000, gap: "5 um" }, "gap"],
      [{ peakVoltage: 1000, gap: 0 }, "gap"],
      [{ peakVoltage: 1000, gap: "-1 mm" }, "gap"],
      [{ peakVoltage: 1000, pressure: "1 Pa" }, "pressure"],
      [{ peakVoltage: 1000, pressure: "100 MPa" }, "pressure"],
      [{ peakVoltage: 1000, temperature: -5 }, "temperature"],
      [{ peakVoltage: 1000, temperature: "-300 °C" }, "temperature"],
      [{ peakVoltage: 1000, safetyFactor: 0.9 }, "safetyFactor"],
      [{ peakVoltage: "3 mA" }, "peakVoltage"],
      [{}, "peakVoltage"],
    ];
    for (const [raw, field] of cases) {
      const r = runCalculator(calculator, raw);
      expect(r.ok, JSON.stringify(raw)).toBe(false);
      if (!r.ok) expect(typeof r.error.fields[field], JSON.stringify(raw)).toBe("string");
    }
  });
});

describe("arc-clearance: properties", () => {
  const air = fc.record({ pressure: fc.double({ min: 10e3, max: 1e6, noNaN: true }), temperature: fc.double({ min: 150, max: 1000, noNaN: true }) });

  it("valid input never yields NaN or Infinity", () => {
    fc.assert(
      fc.property(logUniform(1e-3, 1e6), logUniform(10e-6, 10), air, fc.double({ min: 1, max: 100, noNaN: true }), (peakVoltage, gap, a, safetyFactor) => {
        const o = out({ peakVoltage, gap, ...a, safetyFactor });
        for (const x of [o.relativeAirDensity, o.breakdownVoltage, o.minimumGap, o.recommendedClearance]) expect(Number.isFinite(x)).toBe(true);
        expect(o.recommendedClearance).toBeGreaterThanOrEqual(o.minimumGap);
      }),
    );
  });

  it("breakdown rises monotonically with the gap", () => {
    fc.assert(
      fc.property(logUniform(10e-6, 5), fc.double({ min: 1.0001, max: 2, noNaN: true }), fc.double({ min: 0.1, max: 10, noNaN: true }), (d, grow, delta) => {
        expect(breakdownVolts(d * grow, delta)).toBeGreaterThan(breakdownVolts(d, delta));
      }),
    );
  });

  it("minimumGap inverts breakdownVoltage", () => {
    fc.assert(
      fc.property(logUniform(1, 1e6), fc.double({ min: 0.01, max: 20, noNaN: true }), (v, delta) => {
        expect(breakdownVolts(gapForVolts(v, delta), delta) / v).toBeCloseTo(1, 9);
      }),
    );
  });

  it("bad input is reported under its field", () => {
    const bad = fc.oneof(fc.double({ max: 0, noNaN: true }), fc.constant("wide"), fc.constant("2 F"));
    fc.assert(
      fc.property(fc.constantFrom("peakVoltage", "gap", "pressure", "temperature", "safetyFactor"), bad, (name, value) => {
        const r = runCalculator(calculator, { peakVoltage: 1000, [name]: value });
        expect(r.ok).toBe(false);
        if (!r.ok) expect(typeof r.error.fields[name]).toBe("string");
      }),
    );
  });
});
