import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { calculator } from "@/lib/calc/heater-string";
import { runCalculator } from "@/lib/calc/run";
import { findHeater, HEATERS, TUBE_NAMES } from "@/lib/calc/tables/heaters";
import { calcRunner } from "../helpers/calc";

type Out = {
  stringVoltage: number;
  stringCurrent: number;
  currentsMatch: boolean;
  droppingResistance: number;
  dissipation: number;
  suggestedRating: number | null;
};

const { run, out } = calcRunner<Out>(calculator);

describe("heater-string: published checks", () => {
  it("the classic five-tube AC/DC set: 12BE6 + 12BA6 + 12AV6 + 50C5 + 35W4 needs 122.8 V at 0.15 A", () => {
    // RCA receiving tube manual heater ratings (from memory): 12.6 V ×3, 50 V, 35 V, all 0.15 A;
    // 3 × 12.6 + 50 + 35 = 122.8 V, run straight from 117–120 V mains with no dropping resistor.
    const r = run({ lineVoltage: "117 V", tubes: ["12BE6", "12BA6", "12AV6", "50C5", "35W4"] });
    const o = r.outputs as unknown as Out;
    expect(o.stringVoltage).toBeCloseTo(122.8, 9);
    expect(o.stringCurrent).toBe(0.15);
    expect(o.currentsMatch).toBe(true);
    expect(o.droppingResistance).toBe(0);
    expect(o.dissipation).toBe(0);
    expect(r.warnings.some((w) => w.level === "caution" && /more than the/.test(w.message))).toBe(true);
  });

  it("the octal five-tube set: 12SA7 + 12SK7 + 12SQ7 + 50L6GT + 35Z5GT also needs 122.8 V at 0.15 A", () => {
    // RCA receiving tube manual heater ratings (from memory)
    const o = out({ lineVoltage: 120, tubes: "12sa7, 12sk7, 12sq7, 50l6gt, 35z5gt" });
    expect(o.stringVoltage).toBeCloseTo(122.8, 9);
    expect(o.stringCurrent).toBe(0.15);
  });

  it("the built-in table agrees with the tube-manual heater ratings", () => {
    // RCA receiving tube manual / data sheets, heater ratings — from memory
    const expected: [string, number, number][] = [
      ["12AV6", 12.6, 0.15],
      ["50C5", 50, 0.15],
      ["35W4", 35, 0.15],
      ["6SN7GTB", 6.3, 0.6],
      ["5U4GB", 5, 3],
      ["5Y3GT", 5, 2],
      ["6V6GT", 6.3, 0.45],
      ["6L6GC", 6.3, 0.9],
      ["EL84", 6.3, 0.76],
      ["25L6GT", 25, 0.3],
      ["117Z3", 117, 0.04],
    ];
    for (const [name, v, i] of expected) {
      expect(findHeater(name), name).toMatchObject({ voltage: v, current: i });
    }
    expect(HEATERS.length).toBeGreaterThanOrEqual(40);
  });

  it("a 300 mA string on 117 V: 25L6GT + 25Z6GT + 6SA7 + 6SK7 + 6SQ7 drops 48.1 V in 160 Ω", () => {
    // heater ratings from the RCA receiving tube manual (from memory); 25 + 25 + 3 × 6.3 = 68.9 V
    const o = out({ lineVoltage: 117, tubes: ["25L6GT", "25Z6GT", "6SA7", "6SK7", "6SQ7"] });
    expect(o.stringVoltage).toBeCloseTo(68.9, 9);
    expect(o.stringCurrent).toBe(0.3);
    expect(o.droppingResistance).toBeCloseTo((117 - 68.9) / 0.3, 9);
    expect(o.dissipation).toBeCloseTo(48.1 * 0.3, 9); // 14.4 W
    expect(o.suggestedRating).toBe(50); // next standard rating ≥ 28.9 W
  });
});

describe("heater-string: identities and rules", () => {
  it("P = I²R = ΔV·I for the dropping resistor", () => {
    const o = out({ lineVoltage: 230, heaters: [{ voltage: 6.3, current: 0.3 }, { voltage: "12.6 V", current: "300 mA" }] });
    expect(o.dissipation).toBeCloseTo(o.stringCurrent ** 2 * o.droppingResistance, 9);
    expect(o.dissipation).toBeCloseTo((230 - 18.9) * 0.3, 9);
  });

  it("mismatched currents: caution, not error, and the string current is the lowest rating", () => {
    const r = run({ lineVoltage: 117, tubes: ["6V6GT", "6SQ7"] });
    const o = r.outputs as unknown as Out;
    expect(o.currentsMatch).toBe(false);
    expect(o.stringCurrent).toBe(0.3);
    expect(r.warnings.some((w) => w.level === "caution" && /different currents/.test(w.message))).toBe(true);
  });

  it("currents within 2% match, beyond 2% do not", () => {
    const within = out({ lineVoltage: 30, heaters: [{ voltage: 12.6, current: 0.15 }, { voltage: 12.6, current: 0.1529 }] });
    const beyond = out({ lineVoltage: 30, heaters: [{ voltage: 12.6, current: 0.15 }, { voltage: 12.6, current: 0.1531 }] });
    expect(within.currentsMatch).toBe(true);
    expect(beyond.currentsMatch).toBe(false);
  });

  it("mains is lethal: a danger warning above 50 V, none on a 12 V supply", () => {
    expect(run({ lineVoltage: 120, tubes: ["12AV6"] }).warnings.some((w) => w.level === "danger")).toBe(true);
    expect(run({ lineVoltage: 12.6, tubes: ["12AV6"] }).warnings.some((w) => w.level === "danger")).toBe(false);
  });

  it("tube names are case-insensitive and normalised in the inputs", () => {
    const r = run({ lineVoltage: 120, tubes: ["el84", " 6bq5 "] });
    expect(r.inputs.tubes).toEqual(["6BQ5", "6BQ5"]);
  });
});

describe("heater-string: validation", () => {
  it("an unknown tube is reported under tubes.<index>", () => {
    const r = runCalculator(calculator, { lineVoltage: 120, tubes: ["12BE6", "12BA6", "12ZZ9"] });
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.error.fields["tubes.2"]).toMatch(/^tubes\.2: unknown tube type "12ZZ9"/);
  });

  it("needs heaters or tubes, not both and not neither", () => {
    const neither = runCalculator(calculator, { lineVoltage: 120 });
    expect(neither.ok).toBe(false);
    if (!neither.ok) expect(neither.error.fields.heaters).toMatch(/required/);
    const both = runCalculator(calculator, { lineVoltage: 120, tubes: ["6V6"], heaters: [{ voltage: 6.3, current: 0.45 }] });
    expect(both.ok).toBe(false);
    if (!both.ok) expect(both.error.fields.tubes).toMatch(/not both/);
  });

  it("a heater with a current in volts is reported by path", () => {
    const r = runCalculator(calculator, { lineVoltage: 120, heaters: [{ voltage: 6.3, current: 0.3 }, { voltage: 6.3, current: "0.3 V" }] });
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.error.fields["heaters.1.current"]).toMatch(/current/);
  });
});

describe("heater-string: properties", () => {
  const logUniform = (lo: number, hi: number) =>
    fc.double({ min: Math.log10(lo), max: Math.log10(hi), noNaN: true }).map((e) => Math.min(hi, Math.max(lo, 10 ** e)));
  const heater = fc.record({ voltage: logUniform(1e-3, 500), current: logUniform(1e-4, 20) });

  it("valid heater lists never yield NaN or Infinity; R and P are zero exactly when the string needs the whole line", () => {
    fc.assert(
      fc.property(logUniform(1e-3, 1000), fc.array(heater, { minLength: 1, maxLength: 40 }), (lineVoltage, heaters) => {
        const o = out({ lineVoltage, heaters });
        for (const x of [o.stringVoltage, o.stringCurrent, o.droppingResistance, o.dissipation]) expect(Number.isFinite(x)).toBe(true);
        expect(o.droppingResistance > 0).toBe(lineVoltage > o.stringVoltage);
        expect(o.dissipation).toBeGreaterThanOrEqual(0);
      }),
    );
  });

  it("any list of table tubes sums the table's voltages", () => {
    fc.assert(
      fc.property(fc.array(fc.constantFrom(...TUBE_NAMES), { minLength: 1, maxLength: 12 }), (tubes) => {
        const o = out({ lineVoltage: 120, tubes });
        const sum = tubes.reduce((s, n) => s + findHeater(n)!.voltage, 0);
        expect(o.stringVoltage).toBeCloseTo(sum, 9);
        expect(o.stringCurrent).toBe(Math.min(...tubes.map((n) => findHeater(n)!.current)));
      }),
    );
  });

  const bad = fc.oneof(fc.double({ max: 0, noNaN: true }), fc.constant("lots"), fc.constant(""), fc.constant("3 ohm"), fc.constant(null));

  it("bad line voltage or heater fields give ok:false under their names", () => {
    fc.assert(
      fc.property(bad, fc.constantFrom("lineVoltage", "heaters.0.voltage", "heaters.1.current"), (value, key) => {
        const raw: Record<string, unknown> = { lineVoltage: 120, heaters: [{ voltage: 6.3, current: 0.3 }, { voltage: 6.3, current: 0.3 }] };
        if (key === "lineVoltage") raw.lineVoltage = value;
        else {
          const [, idx, field] = key.split(".");
          (raw.heaters as Record<string, unknown>[])[Number(idx)][field] = value;
        }
        const r = runCalculator(calculator, raw);
        expect(r.ok).toBe(false);
        if (!r.ok) expect(typeof r.error.fields[key]).toBe("string");
      }),
    );
  });
});
