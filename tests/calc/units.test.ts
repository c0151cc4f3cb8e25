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
  const prefixes: [string, string][] = [
    ["", ""],
    ["p", "pico"],
    ["n", "nano"],
    ["u", "micro"],
    ["µ", "micro"],
    ["m", "milli"],
    ["k", "kilo"],
    ["M", "mega"],
    ["G", "giga"],
  ];

  it("property: same SI value either way", () => {
    fc.assert(
      fc.property(
        fc.constantFrom(...kinds),
        fc.constantFrom(...prefixes),
        fc.double({ min: 1e-3, max: 1e4, noNaN: true }),
        fc.boolean(),
        ([kind, symbol, long], [p, longP], x, space) => {
          // "mF" and "MF" on a capacitor are the trade's microfarads, not milli- or megafarads: tested below.
          fc.pre(!(kind === "capacitance" && (p === "m" || p === "M")));
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

describe("parseQuantity: capacitor markings as the trade writes them", () => {
  // docs/PRODUCT.md "Vintage markings"; before SI a capacitor's "m" meant micro, so mfd/mf/MF are microfarads
  // and mmf/mmfd/µµF ("micro-micro-farads") are picofarads (common practice; period parts lists and cans).
  it("mfd, mf, MF, MFD, Mfd, uf, UF, uF, µF are microfarads", () => {
    for (const u of ["mfd", "mf", "MF", "MFD", "Mfd", "uf", "UF", "uF", "µF", "μF", "ufd"]) {
      expect(value(`8 ${u}`, "capacitance"), u).toBe(8e-6);
      expect(value(`0.047${u}`, "capacitance"), u).toBe(47e-9);
    }
  });

  it("mmf, mmfd, MMF, µµF, uuF are picofarads; so are pf and PF", () => {
    for (const u of ["mmf", "mmfd", "MMF", "MMFD", "µµF", "μμF", "uuF", "uuf", "pf", "PF", "pF"]) {
      expect(value(`100 ${u}`, "capacitance"), u).toBe(100e-12);
    }
    expect(value("250 MMFD", "capacitance")).toBe(250e-12);
    expect(value("4.7 nf", "capacitance")).toBe(4.7e-9);
  });

  it("mF (and a lone m) is refused as ambiguous, naming both readings", () => {
    expect(message("47 mF", "capacitance")).toMatch(/ambiguous.*47 uF.*47000 uF/);
    expect(message("4.7m", "capacitance")).toMatch(/ambiguous.*4\.7 uF.*4700 uF/);
    expect(message("4m7", "capacitance")).toMatch(/ambiguous/);
    // elsewhere m is still milli, and long names are unambiguous
    expect(value("47 mA", "current")).toBe(0.047);
    expect(value("47 millifarad", "capacitance")).toBeCloseTo(0.047, 15);
  });

  it("a bare number in a capacitance text field is never read as farads", () => {
    expect(message("47", "capacitance")).toBe('needs a unit: a bare "47" is not read as farads. Give one, e.g. 47 uF, 47 mfd or 47 pF');
    expect(message("0.000047", "capacitance")).toMatch(/needs a unit/);
    expect(message("4.7e-5", "capacitance")).toMatch(/needs a unit/);
    expect(message("2R2", "capacitance")).toMatch(/needs a unit.*2\.2 uF/);
    // a JSON number stays SI (docs/PRODUCT.md), and a prefix alone is a multiplier, as before
    expect(value(4.7e-5, "capacitance")).toBe(4.7e-5);
    expect(value("47u", "capacitance")).toBe(47e-6);
    expect(value("1 F", "capacitance")).toBe(1);
    // other kinds keep their bare numbers in SI
    expect(value("47", "resistance")).toBe(47);
    expect(value("350", "voltage")).toBe(350);
  });

  it("the schema names the field that asks for a unit", () => {
    const s = quantity("capacitance", { positive: true, label: "Reservoir capacitance" });
    expect(s.safeParse("47").error?.issues[0].message).toMatch(/^Reservoir capacitance needs a unit: .*e\.g\. 47 uF/);
    expect(s.safeParse("0,047 mfd").data).toBe(47e-9);
  });
});

describe("parseQuantity: a decimal comma", () => {
  it("reads 4,7 uF, 0,047 mfd, 4,7k and -1,5 kV", () => {
    expect(value("4,7 uF", "capacitance")).toBe(4.7e-6);
    expect(value("0,047 mfd", "capacitance")).toBe(47e-9);
    expect(value("4,7k", "resistance")).toBe(4700);
    expect(value("2,2 MΩ", "resistance")).toBe(2.2e6);
    expect(value("-1,5 kV", "voltage")).toBe(-1500);
    expect(value("0,2", "ratio")).toBe(0.2);
    expect(value(",5 V", "voltage")).toBe(0.5);
  });

  it("a comma before three digits could group thousands: refused, naming both readings", () => {
    expect(message("2,200 uF", "capacitance")).toMatch(/two ways, 2\.2 or 2200/);
    expect(message("1,000", "resistance")).toMatch(/two ways, 1 or 1000/);
    expect(message("1,000,000", "resistance")).toMatch(/without thousands separators/);
    expect(message("4,7.1 V", "voltage")).toMatch(/could not read/);
  });

  it("property: a decimal comma reads as the same value as a point", () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 9999 }), fc.integer({ min: 0, max: 999 }), fc.constantFrom("", "k", " V", " uF", " mfd"), (whole, frac, unit) => {
        const digits = String(frac).length === 3 ? `${frac}5` : String(frac); // never exactly three digits
        const kind: QuantityKind = unit.includes("F") || unit.includes("f") ? "capacitance" : unit.includes("V") ? "voltage" : "resistance";
        expect(value(`${whole},${digits}${unit}`, kind)).toBe(value(`${whole}.${digits}${unit}`, kind));
      }),
    );
  });
});

describe("quantity schemas: magnitudes no bench quantity has are refused", () => {
  const nominal = quantity("resistance", { positive: true, label: "Nominal resistance" });

  it("a 1e-300 Ω nominal is refused with a message, never reaching the working", () => {
    expect(nominal.safeParse(1e-300).error?.issues[0].message).toBe(
      "Nominal resistance is below 1 µΩ, too small for a resistance on the bench: check the prefix and unit",
    );
    expect(nominal.safeParse("1e300").error?.issues[0].message).toMatch(/above 1 PΩ/);
    expect(nominal.safeParse("100k").data).toBe(1e5);
  });

  it("each kind's limits, from both sides, for a field that refuses zero", () => {
    const cases: [QuantityKind, number, number][] = [
      ["voltage", 1e-9, 1e7],
      ["capacitance", 1e-14, 10],
      ["resistance", 1e-6, 1e15],
      ["current", 1e-15, 1e5],
      ["time", 1e-12, 1e9],
    ];
    for (const [kind, lo, hi] of cases) {
      const s = quantity(kind, { positive: true, label: "X" });
      expect(s.safeParse(lo).success, `${kind} ${lo}`).toBe(true);
      expect(s.safeParse(hi).success, `${kind} ${hi}`).toBe(true);
      expect(s.safeParse(lo / 10).error?.issues[0].message, kind).toMatch(/^X is below .* check the prefix/);
      expect(s.safeParse(hi * 10).error?.issues[0].message, kind).toMatch(/^X is above .* check the prefix/);
      const signed = quantity(kind, { label: "X" });
      expect(signed.safeParse(-hi * 10).error?.issues[0].message, kind).toMatch(/above .* in size/);
      expect(signed.safeParse(-lo * 10).data, kind).toBe(-lo * 10);
    }
    expect(quantity("capacitance", { label: "C" }).safeParse("47 MF").data).toBe(47e-6);
    expect(quantity("capacitance", { label: "C" }).safeParse("47 kF").error?.issues[0].message).toMatch(/above 10 F/);
    expect(quantity("voltage", { label: "V" }).safeParse("20 MV").error?.issues[0].message).toMatch(/above 10 MV/);
  });

  it("where zero is a valid entry, a value next to it is too; the upper limit still holds", () => {
    const screen = quantityWithDefault("current", 0, { nonNegative: true, label: "Screen current" });
    expect(screen.safeParse(1e-300).data).toBe(1e-300);
    expect(screen.safeParse(0).data).toBe(0);
    expect(screen.safeParse("1 MA").error?.issues[0].message).toMatch(/^Screen current is above 100 kA/);
    const atLeast = quantity("current", { min: 1e-9, label: "Plate current" });
    expect(atLeast.safeParse(1e-300).error?.issues[0].message).toMatch(/below 1 fA/);
  });

  it("the sign rules of a field come first", () => {
    expect(nominal.safeParse(-1e-300).error?.issues[0].message).toBe("Nominal resistance must be greater than zero");
  });

  it("property: whatever a schema accepts is finite and, unless zero, within the kind's limits", () => {
    const s = optionalQuantity("capacitance", { positive: true });
    fc.assert(
      fc.property(
        fc.oneof(
          fc.double(),
          fc.string(),
          fc.double().map((d) => `${d} uF`),
        ),
        (raw) => {
          const r = s.safeParse(raw);
          if (r.success && r.data !== undefined) {
            expect(Number.isFinite(r.data)).toBe(true);
            expect(r.data >= 1e-14 && r.data <= 10).toBe(true);
          }
        },
      ),
    );
  });
});
