import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { couplingResponse, responseDb, superhetDial } from "@/lib/bench/chart-data-signal";
import { calculator as couplingCap } from "@/lib/calc/coupling-cap";
import { calculator as reactance } from "@/lib/calc/reactance";
import { calculator as superhet } from "@/lib/calc/superhet";
import { calcRunner, logUniform } from "../helpers/calc";

/** The coupling capacitor's and the superhet's pictures, checked against their calculators' own results. */

const coupling = calcRunner<{ cornerFrequency: number }>(couplingCap);
const xc = calcRunner<{ capacitiveReactance: number }>(reactance);
const plan = calcRunner<{ oscillatorFrequency: number; imageFrequency: number; imageRejectionDb: number | null }>(superhet);

function responseFor(raw: Record<string, unknown>) {
  const r = coupling.run(raw);
  return { r, d: couplingResponse(r.inputs, r.outputs)! };
}

describe("coupling capacitor: the response around the corner", () => {
  it("0.05 µF into 470k from 47k: the corner is the calculator's, and the curve is 3 dB down there", () => {
    // fc = 1/(2π·C·(Rg + Rs)) = 6.16 Hz (Radiotron Designer's Handbook ch. 12); −3.01 dB is the half-power point (Terman)
    const { r, d } = responseFor({ capacitance: "0.05 uF", gridResistance: "470k", sourceResistance: "47k" });
    expect(d.corner).toBe(r.outputs.cornerFrequency);
    expect(d.corner).toBeCloseTo(6.1569, 3);
    expect(responseDb(d.corner, d.corner)).toBeCloseTo(-3.0103, 4);
    expect(d.points[0].f).toBeCloseTo(d.corner / 10, 9);
    expect(d.points[0].db).toBeCloseTo(-20.043, 3); // 10·log10(1 + 10²)
    expect(d.points[d.points.length - 1].db).toBeGreaterThan(-0.001); // a hundred times the corner: all but 0.0004 dB
  });

  it("at every point fc/f is the capacitor's reactance over the series resistance (the reactance calculator's X_C)", () => {
    const { d } = responseFor({ capacitance: "22 nF", gridResistance: "1M", sourceResistance: "38k" });
    for (const p of d.points.filter((_, i) => i % 15 === 0)) {
      const x = xc.out({ frequency: p.f, capacitance: 22e-9 }).capacitiveReactance / (1e6 + 38e3);
      expect(p.db).toBeCloseTo(-10 * Math.log10(1 + x * x), 9);
    }
  });

  it("property: the response rises with frequency, never above 0 dB, and falls 6 dB per octave well below the corner", () => {
    fc.assert(
      fc.property(logUniform(1e-10, 1e-5), logUniform(1e4, 5e6), (c, rg) => {
        const { d } = responseFor({ capacitance: c, gridResistance: rg });
        for (let i = 1; i < d.points.length; i++) expect(d.points[i].db).toBeGreaterThan(d.points[i - 1].db);
        expect(d.points.every((p) => p.db <= 0)).toBe(true);
        // Far below the corner a first-order high-pass loses 20·log10(2) = 6.02 dB per halving (Terman)
        expect(responseDb(d.corner, d.corner / 200) - responseDb(d.corner, d.corner / 400)).toBeCloseTo(6.0206, 3);
      }),
      { numRuns: 60 },
    );
  });
});

describe("superhet: the dial with signal, oscillator and image", () => {
  it("1000 kHz with a 455 kHz IF and Q 100: marks at 1000, 1455 and 1910 kHz, the image 42.8 dB down on the curve", () => {
    // Kennedy & Davis, Electronic Communication Systems, receivers chapter worked example: α = 138.6, 42.8 dB (from memory)
    const r = plan.run({ signalFrequency: "1000 kHz", intermediateFrequency: "455 kHz", loadedQ: 100 });
    const d = superhetDial(r.inputs, r.outputs)!;
    expect(d.marks.map((m) => [m.name, m.f])).toEqual([
      ["Signal", 1e6],
      ["Oscillator", r.outputs.oscillatorFrequency],
      ["Image", r.outputs.imageFrequency],
    ]);
    expect(d.marks[2].f).toBeCloseTo(1.91e6, 3);
    const at = (f: number) => d.response!.find((p) => p.f === f)!.db;
    expect(at(1e6)).toBeCloseTo(0, 12);
    expect(at(d.marks[2].f)).toBeCloseTo(-(r.outputs.imageRejectionDb as number), 9);
    expect(at(d.marks[2].f)).toBeCloseTo(-42.84, 1);
    expect(d.span[0]).toBeLessThan(1e6);
    expect(d.span[1]).toBeGreaterThan(1.91e6);
  });

  it("without a loaded Q the dial has its three marks and no curve", () => {
    const r = plan.run({ signalFrequency: "1000 kHz" });
    const d = superhetDial(r.inputs, r.outputs)!;
    expect(d.response).toBeUndefined();
    expect(d.marks).toHaveLength(3);
  });

  it("property: the oscillator sits one IF from the signal, the image one IF beyond it (or the sum lands on the IF)", () => {
    fc.assert(
      fc.property(logUniform(2e5, 3e8), logUniform(1e5, 2e7), fc.boolean(), (fs, fif, above) => {
        fc.pre(above || (fif < fs && Math.abs(fs - 2 * fif) > 1e-6 * fs));
        const r = plan.run({ signalFrequency: fs, intermediateFrequency: fif, oscillatorAbove: above, loadedQ: 60 });
        const d = superhetDial(r.inputs, r.outputs)!;
        const [s, o, im] = d.marks.map((m) => m.f);
        expect(Math.abs(o - s)).toBeCloseTo(fif, 3);
        const lands = Math.abs(im - o) - fif;
        const sum = im + o - fif;
        expect(Math.min(Math.abs(lands), Math.abs(sum)) / fif).toBeLessThan(1e-9);
        expect(d.response!.every((p) => p.db <= 1e-12)).toBe(true);
        for (const m of d.marks) expect(m.f >= d.span[0] && m.f <= d.span[1]).toBe(true);
      }),
      { numRuns: 80 },
    );
  });
});
