import { preferredBelow, nearestPreferred } from "../../calc/tables/preferred-values";
import { slipOf } from "../calc";
import type { DrillKind } from "../types";
import { drawBPlus, drawCap, EXACT, fmt, RELATIVE_2 } from "./common";
import { timeConstantKinds } from "./time-constant";

/** Filter capacitors that hold a charge: time constant and discharge (their own module), bleeders, reforming an electrolytic. */

const LN10 = Math.LN10;

export const dischargeKinds: DrillKind[] = [
  ...timeConstantKinds,
  {
    id: "bleeder/max-resistance",
    slug: "bleeder",
    title: "Largest bleeder that meets a discharge time",
    direction: "forward",
    asked: { name: "maxResistance", label: "largest bleeder resistance (nominal parts)", unit: "Ω" },
    tolerance: RELATIVE_2,
    answerStep: "Largest bleeder that meets the time",
    generate(rng) {
      const c = drawCap(rng);
      const v = drawBPlus(rng);
      return {
        inputs: { capacitance: c, workingVoltage: v },
        prompt: `A ${fmt(c, "F")} filter capacitor works at ${fmt(v, "V")}. Taking the parts at their marked values, what is the largest bleeder that brings it below 60 V within 5 s of switch-off (the residual-voltage limit of IEC 60204-1)?`,
        given: { Capacitor: fmt(c, "F"), "Working voltage": fmt(v, "V"), "Residual-voltage limit": "60 V", "Time allowed": "5 s" },
      };
    },
    mistakes: (ctx) => [
      {
        value: (ctx.expected as number) * LN10,
        step: "Largest bleeder",
        hint: "The discharge follows e: R = t/(C·ln(Vw/Vres)) with the natural logarithm, not log₁₀.",
      },
    ],
  },
  {
    id: "bleeder/suggested",
    slug: "bleeder",
    title: "Bleeder to fit, allowing for tolerances",
    direction: "forward",
    asked: { name: "suggestedResistance", label: "bleeder to fit (E12)", unit: "Ω" },
    tolerance: EXACT,
    answerStep: "Largest E12 value",
    generate(rng) {
      const c = drawCap(rng);
      const v = drawBPlus(rng);
      return {
        inputs: { capacitance: c, workingVoltage: v, capacitorTolerance: 0.5, resistorTolerance: 0.05 },
        prompt:
          `A ${fmt(c, "F")} electrolytic (it may be up to 50 % above its marking) works at ${fmt(v, "V")}. Which E12 bleeder (5 % parts) still brings it ` +
          "below 60 V within 5 s of switch-off, the residual-voltage limit of IEC 60204-1, with both parts at the worst end of their tolerance?",
        given: {
          Capacitor: `${fmt(c, "F")} (+50 %)`,
          "Working voltage": fmt(v, "V"),
          "Resistor tolerance": "5 %",
          "Residual-voltage limit": "60 V",
          "Time allowed": "5 s",
        },
      };
    },
    mistakes: (ctx) => [
      {
        value: preferredBelow(ctx.outputs.maxResistance as number, "E12"),
        step: "Allowing for both tolerances",
        hint: "A capacitor above its marking and a resistor on the high side both slow the discharge: divide by (1 + 0.5)·(1 + 0.05) before choosing.",
      },
      {
        value: nearestPreferred(ctx.outputs.maxResistance as number, "E12"),
        step: "Largest E12 value",
        hint: "Round down, never to the nearest: a larger bleeder takes longer than the limit allows.",
      },
    ],
  },
  {
    id: "reforming/leakage-limit",
    slug: "reforming",
    title: "Leakage limit of an electrolytic",
    direction: "forward",
    asked: { name: "leakageLimit", label: "leakage limit at rated voltage", unit: "A" },
    tolerance: RELATIVE_2,
    answerStep: "Leakage limit",
    generate(rng) {
      const small = rng.chance(0.25);
      const c = (small ? rng.pick([1, 2, 4]) : rng.pick([8, 10, 16, 20, 40, 50, 100])) * 1e-6;
      const v = small ? rng.pick([25, 50, 150]) : rng.pick([150, 250, 350, 450, 500]);
      return {
        inputs: { capacitance: c, ratedVoltage: v },
        prompt: `An electrolytic marked ${fmt(c, "F")} ${fmt(v, "V")} is being reformed. What leakage current should it be down to at rated voltage, by the general-purpose limit of 0.01·C·V µA (C in µF, V in volts) or 3 µA, whichever is greater?`,
        given: { Capacitor: fmt(c, "F"), "Rated voltage": fmt(v, "V") },
      };
    },
    mistakes: (ctx) => [
      {
        value: slipOf("reforming", { ...ctx.inputs, leakageFloor: 0 }, "leakageLimit"),
        step: "Leakage limit",
        hint: "The limit is never below the 3 µA floor: take whichever is greater.",
      },
    ],
  },
  {
    id: "reforming/resistor-power",
    slug: "reforming",
    title: "Power in a reforming resistor",
    direction: "forward",
    asked: { name: "resistorPower", label: "resistor dissipation with a shorted capacitor", unit: "W" },
    tolerance: RELATIVE_2,
    answerStep: "Resistor dissipation",
    generate(rng) {
      const c = rng.pick([10, 20, 40, 50]) * 1e-6;
      const v = rng.pick([250, 350, 450]);
      const r = rng.pick([10e3, 22e3, 47e3, 100e3]);
      return {
        inputs: { capacitance: c, ratedVoltage: v, seriesResistance: r },
        prompt: `A ${fmt(c, "F")} ${fmt(v, "V")} electrolytic is reformed from a supply set to its rated voltage through a ${fmt(r, "Ω")} resistor. If the capacitor were shorted, how much power would the resistor dissipate?`,
        given: { Capacitor: fmt(c, "F"), "Supply (rated voltage)": fmt(v, "V"), "Series resistor": fmt(r, "Ω") },
      };
    },
  },
];
