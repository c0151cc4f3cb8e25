import { outputOf } from "../calc";
import type { Rng } from "../rng";
import type { DrillKind, DrillSetup, SolvedContext } from "../types";
import { EXACT, fmt, noDerating, ohms, RELATIVE_2 } from "./common";

/** Dropping resistor from B+ to a stage: resistance, power, rating, and the voltage a fitted resistor leaves. */

const SLUG = "dropping-resistor";

/** What such a resistor feeds in the sets of the era, with its usual voltage and current (common practice). */
const STAGES = [
  { what: "the screens of an IF amplifier", volts: [90, 100, 125], ma: [2, 3, 4, 5] },
  { what: "a preamplifier's plate supply", volts: [150, 180, 200, 250], ma: [0.5, 1, 1.5, 2, 3] },
  { what: "an oscillator's plate", volts: [90, 100, 150], ma: [3, 4, 5, 6] },
  { what: "the driver stage", volts: [200, 250], ma: [5, 8, 10, 12, 15] },
] as const;

function draw(rng: Rng) {
  const s = rng.pick(STAGES);
  const load = rng.pick(s.volts);
  const supply = rng.pick([250, 265, 280, 300, 315, 350].filter((v) => v >= load + 30));
  return { what: s.what, supply, load, current: rng.pick(s.ma) * 1e-3 };
}

function forward(rng: Rng, ask: string): DrillSetup {
  const d = draw(rng);
  return {
    inputs: { supplyVoltage: d.supply, loadVoltage: d.load, loadCurrent: d.current },
    prompt: `A series resistor from the ${fmt(d.supply, "V")} B+ line feeds ${d.what}, which wants ${fmt(d.load, "V")} and draws ${fmt(d.current, "A")}. ${ask}`,
    given: { "B+": fmt(d.supply, "V"), "Voltage wanted": fmt(d.load, "V"), "Current drawn": fmt(d.current, "A") },
  };
}

const supplyOf = (ctx: SolvedContext) => ctx.inputs.supplyVoltage as number;
const currentOf = (ctx: SolvedContext) => ctx.inputs.loadCurrent as number;

export const droppingResistorKinds: DrillKind[] = [
  {
    id: "dropping-resistor/resistance",
    slug: SLUG,
    title: "Dropping resistor value",
    direction: "forward",
    asked: { name: "resistance", label: "dropping resistor", unit: "Ω" },
    tolerance: RELATIVE_2,
    answerStep: "Resistance",
    generate: (rng) => forward(rng, "What resistance does it need?"),
    mistakes: (ctx) => [
      {
        value: ohms({ voltage: supplyOf(ctx), current: currentOf(ctx) }, "resistance"),
        step: "Resistance",
        hint: "The resistor drops only the difference, B+ minus the stage's voltage; the full B+ is not across it.",
      },
      {
        value: ohms({ voltage: ctx.inputs.loadVoltage as number, current: currentOf(ctx) }, "resistance"),
        step: "Resistance",
        hint: "The stage's voltage over its current is the stage itself; the resistor takes the voltage that is left over.",
      },
      {
        value: ctx.outputs.nearestPreferred as number,
        step: "Nearest E12",
        hint: "The question asks for the resistance worked out; choosing a preferred value comes after.",
      },
    ],
  },
  {
    id: "dropping-resistor/dissipation",
    slug: SLUG,
    title: "Power in a dropping resistor",
    direction: "forward",
    asked: { name: "dissipation", label: "power in the resistor", unit: "W" },
    tolerance: RELATIVE_2,
    answerStep: "Dissipation",
    generate: (rng) => forward(rng, "How much power does the resistor dissipate?"),
    mistakes: (ctx) => [
      {
        value: ohms({ voltage: supplyOf(ctx), current: currentOf(ctx) }, "power"),
        step: "Dissipation",
        hint: "The resistor dissipates the voltage across it (the drop) times the current, not the full B+ times the current.",
      },
    ],
  },
  {
    id: "dropping-resistor/rating",
    slug: SLUG,
    title: "Wattage rating of a dropping resistor",
    direction: "forward",
    asked: { name: "suggestedRating", label: "resistor wattage rating", unit: "W" },
    tolerance: EXACT,
    answerStep: "Suggested rating",
    generate: (rng) => forward(rng, "What standard wattage rating should the resistor have, allowing the usual factor of two?"),
    mistakes: (ctx) => noDerating(ctx.outputs.dissipation as number),
  },
  {
    id: "dropping-resistor/stage-voltage",
    slug: SLUG,
    title: "Stage voltage from a fitted dropping resistor",
    direction: "backward",
    asked: { name: "loadVoltage", label: "voltage at the stage", unit: "V" },
    tolerance: RELATIVE_2,
    answerStep: "Resistance",
    generate(rng) {
      const d = draw(rng);
      // The part fitted is the E12 value the calculator suggests for the design figure.
      const r = outputOf(SLUG, { supplyVoltage: d.supply, loadVoltage: d.load, loadCurrent: d.current }, "nearestPreferred");
      return {
        inputs: { supplyVoltage: d.supply, loadCurrent: d.current },
        prompt: `A ${fmt(r, "Ω")} resistor from the ${fmt(d.supply, "V")} B+ line feeds ${d.what}, which draws ${fmt(d.current, "A")}. What voltage does the stage get?`,
        given: { "B+": fmt(d.supply, "V"), "Resistor fitted": fmt(r, "Ω"), "Current drawn": fmt(d.current, "A") },
        solve: { input: "loadVoltage", output: "resistance", target: r, lo: 0.01, hi: d.supply * 0.999999 },
      };
    },
    accept: (ctx) => (ctx.expected as number) > 10,
    mistakes: (ctx) => [
      {
        value: ohms({ current: currentOf(ctx), resistance: ctx.setup.solve?.target as number }, "voltage"),
        step: "Resistance",
        hint: "I·R is the voltage across the resistor; the stage gets what is left of B+.",
      },
    ],
  },
];
