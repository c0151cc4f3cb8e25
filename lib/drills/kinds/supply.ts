import { slipOf } from "../calc";
import type { Rng } from "../rng";
import type { DrillKind, DrillSetup, SolvedContext } from "../types";
import { fmt, RELATIVE_2 } from "./common";

/** The power supply: ripple on the reservoir, the peak a capacitor charges to, B+ under load. */

/** A reservoir and its load: transformer sets full-wave, AC/DC sets half-wave from the mains (common practice). */
function drawReservoir(rng: Rng) {
  const halfWave = rng.chance(0.35);
  return {
    rectifier: halfWave ? ("half-wave" as const) : ("full-wave" as const),
    lineFrequency: rng.pick([50, 60]),
    loadCurrent: rng.pick(halfWave ? [30, 40, 50, 60] : [40, 50, 60, 70, 80, 100, 120]) * 1e-3,
    capacitance: rng.pick(halfWave ? [20, 30, 40, 50] : [8, 10, 16, 20, 32, 40]) * 1e-6,
  };
}

function rippleSetup(rng: Rng, ask: string): DrillSetup {
  const r = drawReservoir(rng);
  const circuit = r.rectifier === "half-wave" ? "a half-wave rectifier straight from the mains" : "a full-wave rectifier";
  return {
    inputs: r,
    prompt: `A ${fmt(r.capacitance, "F")} reservoir after ${circuit} on ${fmt(r.lineFrequency, "Hz")} mains feeds a set drawing ${fmt(r.loadCurrent, "A")}. ${ask}`,
    given: { Reservoir: fmt(r.capacitance, "F"), Rectifier: r.rectifier, Mains: fmt(r.lineFrequency, "Hz"), "Load current": fmt(r.loadCurrent, "A") },
  };
}

/** The same ripple with the other rectifier: the frequency slip. */
function otherRectifier(ctx: SolvedContext, output: string) {
  const full = ctx.inputs.rectifier === "full-wave";
  return {
    value: slipOf("supply-ripple", { ...ctx.inputs, rectifier: full ? "half-wave" : "full-wave" }, output),
    step: "Ripple frequency",
    hint: full
      ? "A full-wave rectifier charges the reservoir twice each mains cycle: the ripple is at twice the mains frequency."
      : "A half-wave rectifier charges the reservoir once each mains cycle: the ripple is at the mains frequency.",
  };
}

/** Transformer secondaries and AC/DC lines: rms volts a meter reads (per half of a centre-tapped winding). */
function drawSecondary(rng: Rng) {
  if (rng.chance(0.3))
    return { secondaryVoltage: rng.pick([110, 117, 120]), rectifier: "half-wave" as const, what: "the mains (an AC/DC set, no transformer)" };
  return { secondaryVoltage: rng.pick([250, 275, 300, 325, 350, 375]), rectifier: "full-wave" as const, what: "each half of a centre-tapped secondary" };
}

export const supplyKinds: DrillKind[] = [
  {
    id: "supply-ripple/peak-to-peak",
    slug: "supply-ripple",
    title: "Ripple on a reservoir capacitor",
    direction: "forward",
    asked: { name: "ripplePeakToPeak", label: "ripple, peak to peak", unit: "V" },
    tolerance: RELATIVE_2,
    answerStep: "Ripple on the reservoir, peak to peak",
    generate: (rng) => rippleSetup(rng, "How much ripple, peak to peak, is on the reservoir?"),
    mistakes: (ctx) => [otherRectifier(ctx, "ripplePeakToPeak")],
  },
  {
    id: "supply-ripple/rms",
    slug: "supply-ripple",
    title: "Ripple on a reservoir, rms",
    direction: "forward",
    asked: { name: "rippleRms", label: "ripple, rms", unit: "V" },
    tolerance: RELATIVE_2,
    answerStep: "Ripple on the reservoir, rms",
    generate: (rng) => rippleSetup(rng, "What rms ripple would an AC meter across the reservoir read?"),
    mistakes: (ctx) => [
      otherRectifier(ctx, "rippleRms"),
      {
        value: ctx.outputs.ripplePeakToPeak as number,
        step: "Ripple on the reservoir, rms",
        hint: "That is peak to peak; the rms of a sawtooth is Vpp/(2√3).",
      },
      {
        value: (ctx.outputs.ripplePeakToPeak as number) / (2 * Math.SQRT2),
        step: "Ripple on the reservoir, rms",
        hint: "The reservoir's ripple is a sawtooth (a slow fall, a quick recharge), not a sine: its rms is Vpp/(2√3), not Vpp/(2√2).",
      },
    ],
  },
  {
    id: "b-plus/peak",
    slug: "b-plus",
    title: "Peak a reservoir charges to",
    direction: "forward",
    asked: { name: "peakVoltage", label: "peak voltage", unit: "V" },
    tolerance: RELATIVE_2,
    answerStep: "Peak of the secondary",
    generate(rng) {
      const s = drawSecondary(rng);
      const inputs = {
        secondaryVoltage: s.secondaryVoltage,
        rectifier: s.rectifier,
        rectifierDrop: 0,
        loadCurrent: 0.05,
        capacitance: 40e-6,
        lineFrequency: 60,
      };
      return {
        inputs,
        prompt: `A meter reads ${fmt(s.secondaryVoltage, "V")} AC across ${s.what}. With no load, to what peak does the reservoir capacitor charge (ignore the rectifier's drop)?`,
        given: { "AC reading (rms)": fmt(s.secondaryVoltage, "V"), Circuit: s.rectifier },
      };
    },
    mistakes: (ctx) => [
      {
        value: ctx.inputs.secondaryVoltage as number,
        step: "Peak of the secondary",
        hint: "A meter reads the rms; the capacitor charges to the peak of the sine, √2 times as much.",
      },
      {
        value: 2 * (ctx.outputs.peakVoltage as number),
        step: "Peak of the secondary",
        hint: "That is peak to peak; the capacitor charges to one peak, √2 times the rms.",
      },
    ],
  },
  {
    id: "b-plus/dc-output",
    slug: "b-plus",
    title: "B+ under load",
    direction: "forward",
    asked: { name: "dcOutput", label: "B+ under load", unit: "V" },
    tolerance: RELATIVE_2,
    answerStep: "B+ under load",
    generate(rng) {
      const s = drawSecondary(rng);
      const r = drawReservoir(rng);
      // Drops of the era's rectifiers at a typical load (tables/rectifiers.ts): 35W4-class half-wave
      // tubes about 15–20 V, full-wave tubes from 17 V (5AR4) to 60 V (5Y3GT); silicon about 1 V.
      const tube = rng.chance(0.6);
      const drop = tube ? rng.pick(s.rectifier === "half-wave" ? [15, 20] : [17, 25, 44, 50, 60]) : 1;
      const inputs = {
        secondaryVoltage: s.secondaryVoltage,
        rectifier: s.rectifier,
        rectifierDrop: drop,
        loadCurrent: r.loadCurrent,
        capacitance: r.capacitance,
        lineFrequency: r.lineFrequency,
      };
      return {
        inputs,
        prompt:
          `${fmt(s.secondaryVoltage, "V")} AC (rms) across ${s.what} feeds a ${s.rectifier} ${tube ? "tube rectifier" : "silicon rectifier"} that drops ${fmt(drop, "V")}, ` +
          `into a ${fmt(r.capacitance, "F")} reservoir on ${fmt(r.lineFrequency, "Hz")} mains. The set draws ${fmt(r.loadCurrent, "A")}. Estimate the B+ on the reservoir.`,
        given: {
          "AC (rms)": fmt(s.secondaryVoltage, "V"),
          Circuit: s.rectifier,
          "Rectifier drop": fmt(drop, "V"),
          Reservoir: fmt(r.capacitance, "F"),
          Mains: fmt(r.lineFrequency, "Hz"),
          "Load current": fmt(r.loadCurrent, "A"),
        },
      };
    },
    // The estimate only holds while the ripple is small beside B+ (the Bench cautions otherwise).
    accept: (ctx) => !ctx.warnings.some((w) => w.level === "caution") && (ctx.expected as number) > 0,
    mistakes: (ctx) => [
      {
        value: (ctx.expected as number) + (ctx.outputs.ripplePeakToPeak as number) / 2,
        step: "B+ under load",
        hint: "The reservoir sags between charging peaks: the average sits half the peak-to-peak ripple below the top.",
      },
      {
        value: (ctx.expected as number) - (ctx.outputs.peakVoltage as number) + (ctx.inputs.secondaryVoltage as number),
        step: "Peak of the secondary",
        hint: "Start from the peak, √2 times the rms reading: the capacitor charges to the top of the sine.",
      },
    ],
  },
];
