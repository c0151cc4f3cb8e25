import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { round15, toPrecision } from "../../lib/calc/precision";
import { tidy } from "../../lib/calc/units";

// The fast paths must give exactly what the native calls give, for every double: ties (x.5 at the
// last figure), rollovers (9.995 → "10.0"), powers of ten, negatives, tiny and huge values.

const anyDouble = fc.double({ noNaN: false });
const benchRange = fc.double({ min: -1e6, max: 1e6, noNaN: true });
/** Decimal ties and near-ties at p figures: n.5 / 10^k, nudged by a few ulps. */
const nearTie = fc.tuple(fc.integer({ min: 1, max: 999_999 }), fc.integer({ min: 0, max: 8 }), fc.integer({ min: -3, max: 3 })).map(([n, k, nudge]) => {
  let x = (n + 0.5) / 10 ** k;
  for (let i = 0; i < Math.abs(nudge); i++) x = nudge > 0 ? x + Number.EPSILON * x : x - Number.EPSILON * x;
  return x;
});

describe("toPrecision matches Number.prototype.toPrecision", () => {
  const cases = [1, 9.995, 9.9949999, 999.5, 999.4999, 1000, 4.7, 120, 122.8, 2.5, 0.5, 1.005, 12.345, 100, 99.95, -4.75, -0, 0, Infinity, NaN, 1e21, 5e-7];
  it.each(cases)("for %d at 1–9 figures", (x) => {
    for (let p = 1; p <= 9; p++) expect(toPrecision(x, p)).toBe(x.toPrecision(p));
  });

  it("for any double and precision 1–15", () => {
    fc.assert(
      fc.property(fc.oneof(anyDouble, benchRange, nearTie), fc.integer({ min: 1, max: 15 }), (x, p) => {
        expect(toPrecision(x, p)).toBe(x.toPrecision(p));
      }),
      { numRuns: 20_000 },
    );
  });
});

describe("round15 matches Number(x.toPrecision(15))", () => {
  it("for sums and products with binary noise", () => {
    for (const x of [12.6 + 12.6 + 12.6 + 50 + 35, 0.1 + 0.2, 4.7e-7 * 1, 470e-9, 1e15 - 0.5, 1e14 + 0.5, 99999999999999.95, 1.0000000000000002]) {
      expect(Object.is(round15(x), Number(x.toPrecision(15)))).toBe(true);
    }
  });

  it("for any double", () => {
    fc.assert(
      fc.property(fc.oneof(anyDouble, benchRange, nearTie, fc.double({ min: 1e-9, max: 1e16, noNaN: true })), (x) => {
        expect(Object.is(round15(x), Number(x.toPrecision(15)))).toBe(true);
      }),
      { numRuns: 50_000 },
    );
  });

  it("tidy keeps its meaning: 15 figures, zero and non-finite values untouched", () => {
    fc.assert(
      fc.property(anyDouble, (x) => {
        const want = Number.isFinite(x) && x !== 0 ? Number(x.toPrecision(15)) : x;
        expect(Object.is(tidy(x), want)).toBe(true);
      }),
      { numRuns: 20_000 },
    );
  });
});
