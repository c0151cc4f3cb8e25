import { z } from "zod";
import { formatQuantity, texQuantity, tex } from "./format";
import { highVoltageWarning } from "./safety";
import { defineCalculator, type Step, type Warning } from "./types";
import { optionalQuantity, quantity } from "./units";

/**
 * RC time constant and exponential discharge of a capacitor through a resistor:
 * V(t) = V0·e^(−t/τ), τ = RC (ARRL Handbook, electrical fundamentals; Radiotron Designer's Handbook 4th ed.).
 * `.optional()` on the optional fields: zod 4 reports an absent key as an error for a bare transform.
 * Bounds keep every result finite: τ lies between 1e-21 s and 1e19 s, V0/Vt below 1e16.
 */

export const timeConstantSchema = z
  .object({
    resistance: quantity("resistance", { positive: true, min: 1e-6, max: 1e15, label: "Resistance" }),
    capacitance: quantity("capacitance", { positive: true, min: 1e-15, max: 1e4, label: "Capacitance" }),
    initialVoltage: quantity("voltage", { positive: true, min: 1e-6, max: 1e7, label: "Initial voltage" }),
    targetVoltage: optionalQuantity("voltage", { positive: true, min: 1e-9, max: 1e7, label: "Target voltage" }).optional(),
    elapsed: optionalQuantity("time", { nonNegative: true, max: 1e9, label: "Elapsed time" }).optional(),
  })
  .superRefine((v, ctx) => {
    if (v.targetVoltage !== undefined && v.targetVoltage >= v.initialVoltage) {
      ctx.addIssue({
        code: "custom",
        path: ["targetVoltage"],
        message: "Target voltage must be below the initial voltage (this is a discharge) and above zero",
      });
    }
  });

export type TimeConstantInput = z.output<typeof timeConstantSchema>;

export const calculator = defineCalculator({
  slug: "time-constant",
  title: "RC time constant and discharge",
  purpose: "How fast a capacitor discharges through a resistor, and how long until it reaches a given voltage.",
  bench: {
    group: "first-power",
    example: { resistance: "220k", capacitance: "47 uF", initialVoltage: "350 V", targetVoltage: "30 V" },
    headlines: ["timeConstant", "timeToTarget"],
    alwaysDanger: false,
    chart: "rc-discharge",
  },
  inputs: [
    { name: "resistance", label: "Discharge resistance", unit: "Ω", required: true, control: "quantity", quantity: "resistance" },
    { name: "capacitance", label: "Capacitance", unit: "F", required: true, control: "quantity", quantity: "capacitance" },
    {
      name: "initialVoltage",
      label: "Initial voltage",
      unit: "V",
      required: true,
      control: "quantity",
      quantity: "voltage",
      help: "The voltage the capacitor holds when the discharge starts (magnitude).",
    },
    {
      name: "targetVoltage",
      label: "Target voltage",
      unit: "V",
      required: false,
      control: "quantity",
      quantity: "voltage",
      help: "Optional: the voltage you want to reach; must be above zero and below the initial voltage.",
    },
    {
      name: "elapsed",
      label: "Elapsed time",
      unit: "s",
      required: false,
      control: "quantity",
      quantity: "time",
      help: "Optional: the voltage left after this long is shown.",
    },
  ],
  outputs: [
    { name: "timeConstant", label: "Time constant τ", unit: "s" },
    { name: "fiveTau", label: "Five time constants (5τ)", unit: "s" },
    { name: "timeToTarget", label: "Time to reach the target voltage", unit: "s" },
    { name: "voltageAtElapsed", label: "Voltage after the elapsed time", unit: "V" },
  ],
  schema: timeConstantSchema,
  formulas: [
    { label: "Time constant", latex: tex`\tau = R\,C` },
    { label: "Discharge", latex: tex`V(t) = V_0\,e^{-t/\tau}` },
    { label: "Time to a target voltage", latex: tex`t = \tau\,\ln\frac{V_0}{V_t}` },
    { label: "Stored energy", latex: tex`E = \tfrac{1}{2}\,C\,V_0^2` },
  ],
  references: [
    {
      title: "Radiotron Designer's Handbook, 4th ed.",
      detail: "Circuit theory: transients in circuits of resistance and capacitance, exponential discharge, time constant CR (chapter cited from memory)",
    },
    {
      title: "The ARRL Handbook for Radio Communications",
      detail: "Electrical fundamentals chapter: RC time constant; a capacitor falls to 36.8% of its voltage in one time constant",
    },
  ],
  whyItMatters:
    "A filter capacitor keeps its charge after the set is switched off. The time constant says how quickly a " +
    "resistor drains it: after one τ about 37% of the voltage is left, after five τ under 1%. Knowing this tells " +
    "you how long to wait, or how big a bleeder to fit, before your hands go near the circuit — and it is still " +
    "only an estimate, so measure before you touch.",
  compute(input: TimeConstantInput) {
    const { resistance: r, capacitance: c, initialVoltage: v0, targetVoltage: vt, elapsed: t } = input;
    const tau = r * c;
    const timeToTarget = vt === undefined ? null : tau * Math.log(v0 / vt);
    const voltageAtElapsed = t === undefined ? null : v0 * Math.exp(-t / tau);

    const warnings: Warning[] = highVoltageWarning(v0);
    if (v0 > 50 && v0 * Math.exp(-5) > 50) {
      warnings.push({
        level: "caution",
        message: `After 5τ this capacitor still holds about ${formatQuantity(v0 * Math.exp(-5), "V")} — more than 50 V. Wait longer or discharge it deliberately.`,
      });
    }
    warnings.push({
      level: "info",
      message: "Electrolytic capacitors can recover some charge after being discharged (dielectric absorption); measure again before touching.",
    });

    return { outputs: { timeConstant: tau, fiveTau: 5 * tau, timeToTarget, voltageAtElapsed }, warnings };
  },
  explain(input: TimeConstantInput, o) {
    const { resistance: r, capacitance: c, initialVoltage: v0, targetVoltage: vt, elapsed: t } = input;
    const { timeConstant: tau, fiveTau, timeToTarget, voltageAtElapsed } = o;
    const energy = 0.5 * c * v0 * v0;
    const steps: Step[] = [
      {
        label: "Time constant",
        latex: tex`\tau = R\,C = ${texQuantity(r, "Ω")} \times ${texQuantity(c, "F")} = ${texQuantity(tau, "s")}`,
      },
      { label: "Five time constants", latex: tex`5\tau = 5 \times ${texQuantity(tau, "s")} = ${texQuantity(fiveTau, "s")}` },
    ];
    if (vt !== undefined && timeToTarget !== null) {
      steps.push({
        label: "Time to the target voltage",
        latex: tex`t = \tau\,\ln\frac{V_0}{V_t} = ${texQuantity(tau, "s")} \times \ln\frac{${texQuantity(v0, "V")}}{${texQuantity(vt, "V")}} = ${texQuantity(timeToTarget, "s")}`,
      });
    }
    if (t !== undefined && voltageAtElapsed !== null) {
      steps.push({
        label: "Voltage after the elapsed time",
        latex: tex`V(t) = V_0\,e^{-t/\tau} = ${texQuantity(v0, "V")} \times e^{-${texQuantity(t, "s")}/${texQuantity(tau, "s")}} = ${texQuantity(voltageAtElapsed, "V")}`,
      });
    }
    steps.push({
      label: "Energy stored at the initial voltage",
      latex: tex`E = \tfrac{1}{2}\,C\,V_0^2 = \tfrac{1}{2} \times ${texQuantity(c, "F")} \times (${texQuantity(v0, "V")})^2 = ${texQuantity(energy, "J")}`,
    });
    return steps;
  },
});
