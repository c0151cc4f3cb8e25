import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { calculator, decodeBands, encodeResistance } from "@/lib/calc/colour-code";
import { runCalculator } from "@/lib/calc/run";
import { TOLERANCE } from "@/lib/calc/tables/colour-code";
import { calcRunner } from "../helpers/calc";

type Out = { resistance: number; tolerance: number; bands: string[] };

const { run, out, fields } = calcRunner<Out>(calculator);

describe("colour-code: published checks (IEC 60062)", () => {
  it("yellow-violet-red-gold is 4.7 kΩ ±5 %", () => {
    // IEC 60062 colour code example (from memory)
    expect(out({ bands: ["yellow", "violet", "red", "gold"] })).toEqual({
      resistance: 4700,
      tolerance: 0.05,
      bands: ["yellow", "violet", "red", "gold"],
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
  const tolerances = Object.entries(TOLERANCE).filter(([c]) => c !== "none").map(([, t]) => t as number);

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
      fc.property(fc.integer({ min: 100, max: 999 }).filter((n) => n % 10 !== 0), fc.integer({ min: -3, max: 9 }), fc.constantFrom(...tolerances), (sig, e, t) => {
        const r = Number((sig * 10 ** e).toPrecision(12));
        const o = out({ resistance: r, tolerance: t });
        expect(o.bands.length).toBe(5);
        const back = decodeBands(o.bands);
        expect(back.ok && back.resistance / r).toBeCloseTo(1, 12);
      }),
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
    expect(fields({ bands: ["red", "red"] }).bands).toMatch(/3, 4 or 5/);
    expect(fields({ bands: ["red", "red", "red", "red", "red", "red"] }).bands).toMatch(/3, 4 or 5/);
    expect(fields({ bands: ["red", "mauve", "red", "gold"] }).bands).toMatch(/mauve/);
    expect(fields({ bands: ["gold", "red", "red", "gold"] }).bands).toMatch(/First band/);
    expect(fields({ bands: ["black", "red", "red", "gold"] }).bands).toMatch(/black/);
    expect(fields({ bands: ["red", "red", "red", "orange"] }).bands).toMatch(/tolerance/);
    expect(fields({ bands: [1, 2, 3] }).bands).toBeDefined();
  });

  it("refuses values the code cannot show, under resistance or tolerance", () => {
    expect(fields({ resistance: "10.25k" }).resistance).toMatch(/three significant figures/);
    expect(fields({ resistance: "1m" }).resistance).toMatch(/range/);
    expect(fields({ resistance: "4k7", tolerance: 0.03 }).tolerance).toMatch(/no colour/);
    expect(fields({ resistance: "10.2k", tolerance: 0.2 }).tolerance).toBeDefined();
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
