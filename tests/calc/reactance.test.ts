import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { calculator } from "@/lib/calc/reactance";
import { runCalculator } from "@/lib/calc/run";
import { calcRunner, logUniform } from "../helpers/calc";

type Out = { capacitiveReactance: number | null; inductiveReactance: number | null; resonantFrequency: number | null };

const { out, fields } = calcRunner<Out>(calculator);

describe("reactance: published checks", () => {
  it("1 µF at 60 Hz is about 2650 Ω", () => {
    // ARRL Handbook, electrical fundamentals: Xc = 1/(2πfC); 1 µF at 60 Hz ≈ 2.65 kΩ (from memory)
    const o = out({ frequency: 60, capacitance: "1u" });
    expect(o.capacitiveReactance as number).toBeCloseTo(2652.6, 1);
    expect(o.inductiveReactance).toBeNull();
    expect(o.resonantFrequency).toBeNull();
  });

  it("1 H at 60 Hz is about 377 Ω", () => {
    // ARRL Handbook, electrical fundamentals: XL = 2πfL; 2π × 60 = 377 (from memory)
    expect(out({ frequency: "60 Hz", inductance: "1 H" }).inductiveReactance as number).toBeCloseTo(376.99, 2);
  });

  it("100 µH with 100 pF resonates near 1.59 MHz, in the AM broadcast band", () => {
    // ARRL Handbook, resonant circuits: f0 = 1/(2π√(LC)) (from memory)
    const o = out({ inductance: "100 uH", capacitance: "100 pF" });
    expect((o.resonantFrequency as number) / 1e6).toBeCloseTo(1.5915, 4);
    expect(o.capacitiveReactance).toBeNull();
    expect(o.inductiveReactance).toBeNull();
  });

  it("1 mH with 122 pF tunes to the 455 kHz intermediate frequency", () => {
    // Radiotron Designer's Handbook 4th ed., IF amplifiers: 455 kHz is the usual broadcast IF (from memory)
    const f0 = out({ inductance: "1 mH", capacitance: "122 pF" }).resonantFrequency as number;
    expect(Math.abs(f0 - 455e3)).toBeLessThan(1e3);
  });
});

describe("reactance: identities", () => {
  it("property: Xc·XL = L/C at any frequency, and Xc = XL at f0", () => {
    fc.assert(
      fc.property(logUniform(1, 1e9), logUniform(1e-12, 1e-3), logUniform(1e-9, 100), (f, c, l) => {
        const o = out({ frequency: f, capacitance: c, inductance: l });
        const xc = o.capacitiveReactance as number;
        const xl = o.inductiveReactance as number;
        const f0 = o.resonantFrequency as number;
        expect((xc * xl) / (l / c)).toBeCloseTo(1, 9);
        const at = out({ frequency: f0, capacitance: c, inductance: l });
        expect((at.capacitiveReactance as number) / (at.inductiveReactance as number)).toBeCloseTo(1, 9);
        expect((at.capacitiveReactance as number) / Math.sqrt(l / c)).toBeCloseTo(1, 9);
      }),
    );
  });

  it("doubling f halves Xc and doubles XL; four times C halves f0", () => {
    const a = out({ frequency: 1000, capacitance: "10n", inductance: "10m" });
    const b = out({ frequency: 2000, capacitance: "10n", inductance: "10m" });
    expect((a.capacitiveReactance as number) / (b.capacitiveReactance as number)).toBeCloseTo(2, 12);
    expect((b.inductiveReactance as number) / (a.inductiveReactance as number)).toBeCloseTo(2, 12);
    const c = out({ capacitance: "40n", inductance: "10m" });
    expect((a.resonantFrequency as number) / (c.resonantFrequency as number)).toBeCloseTo(2, 12);
  });

  it("property: every accepted input gives finite results, across the whole accepted range", () => {
    fc.assert(
      fc.property(
        fc.option(logUniform(1e-6, 1e12), { nil: undefined }),
        fc.option(logUniform(1e-18, 1e4), { nil: undefined }),
        fc.option(logUniform(1e-15, 1e6), { nil: undefined }),
        (frequency, capacitance, inductance) => {
          const r = runCalculator(calculator, { frequency, capacitance, inductance });
          if (!r.ok) {
            expect(Object.keys(r.error.fields).length).toBeGreaterThan(0);
            return;
          }
          for (const v of Object.values(r.result.outputs)) if (v !== null) expect(Number.isFinite(v as number) && (v as number) > 0).toBe(true);
        },
      ),
    );
  });
});

describe("reactance: refusals", () => {
  it("needs a capacitance or an inductance", () => {
    const f = fields({ frequency: 1000 });
    expect(f).toHaveProperty("capacitance");
    expect(f).toHaveProperty("inductance");
  });

  it("needs a frequency unless both parts are given", () => {
    expect(fields({ capacitance: "1u" }).frequency).toMatch(/required unless both/);
    expect(fields({ inductance: "1" }).frequency).toBeDefined();
  });

  it("property: non-positive or wrong-unit values are refused under their field", () => {
    const bad = fc.oneof(fc.double({ max: 0, noNaN: true }), fc.constantFrom("5 V", "abc", Number.NaN, Number.POSITIVE_INFINITY));
    fc.assert(
      fc.property(bad, (v) => {
        expect(fields({ frequency: v, capacitance: "1u" })).toHaveProperty("frequency");
      }),
    );
    fc.assert(
      fc.property(bad, (v) => {
        expect(fields({ frequency: 60, capacitance: v })).toHaveProperty("capacitance");
      }),
    );
    fc.assert(
      fc.property(bad, (v) => {
        expect(fields({ frequency: 60, inductance: v })).toHaveProperty("inductance");
      }),
    );
    expect(fields({ frequency: 60, capacitance: "5 V" }).capacitance).toBe("Capacitance expected a capacitance, got volts");
  });
});
