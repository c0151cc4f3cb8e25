import { preferredAbove, preferredBelow } from "../../calc/tables/preferred-values";
import { runFor } from "../calc";
import type { Rng } from "../rng";
import type { DrillKind, DrillSetup, MistakeSpec, SolvedContext } from "../types";
import { EXACT, fmt, roundTo } from "./common";

/** Parts on the bench: a drifted resistor, preferred values, the colour code. */

const TOLERANCES = [0.05, 0.1, 0.2] as const;
const pct = (t: number) => `${Math.round(t * 100)} %`;

function driftSetup(rng: Rng, ask: string): DrillSetup {
  const nominal = rng.preferred("E12", 10e3, 2.2e6);
  const tolerance = rng.pick(TOLERANCES);
  // Carbon composition drifts up with age far more often than down (common practice).
  const drift = rng.chance(0.75) ? rng.next() * 0.5 : -rng.next() * 0.25;
  const measured = roundTo(nominal * (1 + drift), 3);
  return {
    inputs: { nominal, measured, tolerance },
    prompt: `A carbon resistor marked ${fmt(nominal, "Ω")} ±${pct(tolerance)} measures ${fmt(measured, "Ω")} with one lead lifted. ${ask}`,
    given: { Marked: fmt(nominal, "Ω"), Tolerance: `±${pct(tolerance)}`, Measured: fmt(measured, "Ω") },
  };
}

/** Clear of the tolerance edge by a point, so rounding the reading cannot change the verdict. */
const clearOfEdge = (ctx: SolvedContext) => Math.abs(Math.abs(ctx.outputs.deviation as number) - (ctx.inputs.tolerance as number)) > 0.01;

/** A value worked out at the bench, to three figures, between 10 Ω and 1 MΩ, not itself a series member. */
function drawValue(rng: Rng): number {
  return roundTo(10 ** (1 + 5 * rng.next()), 3);
}

/** A resistor as the colour code marks it: an E12 or E24 value with a tolerance band. */
function drawMarked(rng: Rng, tolerances: readonly number[] = [0.05, 0.1, 0.01, 0.02]) {
  const resistance = rng.preferred(rng.pick(["E12", "E24"] as const), 1, 10e6);
  const tolerance = rng.pick(tolerances);
  return { resistance, tolerance, bands: runFor("colour-code", { resistance, tolerance }).outputs.bands as string[] };
}

/** Bands for a tenfold slip in the multiplier, when the code can show that value. */
function shiftedBands(ctx: SolvedContext, factor: number): MistakeSpec[] {
  try {
    const r = runFor("colour-code", { resistance: (ctx.inputs.resistance as number) * factor, tolerance: ctx.inputs.tolerance });
    const hint = "The multiplier band is the power of ten, the number of noughts after the figures: count them again.";
    return [{ value: (r.outputs.bands as string[]).join(" "), step: "Bands", hint }];
  } catch {
    return [];
  }
}

export const partsKinds: DrillKind[] = [
  {
    id: "resistor-drift/verdict",
    slug: "resistor-drift",
    title: "Is a drifted resistor within tolerance?",
    direction: "forward",
    asked: { name: "verdict", label: "verdict", unit: "text", choices: ["within", "high", "low"] },
    tolerance: EXACT,
    answerStep: "Compare with the tolerance",
    synonyms: {
      within: ["within tolerance", "in tolerance", "inside tolerance"],
      high: ["reads high", "too high", "drifted high", "high out of tolerance"],
      low: ["reads low", "too low", "drifted low", "low out of tolerance"],
    },
    generate: (rng) => driftSetup(rng, "Is it within its tolerance, high, or low?"),
    accept: clearOfEdge,
    mistakes(ctx) {
      const t = ctx.inputs.tolerance as number;
      const other = t === 0.2 ? 0.1 : 0.2;
      const v = verdictAt(ctx, other);
      return [{ value: v, step: "Compare with the tolerance", hint: `Judge it against its own band's ±${pct(t)}, not ±${pct(other)}.` }];
    },
  },
  {
    id: "resistor-drift/deviation",
    slug: "resistor-drift",
    title: "How far a resistor has drifted",
    direction: "forward",
    asked: { name: "deviation", label: "deviation from the marked value", unit: "%" },
    tolerance: { type: "absolute", amount: 0.005 },
    answerStep: "Deviation",
    generate: (rng) => driftSetup(rng, "By what percentage does it differ from its marked value (+ high, − low)?"),
    mistakes: (ctx) => {
      const n = ctx.inputs.nominal as number;
      const m = ctx.inputs.measured as number;
      const d = ctx.expected as number;
      return [
        { value: -d, step: "Deviation", hint: "Measured minus marked, over the marked value: a resistor reading above its marking has a positive deviation." },
        { value: (m - n) / m, step: "Deviation", hint: "Divide by the marked (nominal) value, not by the reading." },
        { value: d / 100, step: "Deviation", hint: "The answer is asked in per cent: a deviation of 0.28 is 28 %." },
      ];
    },
  },
  {
    id: "preferred-value/nearest",
    slug: "preferred-value",
    title: "Nearest preferred value",
    direction: "forward",
    asked: { name: "nearest", label: "nearest preferred value", unit: "Ω" },
    tolerance: EXACT,
    answerStep: "Nearest preferred value",
    generate(rng) {
      const value = drawValue(rng);
      const series = rng.pick(["E12", "E24"] as const);
      return {
        inputs: { value, series },
        prompt: `The working says ${fmt(value, "Ω")}. Which ${series} resistor is nearest (on the series' own log scale)?`,
        given: { "Worked-out value": fmt(value, "Ω"), Series: series },
      };
    },
    accept: (ctx) => ctx.outputs.below !== ctx.outputs.above,
    mistakes(ctx) {
      const x = ctx.inputs.value as number;
      const series = ctx.inputs.series as "E12" | "E24";
      const below = preferredBelow(x, series);
      const above = preferredAbove(x, series);
      const linear = x - below <= above - x ? below : above;
      const other = ctx.expected === below ? above : below;
      return [
        { value: linear, step: "Distance on a log scale", hint: "The series is spaced by ratios: compare x/below with above/x, not the differences." },
        {
          value: other,
          step: "Nearest preferred value",
          hint: "That is the neighbour on the other side; take the nearer one on the log scale, whichever side it is.",
        },
      ];
    },
  },
  {
    id: "colour-code/read",
    slug: "colour-code",
    title: "Reading a resistor's colour code",
    direction: "forward",
    asked: { name: "resistance", label: "resistance", unit: "Ω" },
    tolerance: EXACT,
    answerStep: "Figures and multiplier",
    generate(rng) {
      const m = drawMarked(rng);
      return {
        inputs: { bands: m.bands },
        prompt: `A resistor's bands read, from the end they crowd towards: ${m.bands.join(", ")}. What is its resistance?`,
        given: { Bands: m.bands.join(", ") },
      };
    },
    mistakes: (ctx) => [
      {
        value: (ctx.expected as number) * 10,
        step: "Figures and multiplier",
        hint: "The multiplier band is a power of ten (the number of noughts), not another figure.",
      },
      {
        value: (ctx.expected as number) / 10,
        step: "Figures and multiplier",
        hint: "Count the noughts again: the multiplier's colour gives the power of ten.",
      },
    ],
  },
  {
    id: "colour-code/bands",
    slug: "colour-code",
    title: "Colour bands for a resistor",
    direction: "forward",
    asked: { name: "bands", label: "colour bands, in order", unit: "text" },
    tolerance: EXACT,
    answerStep: "Bands",
    generate(rng) {
      // ±5 % and ±10 %: always four bands (close-tolerance parts are often marked with five instead).
      const m = drawMarked(rng, [0.05, 0.1]);
      return {
        inputs: { resistance: m.resistance, tolerance: m.tolerance },
        prompt: `What four colour bands mark a ${fmt(m.resistance, "Ω")} ±${m.tolerance * 100} % resistor, in order from the first figure?`,
        given: { Resistance: fmt(m.resistance, "Ω"), Tolerance: `±${m.tolerance * 100} %` },
      };
    },
    mistakes: (ctx) => [...shiftedBands(ctx, 10), ...shiftedBands(ctx, 0.1)],
  },
];

/** The drift verdict judged against another tolerance: the slip of reading the wrong band. */
function verdictAt(ctx: SolvedContext, tolerance: number): string {
  return runFor("resistor-drift", { ...ctx.inputs, tolerance }).outputs.verdict as string;
}
