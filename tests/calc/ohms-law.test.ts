import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { calculator } from "@/lib/calc/ohms-law";
import { runCalculator } from "@/lib/calc/run";
import { calcRunner, logUniform } from "../helpers/calc";

type Out = { voltage: number; current: number; resistance: number; power: number };
const NAMES = ["voltage", "current", "resistance", "power"] as const;

const { run, out, fields } = calcRunner<Out>(calculator);

describe("ohms-law: checks against published tube data", () => {
  it("35Z5GT heater, 35 V at 0.15 A: 233 Ω hot, 5.25 W", () => {
    // Tube data sheet heater rating 35 V, 150 mA (from memory); Ohm's law per the ARRL Handbook
    const o = out({ voltage: "35 V", current: "150 mA" });
    expect(o.resistance).toBeCloseTo(233.333, 3);
    expect(o.power).toBeCloseTo(5.25, 12);
  });

  it("6V6GT class A at 250 V, 45 mA: 11.25 W plate input, inside the 12 W plate rating", () => {
    // 6V6GT data sheet: typical operation 250 V, 45 mA; maximum plate dissipation 12 W (from memory)
    const o = out({ voltage: 250, current: "45m" });
    expect(o.power).toBeCloseTo(11.25, 12);
    expect(o.power).toBeLessThan(12);
    expect(o.resistance).toBeCloseTo(5555.6, 1);
  });

  it("6V6GT cathode: 12.5 V bias at 45 + 4.5 mA needs about 250 Ω", () => {
    // 6V6GT data sheet typical operation: −12.5 V grid, 45 mA plate, 4.5 mA screen; ≈ 250 Ω cathode resistor (from memory)
    const o = out({ voltage: 12.5, current: "49.5m" });
    expect(Math.abs(o.resistance - 250) / 250).toBeLessThan(0.02);
  });

  it("12AX7 heater in series mode, 12.6 V at 150 mA: 84 Ω, 1.89 W", () => {
    // 12AX7 data sheet: heater 12.6 V 0.15 A series or 6.3 V 0.3 A parallel (from memory)
    const o = out({ resistance: 84, current: 0.15 });
    expect(o.voltage).toBeCloseTo(12.6, 12);
    expect(o.power).toBeCloseTo(1.89, 12);
  });

  it("a danger warning above 50 V, none below", () => {
    expect(run({ voltage: 250, resistance: "50k" }).warnings.some((w) => w.level === "danger")).toBe(true);
    expect(run({ voltage: 12, resistance: 6 }).warnings.some((w) => w.level === "danger")).toBe(false);
    expect(run({ resistance: "100k", power: 1 }).warnings.some((w) => w.level === "danger")).toBe(true); // 316 V
  });
});

describe("ohms-law: identities", () => {
  it("property: from any pair, V = IR and P = VI = I²R = V²/R, and every other pair gives the same four", () => {
    fc.assert(
      fc.property(logUniform(1e-3, 1e4), logUniform(1, 1e8), fc.boolean(), fc.constantFrom(...[0, 1, 2, 3, 4, 5]), (vAbs, r, negative, pairIndex) => {
        const v = negative ? -vAbs : vAbs;
        const truth = { voltage: v, current: v / r, resistance: r, power: (v * v) / r };
        const pairs = [
          ["voltage", "current"],
          ["voltage", "resistance"],
          ["voltage", "power"],
          ["current", "resistance"],
          ["current", "power"],
          ["resistance", "power"],
        ] as const;
        const [a, b] = pairs[pairIndex];
        const o = out({ [a]: truth[a], [b]: truth[b] });
        for (const n of NAMES) expect(Number.isFinite(o[n])).toBe(true);
        expect(o.voltage / (o.current * o.resistance)).toBeCloseTo(1, 9);
        expect(o.power / (o.voltage * o.current)).toBeCloseTo(1, 9);
        expect(o.power / (o.current * o.current * o.resistance)).toBeCloseTo(1, 9);
        expect(o.power / ((o.voltage * o.voltage) / o.resistance)).toBeCloseTo(1, 9);
        expect(o.resistance / r).toBeCloseTo(1, 9);
        // R and P alone cannot know the direction; every other pair keeps the sign
        if (a !== "resistance") expect(Math.sign(o.voltage)).toBe(Math.sign(v));
      }),
    );
  });
});

describe("ohms-law: signs, zeros and refusals", () => {
  it("negative voltage and current together are fine", () => {
    expect(out({ voltage: -5, current: "-1m" })).toEqual({ voltage: -5, current: -0.001, resistance: 5000, power: 0.005 });
  });

  it("zero voltage across a known resistance is zero current and power", () => {
    expect(out({ voltage: 0, resistance: 100 })).toEqual({ voltage: 0, current: 0, resistance: 100, power: 0 });
    expect(Object.is(out({ voltage: "-0", resistance: 100 }).current, 0)).toBe(true);
  });

  it("refuses opposite signs, opens and shorts under a named field", () => {
    expect(fields({ voltage: 5, current: -1 }).current).toMatch(/same sign/);
    expect(fields({ voltage: 5, current: 0 }).current).toMatch(/infinite/);
    expect(fields({ voltage: 0, current: 1 }).voltage).toMatch(/zero/);
    expect(fields({ voltage: 0, current: 0 })).toHaveProperty("current");
    expect(fields({ voltage: 0, power: 1 })).toHaveProperty("voltage");
    expect(fields({ voltage: 5, power: 0 }).power).toMatch(/infinite/);
    expect(fields({ current: 0, power: 1 })).toHaveProperty("current");
    expect(fields({ current: 1, power: 0 }).power).toMatch(/zero/);
    expect(fields({ resistance: 0, voltage: 5 })).toHaveProperty("resistance");
    expect(fields({ power: -1, voltage: 5 })).toHaveProperty("power");
  });

  it("needs exactly two values", () => {
    const none = fields({});
    for (const n of NAMES) expect(none[n]).toMatch(/exactly two/);
    expect(Object.keys(fields({ voltage: 5 }))).toEqual(["current", "resistance", "power"]);
    const three = fields({ voltage: 5, current: 1, resistance: 5 });
    expect(Object.keys(three).sort()).toEqual(["current", "resistance", "voltage"]);
    expect(three.voltage).toMatch(/clear one/);
    expect(Object.keys(fields({ voltage: 5, current: 1, resistance: 5, power: 5 })).length).toBe(4);
  });

  it("wrong units and non-numbers are refused under their field", () => {
    expect(fields({ voltage: "1 A", current: 1 }).voltage).toMatch(/expected a voltage, got amperes/);
    expect(fields({ voltage: 1, current: "x" })).toHaveProperty("current");
    expect(fields({ voltage: 1, current: Number.NaN })).toHaveProperty("current");
  });

  it("property: any input either gives four finite numbers or is refused with a field message", () => {
    const anyValue = fc.oneof(fc.double({ noNaN: false }), fc.constantFrom(undefined, "", "1e308", "-0", "5 V", "2 A", "3 Ω", "4 W", 0));
    fc.assert(
      fc.property(anyValue, anyValue, anyValue, anyValue, (voltage, current, resistance, power) => {
        const r = runCalculator(calculator, { voltage, current, resistance, power });
        if (r.ok) {
          for (const n of NAMES) expect(Number.isFinite(r.result.outputs[n] as number)).toBe(true);
          expect(r.result.outputs.resistance as number).toBeGreaterThan(0);
        } else {
          expect(Object.keys(r.error.fields).every((k) => (NAMES as readonly string[]).includes(k))).toBe(true);
          expect(Object.keys(r.error.fields).length).toBeGreaterThan(0);
        }
      }),
      { numRuns: 500 },
    );
  });
});
