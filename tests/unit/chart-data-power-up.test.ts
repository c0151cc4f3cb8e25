import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { COMMON_LAMPS, lampCurrent, lampCurves, reformingSchedule } from "@/lib/bench/chart-data-power-up";
import { calculator as reforming } from "@/lib/calc/reforming";
import { calculator as seriesLamp } from "@/lib/calc/series-lamp";
import { calcRunner, logUniform } from "../helpers/calc";

/** The series lamp's and reforming's pictures, checked against their calculators' own results. */

const lamp = calcRunner<{ maxCurrent: number; setCurrent: number | null; setVoltage: number | null }>(seriesLamp);
const reform = calcRunner<{ leakageLimit: number; steps: { voltage: number; minutes: number; leakageLimit: number }[] }>(reforming);

function lampChart(raw: Record<string, unknown>) {
  const r = lamp.run(raw);
  const d = lampCurves(r.inputs, r.outputs);
  if (!d) throw new Error("no chart data");
  return { r, d };
}

describe("series lamp: current against set power", () => {
  it("every point of every lamp's line is the calculator's own set current for that lamp and set", () => {
    const { d } = lampChart({ lineVoltage: "120 V", lampPower: "75 W", setPower: "35 W" });
    expect(d.lines.map((l) => l.lampPower)).toEqual([25, 40, 60, 75, 100, null]);
    for (const l of d.lines.filter((x) => x.lampPower !== null)) {
      for (const p of d.points.filter((_, i) => i % 12 === 5)) {
        const o = lamp.out({ lineVoltage: 120, lampPower: l.lampPower, setPower: p.setPower });
        expect(p[l.key]).toBeCloseTo(o.setCurrent!, 12);
      }
    }
  });

  it("the marked set is the result's set current: 60 W lamp, 35 W set on 120 V", () => {
    const { r, d } = lampChart({ lineVoltage: "120 V", lampPower: "60 W", setPower: "35 W" });
    expect(d.set).toEqual({ power: 35, current: r.outputs.setCurrent });
    expect(d.maxCurrent).toBeCloseTo(0.5, 12); // P/V = 60 W / 120 V (ARRL Handbook, electrical fundamentals: P = V·I)
    const yours = d.lines.find((l) => l.yours)!;
    expect(d.points.find((p) => p.setPower === 35)![yours.key]).toBe(r.outputs.setCurrent);
  });

  it("the set alone draws P/V, a 100 W set 0.833 A on 120 V", () => {
    // P = V·I: 100 W at 120 V is 0.833 A (physics textbooks' worked example, from memory)
    const { d } = lampChart({ lineVoltage: "120 V", lampPower: "60 W", setPower: "100 W" });
    expect(d.points.find((p) => p.setPower === 100)!.alone).toBeCloseTo(0.8333, 4);
  });

  it("without a set power there is no mark, and the common sizes are drawn all the same", () => {
    const { d } = lampChart({ lineVoltage: "230 V", lampPower: "60 W" });
    expect(d.set).toBeUndefined();
    expect(d.lines.filter((l) => l.lampPower !== null).map((l) => l.lampPower)).toEqual([...COMMON_LAMPS]);
    expect(d.lines.find((l) => l.yours)!.lampPower).toBe(60);
  });

  it("property: through a lamp a set draws less than alone and less than the lamp's dead-short current, and more as it grows", () => {
    fc.assert(
      fc.property(fc.double({ min: 90, max: 250, noNaN: true }), logUniform(10, 300), logUniform(1, 500), (v, pl, ps) => {
        const i = lampCurrent(v, pl, ps);
        expect(i).toBeLessThanOrEqual(ps / v + 1e-12);
        expect(i).toBeLessThanOrEqual(pl / v + 1e-12);
        expect(lampCurrent(v, pl, ps * 1.1)).toBeGreaterThan(i);
        expect(lampCurrent(v, pl, 0)).toBe(0);
      }),
    );
  });
});

describe("reforming: the voltage schedule against time", () => {
  it("40 µF, 450 V through 10k: ten steps of 45 V, 10 min each and an hour at 450 V, 150 min in all", () => {
    // Restorers' practice (common practice): steps of a tenth of rating, each held at least 10 minutes, the last an hour
    const r = reform.run({ capacitance: "40 uF", ratedVoltage: "450 V", seriesResistance: "10k" });
    const d = reformingSchedule(r.inputs, r.outputs)!;
    expect(d.steps.map((s) => s.voltage)).toEqual(r.outputs.steps && (r.outputs.steps as { voltage: number }[]).map((s) => s.voltage));
    expect(d.steps[0].voltage).toBeCloseTo(45, 12);
    expect(d.totalMinutes).toBe(9 * 10 + 60);
    expect(d.points[d.points.length - 1]).toMatchObject({ t: 150, v: 450 });
    // The leakage at rated voltage is the data-sheet form 0.01·C·V µA = 0.01 × 40 × 450 = 180 µA (general-purpose data sheets)
    expect(d.steps[9].leakageLimit).toBeCloseTo(180e-6, 12);
  });

  it("a large resistor stretches every hold to five time constants, and the time axis follows", () => {
    // τ = RC = 1 MΩ × 100 µF = 100 s; 5τ = 500 s, so each step holds ⌈500/60⌉ = 9 min, under the 10 min floor;
    // 10 MΩ gives 5000 s, 84 min per step (Ohm's law and the RC time constant)
    const r = reform.run({ capacitance: "100 uF", ratedVoltage: "400 V", seriesResistance: "10M" });
    const d = reformingSchedule(r.inputs, r.outputs)!;
    expect(d.steps.every((s) => s.minutes === 84)).toBe(true);
    expect(d.totalMinutes).toBe(840);
  });

  it("property: time and voltage only rise, each step starts where the one before ended, and the last is rated voltage", () => {
    fc.assert(
      fc.property(logUniform(1e-7, 1e-2), fc.double({ min: 6, max: 700, noNaN: true }), logUniform(100, 1e7), (c, v, rs) => {
        const r = reform.run({ capacitance: c, ratedVoltage: v, seriesResistance: rs });
        const d = reformingSchedule(r.inputs, r.outputs)!;
        for (let i = 1; i < d.points.length; i++) {
          expect(d.points[i].t).toBeGreaterThan(d.points[i - 1].t);
          expect(d.points[i].v).toBeGreaterThanOrEqual(d.points[i - 1].v);
        }
        for (let i = 1; i < d.steps.length; i++) expect(d.steps[i].start).toBe(d.steps[i - 1].start + d.steps[i - 1].minutes);
        expect(d.points[d.points.length - 1].v).toBe(v);
        expect(d.steps[d.steps.length - 1].leakageLimit).toBe(r.outputs.leakageLimit);
      }),
      { numRuns: 60 },
    );
  });
});
