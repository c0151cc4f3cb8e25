import { slipOf } from "../calc";
import { OPERATING_POINTS } from "../operating-points";
import type { Rng } from "../rng";
import type { DrillKind, DrillSetup, SolvedContext } from "../types";
import { fmt, nearby, RELATIVE_2, TWO_PI } from "./common";
import { outputTransformerKinds } from "./output-transformer";

/** The signal path: the superhet's oscillator and image, coupling capacitors, plate dissipation, the output transformer (its own module). */

/** Sums of frequencies are exact; a person writes three or four figures ("1.46 MHz", "1455 kHz"). */
const FREQUENCY = { type: "relative", fraction: 0.005 } as const;

function superhetSetup(rng: Rng, ask: string): DrillSetup {
  // Broadcast band: 10 kHz channels in the Americas, 9 kHz in Europe; the IF of the region's sets (common practice).
  const american = rng.chance(0.6);
  const signal = american ? 10e3 * rng.int(54, 160) : 9e3 * rng.int(59, 178);
  const intermediate = american ? 455e3 : rng.pick([455e3, 465e3, 470e3]);
  return {
    inputs: { signalFrequency: signal, intermediateFrequency: intermediate, oscillatorAbove: true },
    prompt: `A broadcast superhet with a ${fmt(intermediate, "Hz", 4)} IF is tuned to a station on ${fmt(signal, "Hz", 4)}, its oscillator running above the signal. ${ask}`,
    given: { Station: fmt(signal, "Hz", 4), IF: fmt(intermediate, "Hz", 4), Oscillator: "above the signal" },
  };
}

/** A coupling capacitor of the era between a plate and the next grid (common practice). */
function couplingSetup(rng: Rng, ask: string, leakage = false): DrillSetup {
  const c = rng.pick([0.005, 0.01, 0.02, 0.05, 0.1]) * 1e-6;
  const rg = rng.preferred("E12", 220e3, 1e6);
  const rs = rng.chance(0.5) ? rng.preferred("E12", 10e3, 100e3) : 0;
  const leak = leakage ? rng.pick([0.5, 1, 2, 5, 10]) * 1e-6 : undefined;
  const source = rs ? `, driven from a stage whose output resistance is ${fmt(rs, "Ω")}` : ", driven from a low resistance";
  return {
    inputs: { capacitance: c, gridResistance: rg, sourceResistance: rs, ...(leak ? { leakageCurrent: leak } : {}) },
    prompt: `A ${fmt(c, "F")} coupling capacitor feeds a grid with a ${fmt(rg, "Ω")} grid resistor${source}.${leak ? ` The old paper capacitor leaks ${fmt(leak, "A")}.` : ""} ${ask}`,
    given: { Capacitor: fmt(c, "F"), "Grid resistor": fmt(rg, "Ω"), "Source resistance": fmt(rs, "Ω"), ...(leak ? { Leakage: fmt(leak, "A") } : {}) },
  };
}

/** A tube at its data-sheet point (or measured near it): plate and cathode voltages to chassis. */
function plateSetup(rng: Rng, ask: string): DrillSetup {
  const op = rng.pick(OPERATING_POINTS);
  const ip = rng.chance(0.5) ? op.plateCurrent : nearby(rng, op.plateCurrent, 0.1);
  const plate = op.plateVoltage + op.bias;
  return {
    inputs: { plateVoltage: plate, cathodeVoltage: op.bias, plateCurrent: ip, tube: op.type },
    prompt: `In the ${op.role}, a ${op.type}'s plate reads ${fmt(plate, "V")} to chassis and its cathode ${fmt(op.bias, "V")}, with ${fmt(ip, "A")} plate current. ${ask}`,
    given: { Tube: op.type, "Plate to chassis": fmt(plate, "V"), "Cathode to chassis": fmt(op.bias, "V"), "Plate current": fmt(ip, "A") },
  };
}

const plateToChassis = (ctx: SolvedContext, output: string) => ({
  value: slipOf("plate-dissipation", { ...ctx.inputs, cathodeVoltage: 0 }, output),
  step: "Plate dissipation",
  hint: "Take the cathode voltage off: the tube dissipates its plate-to-cathode voltage times the current.",
});

export const signalKinds: DrillKind[] = [
  {
    id: "superhet/oscillator",
    slug: "superhet",
    title: "Oscillator frequency of a superhet",
    direction: "forward",
    asked: { name: "oscillatorFrequency", label: "oscillator frequency", unit: "Hz" },
    tolerance: FREQUENCY,
    answerStep: "Oscillator",
    generate: (rng) => superhetSetup(rng, "What frequency is the oscillator on?"),
    mistakes: (ctx) => [
      {
        value: slipOf("superhet", { ...ctx.inputs, oscillatorAbove: false }, "oscillatorFrequency"),
        step: "Oscillator",
        hint: "That is signal minus IF; with the oscillator above the signal, add the IF.",
      },
    ],
  },
  {
    id: "superhet/image",
    slug: "superhet",
    title: "Image frequency of a superhet",
    direction: "forward",
    asked: { name: "imageFrequency", label: "image frequency", unit: "Hz" },
    tolerance: FREQUENCY,
    answerStep: "Image",
    generate: (rng) => superhetSetup(rng, "On what frequency would a station come through as the image?"),
    mistakes: (ctx) => [
      {
        value: ctx.outputs.oscillatorFrequency as number,
        step: "Image",
        hint: "That is the oscillator. The image lies one IF beyond it, two IFs from the signal: it mixes to the same IF.",
      },
    ],
  },
  {
    id: "coupling-cap/corner",
    slug: "coupling-cap",
    title: "Low-frequency corner of a coupling capacitor",
    direction: "forward",
    asked: { name: "cornerFrequency", label: "low-frequency corner (−3 dB)", unit: "Hz" },
    tolerance: RELATIVE_2,
    answerStep: "Low-frequency corner",
    generate: (rng) => couplingSetup(rng, "At what frequency is the bass 3 dB down?"),
    mistakes: (ctx) => [
      { value: (ctx.expected as number) * TWO_PI, step: "Low-frequency corner", hint: "1/(R·C) is in radians per second; divide by 2π for hertz." },
      ...((ctx.inputs.sourceResistance as number) > 0
        ? [
            {
              value: slipOf("coupling-cap", { ...ctx.inputs, sourceResistance: 0 }, "cornerFrequency"),
              step: "Low-frequency corner",
              hint: "The capacitor sees the driving stage's resistance in series with the grid resistor: add them.",
            },
          ]
        : []),
    ],
  },
  {
    id: "coupling-cap/grid-shift",
    slug: "coupling-cap",
    title: "Grid pulled positive by a leaky coupling capacitor",
    direction: "forward",
    asked: { name: "gridShift", label: "grid shift", unit: "V" },
    tolerance: RELATIVE_2,
    answerStep: "Grid pulled positive",
    generate: (rng) => couplingSetup(rng, "By how many volts does the leakage pull the grid positive?", true),
  },
  {
    id: "plate-dissipation/dissipation",
    slug: "plate-dissipation",
    title: "Plate dissipation from meter readings",
    direction: "forward",
    asked: { name: "dissipation", label: "plate dissipation", unit: "W" },
    tolerance: RELATIVE_2,
    answerStep: "Plate dissipation",
    generate: (rng) => plateSetup(rng, "How much power is the plate dissipating?"),
    mistakes: (ctx) => [plateToChassis(ctx, "dissipation")],
  },
  {
    id: "plate-dissipation/fraction",
    slug: "plate-dissipation",
    title: "Plate dissipation against the data sheet",
    direction: "forward",
    asked: { name: "fractionOfMax", label: "share of the rated plate dissipation", unit: "%" },
    tolerance: { type: "absolute", amount: 0.01 },
    answerStep: "Fraction of the data-sheet maximum",
    generate: (rng) => plateSetup(rng, "What percentage of the type's rated plate dissipation is that? Take the rating from the tube data."),
    mistakes: (ctx) => [plateToChassis(ctx, "fractionOfMax")],
  },
  ...outputTransformerKinds,
];
