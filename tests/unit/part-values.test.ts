import { describe, expect, test } from "vitest";
import { partFlags, sortParts } from "@/lib/jobs/part-flags";
import { ratingWatts, readPartSide, readPartValues, splitValueAndRating } from "@/lib/jobs/part-values";

// Capacitor markings as the trade writes them (docs/PRODUCT.md "Vintage markings"): mfd = microfarads,
// mmf = picofarads; a bare number in a capacitance text is never read as farads.
const close = (actual: number | null, expected: number) => {
  expect(actual).not.toBeNull();
  expect(Math.abs((actual as number) / expected - 1)).toBeLessThan(1e-12);
};

describe("reading a part's value and rating", () => {
  test('"47 uF 450 V" in one field: 47 µF and 450 V', () => {
    expect(splitValueAndRating("47 uF 450 V", "electrolytic")).toEqual({ value: "47 uF", rating: "450 V" });
    const side = readPartSide("electrolytic", "47 uF 450 V", null);
    close(side.value, 47e-6);
    expect(side.rating).toBe(450);
  });

  test('"0.047 mfd 600 V": the vintage microfarad, 47 nF at 600 V', () => {
    const side = readPartSide("paper", "0.047 mfd 600 V", "");
    close(side.value, 47e-9);
    expect(side.rating).toBe(600);
  });

  test("other ways of writing them: no space, a slash, WVDC, a decimal comma, picofarads", () => {
    const a = readPartSide("electrolytic", "47uF/450V", null);
    close(a.value, 47e-6);
    expect(a.rating).toBe(450);
    expect(readPartSide("electrolytic", "20 mfd", "450 WVDC").rating).toBe(450);
    close(readPartSide("film", "0,1 µF", "630 V").value, 1e-7);
    close(readPartSide("mica", "100 mmf", "500 V").value, 100e-12);
  });

  test("the rating field wins over a rating written in the value", () => {
    expect(readPartSide("electrolytic", "47 uF 350 V", "450 V").rating).toBe(450);
  });

  test("a bare number is not read as farads, and nonsense is not read at all", () => {
    expect(readPartSide("paper", "47", null).value).toBeNull();
    expect(readPartSide("paper", "leaky wax job", "who knows").value).toBeNull();
    expect(readPartSide("paper", "leaky wax job", "who knows").rating).toBeNull();
  });

  test("resistors: ohms by prefix or RKM code, watts including the trade's fractions", () => {
    const r = readPartSide("resistor", "2.2 MΩ 0.5 W", null);
    close(r.value, 2.2e6);
    expect(r.rating).toBe(0.5);
    close(readPartSide("resistor", "4k7", "1/2 W").value, 4700);
    expect(ratingWatts("1/2 W")).toBe(0.5);
    expect(ratingWatts("2W")).toBe(2);
    expect(ratingWatts("1 watt")).toBe(1);
    expect(ratingWatts("3")).toBe(3);
    expect(ratingWatts("0/2 W")).toBeNull();
  });

  test("tubes and other parts carry no number", () => {
    expect(readPartValues({ kind: "tube", originalValue: "6V6GT", originalRating: null, replacementValue: "6V6GT", replacementRating: null })).toEqual({
      originalValueSi: null,
      originalRatingSi: null,
      replacementValueSi: null,
      replacementRatingSi: null,
    });
  });
});

const part = (
  designator: string,
  kind: "paper" | "electrolytic" | "resistor" | "tube",
  texts: [string | null, string | null, string | null, string | null],
  extra = {},
) => {
  const [originalValue, originalRating, replacementValue, replacementRating] = texts;
  return {
    designator,
    kind,
    originalValue,
    originalRating,
    replacementValue,
    replacementRating,
    state: "to-order" as const,
    supplier: null as string | null,
    ...readPartValues({ kind, originalValue, originalRating, replacementValue, replacementRating }),
    ...extra,
  };
};

describe("flags and sorting on the Parts tab", () => {
  test("text that cannot be read is flagged; readable text is not", () => {
    expect(partFlags(part("C1", "paper", ["0.05 µF", "400 V", "0.047 µF", "630 V"]))).toEqual([]);
    const flags = partFlags(part("C2", "paper", ["0.05", "400 V", "0.047 µF", "630 V"]));
    expect(flags).toHaveLength(1);
    expect(flags[0].message).toMatch(/Original value “0.05” could not be read as a capacitance/);
  });

  test("a resistor rated below the one it replaces is a caution; equal or above is not", () => {
    expect(partFlags(part("R7", "resistor", ["2.2 MΩ", "1 W", "2.2 MΩ", "1/2 W"]))[0]).toMatchObject({
      level: "caution",
      message: expect.stringMatching(/0.5 W, below the original 1 W/),
    });
    expect(partFlags(part("R7", "resistor", ["2.2 MΩ", "1/2 W", "2.2 MΩ", "0.5 W"]))).toEqual([]);
  });

  test("a replacement value twice or half the original is pointed out (a slipped decimal point)", () => {
    expect(partFlags(part("C3", "paper", ["0.01 µF", "400 V", "0.1 µF", "630 V"]))[0].message).toMatch(/100 nF is far from the original 10 nF/);
    // 50 µF replaced by 47 µF and 0.05 by 0.047 are ordinary preferred-value steps.
    expect(partFlags(part("C5", "electrolytic", ["50 mfd", "150 V", "47 µF", "250 V"]))).toEqual([]);
  });

  test("by value: capacitors small to large, then resistors, unreadable last; C2 before C10 on ties", () => {
    const list = [
      part("R7", "resistor", ["2.2 MΩ", null, null, null]),
      part("C10", "electrolytic", ["50 mfd", null, "47 µF", null]),
      part("C2", "paper", ["0.02 mfd", null, null, null]),
      part("C9", "paper", ["unmarked", null, null, null]),
      part("V1", "tube", ["6V6", null, null, null]),
      part("C1", "paper", ["0.05 mfd", null, "0.047 uF", null]),
    ];
    expect(sortParts(list, "value").map((p) => p.designator)).toEqual(["C2", "C1", "C10", "C9", "R7", "V1"]);
    expect(sortParts(list, "ref").map((p) => p.designator)).toEqual(["C1", "C2", "C9", "C10", "R7", "V1"]);
  });
});
