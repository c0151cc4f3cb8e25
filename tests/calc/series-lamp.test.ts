import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { calculator, COLD_FRACTION } from "@/lib/calc/series-lamp";
import { runCalculator } from "@/lib/calc/run";
import { calcRunner, logUniform } from "../helpers/calc";

type Out = {
  lampHotResistance: number;
  lampColdResistance: number;
  maxCurrent: number;
  setCurrent: number | null;
  setVoltage: number | null;
};

const { run, out, fields } = calcRunner<Out>(calculator);

/** The lamp model the calculator states: R_lamp(I) = max(R_cold, R_hot·I/I_rated). */
const lampResistance = (o: Out, i: number) => Math.max(o.lampColdResistance, (o.lampHotResistance * i) / o.maxCurrent);

describe("series-lamp: checks against published data", () => {
  it("a 100 W, 120 V lamp is 144 Ω hot and carries 0.833 A", () => {
    // Physics textbooks' worked example of P = V²/R: a 100 W, 120 V bulb has R = 144 Ω, I = 0.833 A (from memory)
    const o = out({ lampPower: "100 W" });
    expect(o.lampHotResistance).toBeCloseTo(144, 9);
    expect(o.maxCurrent).toBeCloseTo(0.8333, 4);
  });

  it("a 60 W, 120 V lamp is 240 Ω hot and 0.5 A; on 230 V mains it is 882 Ω and 0.261 A", () => {
    // P = V²/R (ARRL Handbook, electrical fundamentals); 230 V is the IEC 60038 nominal mains voltage
    const o = out({ lineVoltage: "120 V", lampPower: "60 W" });
    expect(o.lampHotResistance).toBeCloseTo(240, 9);
    expect(o.maxCurrent).toBeCloseTo(0.5, 12);
    const eu = out({ lineVoltage: "230 V", lampPower: "60 W" });
    expect(eu.lampHotResistance).toBeCloseTo(881.67, 2);
    expect(eu.maxCurrent).toBeCloseTo(0.2609, 4);
  });

  it("cold tungsten is about a tenth of the hot resistance", () => {
    // Tungsten filament: cold resistance about a tenth of hot (common practice)
    const o = out({ lampPower: 100 });
    expect(o.lampColdResistance / o.lampHotResistance).toBeCloseTo(0.1, 12);
    expect(o.lampColdResistance).toBeCloseTo(14.4, 9);
  });

  it("the lamp model stays within a few per cent of tungsten's characteristic equation, I ∝ V^0.54", () => {
    // Lamp makers' characteristic equation for gas-filled tungsten lamps: P ∝ V^1.54, so I ∝ V^0.54 (from memory).
    // The model's square law: a lamp at a quarter of its voltage carries half its current; 0.25^0.54 = 0.473.
    const o = out({ lampPower: 100 });
    const i = 0.5 * o.maxCurrent;
    const vLamp = i * lampResistance(o, i);
    expect(vLamp / 120).toBeCloseTo(0.25, 12);
    expect(Math.abs(0.5 / 0.25 ** 0.54 - 1)).toBeLessThan(0.07);
  });

  it("a 100 W lamp before a 40 W set: the set sees about 100 V, between the cold-lamp and hot-lamp bounds", () => {
    // Bench rule: a lamp near the set's wattage lets a healthy set run at a reduced but working voltage (common practice)
    const o = out({ lampPower: 100, setPower: 40 });
    const rSet = (120 * 120) / 40;
    expect(o.setVoltage!).toBeGreaterThan((120 * rSet) / (144 + rSet)); // hot-lamp bound: 85.7 V
    expect(o.setVoltage!).toBeLessThan((120 * rSet) / (14.4 + rSet)); // cold-lamp bound: 115 V
    expect(o.setVoltage!).toBeGreaterThan(95);
    expect(o.setVoltage!).toBeLessThan(110);
  });
});

describe("series-lamp: safety wording", () => {
  it("on 120 V: danger, and the caution that a lamp limits current, not voltage", () => {
    const r = run({ lampPower: 60 });
    expect(r.inputs.lineVoltage).toBe(120);
    expect(r.warnings.some((w) => w.level === "danger")).toBe(true);
    expect(r.warnings.some((w) => w.level === "caution" && /limits current, not voltage/.test(w.message) && /lethal/.test(w.message))).toBe(true);
    for (const w of r.warnings) expect(w.message).not.toMatch(/\bsafe\b/i);
  });

  it("on a 12 V lamp supply neither the danger nor the mains caution fires", () => {
    const r = run({ lineVoltage: 12, lampPower: 21, setPower: 10 });
    expect(r.warnings.some((w) => w.level === "danger")).toBe(false);
    expect(r.warnings.some((w) => w.level === "caution")).toBe(false);
  });

  it("a lamp far smaller than the set says the set will starve; far larger says it limits little", () => {
    expect(run({ lampPower: 25, setPower: 150 }).warnings.some((w) => /may not start/.test(w.message))).toBe(true);
    expect(run({ lampPower: 200, setPower: 30 }).warnings.some((w) => /limits little/.test(w.message))).toBe(true);
    const fit = run({ lampPower: 60, setPower: 40 }).warnings;
    expect(fit.some((w) => /may not start|limits little/.test(w.message))).toBe(false);
  });

  it("without setPower the set outputs are null and no set step is shown", () => {
    const r = run({ lampPower: 60 });
    expect(r.outputs.setCurrent).toBeNull();
    expect(r.outputs.setVoltage).toBeNull();
    expect(r.steps.some((s) => /set sees/.test(s.label))).toBe(false);
    expect(run({ lampPower: 60, setPower: 30 }).steps.some((s) => /set sees/.test(s.label))).toBe(true);
  });
});

describe("series-lamp: identities and properties", () => {
  const valid = fc.record({
    lineVoltage: fc.double({ min: 1, max: 500, noNaN: true }),
    lampPower: logUniform(0.1, 2000),
    setPower: logUniform(0.01, 10_000),
  });

  it("property: Ohm's law and energy balance around the loop; the current lies between the hot- and cold-lamp bounds", () => {
    fc.assert(
      fc.property(valid, (v) => {
        const o = out(v);
        const i = o.setCurrent!;
        const rSet = (v.lineVoltage * v.lineVoltage) / v.setPower;
        for (const x of Object.values(o)) expect(Number.isFinite(x)).toBe(true);
        // P = V²/R and I = P/V at the line voltage
        expect((o.lampHotResistance * v.lampPower) / (v.lineVoltage * v.lineVoltage)).toBeCloseTo(1, 12);
        expect((o.maxCurrent * v.lineVoltage) / v.lampPower).toBeCloseTo(1, 12);
        expect(o.lampColdResistance / o.lampHotResistance).toBeCloseTo(COLD_FRACTION, 12);
        // Series loop: I·(R_lamp(I) + R_set) = V, and V·I = I²·R_set + I²·R_lamp
        const rLamp = lampResistance(o, i);
        expect((i * (rLamp + rSet)) / v.lineVoltage).toBeCloseTo(1, 9);
        expect((i * i * (rSet + rLamp)) / (v.lineVoltage * i)).toBeCloseTo(1, 9);
        expect(o.setVoltage! / (i * rSet)).toBeCloseTo(1, 12);
        expect(i).toBeGreaterThanOrEqual((v.lineVoltage / (o.lampHotResistance + rSet)) * (1 - 1e-12));
        expect(i).toBeLessThanOrEqual((v.lineVoltage / (o.lampColdResistance + rSet)) * (1 + 1e-12));
        expect(o.setVoltage!).toBeLessThan(v.lineVoltage);
      }),
    );
  });

  it("property: a bigger lamp lets the set see more voltage", () => {
    fc.assert(
      fc.property(valid, fc.double({ min: 1.01, max: 10, noNaN: true }), (v, factor) => {
        fc.pre(v.lampPower * factor <= 2000);
        const small = out(v).setVoltage!;
        const big = out({ ...v, lampPower: v.lampPower * factor }).setVoltage!;
        expect(big).toBeGreaterThanOrEqual(small * (1 - 1e-12));
      }),
    );
  });

  it("property: a bad value is refused under its own field", () => {
    const bad = fc.oneof(fc.double({ max: 0, noNaN: true }), fc.constantFrom("abc", "5 Hz", Number.NaN, Number.POSITIVE_INFINITY));
    for (const name of ["lineVoltage", "lampPower", "setPower"]) {
      fc.assert(
        fc.property(bad, (x) => {
          expect(fields({ lineVoltage: 120, lampPower: 60, setPower: 30, [name]: x })).toHaveProperty(name);
        }),
      );
    }
    expect(fields({ lineVoltage: 120 }).lampPower).toMatch(/Lamp power/);
    expect(fields({ lampPower: "60 A" }).lampPower).toMatch(/expected a power/);
    expect(runCalculator(calculator, { lampPower: "60W", setPower: "" }).ok).toBe(true);
  });
});
