import { describe, expect, it } from "vitest";
import fc from "fast-check";
import {
  E6,
  E12,
  E24,
  E48,
  E96,
  SERIES,
  SERIES_NAMES,
  nearestPreferred,
  preferredAbove,
  preferredBelow,
  seriesValues,
} from "@/lib/calc/tables/preferred-values";
import { STANDARD_WATTAGES, nextRatingAtLeast, suggestedRating } from "@/lib/calc/tables/wattage";
import {
  DIGIT,
  MULTIPLIER_EXPONENT,
  OLDER_CHARTS,
  TEMPERATURE_COEFFICIENT,
  TOLERANCE,
  TOLERANCE_LETTER,
  digitColour,
  multiplierColour,
  parseColour,
  temperatureCoefficientColour,
  toleranceColour,
} from "@/lib/calc/tables/colour-code";

const has = (set: readonly number[], v: number) => set.some((m) => Math.abs(m - v) < 1e-9);

describe("IEC 60063 series", () => {
  it("E12 is exactly the twelve values of IEC 60063", () => {
    // IEC 60063, table of E12 values (from memory; they are printed on every resistor chart)
    expect([...E12]).toEqual([1.0, 1.2, 1.5, 1.8, 2.2, 2.7, 3.3, 3.9, 4.7, 5.6, 6.8, 8.2]);
  });

  it("E6 and E24 carry the historic values of the standard", () => {
    // IEC 60063: E6 = 1.0 1.5 2.2 3.3 4.7 6.8 (from memory)
    expect([...E6]).toEqual([1.0, 1.5, 2.2, 3.3, 4.7, 6.8]);
    // IEC 60063 E24 keeps 2.7, 3.0, 3.3, 3.6, 3.9, 4.3, 4.7, 8.2 rather than the rounded 10^(k/24) (from memory)
    for (const v of [2.7, 3.0, 3.3, 3.6, 3.9, 4.3, 4.7, 8.2, 9.1]) expect(has(E24, v)).toBe(true);
    expect(has(E24, 3.2)).toBe(false);
  });

  it("each series has n members, ascending, within one decade", () => {
    const counts: Record<string, number> = { E6: 6, E12: 12, E24: 24, E48: 48, E96: 96 };
    for (const name of SERIES_NAMES) {
      const s = SERIES[name];
      expect(s.length).toBe(counts[name]);
      expect(s[0]).toBe(1);
      for (let i = 1; i < s.length; i++) expect(s[i]).toBeGreaterThan(s[i - 1]);
      expect(s[s.length - 1]).toBeLessThan(10);
    }
  });

  it("E24 ⊃ E12 ⊃ E6 and E96 ⊃ E48", () => {
    for (const v of E6) expect(has(E12, v)).toBe(true);
    for (const v of E12) expect(has(E24, v)).toBe(true);
    for (const v of E48) expect(has(E96, v)).toBe(true);
    // E48 is every second E96 value (IEC 60063 table layout)
    expect(E96.filter((_, i) => i % 2 === 0)).toEqual([...E48]);
  });

  it("members lie near 10^(k/n), within the standard's rounding", () => {
    // Historic E6–E24 values stray up to about 5 % from the geometric ideal (3.3 vs 3.16);
    // E48/E96 are the ideal rounded to three figures.
    for (const name of SERIES_NAMES) {
      const s = SERIES[name];
      const slack = s.length <= 24 ? 0.05 : 0.006;
      s.forEach((m, k) => expect(Math.abs(m / 10 ** (k / s.length) - 1)).toBeLessThan(slack));
    }
  });

  it("seriesValues spans whole decades", () => {
    const v = seriesValues("E12", 2, 3);
    expect(v.length).toBe(24);
    expect(v[0]).toBe(100);
    expect(v).toContain(4700);
    expect(v[v.length - 1]).toBe(8200);
  });

  it("below/above return an exact member itself", () => {
    expect(preferredBelow(4700, "E12")).toBe(4700);
    expect(preferredAbove(4700, "E12")).toBe(4700);
    expect(nearestPreferred(4.7e3, "E12")).toBe(4700);
  });

  it("nearest is on a log scale and crosses decades", () => {
    // 5 k: log(5/4.7) = 0.027 < log(5.6/5) = 0.049, so 4.7 k
    expect(nearestPreferred(5000, "E12")).toBe(4700);
    // 5.13 k: linear midpoint of 4.7k–5.6k is 5.15k but the log midpoint is √(4.7·5.6) = 5.130k
    expect(nearestPreferred(5140, "E12")).toBe(5600);
    expect(nearestPreferred(5120, "E12")).toBe(4700);
    expect(nearestPreferred(9.6, "E12")).toBe(10);
    expect(preferredAbove(9.0, "E12")).toBe(10);
    expect(preferredBelow(0.99, "E12")).toBe(0.82);
  });

  it("property: below ≤ value ≤ above, neighbours, nearest is one of them", () => {
    fc.assert(
      fc.property(fc.double({ min: 1e-3, max: 1e9, noNaN: true }), fc.constantFrom(...SERIES_NAMES), (x, s) => {
        const lo = preferredBelow(x, s);
        const hi = preferredAbove(x, s);
        const n = nearestPreferred(x, s);
        expect(lo).toBeLessThanOrEqual(x * (1 + 1e-9));
        expect(hi).toBeGreaterThanOrEqual(x * (1 - 1e-9));
        expect(hi / lo).toBeLessThan(10 ** (2.2 / SERIES[s].length) + 0.06);
        expect([lo, hi]).toContain(n);
      }),
    );
  });

  it("rejects non-positive and non-finite values", () => {
    expect(() => nearestPreferred(0, "E12")).toThrow(RangeError);
    expect(() => preferredBelow(-1, "E12")).toThrow(RangeError);
    expect(() => preferredAbove(Number.POSITIVE_INFINITY, "E12")).toThrow(RangeError);
  });
});

describe("standard wattages", () => {
  it("next rating at least the given watts (maker catalogues, common practice)", () => {
    expect(nextRatingAtLeast(0.1)).toEqual({ inTable: true, watts: 0.125 });
    expect(nextRatingAtLeast(0.25)).toEqual({ inTable: true, watts: 0.25 });
    expect(nextRatingAtLeast(0.26)).toEqual({ inTable: true, watts: 0.5 });
    expect(nextRatingAtLeast(11)).toEqual({ inTable: true, watts: 15 });
    expect(nextRatingAtLeast(0)).toEqual({ inTable: true, watts: 0.125 });
  });

  it("says so beyond the table", () => {
    const r = nextRatingAtLeast(150);
    expect(r.inTable).toBe(false);
    const s = suggestedRating(60);
    expect(s.rating).toBeNull();
    expect(s.warning?.level).toBe("caution");
  });

  it("suggested rating is the next standard rating ≥ 2 × dissipation (common practice)", () => {
    expect(suggestedRating(0.3).rating).toBe(1);
    expect(suggestedRating(0.25).rating).toBe(0.5);
    fc.assert(
      fc.property(fc.double({ min: 0, max: 50, noNaN: true }), (p) => {
        const r = suggestedRating(p).rating as number;
        expect(r).toBeGreaterThanOrEqual(2 * p);
        expect(STANDARD_WATTAGES).toContain(r);
        const idx = STANDARD_WATTAGES.indexOf(r);
        if (idx > 0) expect(STANDARD_WATTAGES[idx - 1]).toBeLessThan(2 * p);
      }),
    );
  });
});

describe("IEC 60062 colour code", () => {
  it("digits black 0 … white 9", () => {
    // IEC 60062, table of colour codes for resistors (from memory)
    expect(DIGIT).toEqual({
      black: 0,
      brown: 1,
      red: 2,
      orange: 3,
      yellow: 4,
      green: 5,
      blue: 6,
      violet: 7,
      grey: 8,
      white: 9,
    });
    expect(digitColour(7)).toBe("violet");
  });

  it("multipliers include gold 0.1, silver 0.01, pink 0.001", () => {
    // IEC 60062: gold ×0.1, silver ×0.01, pink ×0.001 (the last added in the 2016 edition; from memory)
    expect(MULTIPLIER_EXPONENT.gold).toBe(-1);
    expect(MULTIPLIER_EXPONENT.silver).toBe(-2);
    expect(MULTIPLIER_EXPONENT.pink).toBe(-3);
    expect(MULTIPLIER_EXPONENT.white).toBe(9);
    expect(multiplierColour(3)).toBe("orange");
    expect(multiplierColour(10)).toBeNull();
  });

  it("tolerance colours and letters, IEC 60062:2016", () => {
    // IEC 60062:2016 tolerance colours/letters (from memory): brown F 1 %, red G 2 %, orange W 0.05 %,
    // yellow P 0.02 %, green D 0.5 %, blue C 0.25 %, violet B 0.1 %, grey L 0.01 %, gold J 5 %,
    // silver K 10 %, no band M 20 %
    expect(TOLERANCE).toEqual({
      brown: 0.01,
      red: 0.02,
      orange: 0.0005,
      yellow: 0.0002,
      green: 0.005,
      blue: 0.0025,
      violet: 0.001,
      grey: 0.0001,
      gold: 0.05,
      silver: 0.1,
      none: 0.2,
    });
    expect(TOLERANCE_LETTER).toEqual({
      brown: "F",
      red: "G",
      orange: "W",
      yellow: "P",
      green: "D",
      blue: "C",
      violet: "B",
      grey: "L",
      gold: "J",
      silver: "K",
      none: "M",
    });
    expect(toleranceColour(0.05)).toBe("gold");
    expect(toleranceColour(0.0005)).toBe("orange");
    expect(toleranceColour(0.03)).toBeNull();
  });

  it("older charts differ on grey (±0.05 % before 2016)", () => {
    // pre-2016 charts: grey ±0.05 %, orange and yellow no tolerance (common practice)
    expect(OLDER_CHARTS.grey).toMatch(/±0\.05 %/);
    expect(Object.keys(OLDER_CHARTS).sort()).toEqual(["grey", "orange", "yellow"]);
  });

  it("temperature-coefficient band, ppm/K", () => {
    // IEC 60062:2016 §3.4 TCR colours (from memory): black 250, brown 100, red 50, orange 15,
    // yellow 25, green 20, blue 10, violet 5, grey 1
    expect(TEMPERATURE_COEFFICIENT).toEqual({ black: 250, brown: 100, red: 50, orange: 15, yellow: 25, green: 20, blue: 10, violet: 5, grey: 1 });
    expect(temperatureCoefficientColour(50)).toBe("red");
    expect(temperatureCoefficientColour(30)).toBeNull();
  });

  it("reads British and American spellings", () => {
    expect(parseColour("Grey")).toBe("grey");
    expect(parseColour(" gray ")).toBe("grey");
    expect(parseColour("violet")).toBe("violet");
    expect(parseColour("purple")).toBeNull();
  });
});
