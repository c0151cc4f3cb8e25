import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { calculator } from "@/lib/calc/b-plus";
import { runCalculator } from "@/lib/calc/run";
import { findRectifier } from "@/lib/calc/tables/rectifiers";
import { calcRunner, logUniform } from "../helpers/calc";

type Out = {
  peakVoltage: number;
  rippleFrequency: number;
  ripplePeakToPeak: number;
  rectifierVoltageDrop: number;
  dcOutput: number;
  maxReservoirCapacitance: number | null;
};

const { run, out, fields } = calcRunner<Out>(calculator);
const cautions = (raw: Record<string, unknown>) =>
  run(raw)
    .warnings.filter((w) => w.level === "caution")
    .map((w) => w.message);

describe("b-plus: checks against published worked examples", () => {
  it("filtered bridge, 12 V rms, 0.7 V diodes, 220 Ω and 1000 µF: ripple 0.59 V, DC 15.3 V", () => {
    // Floyd, Electronic Devices, power-supply chapter: filtered bridge rectifier example (from memory):
    // Vp(rect) = 16.97 − 1.4 = 15.6 V, Vr(pp) = Vp(rect)/(f·R·C) = 0.59 V, V_DC = 15.3 V
    const iLoad = (12 * Math.SQRT2 - 1.4) / 220;
    const o = out({ secondaryVoltage: "12 V", rectifier: "bridge", rectifierDrop: "0.7 V", loadCurrent: iLoad, capacitance: "1000 uF" });
    expect(o.peakVoltage).toBeCloseTo(16.97, 2);
    expect(o.rectifierVoltageDrop).toBeCloseTo(1.4, 12);
    expect(o.ripplePeakToPeak).toBeCloseTo(0.59, 2);
    expect(o.dcOutput).toBeCloseTo(15.3, 1);
  });

  it("bridge, 12 V rms, 0.8 V diodes, 154 mA into 1283 µF: 1 V ripple, 14.87 V DC", () => {
    // A published worked solution of the capacitor-input estimate (12 V rms bridge, 0.8 V per diode, C sized for 1 Vpp at 60 Hz full-wave)
    const o = out({ secondaryVoltage: 12, rectifier: "bridge", rectifierDrop: 0.8, loadCurrent: 0.1537, capacitance: "1283 uF" });
    expect(o.peakVoltage - o.rectifierVoltageDrop).toBeCloseTo(15.37, 2);
    expect(o.ripplePeakToPeak).toBeCloseTo(1.0, 2);
    expect(o.dcOutput).toBeCloseTo(14.87, 1);
  });

  it("peak is √2 × rms; full-wave ripples at twice the mains, half-wave at the mains", () => {
    // Textbook rectifier relations (ARRL Handbook, power supplies): 350 V rms → 495 V peak; 60 Hz → 120 Hz full-wave; 50 Hz → 100 Hz
    const fw = out({ secondaryVoltage: "350 V", rectifier: "full-wave", rectifierDrop: 0, loadCurrent: "100 mA", capacitance: "40 uF" });
    expect(fw.peakVoltage).toBeCloseTo(494.97, 2);
    expect(fw.rippleFrequency).toBe(120);
    expect(fw.ripplePeakToPeak).toBeCloseTo(0.1 / (120 * 40e-6), 9); // 20.8 V
    expect(out({ secondaryVoltage: 350, rectifier: "full-wave", loadCurrent: 0.1, capacitance: 40e-6, lineFrequency: "50 Hz" }).rippleFrequency).toBe(100);
    expect(out({ secondaryVoltage: 120, rectifier: "half-wave", loadCurrent: 0.05, capacitance: 50e-6 }).rippleFrequency).toBe(60);
  });
});

describe("b-plus: a listed rectifier tube", () => {
  it("5Y3GT: at its rated 125 mA the drop is the table's 60 V; the data sheet's 20 µF reservoir limit is shown and checked", () => {
    // RCA receiving tube manual, 5Y3GT (via the built-in table, from memory): 20 µF, 125 mA, 60 V drop
    const row = findRectifier("5Y3GT")!;
    const o = out({ secondaryVoltage: "350 V", rectifier: "full-wave", rectifierTube: "5y3", loadCurrent: row.maxCurrent, capacitance: "20 uF" });
    expect(o.rectifierVoltageDrop).toBeCloseTo(row.tubeDrop, 9);
    expect(o.maxReservoirCapacitance).toBe(row.maxInputCapacitance);
    expect(run({ secondaryVoltage: 350, rectifier: "full-wave", rectifierTube: "5Y3", loadCurrent: 0.1, capacitance: "20 uF" }).inputs.rectifierTube).toBe(
      "5Y3GT",
    );
    expect(cautions({ secondaryVoltage: 350, rectifier: "full-wave", rectifierTube: "5Y3GT", loadCurrent: 0.1, capacitance: "20 uF" })).toEqual([]);
    expect(
      cautions({ secondaryVoltage: 350, rectifier: "full-wave", rectifierTube: "5Y3GT", loadCurrent: 0.1, capacitance: "40 uF" }).some((m) =>
        /more than the 20 µF/.test(m),
      ),
    ).toBe(true);
    expect(
      cautions({ secondaryVoltage: 350, rectifier: "full-wave", rectifierTube: "5Y3GT", loadCurrent: "150 mA", capacitance: "20 uF" }).some((m) =>
        /rated 125 mA/.test(m),
      ),
    ).toBe(true);
  });

  it("the tube drop follows Child's law: an eighth of the current gives a quarter of the drop", () => {
    // Child–Langmuir three-halves-power law of a vacuum diode, I ∝ V^(3/2) (from memory)
    const row = findRectifier("5U4GB")!;
    const o = out({ secondaryVoltage: 375, rectifier: "full-wave", rectifierTube: "5U4GB", loadCurrent: row.tubeDropCurrent / 8, capacitance: "40 uF" });
    expect(o.rectifierVoltageDrop).toBeCloseTo(row.tubeDrop / 4, 9);
  });

  it("a peak inverse voltage beyond the tube's rating is pointed out", () => {
    // 35W4 (half-wave, via the built-in table): the plate sees the negative peak plus the charged reservoir;
    // on a 117 V line at 50 mA that stays under its rated figure, as the type was made for (RCA tube manual, from memory)
    const row = findRectifier("35W4")!;
    const vs = row.peakInverseVoltage! / (2 * Math.SQRT2) + 10;
    expect(
      cautions({ secondaryVoltage: vs, rectifier: "half-wave", rectifierTube: "35W4", loadCurrent: 0.05, capacitance: "40 uF" }).some((m) =>
        /peak inverse/.test(m),
      ),
    ).toBe(true);
    expect(
      cautions({ secondaryVoltage: 117, rectifier: "half-wave", rectifierTube: "35W4", loadCurrent: 0.05, capacitance: "40 uF" }).some((m) =>
        /peak inverse/.test(m),
      ),
    ).toBe(false);
  });
});

describe("b-plus: identities and properties", () => {
  const valid = fc.record({
    secondaryVoltage: fc.double({ min: 1, max: 5000, noNaN: true }),
    rectifier: fc.constantFrom("full-wave" as const, "bridge" as const, "half-wave" as const),
    rectifierDrop: fc.oneof(fc.constant(0), fc.double({ min: 0.01, max: 100, noNaN: true })),
    loadCurrent: logUniform(1e-6, 10),
    capacitance: logUniform(1e-9, 10),
    lineFrequency: fc.double({ min: 1, max: 10_000, noNaN: true }),
    windingResistance: fc.oneof(fc.constant(0), logUniform(1e-3, 1e3)),
  });

  it("property: the drops add up to the peak (V_dc + V_pp/2 + n·V_t + I·R_w = V_pk), never NaN, never below zero", () => {
    fc.assert(
      fc.property(valid, (x) => {
        const o = out(x);
        for (const [k, v] of Object.entries(o)) if (k !== "maxReservoirCapacitance") expect(Number.isFinite(v)).toBe(true);
        expect(o.peakVoltage / x.secondaryVoltage).toBeCloseTo(Math.SQRT2, 12);
        expect(o.rectifierVoltageDrop).toBeCloseTo((x.rectifier === "bridge" ? 2 : 1) * x.rectifierDrop, 9);
        expect(o.ripplePeakToPeak * o.rippleFrequency * x.capacitance).toBeCloseTo(x.loadCurrent, 9);
        const balance = o.peakVoltage - o.rectifierVoltageDrop - x.loadCurrent * x.windingResistance - o.ripplePeakToPeak / 2;
        if (balance > 0) expect(o.dcOutput).toBeCloseTo(balance, 6);
        else expect(o.dcOutput).toBe(0);
        expect(o.dcOutput).toBeLessThanOrEqual(o.peakVoltage);
        expect(o.maxReservoirCapacitance).toBeNull();
      }),
    );
  });

  it("property: a larger reservoir means less ripple and more B+; half-wave ripples twice as much as full-wave", () => {
    fc.assert(
      fc.property(valid, fc.double({ min: 1.01, max: 10, noNaN: true }), (x, k) => {
        fc.pre(x.capacitance * k <= 10);
        const a = out(x);
        const b = out({ ...x, capacitance: x.capacitance * k });
        expect(a.ripplePeakToPeak / b.ripplePeakToPeak).toBeCloseTo(k, 9);
        expect(b.dcOutput).toBeGreaterThanOrEqual(a.dcOutput);
        const half = out({ ...x, rectifier: "half-wave" });
        const full = out({ ...x, rectifier: "full-wave" });
        expect(half.ripplePeakToPeak / full.ripplePeakToPeak).toBeCloseTo(2, 9);
      }),
    );
  });
});

describe("b-plus: warnings and refusals", () => {
  it("danger above 50 V peak, the estimate's error band always, and never 'safe'", () => {
    const r = run({ secondaryVoltage: "350 V", rectifier: "full-wave", rectifierDrop: 1, loadCurrent: "100 mA", capacitance: "40 uF" });
    expect(r.warnings.some((w) => w.level === "danger")).toBe(true);
    expect(r.warnings.some((w) => /estimate/.test(w.message) && /10–15 %/.test(w.message))).toBe(true);
    for (const w of r.warnings) expect(w.message).not.toMatch(/\bsafe\b/i);
    expect(
      run({ secondaryVoltage: 30, rectifier: "bridge", rectifierDrop: 1, loadCurrent: 1, capacitance: "4700 uF" }).warnings.some((w) => w.level === "danger"),
    ).toBe(false);
    expect(
      run({ secondaryVoltage: 40, rectifier: "bridge", rectifierDrop: 1, loadCurrent: 1, capacitance: "4700 uF" }).warnings.some((w) => w.level === "danger"),
    ).toBe(true); // 56.6 V peak
  });

  it("ripple too large for the estimate is pointed out, and B+ never goes negative", () => {
    const r = run({ secondaryVoltage: 100, rectifier: "half-wave", rectifierDrop: 1, loadCurrent: 1, capacitance: "10 uF" });
    expect(r.outputs.dcOutput).toBe(0);
    expect(r.warnings.some((w) => w.level === "caution" && /outside the range/.test(w.message))).toBe(true);
  });

  it("refusals name the field", () => {
    const base = { secondaryVoltage: 350, rectifier: "full-wave", loadCurrent: 0.1, capacitance: "40 uF" };
    expect(fields({ ...base, rectifierTube: "5Y3GT", rectifierDrop: 50 }).rectifierTube).toMatch(/not both/);
    expect(fields({ ...base, rectifierTube: "5Y3GT", rectifier: "bridge" }).rectifierTube).toMatch(/bridge/);
    expect(fields({ ...base, rectifierTube: "35W4" }).rectifierTube).toMatch(/half-wave/);
    expect(fields({ ...base, rectifierTube: "9Z9" }).rectifierTube).toMatch(/not in the built-in table/);
    expect(fields({ ...base, rectifier: "doubler" }).rectifier).toMatch(/full-wave/);
    expect(fields({ ...base, capacitance: "40 V" }).capacitance).toMatch(/capacitance/);
    expect(fields({ ...base, rectifierDrop: -1 }).rectifierDrop).toMatch(/Rectifier drop/);
    const bad = fc.oneof(fc.double({ max: 0, noNaN: true }), fc.constantFrom("abc", "5 Hz", Number.NaN, Number.POSITIVE_INFINITY));
    fc.assert(
      fc.property(fc.constantFrom("secondaryVoltage", "loadCurrent", "capacitance"), bad, (name, x) => {
        const r = runCalculator(calculator, { ...base, [name]: x });
        expect(r.ok).toBe(false);
        if (!r.ok) expect(r.error.fields).toHaveProperty(name);
      }),
    );
  });
});
