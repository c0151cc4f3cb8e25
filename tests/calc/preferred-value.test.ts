import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { calculator } from "@/lib/calc/preferred-value";
import { SERIES_NAMES } from "@/lib/calc/tables/preferred-values";
import { calcRunner, logUniform } from "../helpers/calc";

type Out = { nearest: number; below: number; above: number; errorOfNearest: number };

const { out, fields } = calcRunner<Out>(calculator);

describe("preferred-value: published checks (IEC 60063 tables)", () => {
  it("5 kΩ in E12 lies between 4.7 kΩ and 5.6 kΩ, nearest 4.7 kΩ", () => {
    // IEC 60063 E12: … 4.7, 5.6 … (from memory)
    const o = out({ value: "5k" });
    expect(o.below).toBe(4700);
    expect(o.above).toBe(5600);
    expect(o.nearest).toBe(4700);
    expect(o.errorOfNearest).toBeCloseTo(-0.06, 12);
  });

  it("E24 has 5.1 between 4.7 and 5.6", () => {
    // IEC 60063 E24: … 4.7, 5.1, 5.6 … (from memory)
    const o = out({ value: "5.13k", series: "E24" });
    expect(o.below).toBe(5100);
    expect(o.above).toBe(5600);
    expect(o.nearest).toBe(5100);
  });

  it("E96 steps 10.0, 10.2, 10.5 kΩ", () => {
    // IEC 60063 E96: 1.00, 1.02, 1.05, 1.07 … (from memory)
    expect(out({ value: "10.2k", series: "E96" })).toMatchObject({ nearest: 10200, below: 10200, above: 10200, errorOfNearest: 0 });
    const o = out({ value: "10.3k", series: "E96" });
    expect(o.below).toBe(10200);
    expect(o.above).toBe(10500);
    expect(o.nearest).toBe(10200);
  });

  it("E6 at 3: between 2.2 and 3.3, nearer 3.3 on a log scale", () => {
    // IEC 60063 E6: 1.0 1.5 2.2 3.3 4.7 6.8 (from memory)
    expect(out({ value: 3, series: "E6" })).toMatchObject({ below: 2.2, above: 3.3, nearest: 3.3 });
  });

  it("works for capacitors in their own units", () => {
    // 0.047 µF = 47 nF, an E12 member (IEC 60063)
    expect(out({ value: "0.047 uF" }).nearest).toBe(47e-9);
    expect(out({ value: "50n", series: "E6" })).toMatchObject({ below: 47e-9, above: 68e-9, nearest: 47e-9 });
  });

  it("crosses decades: 9.6 kΩ in E12 rounds up to 10 kΩ", () => {
    const o = out({ value: "9.6k" });
    expect(o.below).toBe(8200);
    expect(o.above).toBe(10000);
    expect(o.nearest).toBe(10000);
  });

  it("log, not linear: 5.14 k goes up to 5.6 k although 5.14 k is nearer 4.7 k's side of the linear midpoint 5.15 k", () => {
    // log midpoint √(4.7 × 5.6) = 5.130 k
    expect(out({ value: "5.14k" }).nearest).toBe(5600);
    expect(out({ value: "5.12k" }).nearest).toBe(4700);
  });
});

describe("preferred-value: identities and properties", () => {
  it("nearest is within half a log step, and within the series' tolerance", () => {
    const tol: Record<string, number> = { E6: 0.2, E12: 0.1, E24: 0.05, E48: 0.02, E96: 0.01 };
    fc.assert(
      fc.property(logUniform(1e-12, 1e12), fc.constantFrom(...SERIES_NAMES), (x, series) => {
        const o = out({ value: x, series });
        for (const v of Object.values(o)) expect(Number.isFinite(v)).toBe(true);
        expect(o.below).toBeLessThanOrEqual(x * (1 + 1e-9));
        expect(o.above).toBeGreaterThanOrEqual(x * (1 - 1e-9));
        // within 1e-9 of a member counts as that member (binary noise from unit scaling)
        expect(Math.abs(Math.log(o.nearest / x))).toBeLessThanOrEqual(Math.log(o.above / o.below) / 2 + 1e-9);
        // the widest gaps (E12 1.2 → 1.5, E96 0.953 → 0.976) put the log midpoint up to ~1.2× the nominal tolerance away
        expect(Math.abs(o.errorOfNearest)).toBeLessThan(tol[series] * 1.2);
        expect(o.errorOfNearest).toBeCloseTo((o.nearest - x) / x, 12);
      }),
    );
  });

  it("series name is read in any case", () => {
    expect(out({ value: "5.13k", series: "e24" }).nearest).toBe(5100);
  });

  it("refuses invalid values under the value field", () => {
    fc.assert(
      fc.property(
        fc.oneof(fc.double({ max: 0, noNaN: true }), fc.constantFrom("", "abc", "5 V", "3 A", null, undefined, Number.NaN, Number.POSITIVE_INFINITY, "1e400")),
        (value) => {
          expect(fields({ value })).toHaveProperty("value");
        },
      ),
    );
    expect(fields({})).toHaveProperty("value");
    expect(fields({ value: "5 V" }).value).toMatch(/resistance, capacitance or inductance/);
  });

  it("refuses an unknown series under the series field", () => {
    expect(fields({ value: 100, series: "E7" }).series).toMatch(/E6, E12, E24, E48, E96/);
  });
});
