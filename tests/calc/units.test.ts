import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { z } from "zod";
import { optionalQuantity, parseQuantity, quantity, quantityWithDefault, tidy, type QuantityKind } from "@/lib/calc/units";

const value = (raw: unknown, kind: QuantityKind) => {
  const r = parseQuantity(raw, kind);
  if (!r.ok) throw new Error(r.message);
  return r.value;
};
const message = (raw: unknown, kind: QuantityKind) => {
  const r = parseQuantity(raw, kind);
  if (r.ok) throw new Error(`expected a failure, got ${r.value}`);
  return r.message;
};

describe("parseQuantity: engineering prefixes", () => {
  it("reads SI numbers unchanged", () => {
    expect(value(250, "voltage")).toBe(250);
    expect(value(-12.5, "voltage")).toBe(-12.5);
    expect(value(0, "current")).toBe(0);
  });

  it("reads bare prefixes", () => {
    expect(value("4.7k", "resistance")).toBe(4700);
    expect(value("470n", "capacitance")).toBe(470e-9);
    expect(value("100p", "capacitance")).toBe(100e-12);
    expect(value("0.033u", "capacitance")).toBe(33e-9);
    expect(value("47µ", "capacitance")).toBe(47e-6);
    expect(value("1.5m", "current")).toBe(1.5e-3);
    expect(value("2.2M", "resistance")).toBe(2.2e6);
    expect(value("1meg", "resistance")).toBe(1e6);
    expect(value("1e3", "resistance")).toBe(1000);
  });

  it("keeps milli and mega apart (m vs M)", () => {
    expect(value("1m", "resistance")).toBe(1e-3);
    expect(value("1M", "resistance")).toBe(1e6);
  });

  it("reads the IEC 60062 RKM code", () => {
    // IEC 60062 letter-and-digit code: the letter stands for the decimal point and the multiplier (from memory)
    expect(value("4k7", "resistance")).toBe(4700);
    expect(value("2R2", "resistance")).toBe(2.2);
    expect(value("1M5", "resistance")).toBe(1.5e6);
    expect(value("4n7", "capacitance")).toBe(4.7e-9);
  });

  it("reads values with units", () => {
    expect(value("2.2 MΩ", "resistance")).toBe(2.2e6);
    expect(value("4.7 kohm", "resistance")).toBe(4700);
    expect(value("47 uF", "capacitance")).toBe(47e-6);
    expect(value("47 µF", "capacitance")).toBe(47e-6);
    expect(value("250 V", "voltage")).toBe(250);
    expect(value("10 mH", "inductance")).toBe(10e-3);
    expect(value("1 kHz", "frequency")).toBe(1000);
    expect(value("45 mA", "current")).toBe(0.045);
    expect(value("2 W", "power")).toBe(2);
  });

  it("tidies binary noise from prefix scaling", () => {
    expect(value("470n", "capacitance")).toBe(4.7e-7);
    expect(tidy(0.1 + 0.2)).toBe(0.3);
    expect(tidy(0)).toBe(0);
  });
});

describe("parseQuantity: refusals", () => {
  it("names the wrong unit", () => {
    expect(message("5 V", "capacitance")).toBe("expected a capacitance, got volts");
    expect(message("47 uF", "resistance")).toBe("expected a resistance, got farads");
    expect(message("3 A", "voltage")).toBe("expected a voltage, got amperes");
  });

  it("rejects NaN, Infinity and empty input", () => {
    expect(message(Number.NaN, "voltage")).toMatch(/finite/);
    expect(message(Number.POSITIVE_INFINITY, "voltage")).toMatch(/finite/);
    expect(message(Number.NEGATIVE_INFINITY, "voltage")).toMatch(/finite/);
    expect(message("1e400", "voltage")).toMatch(/finite/);
    expect(parseQuantity("Infinity", "voltage").ok).toBe(false);
    expect(parseQuantity("NaN", "voltage").ok).toBe(false);
    expect(message("", "voltage")).toBe("is required");
    expect(message("   ", "voltage")).toBe("is required");
  });

  it("rejects text that is not a quantity, and other types", () => {
    expect(parseQuantity("abc", "voltage").ok).toBe(false);
    expect(parseQuantity("12 bananas", "voltage").ok).toBe(false);
    expect(parseQuantity(true, "voltage").ok).toBe(false);
    expect(parseQuantity({}, "voltage").ok).toBe(false);
    expect(parseQuantity(null, "voltage").ok).toBe(false);
  });

  it("plain numbers only for ratios", () => {
    expect(value("0.2", "ratio")).toBe(0.2);
    expect(parseQuantity("4k", "ratio").ok).toBe(false);
    expect(parseQuantity("5 V", "ratio").ok).toBe(false);
  });

  it("property: never throws, and any success is finite", () => {
    fc.assert(
      fc.property(fc.oneof(fc.string(), fc.double(), fc.constant(undefined), fc.constant(null)), (raw) => {
        const r = parseQuantity(raw, "resistance");
        if (r.ok) expect(Number.isFinite(r.value)).toBe(true);
      }),
    );
  });

  it("property: a number written with a k prefix reads as 1000 times it", () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 999_999 }), (n) => {
        expect(value(`${n}k`, "resistance")).toBeCloseTo(n * 1000, 6);
      }),
    );
  });
});

describe("quantity schemas", () => {
  const schema = z.object({
    plateCurrent: quantity("current", { positive: true, label: "Plate current" }),
    screenCurrent: quantityWithDefault("current", 0, { nonNegative: true, label: "Screen current" }).prefault(""),
    bypass: optionalQuantity("capacitance", { positive: true, label: "Bypass" }).optional(),
  });

  it("gives SI numbers", () => {
    const r = schema.safeParse({ plateCurrent: "45 mA", screenCurrent: "4.5m", bypass: "25 uF" });
    expect(r.success && r.data).toEqual({ plateCurrent: 0.045, screenCurrent: 0.0045, bypass: 25e-6 });
  });

  it("uses the default for blank or absent, undefined for an optional blank", () => {
    const r = schema.safeParse({ plateCurrent: 1e-3, screenCurrent: "" });
    expect(r.success && r.data.screenCurrent).toBe(0);
    expect(r.success && r.data.bypass).toBeUndefined();
    const absent = schema.safeParse({ plateCurrent: 1e-3 });
    expect(absent.success && absent.data.screenCurrent).toBe(0);
  });

  it("messages name the field and the problem", () => {
    const r = schema.safeParse({ plateCurrent: "", screenCurrent: -1, bypass: "5 V" });
    expect(r.success).toBe(false);
    const byPath = Object.fromEntries((r.error?.issues ?? []).map((i) => [i.path.join("."), i.message]));
    expect(byPath.plateCurrent).toBe("Plate current is required");
    expect(byPath.screenCurrent).toBe("Screen current cannot be negative");
    expect(byPath.bypass).toBe("Bypass expected a capacitance, got volts");
  });

  it("range checks: positive, min and max", () => {
    const s = quantity("voltage", { positive: true, min: 1, max: 100, label: "Supply" });
    expect(s.safeParse(0).error?.issues[0].message).toBe("Supply must be greater than zero");
    expect(s.safeParse(0.5).error?.issues[0].message).toBe("Supply must be at least 1");
    expect(s.safeParse("1 kV").error?.issues[0].message).toBe("Supply must be at most 100");
    expect(s.safeParse("50 V").data).toBe(50);
  });

  it("rejects NaN and Infinity through the schema too", () => {
    const s = quantity("voltage", { positive: true, label: "Supply" });
    expect(s.safeParse(Number.NaN).success).toBe(false);
    expect(s.safeParse(Number.POSITIVE_INFINITY).success).toBe(false);
  });
});

describe("parseQuantity: the fast path for a kind's own unit agrees with mathjs", () => {
  // "250 kV" takes the fast path; "250 kilovolt" (mathjs's long names) always goes through mathjs.
  const kinds: [QuantityKind, string, string][] = [
    ["voltage", "V", "volt"],
    ["current", "A", "ampere"],
    ["resistance", "Ω", "ohm"],
    ["capacitance", "F", "farad"],
    ["inductance", "H", "henry"],
    ["frequency", "Hz", "hertz"],
    ["time", "s", "second"],
    ["length", "m", "meter"],
    ["power", "W", "watt"],
    ["conductance", "S", "siemens"],
  ];
  const prefixes: [string, string][] = [["", ""], ["p", "pico"], ["n", "nano"], ["u", "micro"], ["µ", "micro"], ["m", "milli"], ["k", "kilo"], ["M", "mega"], ["G", "giga"]];

  it("property: same SI value either way", () => {
    fc.assert(
      fc.property(
        fc.constantFrom(...kinds),
        fc.constantFrom(...prefixes),
        fc.double({ min: 1e-3, max: 1e4, noNaN: true }),
        fc.boolean(),
        ([kind, symbol, long], [p, longP], x, space) => {
          const n = Number(x.toPrecision(4));
          const fast = value(`${n}${space ? " " : ""}${p}${symbol}`, kind);
          const slow = value(`${n} ${longP}${long}`, kind);
          expect(Math.abs(fast / slow - 1)).toBeLessThan(1e-12);
        },
      ),
      { numRuns: 300 },
    );
  });

  it("wrong units and other spellings: mathjs's answers and messages", () => {
    expect(message("47 uF", "voltage")).toBe("expected a voltage, got farads");
    expect(message("250 V", "resistance")).toBe("expected a resistance, got volts");
    expect(value("101.3 kPa", "pressure")).toBeCloseTo(101300, 6);
    expect(value("1 bar", "pressure")).toBeCloseTo(1e5, 6);
    expect(value("5 mm", "length")).toBeCloseTo(0.005, 12);
    expect(value("20 degC", "temperature")).toBeCloseTo(293.15, 9);
    expect(value("2.2 Mohm", "resistance")).toBe(2.2e6);
    expect(value("4.7 kOhms", "resistance")).toBe(4700);
  });
});

describe("parseQuantity: metres", () => {
  it("a lone m after a length is the metre, mm is millimetres", () => {
    expect(value("0.005 m", "length")).toBe(0.005);
    expect(value("2m", "length")).toBe(2);
    expect(value("5 mm", "length")).toBe(0.005);
    expect(value("5m", "current")).toBe(0.005); // elsewhere m is still milli
  });
});
