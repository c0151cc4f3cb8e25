import { nearestPreferred } from "../../calc/tables/preferred-values";
import { VR_TUBES } from "../../calc/tables/vr-tubes";
import { outputOf, runFor, slipOf } from "../calc";
import type { Rng } from "../rng";
import type { DrillKind, DrillSetup, SolvedContext } from "../types";
import { EXACT, fmt, ohms, RELATIVE_2 } from "./common";

/** Around the workbench: a VR-tube regulator, a meter's loading, two resistors for one value, pre-war markings. */

function vrSetup(rng: Rng, ask: string): DrillSetup {
  const tube = rng.pick(VR_TUBES);
  const supply = rng.pick([250, 275, 300, 350]);
  const load = rng.pick([5, 10, 15, 20]) * 1e-3;
  return {
    inputs: { supplyVoltage: supply, tube: tube.type, loadCurrentMin: 0, loadCurrentMax: load },
    prompt:
      `A ${tube.type} (${fmt(tube.regulatedVoltage, "V")}, ${fmt(tube.minCurrent, "A")} to ${fmt(tube.maxCurrent, "A")}) regulates a supply for an oscillator drawing up to ${fmt(load, "A")}, ` +
      `fed through a series resistor from ${fmt(supply, "V")}. ${ask}`,
    given: {
      Tube: tube.type,
      "Regulated voltage": fmt(tube.regulatedVoltage, "V"),
      "Tube current range": `${fmt(tube.minCurrent, "A")} to ${fmt(tube.maxCurrent, "A")}`,
      Supply: fmt(supply, "V"),
      "Greatest load": fmt(load, "A"),
    },
  };
}

const vr = (ctx: SolvedContext) => VR_TUBES.find((t) => t.type === ctx.inputs.tube)!;
/** Within the tube's range at both ends of the load (the Bench says so otherwise). */
const inRange = (ctx: SolvedContext) => !ctx.warnings.some((w) => w.level === "caution");

function meterSetup(rng: Rng, ask: string): DrillSetup {
  const ohmsPerVolt = rng.pick([1000, 5000, 20000]);
  const trueVoltage = rng.pick([45, 60, 90, 100, 120, 150]);
  const range = rng.pick([250, 500, 1000].filter((r) => r >= trueVoltage));
  const source = rng.preferred("E12", 100e3, 2.2e6);
  return {
    inputs: { trueVoltage, sourceResistance: source, ohmsPerVolt, range },
    prompt: `A screen grid sits at ${fmt(trueVoltage, "V")}, fed through ${fmt(source, "Ω")}. It is measured with a ${ohmsPerVolt} Ω/V meter on its ${fmt(range, "V")} range. ${ask}`,
    given: { "True voltage": fmt(trueVoltage, "V"), "Feed resistor": fmt(source, "Ω"), Meter: `${ohmsPerVolt} Ω/V`, Range: fmt(range, "V") },
  };
}

const atTheReading = (ctx: SolvedContext, output: string) => ({
  value: slipOf("meter-loading", { ...ctx.inputs, range: ctx.inputs.trueVoltage }, output),
  step: "Meter resistance",
  hint: "The meter's resistance is its ohms per volt times the full scale of the range in use, not times the voltage it reads.",
});

export const workbenchKinds: DrillKind[] = [
  {
    id: "vr-tube/series-resistance",
    slug: "vr-tube",
    title: "Series resistor for a VR tube",
    direction: "forward",
    asked: { name: "seriesResistance", label: "series resistance", unit: "Ω" },
    tolerance: RELATIVE_2,
    answerStep: "Series resistance",
    generate: (rng) => vrSetup(rng, "What series resistance keeps the tube at its minimum current at full load?"),
    accept: inRange,
    mistakes: (ctx) => [
      {
        value: ohms({ voltage: (ctx.inputs.supplyVoltage as number) - vr(ctx).regulatedVoltage, current: ctx.inputs.loadCurrentMax as number }, "resistance"),
        step: "Series resistance",
        hint: "The resistor carries the tube's minimum current as well as the load's: add them.",
      },
      {
        value: ohms({ voltage: ctx.inputs.supplyVoltage as number, current: (ctx.inputs.loadCurrentMax as number) + vr(ctx).minCurrent }, "resistance"),
        step: "Series resistance",
        hint: "The resistor drops the supply minus the tube's regulated voltage, not the whole supply.",
      },
    ],
  },
  {
    id: "vr-tube/resistor-power",
    slug: "vr-tube",
    title: "Power in a VR tube's series resistor",
    direction: "forward",
    asked: { name: "resistorPower", label: "resistor dissipation", unit: "W" },
    tolerance: RELATIVE_2,
    answerStep: "Resistor dissipation",
    generate: (rng) => vrSetup(rng, "With the series resistance chosen for full load, how much power does it dissipate?"),
    accept: inRange,
    mistakes: (ctx) => [
      {
        value: ohms({ voltage: ctx.inputs.supplyVoltage as number, current: (ctx.inputs.loadCurrentMax as number) + vr(ctx).minCurrent }, "power"),
        step: "Resistor dissipation",
        hint: "The resistor dissipates its own drop (supply minus the tube's voltage) times its current, not the whole supply.",
      },
    ],
  },
  {
    id: "meter-loading/reading",
    slug: "meter-loading",
    title: "What a meter reads on a high-resistance point",
    direction: "forward",
    asked: { name: "indicatedVoltage", label: "meter reading", unit: "V" },
    tolerance: RELATIVE_2,
    answerStep: "Reading",
    generate: (rng) => meterSetup(rng, "What does the meter read?"),
    mistakes: (ctx) => [atTheReading(ctx, "indicatedVoltage")],
  },
  {
    id: "meter-loading/meter-resistance",
    slug: "meter-loading",
    title: "Resistance of a meter on a range",
    direction: "forward",
    asked: { name: "meterResistance", label: "meter resistance", unit: "Ω" },
    tolerance: RELATIVE_2,
    answerStep: "Meter resistance",
    generate: (rng) => meterSetup(rng, "What resistance does the meter put across the point?"),
    mistakes: (ctx) => [atTheReading(ctx, "meterResistance")],
  },
  {
    id: "series-parallel/second-part",
    slug: "series-parallel",
    title: "Second resistor to make up a value",
    direction: "forward",
    asked: { name: "second", label: "second resistor", unit: "Ω" },
    tolerance: EXACT,
    answerStep: "In ",
    generate(rng) {
      const target = Number((10 ** (2 + 4 * rng.next())).toPrecision(3));
      const mode = rng.pick(["series", "parallel"] as const);
      const first = outputOf("series-parallel", { target, series: "E12", mode }, "first");
      return {
        inputs: { target, series: "E12", mode },
        prompt: `The working asks for ${fmt(target, "Ω")}. With a ${fmt(first, "Ω")} already on hand, which E12 resistor ${mode === "series" ? "in series with it" : "across it (in parallel)"} comes closest?`,
        given: { "Value wanted": fmt(target, "Ω"), "Resistor on hand": fmt(first, "Ω"), Connection: mode },
      };
    },
    // Keep problems where the value needed, rounded to the nearest E12 member on the log scale, is the
    // calculator's choice: a test of method, not of a tie between neighbours (plain arithmetic, a filter only).
    accept(ctx) {
      const { target, mode } = ctx.inputs as { target: number; mode: string };
      const first = ctx.outputs.first as number;
      if (ctx.outputs.mode !== mode) return false;
      const needed = mode === "series" ? target - first : 1 / (1 / target - 1 / first);
      return needed > 0 && Number.isFinite(needed) && nearestPreferred(needed, "E12") === ctx.expected;
    },
    mistakes: (ctx) => [
      {
        value: nearestPreferred(ctx.inputs.target as number, "E12"),
        step: "In ",
        hint: "Work out what the second part must make up first, then round that to the series.",
      },
    ],
  },
  {
    id: "vintage-markings/read",
    slug: "vintage-markings",
    title: "Reading a body-end-dot resistor",
    direction: "forward",
    asked: { name: "resistance", label: "resistance", unit: "Ω" },
    tolerance: EXACT,
    answerStep: "Dot",
    generate(rng) {
      const r = rng.preferred("E12", 10, 10e6);
      const [body, end, dot] = runFor("colour-code", { resistance: r, tolerance: 0.2 }).outputs.bands as string[];
      return {
        inputs: { body, end, dot },
        prompt: `A pre-war composition resistor has a ${body} body, a ${end} tip at one end and a ${dot} dot in the middle. What is its value?`,
        given: { Body: body, End: end, Dot: dot },
      };
    },
    accept: (ctx) => ctx.inputs.body !== "black",
    mistakes: (ctx) => [
      {
        value: slipOf("vintage-markings", { ...ctx.inputs, end: ctx.inputs.dot, dot: ctx.inputs.end }, "resistance"),
        step: "Dot",
        hint: "Body, end, dot: the body is the first figure, the end the second, and the dot the multiplier.",
      },
    ],
  },
];
