import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { runCalculator } from "@/lib/calc/run";
import { E12 } from "@/lib/calc/tables/preferred-values";
import { findVrTube, VR_TUBES } from "@/lib/calc/tables/vr-tubes";
import { calculator } from "@/lib/calc/vr-tube";
import { calcRunner, logUniform } from "../helpers/calc";

type Out = {
  seriesResistance: number;
  tubeCurrentAtMinLoad: number;
  tubeCurrentAtMaxLoad: number;
  resistorPower: number;
  suggestedRating: number | null;
  preferredResistance: number;
  strikingVoltage: number | null;
  voltageBeforeStrike: number;
};

const { run, out, fields } = calcRunner<Out>(calculator);
const cautions = (raw: Record<string, unknown>) =>
  run(raw)
    .warnings.filter((w) => w.level === "caution")
    .map((w) => w.message);
const isE12 = (x: number) => {
  const m = x / 10 ** Math.floor(Math.log10(x) + 1e-12);
  return E12.some((e) => Math.abs(e - m) < 1e-9 * e);
};

describe("vr-tube: the built-in table against the data sheets", () => {
  it("0A2 150 V, 0B2 108 V, 0C3 105 V, 0D3 150 V; miniatures 5–30 mA, octals 5–40 mA", () => {
    // RCA receiving tube manual (RC-series), VR tube data (from memory)
    const row = (n: string) => findVrTube(n)!;
    expect([row("0A2").regulatedVoltage, row("0B2").regulatedVoltage, row("0C3").regulatedVoltage, row("0D3").regulatedVoltage]).toEqual([150, 108, 105, 150]);
    expect([row("0A2").maxCurrent, row("0B2").maxCurrent]).toEqual([0.03, 0.03]);
    expect([row("0C3").maxCurrent, row("0D3").maxCurrent]).toEqual([0.04, 0.04]);
    for (const t of VR_TUBES) expect(t.minCurrent).toBe(0.005);
    // 0A2 starting supply 185 V (data sheet, from memory; agrees with a published summary)
    expect(row("0A2").strikingVoltage).toBe(185);
    // every striking voltage is above the burning voltage: a glow needs more to start than to run (any gas-discharge text)
    for (const t of VR_TUBES) expect(t.strikingVoltage).toBeGreaterThan(t.regulatedVoltage);
  });

  it("reads the names the trade writes: OA2 with a letter O, VR150, vr-105", () => {
    expect(findVrTube("OA2")?.type).toBe("0A2");
    expect(findVrTube(" vr150 ")?.type).toBe("0D3");
    expect(findVrTube("VR-105")?.type).toBe("0C3");
    expect(findVrTube("6V6")).toBeUndefined();
  });
});

describe("vr-tube: worked cases", () => {
  it("0A2 from 250 V, load 0–20 mA: 4 kΩ, 25 mA at no load, 2.5 W", () => {
    // R = (Vs − Vvr)/(IL,max + It,min) (Radiotron Designer's Handbook, gaseous regulators; RCA manual notes, from memory);
    // 0A2 150 V, 5–30 mA (RCA data, from memory)
    const o = out({ supplyVoltage: "250 V", tube: "0A2", loadCurrentMax: "20 mA" });
    expect(o.seriesResistance).toBeCloseTo(4000, 9);
    expect(o.tubeCurrentAtMaxLoad).toBeCloseTo(0.005, 12);
    expect(o.tubeCurrentAtMinLoad).toBeCloseTo(0.025, 12); // inside 30 mA
    expect(o.resistorPower).toBeCloseTo(2.5, 9);
    expect(o.suggestedRating).toBe(5); // 2 × 2.5 W → 5 W (common practice)
    expect(o.preferredResistance).toBe(3900); // IEC 60063 E12, at or below
    expect(o.strikingVoltage).toBe(185);
    expect(cautions({ supplyVoltage: "250 V", tube: "0A2", loadCurrentMax: "20 mA" })).toEqual([]);
  });

  it("0D3 from 300 V, load 10–40 mA: 3.33 kΩ; a load that falls to nothing overruns the 40 mA maximum", () => {
    // 0D3/VR150 150 V, 5–40 mA (RCA data, from memory)
    const o = out({ supplyVoltage: 300, tube: "0D3", loadCurrentMin: "10m", loadCurrentMax: "40m" });
    expect(o.seriesResistance).toBeCloseTo(3333.33, 2);
    expect(o.tubeCurrentAtMinLoad).toBeCloseTo(0.035, 12);
    expect(cautions({ supplyVoltage: 300, tube: "0D3", loadCurrentMin: "10m", loadCurrentMax: "40m" })).toEqual([]);
    const swing = cautions({ supplyVoltage: 300, tube: "0D3", loadCurrentMax: "40m" });
    expect(swing.some((m) => /45 mA at the least load, above the 5 mA to 40 mA/.test(m) && /no single resistor/.test(m))).toBe(true);
  });

  it("0C3 from 200 V with 30 mA: (200 − 105)/35 mA = 2.71 kΩ, 3.3 W", () => {
    // 0C3/VR105 105 V, 5–40 mA (RCA data, from memory)
    const o = out({ supplyVoltage: "200V", tube: "VR105", loadCurrentMin: "20 mA", loadCurrentMax: "30 mA" });
    expect(o.seriesResistance).toBeCloseTo(95 / 0.035, 6);
    expect(o.resistorPower).toBeCloseTo((95 * 95) / (95 / 0.035), 9);
    expect(o.tubeCurrentAtMinLoad).toBeCloseTo(0.015, 12);
  });

  it("a fitted resistor too large drops the tube out at full load; too small overruns it at no load", () => {
    // 0A2 from 250 V, 0–20 mA: 4.7 kΩ passes 21.3 mA, leaving 1.3 mA < 5 mA; 5.6 kΩ passes 17.9 mA < 20 mA; 2.7 kΩ passes 37 mA > 30 mA
    const base = { supplyVoltage: 250, tube: "0A2", loadCurrentMax: 0.02 };
    const big = run({ ...base, fittedResistance: "4.7k" });
    expect(big.outputs.tubeCurrentAtMaxLoad as number).toBeCloseTo(100 / 4700 - 0.02, 12);
    expect(big.outputs.seriesResistance).toBeCloseTo(4000, 9); // the calculation stays the calculation
    expect(big.warnings.some((w) => w.level === "caution" && /drops out of regulation/.test(w.message))).toBe(true);
    const huge = run({ ...base, fittedResistance: "5.6k" });
    expect(huge.outputs.tubeCurrentAtMaxLoad).toBe(0);
    expect(huge.warnings.some((w) => /tube goes out/.test(w.message))).toBe(true);
    expect(huge.steps.some((s) => /goes out/.test(s.latex))).toBe(true);
    const small = run({ ...base, fittedResistance: "2.7k" });
    expect(small.outputs.tubeCurrentAtMinLoad as number).toBeCloseTo(100 / 2700, 12);
    expect(small.warnings.some((w) => w.level === "caution" && /above the 5 mA to 30 mA/.test(w.message) && /larger resistor/.test(w.message))).toBe(true);
  });

  it("the supply must exceed the striking voltage, with the load connected", () => {
    // 0A2 starts at 185 V (data sheet, from memory). 170 V never strikes it.
    expect(cautions({ supplyVoltage: 170, tube: "0A2", loadCurrentMax: "10m" }).some((m) => /below the 185 V/.test(m))).toBe(true);
    // 200 V, 25 mA load (6 kΩ) through 1.67 kΩ: 200 × 6/7.67 = 156.5 V on the tube before it strikes, below 185 V
    const o = out({ supplyVoltage: 200, tube: "0A2", loadCurrentMax: "25m" });
    expect(o.voltageBeforeStrike).toBeCloseTo((200 * 6000) / (6000 + 50 / 0.03), 6);
    const early = run({ supplyVoltage: 200, tube: "0A2", loadCurrentMax: "25m" }).warnings.find((w) => /before it strikes/.test(w.message))!;
    expect(early.level).toBe("info"); // a load of tubes still warming up draws little at switch-on (common practice)
    expect(early.message).toMatch(/only 157 V before it strikes, and it may not light/);
    // 5 mA (30 kΩ) through 15 kΩ leaves 300 × 30/45 = 200 V, above 185 V: compared with the data sheet's figure, never called safe
    const r = run({ supplyVoltage: 300, tube: "0A2", loadCurrentMax: "5m" });
    const note = r.warnings.find((w) => /Striking:/.test(w.message))!;
    expect(note.level).toBe("info");
    expect(note.message).toMatch(/both above the 185 V the 0A2's data sheet gives/);
    expect(r.outputs.voltageBeforeStrike).toBeCloseTo(200, 9);
    for (const w of r.warnings) expect(w.message).not.toMatch(/\bsafe\b/i);
  });

  it("custom figures work, and without a striking voltage it says to read one from the data sheet", () => {
    const r = run({ supplyVoltage: 120, regulatedVoltage: "75 V", minCurrent: "5 mA", maxCurrent: "40 mA", loadCurrentMax: "10 mA" });
    expect(r.outputs.seriesResistance).toBeCloseTo(3000, 9);
    expect(r.outputs.strikingVoltage).toBeNull();
    expect(r.warnings.some((w) => /No striking voltage given/.test(w.message))).toBe(true);
  });

  it("danger above 50 V; none for a low-voltage custom regulator", () => {
    expect(run({ supplyVoltage: 250, tube: "0A2", loadCurrentMax: 0.01 }).warnings[0].level).toBe("danger");
    const low = run({ supplyVoltage: 40, regulatedVoltage: 30, minCurrent: 0.001, maxCurrent: 0.01, loadCurrentMax: 0.002 });
    expect(low.warnings.some((w) => w.level === "danger")).toBe(false);
  });
});

describe("vr-tube: identities and properties", () => {
  it("property: full load leaves exactly the minimum, the currents differ by the load swing, P = ΔV²/R, E12 at or below", () => {
    fc.assert(
      fc.property(
        fc.constantFrom(...VR_TUBES),
        fc.double({ min: 1.01, max: 4, noNaN: true }),
        logUniform(1e-4, 0.1),
        fc.double({ min: 0, max: 1, noNaN: true }),
        (tube, k, ilMax, frac) => {
          const vs = tube.regulatedVoltage * k;
          const ilMin = ilMax * frac;
          const r = run({ supplyVoltage: vs, tube: tube.type, loadCurrentMin: ilMin, loadCurrentMax: ilMax });
          const o = r.outputs as unknown as Out;
          const drop = vs - tube.regulatedVoltage;
          for (const v of Object.values(o)) if (v !== null) expect(Number.isFinite(v)).toBe(true);
          expect((o.seriesResistance * (ilMax + tube.minCurrent)) / drop).toBeCloseTo(1, 9);
          expect(o.tubeCurrentAtMaxLoad / tube.minCurrent).toBeCloseTo(1, 9);
          expect(o.tubeCurrentAtMinLoad - o.tubeCurrentAtMaxLoad).toBeCloseTo(ilMax - ilMin, 9);
          expect(o.resistorPower / ((drop * drop) / o.seriesResistance)).toBeCloseTo(1, 9);
          expect(isE12(o.preferredResistance)).toBe(true);
          expect(o.preferredResistance).toBeLessThanOrEqual(o.seriesResistance * (1 + 1e-9));
          expect(o.preferredResistance * 1.25).toBeGreaterThan(o.seriesResistance); // widest E12 step: 1.2 → 1.5
          expect(o.voltageBeforeStrike).toBeLessThanOrEqual(vs);
          expect(o.voltageBeforeStrike).toBeGreaterThan(0);
          const over = r.warnings.some((w) => w.level === "caution" && /at the least load, above/.test(w.message));
          expect(over).toBe(ilMax - ilMin + tube.minCurrent > tube.maxCurrent * (1 + 1e-9));
          expect(r.warnings.some((w) => /drops out|goes out/.test(w.message))).toBe(false);
          expect(r.warnings[0].level).toBe("danger"); // every listed tube runs above 50 V
        },
      ),
    );
  });
});

describe("vr-tube: refusals", () => {
  it("a tube or its figures, not both; the figures all there without a tube", () => {
    expect(fields({ supplyVoltage: 250, tube: "0A2", regulatedVoltage: 150, loadCurrentMax: 0.01 }).regulatedVoltage).toMatch(/either a tube/);
    const missing = fields({ supplyVoltage: 250, loadCurrentMax: 0.01 });
    expect(Object.keys(missing).sort()).toEqual(["maxCurrent", "minCurrent", "regulatedVoltage"]);
    expect(fields({ supplyVoltage: 250, tube: "6V6", loadCurrentMax: 0.01 }).tube).toMatch(/one of 0A2, 0B2, 0C3, 0D3/);
    expect(fields({ supplyVoltage: 250, regulatedVoltage: 150, minCurrent: 0.03, maxCurrent: 0.005, loadCurrentMax: 0.01 }).maxCurrent).toMatch(
      /above the minimum/,
    );
    expect(
      fields({ supplyVoltage: 250, regulatedVoltage: 150, minCurrent: 0.005, maxCurrent: 0.03, strikingVoltage: 100, loadCurrentMax: 0.01 }),
    ).toHaveProperty("strikingVoltage");
  });

  it("supply above the regulated voltage; least load not above the greatest", () => {
    expect(fields({ supplyVoltage: 150, tube: "0A2", loadCurrentMax: 0.01 }).supplyVoltage).toMatch(/above the tube's regulated 150 V/);
    expect(fields({ supplyVoltage: 250, tube: "0A2", loadCurrentMin: 0.02, loadCurrentMax: 0.01 })).toHaveProperty("loadCurrentMin");
  });

  it("property: non-finite, negative, wrong-unit or missing values are refused under their field", () => {
    const bad = fc.oneof(fc.double({ max: -1e-3, noNaN: true }), fc.constantFrom("abc", "5 F", Number.NaN, Number.POSITIVE_INFINITY));
    const good = { supplyVoltage: 250, tube: "0A2", loadCurrentMin: 0, loadCurrentMax: 0.01, fittedResistance: 4000 };
    for (const name of ["supplyVoltage", "loadCurrentMin", "loadCurrentMax", "fittedResistance"]) {
      fc.assert(fc.property(bad, (v) => void expect(fields({ ...good, [name]: v })).toHaveProperty(name)));
    }
    expect(fields({ supplyVoltage: 250, tube: "0A2" })).toHaveProperty("loadCurrentMax");
    expect(runCalculator(calculator, { ...good, loadCurrentMax: "20 mA" }).ok).toBe(true);
  });
});
