import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { formatQuantity, texQuantity, toEngineering } from "@/lib/calc/format";
import { parseQuantity } from "@/lib/calc/units";

describe("formatQuantity", () => {
  it("uses engineering prefixes", () => {
    expect(formatQuantity(4700, "Ω")).toBe("4.7 kΩ");
    expect(formatQuantity(0.00125, "A")).toBe("1.25 mA");
    expect(formatQuantity(2.2e6, "Ω")).toBe("2.2 MΩ");
    expect(formatQuantity(47e-6, "F")).toBe("47 µF");
    expect(formatQuantity(100e-12, "F")).toBe("100 pF");
    expect(formatQuantity(4.7e-9, "F")).toBe("4.7 nF");
  });

  it("shows power ratings from 0.1 W to 1 W in watts, smaller powers in milliwatts", () => {
    // Resistor ratings are catalogued as 1/8, 1/4, 1/2 W (common practice), so "0.5 W" reads as the part.
    expect(formatQuantity(0.5, "W")).toBe("0.5 W");
    expect(formatQuantity(0.125, "W")).toBe("0.125 W");
    expect(formatQuantity(0.1, "W")).toBe("0.1 W");
    expect(formatQuantity(0.0999, "W")).toBe("99.9 mW");
    expect(formatQuantity(1, "W")).toBe("1 W");
    expect(formatQuantity(2500, "W")).toBe("2.5 kW");
    expect(texQuantity(0.25, "W")).toBe(String.raw`0.25\,\mathrm{W}`);
    expect(formatQuantity(0.5, "V")).toBe("500 mV"); // only watts are shown this way
  });

  it("rounds to significant figures and moves up a prefix at 1000", () => {
    expect(formatQuantity(252.525, "Ω")).toBe("253 Ω");
    expect(formatQuantity(999.4, "Ω")).toBe("999 Ω");
    expect(formatQuantity(999.96, "Ω")).toBe("1 kΩ");
    expect(formatQuantity(1666.67, "Ω", 4)).toBe("1.667 kΩ");
  });

  it("handles zero, negatives and units that take no prefix", () => {
    expect(formatQuantity(0, "V")).toBe("0 V");
    expect(formatQuantity(-12.5, "V")).toBe("-12.5 V");
    expect(formatQuantity(293.15, "K")).toBe("293 K");
    expect(formatQuantity(0.2, "")).toBe("0.2");
  });

  it("property: the text reads back (through the unit parser) within the rounding", () => {
    fc.assert(
      fc.property(fc.double({ min: -9, max: 11, noNaN: true }), (e) => {
        const v = 10 ** e;
        const text = formatQuantity(v, "Ω", 6).replace("µ", "u");
        const back = parseQuantity(text, "resistance");
        expect(back.ok).toBe(true);
        if (back.ok) expect(Math.abs(back.value / v - 1)).toBeLessThan(1e-5);
      }),
    );
  });
});

describe("texQuantity", () => {
  it("writes LaTeX with the prefix inside \\mathrm", () => {
    expect(texQuantity(4700, "Ω")).toBe(String.raw`4.7\,\mathrm{k\Omega}`);
    expect(texQuantity(25e-6, "F")).toBe(String.raw`25\,\mathrm{\mu F}`);
    expect(texQuantity(250, "V")).toBe(String.raw`250\,\mathrm{V}`);
    expect(texQuantity(0.5, "")).toBe("0.5");
    expect(texQuantity(50, "%")).toBe(String.raw`50\,\mathrm{\%}`);
  });
});

describe("toEngineering", () => {
  it("splits mantissa and prefix", () => {
    expect(toEngineering(4700, "Ω")).toEqual({ mantissa: "4.7", prefix: "k", texPrefix: "k" });
    expect(toEngineering(Number.POSITIVE_INFINITY, "Ω").mantissa).toBe("Infinity");
  });

  it("property: mantissa lies in [1, 1000) for values within the prefix range", () => {
    fc.assert(
      fc.property(fc.double({ min: -12, max: 11.9, noNaN: true }), (e) => {
        const m = Math.abs(Number(toEngineering(10 ** e, "V").mantissa));
        expect(m).toBeGreaterThanOrEqual(1);
        expect(m).toBeLessThan(1000);
      }),
    );
  });
});
