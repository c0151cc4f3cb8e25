import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { calculator, MARGIN } from "@/lib/calc/fuse";
import { runCalculator } from "@/lib/calc/run";
import { FUSE_MANTISSAS, FUSE_RATINGS, ratingAtLeast } from "@/lib/calc/tables/fuses";
import { calcRunner, logUniform } from "../helpers/calc";

type Out = { runningCurrent: number; margin: number; suggestedRating: number | null; ratingSeries: string };

const { run, out, fields } = calcRunner<Out>(calculator);

const inSeries = (x: number) => {
  const mantissa = x / 10 ** Math.floor(Math.log10(x) + 1e-12);
  return FUSE_MANTISSAS.some((m) => Math.abs(m - mantissa) < 1e-9);
};

describe("fuse: the IEC 60127 rating series", () => {
  it("every listed rating is 1–1.25–1.6–2–2.5–3.15–4–5–6.3–8 × 10ⁿ A, ascending, 32 mA to 10 A", () => {
    // IEC 60127-1/-2: rated currents 1, 1.25, 1.6, 2, 2.5, 3.15, 4, 5, 6.3, 8 × 10ⁿ A; 5 × 20 mm sheets 32 mA–10 A (from memory)
    expect(FUSE_MANTISSAS).toEqual([1, 1.25, 1.6, 2, 2.5, 3.15, 4, 5, 6.3, 8]);
    // the sheets write the lowest one, 31.5 mA of the series, as 32 mA (from memory)
    for (const r of FUSE_RATINGS.slice(1)) expect(inSeries(r)).toBe(true);
    expect(FUSE_RATINGS[0]).toBe(0.032);
    expect(FUSE_RATINGS.at(-1)).toBe(10);
    // R10 of ISO 3: each step is about 10^(1/10) = 1.259
    for (let k = 1; k < FUSE_RATINGS.length; k++) expect(FUSE_RATINGS[k] / FUSE_RATINGS[k - 1]).toBeCloseTo(1.259, 1);
    expect(FUSE_RATINGS).toHaveLength(26); // 32, 40, 50, 63, 80 mA, two full decades, 10 A
  });

  it("the rating at or above a value: 1 A is 1 A, 1.01 A is 1.25 A, 3 A is 3.15 A, 300 mA is 315 mA", () => {
    // IEC 60127 series: the next member at or above
    expect(ratingAtLeast(1)).toBe(1);
    expect(ratingAtLeast(0.8 * 1.25)).toBe(1); // 1.0000000000000002 in binary is still 1 A
    expect(ratingAtLeast(1.01)).toBe(1.25);
    expect(ratingAtLeast(3)).toBe(3.15);
    expect(ratingAtLeast(0.3)).toBe(0.315);
    expect(ratingAtLeast(10.5)).toBeNull();
  });
});

describe("fuse: worked cases", () => {
  it("a 100 W set on 120 V: 0.833 A; time-lag 1.25 A, quick-acting 2 A", () => {
    // I = P/V (ARRL Handbook, AC power); margins 1.25 and 2 (common practice); IEC 60127 series
    const t = out({ loadPower: "100 W", kind: "time-lag" });
    expect(t.runningCurrent).toBeCloseTo(0.8333, 4);
    expect(t.suggestedRating).toBe(1.25);
    const q = out({ loadPower: "100 W", kind: "quick" });
    expect(q.suggestedRating).toBe(2);
  });

  it("a 30 W table radio on 120 V draws 0.25 A: time-lag 315 mA", () => {
    // A five-tube AC/DC receiver draws roughly 30 W (common practice); 1.25 × 0.25 A = 0.3125 A → 315 mA (IEC 60127 series)
    const o = out({ loadPower: 30, lineVoltage: 120, kind: "time-lag" });
    expect(o.runningCurrent).toBeCloseTo(0.25, 12);
    expect(o.suggestedRating).toBe(0.315);
  });

  it("power factor raises the current: 60 W at 230 V and cos φ 0.75 is 348 mA, time-lag 500 mA", () => {
    // I = P/(V·cos φ) (ARRL Handbook, power factor); 230 V per IEC 60038; 1.25 × 0.348 = 0.435 A → 500 mA
    const o = out({ loadPower: "60 W", lineVoltage: "230 V", powerFactor: 0.75, kind: "time-lag" });
    expect(o.runningCurrent).toBeCloseTo(0.3478, 4);
    expect(o.suggestedRating).toBe(0.5);
  });

  it("a measured current is used as it is: 0.8 A time-lag is exactly 1 A", () => {
    const o = out({ loadCurrent: "800 mA", kind: "time-lag" });
    expect(o.runningCurrent).toBe(0.8);
    expect(o.suggestedRating).toBe(1);
    expect(o.margin).toBe(1.25);
    expect(o.ratingSeries).toMatch(/IEC 60127/);
  });
});

describe("fuse: warnings", () => {
  it("on mains: danger, and the caution that a fuse does not protect from shock; never 'safe'", () => {
    const r = run({ loadPower: 60, kind: "time-lag" });
    expect(r.warnings.some((w) => w.level === "danger")).toBe(true);
    expect(r.warnings.some((w) => w.level === "caution" && /not protect anyone from shock/.test(w.message))).toBe(true);
    for (const w of r.warnings) expect(w.message).not.toMatch(/\bsafe\b/i);
    expect(run({ loadCurrent: 2, lineVoltage: 12, kind: "quick" }).warnings.some((w) => w.level === "danger")).toBe(false);
  });

  it("quick-acting explains the surge; above 10 A and above 250 V say so", () => {
    expect(run({ loadPower: 60, kind: "quick" }).warnings.some((w) => /surge/.test(w.message))).toBe(true);
    expect(run({ loadPower: 60, kind: "time-lag" }).warnings.some((w) => /switch-on surge of several/.test(w.message))).toBe(false);
    const big = run({ loadPower: 2000, kind: "time-lag" });
    expect(big.outputs.suggestedRating).toBeNull();
    expect(big.warnings.some((w) => w.level === "caution" && /10 A/.test(w.message))).toBe(true);
    expect(run({ loadPower: 100, lineVoltage: 400, kind: "time-lag" }).warnings.some((w) => /rated voltage/.test(w.message))).toBe(true);
    expect(run({ loadPower: 100, lineVoltage: 230, kind: "time-lag" }).warnings.some((w) => /rated voltage/.test(w.message))).toBe(false);
  });
});

describe("fuse: identities and properties", () => {
  const valid = fc.record({
    loadPower: logUniform(0.01, 5000),
    lineVoltage: fc.double({ min: 1, max: 1000, noNaN: true }),
    powerFactor: fc.double({ min: 0.05, max: 1, noNaN: true }),
    kind: fc.constantFrom("quick" as const, "time-lag" as const),
  });

  it("property: P = V·I·cos φ; the rating is the smallest listed one at or above margin × I", () => {
    fc.assert(
      fc.property(valid, (x) => {
        const o = out(x);
        expect((x.lineVoltage * o.runningCurrent * x.powerFactor) / x.loadPower).toBeCloseTo(1, 12);
        expect(o.margin).toBe(MARGIN[x.kind]);
        const needed = o.margin * o.runningCurrent;
        if (o.suggestedRating === null) {
          expect(needed).toBeGreaterThan(10);
          return;
        }
        expect(FUSE_RATINGS).toContain(o.suggestedRating);
        expect(o.suggestedRating).toBeGreaterThanOrEqual(needed * (1 - 1e-9));
        const below = FUSE_RATINGS[FUSE_RATINGS.indexOf(o.suggestedRating) - 1];
        if (below !== undefined) expect(below).toBeLessThan(needed * (1 - 1e-9));
        // never more than one R10 step (at most 1.6/1.25 = 1.28) above what is needed, inside the table
        if (needed >= FUSE_RATINGS[0]) expect(o.suggestedRating / needed).toBeLessThanOrEqual(1.28 + 1e-9);
      }),
    );
  });

  it("property: quick-acting never gets a smaller rating than time-lag for the same load", () => {
    fc.assert(
      fc.property(logUniform(1e-3, 5), (i) => {
        const q = out({ loadCurrent: i, kind: "quick" }).suggestedRating;
        const t = out({ loadCurrent: i, kind: "time-lag" }).suggestedRating;
        if (q !== null && t !== null) expect(q).toBeGreaterThanOrEqual(t);
        if (t === null) expect(q).toBeNull();
      }),
    );
  });

  it("refusals name the field", () => {
    expect(fields({ kind: "quick" }).loadPower).toMatch(/required/);
    expect(fields({ loadPower: 60, loadCurrent: 0.5, kind: "quick" }).loadCurrent).toMatch(/not both/);
    expect(fields({ loadPower: 60 }).kind).toMatch(/quick.*time-lag/);
    expect(fields({ loadPower: 60, kind: "slow" }).kind).toMatch(/quick.*time-lag/);
    expect(fields({ loadPower: 60, powerFactor: 1.2, kind: "quick" }).powerFactor).toMatch(/Power factor/);
    expect(fields({ loadPower: 60, powerFactor: 0, kind: "quick" }).powerFactor).toMatch(/Power factor/);
    const bad = fc.oneof(fc.double({ max: 0, noNaN: true }), fc.constantFrom("abc", "5 Hz", Number.NaN, Number.POSITIVE_INFINITY));
    fc.assert(
      fc.property(fc.constantFrom("loadPower", "lineVoltage"), bad, (name, x) => {
        const r = runCalculator(calculator, { loadPower: 60, kind: "time-lag", [name]: x });
        expect(r.ok).toBe(false);
        if (!r.ok) expect(r.error.fields).toHaveProperty(name);
      }),
    );
  });
});
