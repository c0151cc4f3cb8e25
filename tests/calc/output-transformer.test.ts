import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { calculator, MISMATCH_FACTOR } from "@/lib/calc/output-transformer";
import { runCalculator } from "@/lib/calc/run";
import { calcRunner, logUniform } from "../helpers/calc";

type Out = { turnsRatio: number; reflectedImpedance: number | null };

const { run, out, fields } = calcRunner<Out>(calculator);

describe("output-transformer: checks against published data", () => {
  it("5000 Ω to 8 Ω is a 25 : 1 transformer", () => {
    // Radiotron Designer's Handbook 4th ed., ch. 5: impedance ratio = (turns ratio)²; 5000/8 = 625 = 25² (from memory)
    const o = out({ primaryImpedance: "5k", secondaryImpedance: "8" });
    expect(o.turnsRatio).toBeCloseTo(25, 12);
    expect(o.reflectedImpedance).toBeNull();
  });

  it("a 6V6GT's 5000 Ω load onto a 3.2 Ω table-radio speaker: about 39.5 : 1", () => {
    // RCA 6V6GT single-ended class A typical operation: 5000 Ω load (from memory); 3.2 Ω voice coils were common in radios (common practice)
    expect(out({ primaryImpedance: 5000, secondaryImpedance: 3.2 }).turnsRatio).toBeCloseTo(39.528, 3);
  });

  it("push-pull 6L6GC, 6600 Ω plate to plate, onto 16 Ω: about 20.3 : 1", () => {
    // RCA 6L6GC class AB1 push-pull typical operation: 6600 Ω plate-to-plate load (from memory); ARRL Handbook, Zp = n²Zs
    expect(out({ primaryImpedance: "6.6k", secondaryImpedance: "16 ohm" }).turnsRatio).toBeCloseTo(20.31, 2);
  });

  it("a 4 Ω speaker on the 8 Ω tap halves the plate load: 5000 Ω becomes 2500 Ω", () => {
    // ARRL Handbook, impedance matching with transformers: the load reflects as n²·Z_L (from memory)
    const r = run({ primaryImpedance: "5k", secondaryImpedance: 8, newLoad: 4 });
    expect(r.outputs.reflectedImpedance).toBeCloseTo(2500, 9);
    expect(r.warnings.some((w) => w.level === "info" && /below the tap's, within a factor of 2: the plate load falls/.test(w.message))).toBe(true);
    expect(r.warnings.some((w) => w.level === "caution" && /more than a factor of 2/.test(w.message))).toBe(false);
  });
});

describe("output-transformer: warnings", () => {
  it("always danger and the no-load flashover caution; a mismatch beyond a factor of 2 is a caution either way; never 'safe'", () => {
    const r = run({ primaryImpedance: "5k", secondaryImpedance: 8 });
    expect(r.warnings[0].level).toBe("danger");
    expect(r.warnings.some((w) => w.level === "caution" && /no load/.test(w.message) && /arc/.test(w.message))).toBe(true);
    for (const w of r.warnings) expect(w.message).not.toMatch(/\bsafe\b/i);
    const low = run({ primaryImpedance: "5k", secondaryImpedance: 8, newLoad: 2 });
    expect(low.warnings.some((w) => w.level === "caution" && /less power/.test(w.message))).toBe(true);
    const high = run({ primaryImpedance: "5k", secondaryImpedance: 4, newLoad: 16 });
    expect(high.outputs.reflectedImpedance).toBeCloseTo(20000, 9);
    expect(high.warnings.some((w) => w.level === "caution" && /swing further/.test(w.message))).toBe(true);
    const matched = run({ primaryImpedance: "5k", secondaryImpedance: 8, newLoad: 8 });
    expect(matched.outputs.reflectedImpedance).toBe(5000);
    expect(matched.warnings.some((w) => /speaker's impedance is/.test(w.message))).toBe(false);
  });
});

describe("output-transformer: identities and properties", () => {
  const valid = fc.record({ zp: logUniform(500, 20000), zs: logUniform(1, 600), zl: logUniform(0.5, 1000) }).filter((x) => x.zp > x.zs);

  it("property: Zp = n²·Zs; a load equal to the tap reflects as Zp; Zp' = n²·Z_L", () => {
    fc.assert(
      fc.property(valid, ({ zp, zs, zl }) => {
        const o = out({ primaryImpedance: zp, secondaryImpedance: zs, newLoad: zl });
        expect((o.turnsRatio ** 2 * zs) / zp).toBeCloseTo(1, 12);
        expect(o.turnsRatio).toBeGreaterThan(1);
        expect(o.reflectedImpedance! / (o.turnsRatio ** 2 * zl)).toBeCloseTo(1, 12);
        expect(out({ primaryImpedance: zp, secondaryImpedance: zs, newLoad: zs }).reflectedImpedance! / zp).toBeCloseTo(1, 12);
      }),
    );
  });

  it("property: energy is conserved — V_s²/Z_L on the secondary equals V_p²/Z_p' on the primary with V_p = n·V_s", () => {
    // ideal transformer: V_p/V_s = n, I_p/I_s = 1/n, so the power is the same on both sides (ARRL Handbook, transformers)
    fc.assert(
      fc.property(valid, fc.double({ min: 0.1, max: 50, noNaN: true }), ({ zp, zs, zl }, vs) => {
        const o = out({ primaryImpedance: zp, secondaryImpedance: zs, newLoad: zl });
        const vp = o.turnsRatio * vs;
        expect((vp * vp) / o.reflectedImpedance! / ((vs * vs) / zl)).toBeCloseTo(1, 9);
      }),
    );
  });

  it("property: the mismatch caution fires exactly beyond the stated factor", () => {
    fc.assert(
      fc.property(valid, ({ zp, zs, zl }) => {
        const r = run({ primaryImpedance: zp, secondaryImpedance: zs, newLoad: zl });
        const ratio = zl / zs;
        expect(r.warnings.some((w) => w.level === "caution" && /more than a factor of 2/.test(w.message))).toBe(
          ratio > MISMATCH_FACTOR || ratio < 1 / MISMATCH_FACTOR,
        );
      }),
    );
  });
});

describe("output-transformer: refusals", () => {
  it("a primary not above the secondary is refused as swapped; bad values under their own field", () => {
    expect(fields({ primaryImpedance: 16, secondaryImpedance: "5k" }).secondaryImpedance).toMatch(/swapped/);
    expect(fields({ primaryImpedance: 16, secondaryImpedance: 16 }).secondaryImpedance).toMatch(/below the primary/);
    expect(fields({ secondaryImpedance: 8 }).primaryImpedance).toMatch(/required/);
    expect(fields({ primaryImpedance: "5k", secondaryImpedance: 8, newLoad: "4 V" }).newLoad).toMatch(/expected a resistance/);
    const bad = fc.constantFrom("abc", "5 A", Number.NaN, Number.POSITIVE_INFINITY, -8, 0);
    fc.assert(
      fc.property(fc.constantFrom("primaryImpedance", "secondaryImpedance", "newLoad"), bad, (name, x) => {
        const r = runCalculator(calculator, { primaryImpedance: "5k", secondaryImpedance: 8, [name]: x });
        expect(r.ok).toBe(false);
        if (!r.ok) expect(r.error.fields).toHaveProperty(name);
      }),
    );
  });
});
