import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { calculator } from "@/lib/calc/meter-loading";
import { runCalculator } from "@/lib/calc/run";
import { calcRunner, logUniform } from "../helpers/calc";

type Out = { meterResistance: number; indicatedVoltage: number; error: number };

const { run, out, fields } = calcRunner<Out>(calculator);

describe("meter-loading: checks against published data", () => {
  it("a 20 000 Ω/V meter on its 250 V range is 5 MΩ: through 1 MΩ it reads 83 V of 100 V", () => {
    // ARRL Handbook, test equipment chapter: R_m = sensitivity × range, and the divider it makes (from memory)
    const o = out({ trueVoltage: "100 V", sourceResistance: "1 Meg", ohmsPerVolt: "20k", range: "250 V" });
    expect(o.meterResistance).toBe(5e6);
    expect(o.indicatedVoltage).toBeCloseTo(83.33, 2);
    expect(o.error).toBeCloseTo(-1 / 6, 12);
  });

  it("a 1000 Ω/V meter on the 250 V range across 250 kΩ reads half the true voltage", () => {
    // Terman, Radio Engineers' Handbook, measurements: a voltmeter whose resistance equals the circuit's reads 50 % low (from memory)
    const o = out({ trueVoltage: 200, sourceResistance: "250k", ohmsPerVolt: 1000, range: 250 });
    expect(o.meterResistance).toBe(250e3);
    expect(o.indicatedVoltage).toBeCloseTo(100, 9);
    expect(o.error).toBeCloseTo(-0.5, 12);
  });

  it("an 11 MΩ VTVM on an AVC line: −5 V through 2.2 MΩ reads −4.17 V, the sign kept", () => {
    // VTVM input resistance 11 MΩ including the 1 MΩ probe resistor (from memory of the era's VTVM manuals)
    const o = out({ trueVoltage: "-5 V", sourceResistance: "2.2M", inputResistance: "11M" });
    expect(o.meterResistance).toBe(11e6);
    expect(o.indicatedVoltage).toBeCloseTo(-5 * (11 / 13.2), 12);
    expect(o.error).toBeCloseTo(-2.2 / 13.2, 12);
  });

  it("a stiff B+ line (source of a few hundred ohms) reads true to well under 1 %", () => {
    // common practice: a filter capacitor's node is low-resistance; loading there is negligible
    const o = out({ trueVoltage: 300, sourceResistance: 300, ohmsPerVolt: 1000, range: 500 });
    expect(Math.abs(o.error)).toBeLessThan(0.001);
  });
});

describe("meter-loading: warnings", () => {
  it("danger above 50 V only; an off-scale reading is a caution; never 'safe'", () => {
    const hv = run({ trueVoltage: 100, sourceResistance: "1M", ohmsPerVolt: "20k", range: 250 });
    expect(hv.warnings.some((w) => w.level === "danger")).toBe(true);
    expect(hv.warnings.some((w) => /reads 17 % low/.test(w.message))).toBe(true);
    for (const w of hv.warnings) expect(w.message).not.toMatch(/\bsafe\b/i);
    expect(run({ trueVoltage: -5, sourceResistance: "2.2M", inputResistance: "11M" }).warnings.some((w) => w.level === "danger")).toBe(false);
    const pinned = run({ trueVoltage: 100, sourceResistance: 0, ohmsPerVolt: 1000, range: 50 });
    expect(pinned.warnings.some((w) => w.level === "caution" && /beyond the 50 V range/.test(w.message))).toBe(true);
    expect(hv.warnings.some((w) => /beyond/.test(w.message))).toBe(false);
    expect(hv.warnings.some((w) => /DC sensitivity/.test(w.message))).toBe(true);
  });
});

describe("meter-loading: identities and properties", () => {
  const valid = fc.record({
    v: fc.double({ min: -1000, max: 1000, noNaN: true }).filter((x) => Math.abs(x) > 1e-6),
    rs: fc.oneof(fc.constant(0), logUniform(1, 1e9)),
    rm: logUniform(1e3, 1e9),
  });

  it("property: divider identity V − V_ind = I·Rs, V_ind = I·Rm; error = V_ind/V − 1 in (−1, 0]; sign kept", () => {
    fc.assert(
      fc.property(valid, ({ v, rs, rm }) => {
        const o = out({ trueVoltage: v, sourceResistance: rs, inputResistance: rm });
        const i = v / (rs + rm);
        expect(o.indicatedVoltage / (i * rm)).toBeCloseTo(1, 9);
        expect(Math.abs(v - o.indicatedVoltage - i * rs)).toBeLessThanOrEqual(1e-9 * Math.abs(v));
        expect(o.error).toBeLessThanOrEqual(0);
        expect(o.error).toBeGreaterThan(-1);
        expect(o.indicatedVoltage / v - 1).toBeCloseTo(o.error, 9);
        expect(Math.sign(o.indicatedVoltage)).toBe(Math.sign(v));
        if (rs === 0) expect(o.indicatedVoltage / v).toBeCloseTo(1, 12);
      }),
    );
  });

  it("property: a more sensitive meter or a higher range never reads further from the truth", () => {
    fc.assert(
      fc.property(logUniform(1, 1e8), logUniform(100, 1e5), fc.double({ min: 1.01, max: 100, noNaN: true }), logUniform(1, 1000), (rs, s, k, range) => {
        const lo = out({ trueVoltage: 10, sourceResistance: rs, ohmsPerVolt: s, range });
        const hi = out({ trueVoltage: 10, sourceResistance: rs, ohmsPerVolt: s * k > 1e7 ? 1e7 : s * k, range });
        expect(hi.error).toBeGreaterThanOrEqual(lo.error);
        expect(lo.meterResistance).toBeCloseTo(s * range, 6);
      }),
    );
  });
});

describe("meter-loading: refusals", () => {
  it("either ohms per volt with a range, or an input resistance; each missing piece named", () => {
    expect(fields({ trueVoltage: 100, sourceResistance: "1M" }).ohmsPerVolt).toMatch(/input resistance/);
    expect(fields({ trueVoltage: 100, sourceResistance: "1M", ohmsPerVolt: "20k" }).range).toMatch(/Range is required/);
    expect(fields({ trueVoltage: 100, sourceResistance: "1M", range: 250 }).ohmsPerVolt).toMatch(/Ohms per volt is required/);
    expect(fields({ trueVoltage: 100, sourceResistance: "1M", ohmsPerVolt: "20k", range: 250, inputResistance: "11M" }).inputResistance).toMatch(/not both/);
    expect(fields({ trueVoltage: 0, sourceResistance: "1M", inputResistance: "11M" }).trueVoltage).toMatch(/not be zero/);
    expect(fields({ trueVoltage: 100, sourceResistance: -1, inputResistance: "11M" }).sourceResistance).toMatch(/negative/);
  });

  it("property: bad values are refused under their own field", () => {
    const bad = fc.constantFrom("", "abc", "5 A", Number.NaN, Number.POSITIVE_INFINITY, -1, 0);
    const good = { trueVoltage: 100, sourceResistance: "1M", ohmsPerVolt: "20k", range: 250 };
    fc.assert(
      fc.property(fc.constantFrom("ohmsPerVolt", "range"), bad, (name, x) => {
        const r = runCalculator(calculator, { ...good, [name]: x });
        expect(r.ok).toBe(false);
        if (!r.ok) expect(r.error.fields).toHaveProperty(name);
      }),
    );
    expect(fields({ ...good, trueVoltage: "abc" })).toHaveProperty("trueVoltage");
    expect(fields({ ...good, sourceResistance: "5 V" }).sourceResistance).toMatch(/expected a resistance/);
    // the dial's own way of writing it is read
    expect(out({ ...good, ohmsPerVolt: "20 kΩ/V" }).meterResistance).toBe(5e6);
    expect(out({ ...good, ohmsPerVolt: "20000 ohms per volt" }).meterResistance).toBe(5e6);
    expect(fields({ ...good, ohmsPerVolt: "20 mA" }).ohmsPerVolt).toMatch(/sensitivity/);
  });
});
