import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { runCalculator } from "@/lib/calc/run";
import { calculator } from "@/lib/calc/series-parallel";
import { bestParallel, bestSeries, partsOf } from "@/lib/calc/series-parallel-search";
import { SERIES, SERIES_NAMES, type SeriesName } from "@/lib/calc/tables/preferred-values";
import { calcRunner, logUniform } from "../helpers/calc";

type Out = { first: number; second: number; mode: "series" | "parallel"; combined: number; error: number };

const { run, out, fields } = calcRunner<Out>(calculator);

const isMember = (x: number, s: SeriesName) => {
  const m = x / 10 ** Math.floor(Math.log10(x) + 1e-12);
  return SERIES[s].some((e) => Math.abs(e - m) < 1e-9 * e);
};

/** Every pair the calculator may offer, tried one by one: the smallest |error| (the check on the fast search). */
function bruteForce(x: number, s: SeriesName, mode: "series" | "parallel"): number {
  const v = Array.from(partsOf(s));
  let best = Infinity;
  for (let i = 0; i < v.length; i++) {
    for (let j = i; j < v.length; j++) {
      const [a, b] = [v[i], v[j]];
      if (mode === "series") {
        if (b >= x * (1 - 1e-9)) break; // b = x is the member itself, b > x overshoots
        best = Math.min(best, Math.abs(a + b - x) / x);
      } else if (a > x * (1 + 1e-9)) best = Math.min(best, Math.abs((a * b) / (a + b) - x) / x);
    }
  }
  return best;
}

describe("series-parallel: checks against IEC 60063 values", () => {
  it("3.3 kΩ from E12: 1.5 kΩ + 1.8 kΩ in series, exactly", () => {
    // IEC 60063 E12 has 1.5 and 1.8; 1.5 k + 1.8 k = 3.3 k
    expect(out({ target: "3.3k", mode: "series" })).toEqual({ first: 1500, second: 1800, mode: "series", combined: 3300, error: 0 });
    expect(out({ target: "3k3", series: "E12", mode: "either" })).toMatchObject({ first: 1500, second: 1800, mode: "series", error: 0 });
    // it is itself an E12 value, and the note says so
    expect(run({ target: "3.3k", mode: "series" }).warnings.some((w) => /itself an E12 value/.test(w.message))).toBe(true);
  });

  it("3.3 kΩ from E12 in parallel: 3.9 kΩ ∥ 22 kΩ = 3.313 kΩ, +0.39 %", () => {
    // IEC 60063 E12; R = R1R2/(R1 + R2): 3.9 × 22/25.9 = 3.3127 k, +0.386 % (the next best, 5.6 k ∥ 8.2 k, is +0.83 %)
    const o = out({ target: 3300, mode: "parallel" });
    expect([o.first, o.second]).toEqual([3900, 22000]);
    expect(o.combined).toBeCloseTo((3900 * 22000) / 25900, 9);
    expect(o.error).toBeCloseTo(0.00386, 5);
  });

  it("5 kΩ: 10 kΩ ∥ 10 kΩ exactly in E12; in E24 a series pair ties it exactly and series is kept", () => {
    // IEC 60063: 10 is in every series; 3.0 (and 2.0) are E24 members, not E12, so 4.7 k + 300 Ω (or 2 k + 3 k) is exact
    expect(out({ target: "5k", mode: "either" })).toMatchObject({ first: 10000, second: 10000, mode: "parallel", combined: 5000, error: 0 });
    const e24 = out({ target: "5k", series: "e24", mode: "either" });
    expect(e24).toMatchObject({ mode: "series", combined: 5000, error: 0 });
    expect(e24.first + e24.second).toBe(5000);
    expect(out({ target: "5k", series: "E24", mode: "parallel" })).toMatchObject({ combined: 5000, error: 0 }); // 7.5 k ∥ 15 k, also E24
  });

  it("equal parts beyond the searched octave: 9.5 kΩ from E6 is 4.7 k + 4.7 k; 3.3 kΩ in parallel is 6.8 k ∥ 6.8 k", () => {
    // IEC 60063 E6: 1.0 1.5 2.2 3.3 4.7 6.8. 9.4 k is −1.05 %; 6.8 k ∥ 6.8 k = 3.4 k is +3.03 % (4.7 k ∥ 10 k is −3.1 %)
    expect(out({ target: "9.5k", series: "E6", mode: "series" })).toMatchObject({ first: 4700, second: 4700, combined: 9400 });
    expect(out({ target: "3.3k", series: "E6", mode: "parallel" })).toMatchObject({ first: 6800, second: 6800, combined: 3400 });
  });

  it("E96: 5.13 kΩ comes within 0.1 %", () => {
    // IEC 60063 E96 steps are about 2.4 %, so a pair lands far closer than one part (5.11 k alone is −0.39 %)
    const o = out({ target: "5.13k", series: "E96", mode: "either" });
    expect(Math.abs(o.error)).toBeLessThan(0.001);
    expect(isMember(o.first, "E96") && isMember(o.second, "E96")).toBe(true);
  });
});

describe("series-parallel: identities and properties", () => {
  it("property: the fast search finds the best pair that trying every pair finds", () => {
    fc.assert(
      fc.property(logUniform(2, 1e7), fc.constantFrom(...SERIES_NAMES), (x, s) => {
        expect(Math.abs(bestSeries(x, s)!.error)).toBeCloseTo(bruteForce(x, s, "series"), 12);
        expect(Math.abs(bestParallel(x, s)!.error)).toBeCloseTo(bruteForce(x, s, "parallel"), 12);
      }),
      { numRuns: 60 },
    );
  });

  it("property: members of the series, first ≤ second, combined by the mode's law, error = (R − x)/x, either no worse than both", () => {
    fc.assert(
      fc.property(logUniform(2, 1e7), fc.constantFrom(...SERIES_NAMES), fc.constantFrom("series", "parallel", "either"), (x, s, mode) => {
        const o = out({ target: x, series: s, mode });
        expect(isMember(o.first, s) && isMember(o.second, s)).toBe(true);
        expect(o.first).toBeLessThanOrEqual(o.second);
        const law = o.mode === "series" ? o.first + o.second : (o.first * o.second) / (o.first + o.second);
        expect(o.combined / law).toBeCloseTo(1, 12);
        expect(o.error).toBeCloseTo((o.combined - x) / x, 12);
        if (mode !== "either") expect(o.mode).toBe(mode);
        else {
          const best = Math.min(Math.abs(bestSeries(x, s)!.error), Math.abs(bestParallel(x, s)!.error));
          expect(Math.abs(o.error)).toBe(best);
        }
        // a pair never does worse than the series' own spacing allows: the widest E-series step is 1.5 (E6 1.0 → 1.5)
        expect(Math.abs(o.error)).toBeLessThan(0.25);
      }),
    );
  });

  it("a finer series never does worse: E96 ≤ E48, E24 ≤ E12 ≤ E6 (each contains the next)", () => {
    // IEC 60063: E12 ⊂ E24, E6 ⊂ E12, E48 ⊂ E96
    fc.assert(
      fc.property(logUniform(2, 1e7), (x) => {
        const e = (s: SeriesName) => Math.abs(out({ target: x, series: s, mode: "either" }).error);
        expect(e("E12")).toBeLessThanOrEqual(e("E6") + 1e-15);
        expect(e("E24")).toBeLessThanOrEqual(e("E12") + 1e-15);
        expect(e("E96")).toBeLessThanOrEqual(e("E48") + 1e-15);
      }),
      { numRuns: 50 },
    );
  });

  it("the working shows both ways for either, and the power share", () => {
    const r = run({ target: "5k", mode: "either" });
    expect(r.steps[0].latex).toMatch(/\\parallel/);
    expect(r.steps.some((s) => /Share of the power/.test(s.label))).toBe(true);
    for (const w of r.warnings) expect(w.level).not.toBe("danger");
  });
});

describe("series-parallel: refusals", () => {
  it("target within 2 Ω to 10 MΩ, a known series and mode", () => {
    expect(fields({ target: 1, mode: "series" }).target).toMatch(/at least 2/);
    expect(fields({ target: "22M", mode: "series" })).toHaveProperty("target");
    expect(fields({ target: "3.3k", series: "E3", mode: "series" }).series).toMatch(/E6, E12/);
    expect(fields({ target: "3.3k", mode: "both" }).mode).toMatch(/series.*parallel.*either/);
    expect(fields({ target: "3.3k" })).toHaveProperty("mode");
  });

  it("property: non-positive, non-finite, wrong-unit or missing targets are refused under target", () => {
    const bad = fc.oneof(fc.double({ max: 0, noNaN: true }), fc.constantFrom("", "abc", "5 V", null, Number.NaN, Number.POSITIVE_INFINITY));
    fc.assert(fc.property(bad, (v) => void expect(fields({ target: v, mode: "series" })).toHaveProperty("target")));
    expect(runCalculator(calculator, { target: "4k7", mode: "PARALLEL" }).ok).toBe(true);
  });
});
