import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { bleederDischarge } from "@/lib/bench/chart-data";
import { calculator } from "@/lib/calc/bleeder";
import type { BleederOutputs } from "@/lib/calc/bleeder-explain";
import { texQuantity } from "@/lib/calc/format";
import { runCalculator } from "@/lib/calc/run";
import { limitingVoltage, MAX_LIMITING_VOLTAGE } from "@/lib/calc/tables/limiting-voltage";
import { E12 } from "@/lib/calc/tables/preferred-values";
import { STANDARD_WATTAGES } from "@/lib/calc/tables/wattage";
import { calculator as timeConstant } from "@/lib/calc/time-constant";
import { calcRunner, logUniform } from "../helpers/calc";

type Out = BleederOutputs;

const { run, out, fields } = calcRunner<Out>(calculator);

const decade = (x: number) => 10 ** Math.floor(Math.log10(x) + 1e-12);

/** Is x a member of E12 (any decade)? */
function isE12(x: number): boolean {
  const mantissa = x / decade(x);
  return E12.some((m) => Math.abs(m - mantissa) < 1e-9 * m);
}

/** The E12 member just above x (x itself an E12 member), from the IEC 60063 list. */
function nextE12Up(x: number): number {
  const d = decade(x);
  const i = E12.findIndex((m) => Math.abs(m - x / d) < 1e-9);
  return i === E12.length - 1 ? 10 * d : E12[i + 1] * d;
}

/** Voltage left after `elapsed`, from the separate time-constant calculator. */
function residual(r: number, c: number, v0: number, elapsed: number): number {
  const res = runCalculator(timeConstant, { resistance: r, capacitance: c, initialVoltage: v0, elapsed });
  if (!res.ok) throw new Error(JSON.stringify(res.error));
  return res.result.outputs.voltageAtElapsed as number;
}

describe("bleeder: published checks", () => {
  it("defaults to IEC 60204-1 §6.2.4 (60 V within 5 s) and meets it with C at +50 % and R at +5 %", () => {
    // IEC 60204-1 §6.2.4, protection against residual voltages: ≤ 60 V within 5 s of disconnection (from memory)
    // Electrolytics: −10 %/+50 % is a maker's typical high-voltage tolerance (common practice)
    const r = run({ capacitance: "100 uF", workingVoltage: "450 V" });
    expect(r.inputs).toMatchObject({ safeVoltage: 60, residualVoltage: 60, maxTime: 5, capacitorTolerance: 0.5, resistorTolerance: 0.05, tolerance: 0.05 });
    const o = r.outputs as unknown as Out;
    // By hand: 5 s / (100 µF × ln 7.5) = 24.8 kΩ; / (1.5 × 1.05) = 15.76 kΩ; largest E12 below: 15 kΩ
    expect(o.suggestedResistance).toBe(15e3);
    expect(residual(15e3 * 1.05, 150e-6, 450, 5)).toBeLessThanOrEqual(60);
    expect(residual(18e3 * 1.05, 150e-6, 450, 5)).toBeGreaterThan(60); // the next E12 value up fails at the corner
  });

  it("the capacitor's tolerance matters: the first contract's 22 kΩ fails with the capacitor 50 % high", () => {
    // common practice: a 100 µF electrolytic may measure up to 150 µF
    const nominalOnly = out({ capacitance: "100 uF", workingVoltage: "450 V", capacitorTolerance: 0 });
    expect(nominalOnly.suggestedResistance).toBe(22e3); // 24.8 kΩ / 1.05 = 23.6 kΩ → 22 kΩ
    expect(residual(22e3 * 1.05, 150e-6, 450, 5)).toBeGreaterThan(60);
    expect(out({ capacitance: "100 uF", workingVoltage: "450 V" }).suggestedResistance).toBeLessThan(22e3);
  });

  it("five time constants: a working voltage of 60·e⁵ V needs RC = 1 s for 5 s", () => {
    // ARRL Handbook, electrical fundamentals: after 5τ a capacitor holds e^-5 ≈ 0.7% of its voltage — from memory
    const o = out({ capacitance: "10 uF", workingVoltage: 60 * Math.exp(5), capacitorTolerance: 0, resistorTolerance: 0 });
    expect(o.maxResistance * 10e-6).toBeCloseTo(1, 12);
  });

  it("25 kV across one resistor is no longer proposed: a chain, none over its element limit", () => {
    // IEC 60115-1 limiting element voltage; typical film-resistor data sheets top out near 500 V (from memory)
    const r = run({ capacitance: "1 nF", workingVoltage: "25 kV" });
    const o = r.outputs as unknown as Out;
    expect(o.resistorsInSeries).toBe(Math.ceil(25e3 / MAX_LIMITING_VOLTAGE));
    expect(o.voltagePerResistor * o.resistorsInSeries).toBeCloseTo(25e3, 6);
    expect(o.voltagePerResistor).toBeLessThanOrEqual(limitingVoltage(o.resistorRating as number));
    expect(isE12(o.resistorValue)).toBe(true);
    // the whole chain still meets the time at the worst corner
    expect(residual(o.resistorsInSeries * o.resistorValue * 1.05, 1.5e-9, 25e3, 5)).toBeLessThanOrEqual(60);
    const chain = r.warnings.find((w) => w.level === "caution" && /in series/.test(w.message));
    expect(chain?.message).toContain(`${o.resistorsInSeries} ×`);
    expect(chain?.message).toMatch(/limiting element voltage, IEC 60115-1/);
  });

  it("typical limiting element voltages by rating (IEC 60115-1 idea; data-sheet figures from memory)", () => {
    // 0204 body 1/8 W 200 V; 0207 1/4 W 250 V; 1/2 W 350 V; 0414 1 W 350 V; 2 W and up 500 V
    expect([0.125, 0.25, 0.5, 1, 2, 100].map(limitingVoltage)).toEqual([200, 250, 350, 350, 500, 500]);
  });

  it("450 V at small power needs a body rated for the voltage, not just the watts", () => {
    // 0.1 µF: 15 MΩ dissipates 13.5 mW (a 1/8 W part by power) but 1/8 W bodies stand about 200 V (from memory)
    const r = run({ capacitance: "0.1 uF", workingVoltage: "450 V" });
    const o = r.outputs as unknown as Out;
    expect(o.resistorsInSeries).toBe(1);
    expect(o.suggestedRating).toBe(0.125);
    expect(limitingVoltage(o.resistorRating as number)).toBeGreaterThanOrEqual(450);
    expect(r.warnings.some((w) => w.level === "caution" && /typically limited to 200 V/.test(w.message))).toBe(true);
  });
});

describe("bleeder: wording and the chart say what the figure is measured against", () => {
  it("names the IEC 60204-1 residual-voltage limit and what it does not cover", () => {
    const r = run({ capacitance: "40 uF", workingVoltage: "450 V" });
    const note = r.warnings.find((w) => w.message.includes("below the 60 V residual-voltage limit of IEC 60204-1"));
    expect(note?.message).toMatch(/after 5 s/);
    expect(note?.message).toMatch(/failed open/);
    expect(note?.message).toMatch(/measure with a meter before touching/);
    expect(r.warnings.some((w) => w.level === "danger")).toBe(true);
  });

  it("never calls a voltage, time or rating safe (words or chart line)", () => {
    const r = run({ capacitance: "1 nF", workingVoltage: "25 kV", safeVoltage: "30 V", maxTime: "2 s" });
    const texts = [
      calculator.purpose,
      calculator.whyItMatters,
      ...calculator.inputs.flatMap((i) => [i.label, i.help ?? ""]),
      ...calculator.outputs.map((o) => o.label),
      ...r.warnings.filter((w) => w.level !== "danger").map((w) => w.message),
      ...r.steps.map((s) => s.label),
    ];
    for (const t of texts) expect(t).not.toMatch(/\bsafe\b|\bsafely\b/i);
    const d = bleederDischarge(r.inputs, r.outputs);
    expect(d?.limitLabel).toBe("Residual-voltage limit");
    expect(d?.limit).toBe(30);
  });

  it("shows the stored energy ½CV² and the worst-corner check as steps", () => {
    const r = run({ capacitance: "100uF", workingVoltage: 400 });
    expect(r.steps.find((s) => /energy/i.test(s.label))?.latex).toContain(texQuantity(0.5 * 100e-6 * 400 * 400, "J")); // 8 J
    expect(r.steps.find((s) => /worst corner/i.test(s.label))?.latex).toContain("(1 + 0.5)");
  });

  it("cites IEC 60204-1 §6.2.4 and IEC 60115-1", () => {
    expect(calculator.references.some((ref) => /60204-1/.test(ref.title) && /6\.2\.4/.test(ref.detail))).toBe(true);
    expect(calculator.references.some((ref) => /60115-1/.test(ref.title) && /limiting element voltage/i.test(ref.detail))).toBe(true);
  });
});

describe("bleeder: inputs, aliases and validation", () => {
  it("residualVoltage is the same input as safeVoltage; tolerance is the resistor's", () => {
    expect(out({ capacitance: "40uF", workingVoltage: 450, residualVoltage: 50 })).toEqual(out({ capacitance: "40uF", workingVoltage: 450, safeVoltage: 50 }));
    expect(run({ capacitance: "40uF", workingVoltage: 450, residualVoltage: 50 }).inputs).toMatchObject({ safeVoltage: 50, residualVoltage: 50 });
    expect(out({ capacitance: "40uF", workingVoltage: 450, tolerance: 0.1 })).toEqual(
      out({ capacitance: "40uF", workingVoltage: 450, resistorTolerance: 0.1 }),
    );
    expect(out({ capacitance: "40uF", workingVoltage: 450, tolerance: 0.1, resistorTolerance: 0.1 }).suggestedResistance).toBeGreaterThan(0);
  });

  it("refuses two different values for one input under the alias", () => {
    expect(fields({ capacitance: "40uF", workingVoltage: 450, safeVoltage: 60, residualVoltage: 50 }).residualVoltage).toMatch(/give one/);
    expect(fields({ capacitance: "40uF", workingVoltage: 450, tolerance: 0.1, resistorTolerance: 0.05 }).tolerance).toMatch(/give one/);
  });

  it("rejects a working voltage at or below the residual-voltage limit under workingVoltage", () => {
    for (const workingVoltage of [60, 40]) expect(fields({ capacitance: "100uF", workingVoltage }).workingVoltage).toMatch(/above the residual-voltage limit/);
    expect(fields({ capacitance: "100uF", workingVoltage: 45, residualVoltage: 50 }).workingVoltage).toMatch(/residual-voltage limit/);
  });

  it("rejects tolerances given with a unit or out of range, under their own names", () => {
    expect(fields({ capacitance: "100uF", workingVoltage: 300, tolerance: "5 V" }).tolerance).toBeTruthy();
    expect(fields({ capacitance: "100uF", workingVoltage: 300, capacitorTolerance: "5 V" }).capacitorTolerance).toBeTruthy();
    expect(fields({ capacitance: "100uF", workingVoltage: 300, capacitorTolerance: 1.5 }).capacitorTolerance).toMatch(/at most 1/);
    expect(fields({ capacitance: "100uF", workingVoltage: 300, resistorTolerance: -0.1 }).resistorTolerance).toMatch(/negative/);
  });
});

describe("bleeder: properties", () => {
  const valid = fc.record({
    capacitance: logUniform(1e-12, 10),
    safeVoltage: logUniform(1e-3, 1e3),
    ratio: logUniform(1.001, 1e3),
    maxTime: logUniform(1e-3, 1e4),
    capacitorTolerance: fc.double({ min: 0, max: 1, noNaN: true }),
    resistorTolerance: fc.double({ min: 0, max: 0.5, noNaN: true }),
  });

  it("worst corner: the suggestion meets the time with C at +capTol and R at +resTol; the next E12 value up does not", () => {
    fc.assert(
      fc.property(valid, (v) => {
        const workingVoltage = Math.min(1e6, v.safeVoltage * v.ratio * 1.0000001);
        fc.pre(workingVoltage >= v.safeVoltage * 1.001);
        const { ratio: _, ...rest } = v;
        const o = out({ ...rest, workingVoltage });
        for (const x of [o.maxResistance, o.suggestedResistance, o.bleederCurrent, o.dissipation, o.voltagePerResistor, o.resistorValue])
          expect(Number.isFinite(x)).toBe(true);
        const time = (r: number) => r * (1 + v.resistorTolerance) * v.capacitance * (1 + v.capacitorTolerance) * Math.log(workingVoltage / v.safeVoltage);
        expect(isE12(o.suggestedResistance)).toBe(true);
        expect(time(o.suggestedResistance)).toBeLessThanOrEqual(v.maxTime);
        expect(time(nextE12Up(o.suggestedResistance))).toBeGreaterThan(v.maxTime);
        expect(o.suggestedRating === null || STANDARD_WATTAGES.includes(o.suggestedRating)).toBe(true);
      }),
    );
  });

  it("the chain: fewest equal E12 resistors, none over the typical element limit, rated for power and voltage, still in time", () => {
    fc.assert(
      fc.property(valid, (v) => {
        const workingVoltage = Math.min(1e6, v.safeVoltage * v.ratio * 1.0000001);
        fc.pre(workingVoltage >= v.safeVoltage * 1.001);
        const { ratio: _, ...rest } = v;
        const o = out({ ...rest, workingVoltage });
        const n = o.resistorsInSeries;
        expect(Number.isInteger(n) && n >= 1).toBe(true);
        expect(o.voltagePerResistor).toBeLessThanOrEqual(MAX_LIMITING_VOLTAGE);
        if (n > 1) expect(workingVoltage / (n - 1)).toBeGreaterThan(MAX_LIMITING_VOLTAGE);
        expect(o.voltagePerResistor * n).toBeCloseTo(workingVoltage, 6);
        expect(isE12(o.resistorValue)).toBe(true);
        const chainTime =
          n * o.resistorValue * (1 + v.resistorTolerance) * v.capacitance * (1 + v.capacitorTolerance) * Math.log(workingVoltage / v.safeVoltage);
        expect(chainTime).toBeLessThanOrEqual(v.maxTime);
        if (n === 1) expect(o.resistorValue).toBe(o.suggestedResistance);
        if (o.resistorRating !== null) {
          expect(o.voltagePerResistor).toBeLessThanOrEqual(limitingVoltage(o.resistorRating));
          expect(o.resistorRating).toBeGreaterThanOrEqual((2 * o.voltagePerResistor ** 2) / o.resistorValue); // house derating: twice the dissipation
        }
      }),
    );
  });

  const bad = fc.oneof(fc.double({ max: 0, noNaN: true }), fc.constant("x"), fc.constant("3 H"), fc.constant(Number.NaN));

  it("bad input gives ok:false with a message under the field", () => {
    fc.assert(
      fc.property(fc.constantFrom("capacitance", "workingVoltage", "safeVoltage", "residualVoltage", "maxTime"), bad, (name, value) => {
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
      expect(fields(raw)[name]).toMatch(/required/);
    }
  });
});
