import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { calculator } from "@/lib/calc/reforming";
import { runCalculator } from "@/lib/calc/run";
import { calcRunner, logUniform } from "../helpers/calc";

type Step = { voltage: number; minutes: number; leakageLimit: number };
type Out = {
  leakageLimit: number;
  initialCurrent: number | null;
  resistorPower: number | null;
  timeConstant: number | null;
  steps: Step[];
};

const { run, out, fields } = calcRunner<Out>(calculator);

describe("reforming: checks against published data", () => {
  it("general-purpose data-sheet form: 100 µF, 10 V gives 10 µA", () => {
    // Aluminium electrolytic data sheets, general-purpose radial series: I ≤ 0.01·C·V µA or 3 µA, whichever is greater,
    // after 2 min at rated voltage; the worked reading 10 V/100 µF → 10 µA is the usual one in data-sheet explanations
    expect(out({ capacitance: "100 uF", ratedVoltage: "10 V" }).leakageLimit).toBeCloseTo(10e-6, 15);
  });

  it("47 µF, 40 V gives 18.8 µA; a 35 V, 2200 µF part gives 770 µA", () => {
    // Same data-sheet form: 0.01 × 47 × 40 = 18.8 µA (a published worked example of the form);
    // a capacitor maker's note on leakage versus time quotes 770 µA (20 °C, 2 min) for a 35 V 2200 µF radial part
    expect(out({ capacitance: "47uF", ratedVoltage: 40 }).leakageLimit).toBeCloseTo(18.8e-6, 15);
    expect(out({ capacitance: "2200 uF", ratedVoltage: "35 V" }).leakageLimit).toBeCloseTo(770e-6, 15);
  });

  it("small parts take the 3 µA floor: 1 µF, 50 V is 0.5 µA by the product, so 3 µA", () => {
    // "or 3 µA, whichever is greater" of the same data-sheet form
    expect(out({ capacitance: "1 uF", ratedVoltage: "50 V" }).leakageLimit).toBeCloseTo(3e-6, 15);
    // the crossover: 0.01·C·V = 3 µA at C·V = 300 µF·V
    expect(out({ capacitance: "10 uF", ratedVoltage: "30 V" }).leakageLimit).toBeCloseTo(3e-6, 15);
  });

  it("a typical B+ reservoir: 40 µF, 450 V gives 180 µA", () => {
    // 0.01 × 40 × 450 = 180 µA (same data-sheet form)
    expect(out({ capacitance: "40 uF", ratedVoltage: "450 V" }).leakageLimit).toBeCloseTo(180e-6, 15);
  });
});

describe("reforming: schedule", () => {
  it("ten steps of a tenth of rated voltage, ending at rated voltage held an hour", () => {
    // Schedule rule: steps of about 10–25 % of rating, each held until the leakage falls (common practice)
    const o = out({ capacitance: "40 uF", ratedVoltage: "450 V" });
    expect(o.steps).toHaveLength(10);
    expect(o.steps.map((s) => s.voltage)).toEqual([45, 90, 135, 180, 225, 270, 315, 360, 405, 450]);
    expect(o.steps[9].voltage).toBe(450);
    expect(o.steps.slice(0, 9).every((s) => s.minutes === 10)).toBe(true);
    expect(o.steps[9].minutes).toBe(60);
    expect(o.steps[9].leakageLimit).toBe(o.leakageLimit);
    expect(o.steps[0].leakageLimit).toBeCloseTo(18e-6, 15); // 0.01 × 40 × 45
  });

  it("a large resistor stretches each hold to five time constants", () => {
    // 1 MΩ × 100 µF = 100 s; 5τ = 500 s → 9 min (below 10), 4.7 MΩ → 5τ = 2350 s → 40 min
    expect(out({ capacitance: "100 uF", ratedVoltage: 350, seriesResistance: "1M" }).steps[0].minutes).toBe(10);
    const slow = out({ capacitance: "100 uF", ratedVoltage: 350, seriesResistance: "4.7M" });
    expect(slow.steps[0].minutes).toBe(40);
    expect(slow.steps[9].minutes).toBe(60);
  });

  it("property: the schedule rises in steps of at most a quarter of rating to rated voltage; each hold covers 10 min and 5τ", () => {
    fc.assert(
      fc.property(logUniform(1e-9, 10), fc.double({ min: 1, max: 1000, noNaN: true }), logUniform(1, 1e9), (c, v, r) => {
        const o = out({ capacitance: c, ratedVoltage: v, seriesResistance: r });
        let prev = 0;
        for (const s of o.steps) {
          expect(s.voltage).toBeGreaterThan(prev);
          expect(s.voltage - prev).toBeLessThanOrEqual(0.25 * v + 1e-9);
          expect(s.minutes).toBeGreaterThanOrEqual(10);
          expect(s.minutes * 60).toBeGreaterThanOrEqual(5 * o.timeConstant! * (1 - 1e-12));
          expect(s.leakageLimit).toBeLessThanOrEqual(o.leakageLimit);
          prev = s.voltage;
        }
        expect(prev).toBe(v);
      }),
    );
  });
});

describe("reforming: identities and properties", () => {
  it("Ohm's law and power through the resistor: I0 = V/R, P = V²/R = I0²R, τ = RC", () => {
    const o = out({ capacitance: "47 uF", ratedVoltage: "350 V", seriesResistance: "10k" });
    expect(o.initialCurrent).toBeCloseTo(0.035, 12);
    expect(o.resistorPower).toBeCloseTo(12.25, 9);
    expect(o.resistorPower! / (o.initialCurrent! ** 2 * 10e3)).toBeCloseTo(1, 12);
    expect(o.timeConstant).toBeCloseTo(0.47, 12);
  });

  it("property: the limit is the greater of k·C·V + offset and the floor, and grows with C and V", () => {
    const input = fc.record({
      capacitance: logUniform(1e-9, 10),
      ratedVoltage: fc.double({ min: 1, max: 1000, noNaN: true }),
      leakageFactor: fc.oneof(fc.constant(0), logUniform(1e-6, 1)),
      leakageOffset: fc.oneof(fc.constant(0), logUniform(1e-9, 1)),
      leakageFloor: fc.oneof(fc.constant(3e-6), logUniform(1e-9, 1)),
    });
    fc.assert(
      fc.property(input, fc.double({ min: 1, max: 3, noNaN: true }), (x, grow) => {
        const o = out(x);
        const product = x.leakageFactor * x.capacitance * x.ratedVoltage + x.leakageOffset;
        expect(o.leakageLimit).toBe(Math.max(product, x.leakageFloor));
        expect(Number.isFinite(o.leakageLimit) && o.leakageLimit > 0).toBe(true);
        expect(o.initialCurrent).toBeNull();
        fc.pre(x.capacitance * grow <= 10 && x.ratedVoltage * grow <= 1000);
        expect(out({ ...x, capacitance: x.capacitance * grow }).leakageLimit).toBeGreaterThanOrEqual(o.leakageLimit);
        expect(out({ ...x, ratedVoltage: x.ratedVoltage * grow }).leakageLimit).toBeGreaterThanOrEqual(o.leakageLimit);
      }),
    );
  });

  it("an offset adds to the product: 0.01CV + 4 µA for 100 µF, 25 V is 29 µA", () => {
    // Identity of the form max(k·C·V + offset, floor)
    expect(out({ capacitance: "100u", ratedVoltage: 25, leakageOffset: "4 uA", leakageFloor: 0 }).leakageLimit).toBeCloseTo(29e-6, 15);
  });
});

describe("reforming: warnings and refusals", () => {
  it("danger above 50 V, and always the replace-not-reform caution", () => {
    const high = run({ capacitance: "40 uF", ratedVoltage: "450 V" });
    expect(high.warnings.some((w) => w.level === "danger")).toBe(true);
    expect(high.warnings.some((w) => w.level === "caution" && /replaced, not reformed/.test(w.message) && /keeps rising/.test(w.message))).toBe(true);
    const low = run({ capacitance: "1000 uF", ratedVoltage: "25 V" });
    expect(low.warnings.some((w) => w.level === "danger")).toBe(false);
    expect(low.warnings.some((w) => /replaced, not reformed/.test(w.message))).toBe(true);
    for (const w of [...high.warnings, ...low.warnings]) expect(w.message).not.toMatch(/\bsafe\b/i);
  });

  it("a resistor that drops much of the voltage at the limit current is pointed out", () => {
    // 180 µA × 470 kΩ = 85 V, 19 % of 450 V
    const big = run({ capacitance: "40 uF", ratedVoltage: 450, seriesResistance: "470k" });
    expect(big.warnings.some((w) => w.level === "caution" && /drops 84.6 V/.test(w.message))).toBe(true);
    const small = run({ capacitance: "40 uF", ratedVoltage: 450, seriesResistance: "10k" });
    expect(small.warnings.some((w) => /drops/.test(w.message))).toBe(false);
  });

  it("refuses impossible input under the field's name", () => {
    expect(fields({ capacitance: "40 uF" }).ratedVoltage).toMatch(/Rated voltage is required/);
    expect(fields({ capacitance: "40 V", ratedVoltage: 450 }).capacitance).toMatch(/capacitance/);
    expect(fields({ capacitance: "40 uF", ratedVoltage: 450, leakageFactor: -0.01 }).leakageFactor).toMatch(/Leakage factor/);
    expect(fields({ capacitance: "40 uF", ratedVoltage: 450, seriesResistance: 0 }).seriesResistance).toMatch(/Series resistance/);
    expect(fields({ capacitance: "40 uF", ratedVoltage: 450, leakageFactor: 0, leakageFloor: 0 }).leakageFloor).toMatch(/above zero/);
    const bad = fc.oneof(fc.double({ max: 0, noNaN: true }), fc.constantFrom("abc", "5 Hz", Number.NaN, Number.NEGATIVE_INFINITY));
    fc.assert(
      fc.property(fc.constantFrom("capacitance", "ratedVoltage", "seriesResistance"), bad, (name, x) => {
        const r = runCalculator(calculator, { capacitance: "40 uF", ratedVoltage: 450, seriesResistance: "10k", [name]: x });
        expect(r.ok).toBe(false);
        if (!r.ok) expect(r.error.fields).toHaveProperty(name);
      }),
    );
  });
});
