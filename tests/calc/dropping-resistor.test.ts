import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { calculator } from "@/lib/calc/dropping-resistor";
import { runCalculator } from "@/lib/calc/run";
import { E12 } from "@/lib/calc/tables/preferred-values";
import { STANDARD_WATTAGES } from "@/lib/calc/tables/wattage";
import { calcRunner, logUniform } from "../helpers/calc";

type Out = {
  resistance: number;
  dissipation: number;
  suggestedRating: number | null;
  nearestPreferred: number;
  loadVoltageWithPreferred: number;
};

const { run, out, fields } = calcRunner<Out>(calculator);
function isE12(x: number): boolean {
  const mantissa = x / 10 ** Math.floor(Math.log10(x) + 1e-12);
  return E12.some((m) => Math.abs(m - mantissa) < 1e-9 * m);
}

describe("dropping-resistor: checks against published data", () => {
  it("6V6GT screen at 250 V, 4.5 mA, from a 300 V supply", () => {
    // 6V6GT data sheet typical operation: screen 250 V, 4.5 mA zero-signal (from memory);
    // R = (Vs − Vl)/I per the Radiotron Designer's Handbook; E12 per IEC 60063
    const o = out({ supplyVoltage: "300 V", loadVoltage: "250 V", loadCurrent: "4.5 mA" });
    expect(o.resistance).toBeCloseTo(11111.1, 1);
    expect(o.dissipation).toBeCloseTo(0.225, 12);
    expect(o.suggestedRating).toBe(0.5); // 2 × 0.225 W = 0.45 W → ½ W (common practice)
    expect(o.nearestPreferred).toBe(12000); // log-nearer than 10 k
    expect(o.loadVoltageWithPreferred).toBeCloseTo(246, 9);
  });

  it("12AX7 plate supply at 250 V, 1.2 mA, from 300 V: 41.7 kΩ, nearest E12 39 kΩ", () => {
    // 12AX7 data sheet typical operation: 250 V plate, 1.2 mA (from memory)
    const o = out({ supplyVoltage: 300, loadVoltage: 250, loadCurrent: "1.2m" });
    expect(o.resistance).toBeCloseTo(41666.67, 1);
    expect(o.nearestPreferred).toBe(39000);
    expect(o.loadVoltageWithPreferred).toBeCloseTo(300 - 0.0012 * 39000, 9);
    expect(o.suggestedRating).toBe(0.125);
  });

  it("an exact E12 result stays as it is: 100 V at 10 mA is 10 kΩ, 1 W, rated 2 W", () => {
    // IEC 60063: 10 is an E12 member; 2 × 1 W → 2 W (common practice)
    const o = out({ supplyVoltage: 350, loadVoltage: 250, loadCurrent: "10 mA" });
    expect(o).toEqual({ resistance: 10000, dissipation: 1, suggestedRating: 2, nearestPreferred: 10000, loadVoltageWithPreferred: 250 });
  });

  it("says the load is treated as a constant current, and warns of high voltage", () => {
    const r = run({ supplyVoltage: 300, loadVoltage: 250, loadCurrent: "4.5m" });
    expect(r.warnings.some((w) => /constant current/.test(w.message))).toBe(true);
    expect(r.steps.some((s) => /constant current/.test(s.label))).toBe(true);
    expect(r.warnings.some((w) => w.level === "danger")).toBe(true);
    expect(run({ supplyVoltage: 12, loadVoltage: 9, loadCurrent: "30m" }).warnings.some((w) => w.level === "danger")).toBe(false);
  });

  it("beyond the largest standard rating it says so", () => {
    const r = run({ supplyVoltage: 1000, loadVoltage: 100, loadCurrent: "1 A" });
    expect(r.outputs.suggestedRating).toBeNull();
    expect(r.warnings.some((w) => w.level === "caution" && /largest standard rating/.test(w.message))).toBe(true);
  });
});

describe("dropping-resistor: identities and properties", () => {
  it("property: I·R + Vl = Vs, P = I²R = (Vs − Vl)·I, rating ≥ 2P, E12 nearest, Vl' = Vs − I·R_pref", () => {
    fc.assert(
      fc.property(logUniform(1, 1e4), fc.double({ min: 0.05, max: 0.95, noNaN: true }), logUniform(1e-6, 10), (vs, frac, i) => {
        const vl = vs * frac;
        const res = runCalculator(calculator, { supplyVoltage: vs, loadVoltage: vl, loadCurrent: i });
        if (!res.ok) {
          // only when R falls outside 1 mΩ … 1 TΩ
          expect(res.error.fields).toHaveProperty("loadCurrent");
          return;
        }
        const o = res.result.outputs as unknown as Out;
        for (const v of Object.values(o)) if (v !== null) expect(Number.isFinite(v)).toBe(true);
        expect((i * o.resistance + vl) / vs).toBeCloseTo(1, 9);
        expect(o.dissipation / ((vs - vl) * i)).toBeCloseTo(1, 9);
        expect(o.dissipation / (i * i * o.resistance)).toBeCloseTo(1, 9);
        if (o.suggestedRating !== null) {
          expect(o.suggestedRating).toBeGreaterThanOrEqual(2 * o.dissipation);
          expect(STANDARD_WATTAGES).toContain(o.suggestedRating);
        } else expect(2 * o.dissipation).toBeGreaterThan(100);
        expect(isE12(o.nearestPreferred)).toBe(true);
        expect(Math.abs(Math.log(o.nearestPreferred / o.resistance))).toBeLessThan(Math.log(1.25) / 2 + 1e-9); // widest E12 gap: 1.2 → 1.5
        const raw = vs - i * o.nearestPreferred;
        expect(o.loadVoltageWithPreferred).toBeCloseTo(Math.max(0, raw), 6);
        expect(o.loadVoltageWithPreferred).toBeGreaterThanOrEqual(0);
      }),
    );
  });

  it("a load far below the supply can leave nothing under the constant-current estimate: clamped to 0 with a caution", () => {
    // 300 V to 10 V at 25 mA: R = 11.6 kΩ → E12 12 kΩ drops 300 V
    const r = run({ supplyVoltage: 300, loadVoltage: 10, loadCurrent: "25m" });
    expect(r.outputs.nearestPreferred).toBe(12000);
    expect(r.outputs.loadVoltageWithPreferred).toBe(0);
    expect(r.warnings.some((w) => w.level === "caution" && /breaks down/.test(w.message))).toBe(true);
  });
});

describe("dropping-resistor: refusals", () => {
  it("load voltage must be below the supply", () => {
    expect(fields({ supplyVoltage: 250, loadVoltage: 250, loadCurrent: 0.01 }).loadVoltage).toMatch(/below the supply/);
    expect(fields({ supplyVoltage: 250, loadVoltage: 300, loadCurrent: 0.01 })).toHaveProperty("loadVoltage");
  });

  it("property: non-positive, wrong-unit or missing values are refused under their field", () => {
    const bad = fc.oneof(fc.double({ max: 0, noNaN: true }), fc.constantFrom("", "5 F", "abc", null, undefined, Number.NaN, Number.NEGATIVE_INFINITY));
    const good = { supplyVoltage: 300, loadVoltage: 250, loadCurrent: 0.01 };
    for (const name of Object.keys(good)) {
      fc.assert(
        fc.property(bad, (v) => {
          expect(fields({ ...good, [name]: v })).toHaveProperty(name);
        }),
      );
    }
    expect(fields({ ...good, loadCurrent: "5 V" }).loadCurrent).toBe("Load current expected a current, got volts");
  });
});
