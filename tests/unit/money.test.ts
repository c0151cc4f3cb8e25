import fc from "fast-check";
import { describe, expect, test } from "vitest";
import {
  computeTotals,
  divideRoundHalfAwayFromZero,
  formatMoney,
  formatQuantity,
  formatTaxRate,
  lineAmountMinor,
  minorExponent,
  parseMoney,
  parseQuantityMilli,
  taxMinor,
  toDecimalString,
} from "@/lib/money";

describe("minor units per ISO 4217", () => {
  test.each([
    ["GBP", 2],
    ["EUR", 2],
    ["USD", 2],
    ["JPY", 0],
    ["KWD", 3],
  ])("%s has %i decimals", (code, exponent) => {
    expect(minorExponent(code)).toBe(exponent);
  });

  test("decimal strings are exact", () => {
    expect(toDecimalString(12345, 2)).toBe("123.45");
    expect(toDecimalString(5, 2)).toBe("0.05");
    expect(toDecimalString(-5, 3)).toBe("-0.005");
    expect(toDecimalString(700, 0)).toBe("700");
  });

  test("formatting goes through Intl with the currency's own decimals", () => {
    expect(formatMoney(123450, "GBP")).toBe("£1,234.50");
    expect(formatMoney(1500, "JPY", "en-GB")).toBe("JP¥1,500");
    expect(formatMoney(1234, "KWD", "en-GB")).toMatch(/1\.234$/);
  });

  test("typed amounts parse exactly, and too many decimals are refused", () => {
    expect(parseMoney("12.5", "GBP")).toBe(1250);
    expect(parseMoney("1,250.00", "GBP")).toBe(125000);
    expect(parseMoney("0.1", "GBP")).toBe(10); // 0.1 is not exact in binary floating point; we never go through it
    expect(parseMoney("12.345", "GBP")).toBeNull();
    expect(parseMoney("1500", "JPY")).toBe(1500);
    expect(parseMoney("15.5", "JPY")).toBeNull();
    expect(parseMoney("-3", "GBP")).toBeNull();
    expect(parseMoney("abc", "GBP")).toBeNull();
  });

  test("quantities are thousandths", () => {
    expect(parseQuantityMilli("1.5")).toBe(1500);
    expect(parseQuantityMilli("0.25")).toBe(250);
    expect(parseQuantityMilli("3")).toBe(3000);
    expect(parseQuantityMilli("0.0005")).toBeNull();
    expect(formatQuantity(1500)).toBe("1.5");
    expect(formatQuantity(3000)).toBe("3");
    expect(formatQuantity(250)).toBe("0.25");
  });
});

describe("rounding: half away from zero, once per line", () => {
  test("the divide rounds halves away from zero in both directions", () => {
    expect(divideRoundHalfAwayFromZero(15n, 10n)).toBe(2n); // 1.5 → 2
    expect(divideRoundHalfAwayFromZero(25n, 10n)).toBe(3n); // 2.5 → 3 (not banker's 2)
    expect(divideRoundHalfAwayFromZero(14n, 10n)).toBe(1n);
    expect(divideRoundHalfAwayFromZero(-15n, 10n)).toBe(-2n);
    expect(divideRoundHalfAwayFromZero(-14n, 10n)).toBe(-1n);
  });

  test("labour: 1.25 h at £45.00/h", () => {
    // 1250 × 4500 / 1000 = 5625 exactly → £56.25
    expect(lineAmountMinor({ quantityMilli: 1250, unitPriceMinor: 4500 })).toBe(5625);
  });

  test("labour: 0.333 h at £45.00/h rounds down", () => {
    // 333 × 4500 / 1000 = 1498.5 → half away from zero → 1499 (£14.99)
    expect(lineAmountMinor({ quantityMilli: 333, unitPriceMinor: 4500 })).toBe(1499);
  });

  test("a part: 3 × £0.85", () => {
    // 3000 × 85 / 1000 = 255 → £2.55
    expect(lineAmountMinor({ quantityMilli: 3000, unitPriceMinor: 85 })).toBe(255);
  });

  test("a half-penny line rounds up, not to even", () => {
    // 1500 × 3 / 1000 = 4.5 → 5 (banker's rounding would give 4)
    expect(lineAmountMinor({ quantityMilli: 1500, unitPriceMinor: 3 })).toBe(5);
    // 500 × 5 / 1000 = 2.5 → 3
    expect(lineAmountMinor({ quantityMilli: 500, unitPriceMinor: 5 })).toBe(3);
  });
});

describe("totals with tax on the subtotal", () => {
  test("the demo radio: labour, two paper caps, one can, a diagnosis fee, 20% tax", () => {
    // labour 2.5 h × £45.00   = 2500 × 4500 / 1000 = 11250
    // C1, C2: 2 × £0.85       = 2000 × 85 / 1000   =   170
    // C5a: 1 × £2.40          = 1000 × 240 / 1000  =   240
    // bench diagnosis fee     = 1000 × 2500 / 1000 =  2500
    // subtotal                = 11250 + 170 + 240 + 2500 = 14160 (£141.60)
    // tax 20% = 14160 × 2000 / 10000 = 2832 exactly (£28.32)
    // total = 14160 + 2832 = 16992 (£169.92)
    const t = computeTotals(
      [
        { quantityMilli: 2500, unitPriceMinor: 4500 },
        { quantityMilli: 2000, unitPriceMinor: 85 },
        { quantityMilli: 1000, unitPriceMinor: 240 },
        { quantityMilli: 1000, unitPriceMinor: 2500 },
      ],
      2000,
    );
    expect(t).toEqual({ lines: [11250, 170, 240, 2500], subtotalMinor: 14160, taxMinor: 2832, totalMinor: 16992 });
  });

  test("rounding happens per line, then once on the tax", () => {
    // line 1: 333 × 4500 / 1000 = 1498.5 → 1499
    // line 2: 333 × 4500 / 1000 = 1498.5 → 1499
    // subtotal 2998 (rounding the sum instead would give 2997: 666 × 4500 / 1000 = 2997)
    // tax 17.5% = 2998 × 1750 / 10000 = 524.65 → 525
    // total 2998 + 525 = 3523
    const t = computeTotals(
      [
        { quantityMilli: 333, unitPriceMinor: 4500 },
        { quantityMilli: 333, unitPriceMinor: 4500 },
      ],
      1750,
    );
    expect(t).toEqual({ lines: [1499, 1499], subtotalMinor: 2998, taxMinor: 525, totalMinor: 3523 });
  });

  test("tax at exactly half a minor unit rounds up", () => {
    // 1 × £0.25 at 10%: 25 × 1000 / 10000 = 2.5 → 3
    expect(taxMinor(25, 1000)).toBe(3);
    // 1 × £0.24 at 10%: 2.4 → 2
    expect(taxMinor(24, 1000)).toBe(2);
  });

  test("yen have no minor unit: ¥1,500/h for 1.5 h, 10% tax", () => {
    // 1500 × 1500 / 1000 = 2250; tax 2250 × 1000 / 10000 = 225; total 2475 (¥2,475)
    const t = computeTotals([{ quantityMilli: 1500, unitPriceMinor: 1500 }], 1000);
    expect(t.totalMinor).toBe(2475);
    expect(formatMoney(t.totalMinor, "JPY")).toBe("JP¥2,475");
  });

  test("no lines, no tax rate", () => {
    expect(computeTotals([], 2000)).toEqual({ lines: [], subtotalMinor: 0, taxMinor: 0, totalMinor: 0 });
    expect(computeTotals([{ quantityMilli: 1000, unitPriceMinor: 999 }], 0).totalMinor).toBe(999);
  });

  test("tax rates read as percentages", () => {
    expect(formatTaxRate(2000)).toBe("20%");
    expect(formatTaxRate(1750)).toBe("17.5%");
    expect(formatTaxRate(0)).toBe("0%");
  });

  test("non-integer input is refused rather than rounded silently", () => {
    expect(() => lineAmountMinor({ quantityMilli: 1.5, unitPriceMinor: 100 })).toThrow(RangeError);
    expect(() => taxMinor(100, 12.5)).toThrow(RangeError);
  });

  test("properties: per-line rounding error is at most half a minor unit, totals add up", () => {
    fc.assert(
      fc.property(
        fc.array(fc.record({ quantityMilli: fc.integer({ min: 1, max: 1_000_000 }), unitPriceMinor: fc.integer({ min: 0, max: 10_000_000 }) }), {
          maxLength: 20,
        }),
        fc.integer({ min: 0, max: 5000 }),
        (lines, bp) => {
          const t = computeTotals(lines, bp);
          lines.forEach((l, i) => {
            const exact = (l.quantityMilli * l.unitPriceMinor) / 1000;
            expect(Math.abs(t.lines[i] - exact)).toBeLessThanOrEqual(0.5 + 1e-6);
          });
          expect(t.subtotalMinor).toBe(t.lines.reduce((a, b) => a + b, 0));
          expect(t.totalMinor).toBe(t.subtotalMinor + t.taxMinor);
          expect(Math.abs(t.taxMinor - (t.subtotalMinor * bp) / 10000)).toBeLessThanOrEqual(0.5 + 1e-6);
        },
      ),
    );
  });
});
