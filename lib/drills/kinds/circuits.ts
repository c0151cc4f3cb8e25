import { HEATERS } from "../../calc/tables/heaters";
import { outputOf } from "../calc";
import type { Rng } from "../rng";
import type { DrillKind } from "../types";
import { fmt, RELATIVE_2, roundTo, TWO_PI } from "./common";

/** Ohm's law and reactance: the arithmetic under every other calculator. */

const RADIANS_HINT = "1/√(LC) and 1/(RC) come out in radians per second; divide by 2π for hertz.";

/** A coupling capacitor at audio, or a filter capacitor at the ripple frequency (common practice). */
function drawCapAtFrequency(rng: Rng) {
  if (rng.chance(0.5)) return { capacitance: rng.preferred("E6", 1e-9, 470e-9), frequency: rng.pick([50, 100, 1000, 10000]), what: "coupling capacitor" };
  return { capacitance: rng.pick([8, 10, 16, 20, 40]) * 1e-6, frequency: rng.pick([100, 120]), what: "filter capacitor, at the ripple frequency" };
}

export const circuitKinds: DrillKind[] = [
  {
    id: "ohms-law/current",
    slug: "ohms-law",
    title: "Current through a resistor",
    direction: "forward",
    asked: { name: "current", label: "current", unit: "A" },
    tolerance: RELATIVE_2,
    answerStep: "Current: with your values",
    generate(rng) {
      const r = rng.preferred("E12", 1e3, 1e6);
      const v = rng.pick([10, 25, 50, 90, 100, 150, 200, 250]);
      return {
        inputs: { voltage: v, resistance: r },
        prompt: `A meter reads ${fmt(v, "V")} across a ${fmt(r, "Ω")} resistor in a working set. What current flows through it?`,
        given: { "Voltage across": fmt(v, "V"), Resistor: fmt(r, "Ω") },
      };
    },
    // A resistor in a working set of the era dissipates a few watts at most.
    accept: (ctx) => (ctx.outputs.power as number) <= 2,
  },
  {
    id: "ohms-law/power",
    slug: "ohms-law",
    title: "Power in a resistor from its current",
    direction: "forward",
    asked: { name: "power", label: "power", unit: "W" },
    tolerance: RELATIVE_2,
    answerStep: "Power: with your values",
    generate(rng) {
      const r = rng.preferred("E12", 100, 100e3);
      const i = rng.pick([0.5, 1, 2, 5, 10, 20, 50]) * 1e-3;
      return {
        inputs: { current: i, resistance: r },
        prompt: `${fmt(i, "A")} flows through a ${fmt(r, "Ω")} resistor. How much power does it dissipate?`,
        given: { Current: fmt(i, "A"), Resistor: fmt(r, "Ω") },
      };
    },
    mistakes: (ctx) => [
      { value: ctx.outputs.voltage as number, step: "Power: formula", hint: "I·R is the voltage across it; the power is I²·R: the current is squared." },
    ],
  },
  {
    id: "ohms-law/voltage-for-power",
    slug: "ohms-law",
    title: "Voltage that puts a power into a resistor",
    direction: "forward",
    asked: { name: "voltage", label: "voltage across the resistor", unit: "V" },
    tolerance: RELATIVE_2,
    answerStep: "Voltage: with your values",
    generate(rng) {
      const r = rng.preferred("E12", 1e3, 470e3);
      const p = rng.pick([0.125, 0.25, 0.5, 1, 2]);
      return {
        inputs: { power: p, resistance: r },
        prompt: `What voltage across a ${fmt(r, "Ω")} resistor makes it dissipate its full ${fmt(p, "W")} rating?`,
        given: { Resistor: fmt(r, "Ω"), Power: fmt(p, "W") },
      };
    },
    mistakes: (ctx) => [
      { value: (ctx.inputs.power as number) * (ctx.inputs.resistance as number), step: "Voltage: formula", hint: "P·R is V²: take its square root." },
    ],
  },
  {
    id: "ohms-law/heater-resistance",
    slug: "ohms-law",
    title: "Resistance of a hot heater",
    direction: "forward",
    asked: { name: "resistance", label: "hot heater resistance", unit: "Ω" },
    tolerance: RELATIVE_2,
    answerStep: "Resistance: with your values",
    generate(rng) {
      const h = rng.pick(HEATERS);
      return {
        inputs: { voltage: h.voltage, current: h.current },
        prompt: `The ${h.names[0]} (${h.use}) has a heater rated ${fmt(h.voltage, "V")} at ${fmt(h.current, "A")}. What is its resistance when hot?`,
        given: { Tube: h.names[0], "Heater voltage": fmt(h.voltage, "V"), "Heater current": fmt(h.current, "A") },
      };
    },
    mistakes: (ctx) => [
      {
        value: (ctx.inputs.current as number) / (ctx.inputs.voltage as number),
        step: "Resistance: formula",
        hint: "Resistance is voltage over current, R = V/I.",
      },
    ],
  },
  {
    id: "reactance/capacitive",
    slug: "reactance",
    title: "Reactance of a capacitor",
    direction: "forward",
    asked: { name: "capacitiveReactance", label: "capacitive reactance", unit: "Ω" },
    tolerance: RELATIVE_2,
    answerStep: "Capacitive reactance",
    generate(rng) {
      const c = drawCapAtFrequency(rng);
      return {
        inputs: { capacitance: c.capacitance, frequency: c.frequency },
        prompt: `What is the reactance of a ${fmt(c.capacitance, "F")} ${c.what}, at ${fmt(c.frequency, "Hz")}?`,
        given: { Capacitor: fmt(c.capacitance, "F"), Frequency: fmt(c.frequency, "Hz") },
      };
    },
    mistakes: (ctx) => [
      { value: (ctx.expected as number) * TWO_PI, step: "Capacitive reactance", hint: "Xc = 1/(2πfC): the 2π turns hertz into radians per second." },
    ],
  },
  {
    id: "reactance/inductive",
    slug: "reactance",
    title: "Reactance of a filter choke",
    direction: "forward",
    asked: { name: "inductiveReactance", label: "inductive reactance", unit: "Ω" },
    tolerance: RELATIVE_2,
    answerStep: "Inductive reactance",
    generate(rng) {
      const l = rng.pick([4, 5, 8, 10, 15, 20]);
      const f = rng.pick([100, 120]);
      return {
        inputs: { inductance: l, frequency: f },
        prompt: `What reactance does a ${fmt(l, "H")} filter choke present to ${fmt(f, "Hz")} ripple?`,
        given: { Choke: fmt(l, "H"), "Ripple frequency": fmt(f, "Hz") },
      };
    },
    mistakes: (ctx) => [
      { value: (ctx.expected as number) / TWO_PI, step: "Inductive reactance", hint: "XL = 2πfL: the 2π turns hertz into radians per second." },
    ],
  },
  {
    id: "reactance/resonance",
    slug: "reactance",
    title: "Resonant frequency of a tuned circuit",
    direction: "forward",
    asked: { name: "resonantFrequency", label: "resonant frequency", unit: "Hz" },
    tolerance: RELATIVE_2,
    answerStep: "Resonant frequency",
    generate(rng) {
      const l = rng.pick([200, 230, 240, 250]) * 1e-6;
      const c = rng.pick([20, 30, 47, 68, 100, 150, 220, 330, 365]) * 1e-12;
      return {
        inputs: { inductance: l, capacitance: c },
        prompt: `A broadcast-band aerial coil of ${fmt(l, "H")} is tuned by ${fmt(c, "F")} of gang and strays. At what frequency does it resonate?`,
        given: { Coil: fmt(l, "H"), Capacitance: fmt(c, "F") },
      };
    },
    mistakes: (ctx) => [{ value: (ctx.expected as number) * TWO_PI, step: "Resonant frequency", hint: RADIANS_HINT }],
  },
  {
    id: "reactance/capacitor-for-reactance",
    slug: "reactance",
    title: "Capacitor for a reactance",
    direction: "backward",
    asked: { name: "capacitance", label: "capacitance", unit: "F" },
    tolerance: RELATIVE_2,
    answerStep: "Capacitive reactance",
    generate(rng) {
      const c = drawCapAtFrequency(rng);
      const xc = roundTo(outputOf("reactance", { capacitance: c.capacitance, frequency: c.frequency }, "capacitiveReactance"), 3);
      return {
        inputs: { frequency: c.frequency },
        prompt: `Which capacitor has a reactance of ${fmt(xc, "Ω")} at ${fmt(c.frequency, "Hz")}?`,
        given: { Reactance: fmt(xc, "Ω"), Frequency: fmt(c.frequency, "Hz") },
        solve: { input: "capacitance", output: "capacitiveReactance", target: xc, lo: 1e-13, hi: 1 },
      };
    },
    mistakes: (ctx) => [
      {
        value: (ctx.expected as number) * TWO_PI,
        step: "Capacitive reactance",
        hint: "C = 1/(2πf·Xc): leave out the 2π and the answer is 2π times too large.",
      },
    ],
  },
];
