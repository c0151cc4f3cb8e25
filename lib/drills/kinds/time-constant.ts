import type { Rng } from "../rng";
import type { DrillKind } from "../types";
import { drawBPlus, drawCap, fmt, RELATIVE_2 } from "./common";

/** A filter capacitor discharging through a resistor: its time constant, the time to a voltage, what is left. Part of the discharge kinds. */

function dischargeInputs(rng: Rng) {
  return { resistance: rng.preferred("E12", 47e3, 1e6), capacitance: drawCap(rng), initialVoltage: drawBPlus(rng) };
}

const LN10 = Math.LN10;

export const timeConstantKinds: DrillKind[] = [
  {
    id: "time-constant/tau",
    slug: "time-constant",
    title: "Time constant of a filter capacitor and its bleeder",
    direction: "forward",
    asked: { name: "timeConstant", label: "time constant", unit: "s" },
    tolerance: RELATIVE_2,
    answerStep: "Time constant",
    generate(rng) {
      const d = dischargeInputs(rng);
      return {
        inputs: d,
        prompt: `A ${fmt(d.capacitance, "F")} filter capacitor charged to ${fmt(d.initialVoltage, "V")} discharges through a ${fmt(d.resistance, "Ω")} resistor. What is the time constant?`,
        given: { Capacitor: fmt(d.capacitance, "F"), "Charged to": fmt(d.initialVoltage, "V"), Resistor: fmt(d.resistance, "Ω") },
      };
    },
  },
  {
    id: "time-constant/time-to-target",
    slug: "time-constant",
    title: "Time for a capacitor to fall to a voltage",
    direction: "forward",
    asked: { name: "timeToTarget", label: "time to fall to the voltage", unit: "s" },
    tolerance: RELATIVE_2,
    answerStep: "Time to the target voltage",
    generate(rng) {
      const d = dischargeInputs(rng);
      const target = rng.pick([30, 50, 60]);
      return {
        inputs: { ...d, targetVoltage: target },
        prompt: `A ${fmt(d.capacitance, "F")} filter capacitor charged to ${fmt(d.initialVoltage, "V")} discharges through a ${fmt(d.resistance, "Ω")} resistor. How long until it is down to ${fmt(target, "V")}? (Down to that figure is not discharged: measure before touching.)`,
        given: { Capacitor: fmt(d.capacitance, "F"), "Charged to": fmt(d.initialVoltage, "V"), Resistor: fmt(d.resistance, "Ω"), "Down to": fmt(target, "V") },
      };
    },
    mistakes: (ctx) => [
      {
        value: (ctx.expected as number) / LN10,
        step: "Time to the target voltage",
        hint: "The discharge follows e: use the natural logarithm, t = τ·ln(V₀/V), not log₁₀.",
      },
      {
        value: ctx.outputs.fiveTau as number,
        step: "Five time constants",
        hint: "Five time constants is a rule of thumb for 'nearly empty'; the time to a given voltage is τ·ln(V₀/V).",
      },
    ],
  },
  {
    id: "time-constant/voltage-after",
    slug: "time-constant",
    title: "Voltage left on a capacitor after a time",
    direction: "forward",
    asked: { name: "voltageAtElapsed", label: "voltage left", unit: "V" },
    tolerance: RELATIVE_2,
    answerStep: "Voltage after the elapsed time",
    generate(rng) {
      const d = dischargeInputs(rng);
      const t = rng.pick([5, 10, 20, 30, 60]);
      return {
        inputs: { ...d, elapsed: t },
        prompt: `A ${fmt(d.capacitance, "F")} filter capacitor charged to ${fmt(d.initialVoltage, "V")} discharges through a ${fmt(d.resistance, "Ω")} resistor. What voltage is left after ${fmt(t, "s")}?`,
        given: {
          Capacitor: fmt(d.capacitance, "F"),
          "Charged to": fmt(d.initialVoltage, "V"),
          Resistor: fmt(d.resistance, "Ω"),
          "Time after switch-off": fmt(t, "s"),
        },
      };
    },
    // Below a millivolt the figure is noise on any meter; such a problem teaches nothing.
    accept: (ctx) => (ctx.expected as number) > 0.1,
    mistakes: (ctx) => [
      {
        value: (ctx.inputs.initialVoltage as number) - (ctx.expected as number),
        step: "Voltage after the elapsed time",
        hint: "That is how far it has fallen; what is left is V₀·e^(−t/τ).",
      },
    ],
  },
];
