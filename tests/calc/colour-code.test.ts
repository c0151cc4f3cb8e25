import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { calculator, decodeBands, encodeResistance } from "@/lib/calc/colour-code";
import { runCalculator } from "@/lib/calc/run";
import { TEMPERATURE_COEFFICIENT, TOLERANCE } from "@/lib/calc/tables/colour-code";
import { calcRunner } from "../helpers/calc";

type Out = { resistance: number; tolerance: number; bands: string[]; temperatureCoefficient: number | null; toleranceLetter: string | null };

const { run, out, fields } = calcRunner<Out>(calculator);

describe("colour-code: published checks (IEC 60062)", () => {
  it("yellow-violet-red-gold is 4.7 kΩ ±5 % (J), with no temperature coefficient", () => {
    // IEC 60062 colour code example (from memory)
    expect(out({ bands: ["yellow", "violet", "red", "gold"] })).toEqual({
      resistance: 4700,
      tolerance: 0.05,
      bands: ["yellow", "violet", "red", "gold"],
      temperatureCoefficient: null,
      toleranceLetter: "J",
    });
  });

  it("brown-black-black-red-brown is 10 kΩ ±1 %", () => {
    // IEC 60062 five-band example (from memory)
    const o = out({ bands: "brown-black-black-red-brown" });
    expect(o.resistance).toBe(10000);
    expect(o.tolerance).toBe(0.01);
  });

  it("three bands mean ±20 %: brown-black-red is 1 kΩ", () => {
    // IEC 60062: no tolerance band = ±20 % (from memory)
    expect(out({ bands: "brown black red" })).toMatchObject({ resistance: 1000, tolerance: 0.2 });
  });

  it("gold and silver multipliers: red-red-gold-gold is 2.2 Ω, orange-orange-silver-silver 0.33 Ω ±10 %", () => {
    // IEC 60062 multipliers: gold ×0.1, silver ×0.01 (from memory)
    expect(out({ bands: ["red", "red", "gold", "gold"] }).resistance).toBe(2.2);
    expect(out({ bands: ["orange", "orange", "silver", "silver"] })).toMatchObject({ resistance: 0.33, tolerance: 0.1 });
  });

  it("codes 4.7 kΩ ±5 % as yellow, violet, red, gold and 10.2 kΩ ±1 % with five bands", () => {
    // IEC 60062 (from memory); 10.2 k is an E96 value (IEC 60063)
    expect(out({ resistance: "4k7", tolerance: 0.05 }).bands).toEqual(["yellow", "violet", "red", "gold"]);
    expect(out({ resistance: "10.2k", tolerance: 0.01 }).bands).toEqual(["brown", "black", "red", "red", "brown"]);
    expect(out({ resistance: "1k", tolerance: 0.2 }).bands).toEqual(["brown", "black", "red"]);
  });

  it("a 1 % E24 value gets four bands and an info with the five-band form", () => {
    const r = run({ resistance: "10k", tolerance: 0.01 });
    expect((r.outputs as unknown as Out).bands).toEqual(["brown", "black", "orange", "brown"]);
    expect(r.warnings.some((w) => w.message.includes("brown, black, black, red, brown"))).toBe(true);
  });
});

describe("colour-code: IEC 60062:2016 tolerance rows and six bands", () => {
  it("orange is ±0.05 % (W) and yellow ±0.02 % (P) as tolerance bands", () => {
    // IEC 60062:2016 colour table, tolerance column: orange ±0.05 % W, yellow ±0.02 % P (from memory)
    expect(out({ bands: "brown black black red orange" })).toMatchObject({ resistance: 10e3, tolerance: 0.0005, toleranceLetter: "W" });
    expect(out({ bands: "brown black black red yellow" })).toMatchObject({ resistance: 10e3, tolerance: 0.0002, toleranceLetter: "P" });
    expect(out({ resistance: "10.2k", tolerance: 0.0002 }).bands).toEqual(["brown", "black", "red", "red", "yellow"]);
  });

  it("grey is ±0.01 % (L) in 2016, and the result says older charts read it as ±0.05 %", () => {
    // IEC 60062:2016: grey ±0.01 % L (from memory); pre-2016 charts: grey ±0.05 % (common practice)
    const r = run({ bands: "brown black black red grey" });
    expect(r.outputs).toMatchObject({ tolerance: 0.0001, toleranceLetter: "L" });
    expect(r.warnings.some((w) => /IEC 60062:2016/.test(w.message) && /grey/.test(w.message) && /±0\.05 %/.test(w.message))).toBe(true);
    expect(r.steps.find((s) => s.label === "Tolerance")?.latex).toContain("9.999");
  });

  it("±0.05 % is coded orange now, not grey as on older charts", () => {
    // IEC 60062:2016 (from memory)
    const r = run({ resistance: "10.2k", tolerance: 0.0005 });
    expect((r.outputs as unknown as Out).bands.at(-1)).toBe("orange");
    expect(r.warnings.some((w) => /orange/.test(w.message) && /grey/.test(w.message))).toBe(true);
  });

  it("six bands: brown-black-black-red-brown-red is 10 kΩ ±1 %, 50 ppm/K", () => {
    // IEC 60062:2016 §3.4, TCR band after the tolerance band; red = 50 ppm/K (from memory)
    const r = run({ bands: ["brown", "black", "black", "red", "brown", "red"] });
    expect(r.outputs).toMatchObject({ resistance: 10e3, tolerance: 0.01, temperatureCoefficient: 50, toleranceLetter: "F" });
    // 50 ppm/K of 10 kΩ is 0.5 Ω per kelvin
    expect(r.steps.find((s) => /Temperature coefficient/.test(s.label))?.latex).toContain("500\\,\\mathrm{m\\Omega}");
  });

  it("codes a value with a temperature coefficient into six bands (three figures)", () => {
    // IEC 60062:2016 §3.4 (from memory): 4.7 kΩ = 470 × 10¹; brown tolerance ±1 %; brown TC 100 ppm/K
    expect(out({ resistance: "4k7", tolerance: 0.01, temperatureCoefficient: "100 ppm/K" })).toMatchObject({
      bands: ["yellow", "violet", "black", "brown", "brown", "brown"],
      temperatureCoefficient: 100,
    });
    expect(out({ resistance: "10.2k", tolerance: 0.001, temperatureCoefficient: 15 }).bands).toEqual(["brown", "black", "red", "red", "violet", "orange"]);
  });

  it("the TC field is ignored, with a note, when reading bands", () => {
    const r = run({ bands: "yellow violet red gold", temperatureCoefficient: 50 });
    expect((r.outputs as unknown as Out).temperatureCoefficient).toBeNull();
    expect(r.warnings.some((w) => /temperature-coefficient field is ignored/.test(w.message))).toBe(true);
  });

  it("property: six bands encode and decode back, value, tolerance and TC", () => {
    const tcs = Object.values(TEMPERATURE_COEFFICIENT) as number[];
    const tols = Object.entries(TOLERANCE)
      .filter(([c]) => c !== "none")
      .map(([, t]) => t as number);
    fc.assert(
      // three figures always: a two-figure value is padded (10 × 10⁻² = 100 × 10⁻³), so ×10⁻² is its lowest decade here
      fc.property(fc.integer({ min: 10, max: 999 }), fc.integer({ min: -2, max: 8 }), fc.constantFrom(...tols), fc.constantFrom(...tcs), (sig, e, t, tc) => {
        const r = Number((sig * 10 ** e).toPrecision(12));
        const o = out({ resistance: r, tolerance: t, temperatureCoefficient: tc });
        expect(o.bands.length).toBe(6);
        const back = out({ bands: o.bands });
        expect(back.resistance / r).toBeCloseTo(1, 12);
        expect(back.tolerance).toBe(t);
        expect(back.temperatureCoefficient).toBe(tc);
      }),
    );
  });
});

describe("colour-code: spelling and input forms", () => {
  it("reads grey, gray and any case", () => {
    expect(out({ bands: ["Grey", "red", "black", "gold"] }).resistance).toBe(82);
    expect(out({ bands: ["gray", "red", "black", "gold"] })).toMatchObject({ resistance: 82, bands: ["grey", "red", "black", "gold"] });
    expect(out({ bands: "VIOLET, green, brown, brown" }).resistance).toBe(750);
  });

  it("pink multiplier ×0.001", () => {
    // IEC 60062:2016 pink multiplier (from memory)
    expect(out({ bands: ["brown", "black", "pink", "gold"] }).resistance).toBeCloseTo(0.01, 15);
  });
});

describe("colour-code: round trips and refusals", () => {
  const tolerances = Object.entries(TOLERANCE)
    .filter(([c]) => c !== "none")
    .map(([, t]) => t as number);

  it("property: two figures encode to four bands and decode back", () => {
    fc.assert(
      fc.property(fc.integer({ min: 10, max: 99 }), fc.integer({ min: -3, max: 9 }), fc.constantFrom(...tolerances), (sig, e, t) => {
        const r = Number((sig * 10 ** e).toPrecision(12));
        const o = out({ resistance: r, tolerance: t });
        expect(o.bands.length).toBe(4);
        const back = out({ bands: o.bands });
        expect(back.resistance / r).toBeCloseTo(1, 12);
        expect(back.tolerance).toBe(t);
      }),
    );
  });

  it("property: three figures encode to five bands and decode back", () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 100, max: 999 }).filter((n) => n % 10 !== 0),
        fc.integer({ min: -3, max: 9 }),
        fc.constantFrom(...tolerances),
        (sig, e, t) => {
          const r = Number((sig * 10 ** e).toPrecision(12));
          const o = out({ resistance: r, tolerance: t });
          expect(o.bands.length).toBe(5);
          const back = decodeBands(o.bands);
          expect(back.ok && back.resistance / r).toBeCloseTo(1, 12);
        },
      ),
    );
  });

  it("property: any accepted input gives finite numbers", () => {
    fc.assert(
      fc.property(fc.double({ min: 1e-3, max: 1e12, noNaN: true }), fc.constantFrom(...tolerances, 0.2), (r, t) => {
        const res = runCalculator(calculator, { resistance: r, tolerance: t });
        if (res.ok) {
          const o = res.result.outputs as unknown as Out;
          expect(Number.isFinite(o.resistance) && Number.isFinite(o.tolerance)).toBe(true);
        } else {
          expect(Object.keys(res.error.fields).some((k) => k === "resistance" || k === "tolerance")).toBe(true);
        }
      }),
    );
  });

  it("refuses bad bands under the bands field", () => {
    expect(fields({ bands: ["red", "red"] }).bands).toMatch(/3, 4, 5 or 6/);
    expect(fields({ bands: ["red", "red", "red", "red", "red", "red", "red"] }).bands).toMatch(/3, 4, 5 or 6/);
    expect(fields({ bands: ["red", "red", "red", "red", "red", "white"] }).bands).toMatch(/Sixth band/);
    expect(fields({ bands: ["red", "red", "red", "red", "red", "gold"] }).bands).toMatch(/temperature coefficient/);
    expect(fields({ bands: ["red", "mauve", "red", "gold"] }).bands).toMatch(/mauve/);
    expect(fields({ bands: ["gold", "red", "red", "gold"] }).bands).toMatch(/First band/);
    expect(fields({ bands: ["black", "red", "red", "gold"] }).bands).toMatch(/black/);
    expect(fields({ bands: ["red", "red", "red", "white"] }).bands).toMatch(/tolerance/);
    expect(fields({ bands: ["red", "red", "red", "black"] }).bands).toMatch(/tolerance/);
    expect(fields({ bands: [1, 2, 3] }).bands).toBeDefined();
  });

  it("refuses values the code cannot show, under resistance or tolerance", () => {
    expect(fields({ resistance: "10.25k" }).resistance).toMatch(/three significant figures/);
    expect(fields({ resistance: "1m" }).resistance).toMatch(/range/);
    expect(fields({ resistance: "4k7", tolerance: 0.03 }).tolerance).toMatch(/no colour/);
    expect(fields({ resistance: "10.2k", tolerance: 0.2 }).tolerance).toBeDefined();
    expect(fields({ resistance: "4k7", tolerance: 0.2, temperatureCoefficient: 50 }).tolerance).toMatch(/six-band/);
    expect(fields({ resistance: "4k7", tolerance: 0.01, temperatureCoefficient: 30 }).temperatureCoefficient).toMatch(/no colour/);
    expect(fields({ resistance: "4k7", tolerance: 0.01, temperatureCoefficient: "fast" }).temperatureCoefficient).toMatch(/ppm\/K/);
    expect(fields({ resistance: "4k7", tolerance: 0.01, temperatureCoefficient: -50 })).toHaveProperty("temperatureCoefficient");
    expect(fields({ resistance: "4k7 V" })).toHaveProperty("resistance");
    expect(fields({ resistance: -100 })).toHaveProperty("resistance");
    expect(fields({ resistance: "5 V" }).resistance).toMatch(/expected a resistance, got volts/);
    expect(encodeResistance(4700, 0.05).ok).toBe(true);
  });

  it("needs exactly one of bands and resistance", () => {
    const none = fields({});
    expect(none).toHaveProperty("bands");
    expect(none).toHaveProperty("resistance");
    expect(fields({ bands: "red red red", resistance: 2200 })).toHaveProperty("resistance");
  });
});
