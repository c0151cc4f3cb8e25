import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { calculator } from "@/lib/calc/cathode-bias";
import type { CathodeBiasOutputs } from "@/lib/calc/cathode-bias-explain";
import { E12 } from "@/lib/calc/tables/preferred-values";
import { STANDARD_WATTAGES } from "@/lib/calc/tables/wattage";
import { calcRunner, logUniform } from "../helpers/calc";

type Out = CathodeBiasOutputs;

const { run, out, fields } = calcRunner<Out>(calculator);
const parallel = (a: number, b: number) => (a * b) / (a + b);

describe("cathode-bias: published checks", () => {
  it("6V6GT class A: 250 V, −12.5 V grid, 45 mA plate, 4.5 mA screen → about 250 Ω", () => {
    // 6V6GT data sheet, typical operation class A1 single tube: cathode-bias resistor ≈ 250 Ω (from memory)
    const o = out({ biasVoltage: "-12.5 V", plateCurrent: "45 mA", screenCurrent: "4.5 mA" });
    expect(o.cathodeCurrent).toBeCloseTo(0.0495, 12);
    expect(Math.abs(o.cathodeResistance - 250) / 250).toBeLessThan(0.02);
    expect(o.dissipation).toBeCloseTo(12.5 * 0.0495, 12);
    expect(o.suggestedRating).toBe(2); // 2 × 0.62 W = 1.24 W → 2 W (common practice)
    expect(o.nearestPreferred).toBe(270); // IEC 60063 E12: 220 … 270, log-nearer 270
    expect(o.bypassCornerFrequency).toBeNull();
  });

  it("12AX7: 250 V, −2 V, 1.2 mA → about 1.6 kΩ", () => {
    // 12AX7 data sheet typical operation, one section: cathode resistor ≈ 1.6 kΩ (from memory)
    const o = out({ biasVoltage: 2, plateCurrent: "1.2 mA" });
    expect(o.cathodeResistance).toBeCloseTo(1666.67, 1);
    expect(Math.abs(o.cathodeResistance - 1600) / 1600).toBeLessThan(0.05);
    expect(o.nearestPreferred).toBe(1800);
    expect(o.suggestedRating).toBe(0.125);
  });

  it("12AX7 bypass with µ = 100, rp = 62.5 kΩ, 100 kΩ load: the cathode looks like (rp + Ra)/(µ + 1)", () => {
    // Radiotron Designer's Handbook 4th ed., cathode by-pass: resistance looking into the cathode (rp + RL)/(µ + 1)
    // (from memory); 12AX7 data sheet µ = 100, rp = 62.5 kΩ (from memory)
    const o = out({
      biasVoltage: 2,
      plateCurrent: "1.2m",
      bypassCapacitance: "25 uF",
      amplificationFactor: 100,
      plateResistance: "62.5k",
      plateLoad: "100k",
    });
    const r = parallel(2 / 1.2e-3, 162.5e3 / 101);
    expect(r).toBeCloseTo(818.6, 1);
    expect(o.bypassCornerFrequency as number).toBeCloseTo(1 / (2 * Math.PI * r * 25e-6), 9);
    expect(o.bypassCornerFrequency as number).toBeCloseTo(7.78, 2);
  });

  it("6V6GT bypass with gm = 4.1 mS: the cathode looks like 1/gm", () => {
    // 6V6GT data sheet transconductance 4100 µmho (from memory); Radiotron Designer's Handbook: pentode cathode ≈ 1/gm
    const o = out({ biasVoltage: 12.5, plateCurrent: "45m", screenCurrent: "4.5m", bypassCapacitance: "25u", transconductance: "4.1m" });
    const r = parallel(12.5 / 0.0495, 1 / 4.1e-3);
    expect(o.bypassCornerFrequency as number).toBeCloseTo(1 / (2 * Math.PI * r * 25e-6), 9);
  });

  it("Rk alone gives a lower corner, with a caution that it underestimates", () => {
    const base = { biasVoltage: 2, plateCurrent: "1.2m", bypassCapacitance: "25u" };
    const r = run(base);
    expect((r.outputs as unknown as Out).bypassCornerFrequency as number).toBeCloseTo(1 / (2 * Math.PI * (2 / 1.2e-3) * 25e-6), 9);
    expect(r.warnings.some((w) => w.level === "caution" && /underestimates/.test(w.message))).toBe(true);
    const triode = out({ ...base, amplificationFactor: 100, plateResistance: "62.5k", plateLoad: "100k" });
    expect(triode.bypassCornerFrequency as number).toBeGreaterThan((r.outputs as unknown as Out).bypassCornerFrequency as number);
  });

  it("always carries the high-voltage danger: the stage runs from B+", () => {
    expect(run({ biasVoltage: 2, plateCurrent: "1m" }).warnings[0].level).toBe("danger");
  });
});

describe("cathode-bias: identities and properties", () => {
  it("property: Ik = Ip + Ig2, Ik·Rk = Vk, P = Vk·Ik = Ik²Rk, rating ≥ 2P, E12, corners ordered", () => {
    fc.assert(
      fc.property(
        logUniform(0.1, 100),
        logUniform(1e-4, 0.5),
        fc.double({ min: 0, max: 0.3, noNaN: true }),
        logUniform(1e-6, 1e-3),
        logUniform(2, 200),
        logUniform(1e3, 1e5),
        logUniform(1e3, 1e6),
        (vk, ip, screenShare, ck, mu, rp, ra) => {
          const ig2 = ip * screenShare;
          const o = out({ biasVoltage: vk, plateCurrent: ip, screenCurrent: ig2, bypassCapacitance: ck });
          expect(o.cathodeCurrent).toBeCloseTo(ip + ig2, 12);
          expect((o.cathodeCurrent * o.cathodeResistance) / vk).toBeCloseTo(1, 9);
          expect(o.dissipation / (vk * o.cathodeCurrent)).toBeCloseTo(1, 9);
          expect(o.dissipation / (o.cathodeCurrent ** 2 * o.cathodeResistance)).toBeCloseTo(1, 9);
          if (o.suggestedRating !== null) {
            expect(o.suggestedRating).toBeGreaterThanOrEqual(2 * o.dissipation);
            expect(STANDARD_WATTAGES).toContain(o.suggestedRating);
          }
          const mantissa = o.nearestPreferred / 10 ** Math.floor(Math.log10(o.nearestPreferred) + 1e-12);
          expect(E12.some((m) => Math.abs(m - mantissa) < 1e-9)).toBe(true);
          const fRk = o.bypassCornerFrequency as number;
          expect(fRk * 2 * Math.PI * o.cathodeResistance * ck).toBeCloseTo(1, 9);
          const t = out({
            biasVoltage: vk,
            plateCurrent: ip,
            screenCurrent: ig2,
            bypassCapacitance: ck,
            amplificationFactor: mu,
            plateResistance: rp,
            plateLoad: ra,
          });
          expect(t.bypassCornerFrequency as number).toBeGreaterThan(fRk);
          expect((t.bypassCornerFrequency as number) * 2 * Math.PI * parallel(o.cathodeResistance, (rp + ra) / (mu + 1)) * ck).toBeCloseTo(1, 9);
        },
      ),
    );
  });

  it("a negative bias voltage is read as its magnitude", () => {
    expect(out({ biasVoltage: -12.5, plateCurrent: 0.05 })).toEqual(out({ biasVoltage: 12.5, plateCurrent: 0.05 }));
    expect(run({ biasVoltage: "-12.5 V", plateCurrent: 0.05 }).inputs.biasVoltage).toBe(12.5);
  });

  it("property: every accepted input gives finite results", () => {
    fc.assert(
      fc.property(
        logUniform(1e-3, 1e4),
        logUniform(1e-9, 10),
        fc.option(logUniform(1e-12, 1), { nil: undefined }),
        fc.option(logUniform(1e-7, 10), { nil: undefined }),
        (vk, ip, ck, gm) => {
          const o = out({ biasVoltage: vk, plateCurrent: ip, bypassCapacitance: ck, transconductance: gm });
          for (const v of Object.values(o)) if (v !== null) expect(Number.isFinite(v)).toBe(true);
        },
      ),
    );
  });
});

describe("cathode-bias: refusals", () => {
  it("triode figures come as a set of three", () => {
    const f = fields({ biasVoltage: 2, plateCurrent: "1.2m", bypassCapacitance: "25u", amplificationFactor: 100 });
    expect(Object.keys(f).sort()).toEqual(["plateLoad", "plateResistance"]);
  });

  it("triode figures or transconductance, not both", () => {
    const f = fields({
      biasVoltage: 2,
      plateCurrent: "1.2m",
      amplificationFactor: 100,
      plateResistance: "62.5k",
      plateLoad: "100k",
      transconductance: "1.6m",
    });
    expect(f.transconductance).toMatch(/not both/);
  });

  it("property: zero or negative currents, zero bias, wrong units and missing values are refused under their field", () => {
    const good = { biasVoltage: 2, plateCurrent: 0.001 };
    expect(fields({ ...good, biasVoltage: 0 }).biasVoltage).toMatch(/zero/);
    expect(fields({ plateCurrent: 0.001 })).toHaveProperty("biasVoltage");
    expect(fields({ biasVoltage: 2 })).toHaveProperty("plateCurrent");
    expect(fields({ ...good, plateCurrent: "2 V" }).plateCurrent).toBe("Plate current expected a current, got volts");
    fc.assert(
      fc.property(fc.oneof(fc.double({ max: 0, noNaN: true }), fc.constantFrom("x", "5 V", Number.NaN)), (bad) => {
        expect(fields({ ...good, plateCurrent: bad })).toHaveProperty("plateCurrent");
        expect(fields({ ...good, bypassCapacitance: bad })).toHaveProperty("bypassCapacitance");
        expect(fields({ ...good, transconductance: bad })).toHaveProperty("transconductance");
      }),
    );
    fc.assert(
      fc.property(fc.double({ max: -1e-300, noNaN: true }), (bad) => {
        expect(fields({ ...good, screenCurrent: bad })).toHaveProperty("screenCurrent");
      }),
    );
  });
});
