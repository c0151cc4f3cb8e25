import { z } from "zod";
import { formatQuantity, texQuantity, tex } from "./format";
import { ALWAYS_DANGER } from "./safety";
import { defineCalculator, type Step, type Warning } from "./types";
import { optionalQuantity, quantity, quantityWithDefault } from "./units";

/**
 * Interstage coupling capacitor of a resistance-coupled stage. Low-frequency corner, where the
 * capacitor's reactance equals the resistance in series with it and the response is 3 dB down:
 * f = 1/(2π·C·(Rg + Rs)), Rs being the driving stage's output resistance (rp ∥ Ra)
 * (Radiotron Designer's Handbook 4th ed., ch. 12, resistance-capacitance coupled amplifiers;
 * Terman, Radio Engineers' Handbook, resistance-coupled amplifiers: low-frequency response).
 * A leaky capacitor passes DC from the driving plate through the grid resistor: the grid is pulled
 * positive by I_leak·Rg (Ohm's law), which cuts the stage's bias.
 */

/** Bias of a typical output stage, a 6V6GT in class A at 250 V: −12.5 V (RCA data sheet, from memory). */
export const TYPICAL_BIAS = 12.5;
/** A grid shift above this fraction of the bias is a caution (common practice; see the message). */
export const SHIFT_FRACTION = 0.1;

export const couplingCapSchema = z.object({
  capacitance: quantity("capacitance", { positive: true, min: 1e-12, max: 1e-3, label: "Capacitance" }),
  gridResistance: quantity("resistance", { positive: true, min: 1, max: 1e9, label: "Grid resistance" }),
  sourceResistance: quantityWithDefault("resistance", 0, { nonNegative: true, max: 1e9, label: "Source resistance" }),
  leakageCurrent: optionalQuantity("current", { nonNegative: true, max: 0.1, label: "Leakage current" }),
  maxGridResistance: optionalQuantity("resistance", { positive: true, min: 1, max: 1e9, label: "Maximum grid resistance" }),
  biasVoltage: optionalQuantity("voltage", { positive: true, max: 1000, label: "Bias voltage" }),
});

export type CouplingCapInput = z.output<typeof couplingCapSchema>;

const CHOSEN_VALUE: Warning = {
  level: "info",
  message:
    "Replace a coupling capacitor with the value the designer chose. A much larger one passes more hum and rumble and, in an amplifier " +
    "with negative feedback, can shift the low-frequency corners enough to make it motorboat (common practice).",
};
const PAPER: Warning = {
  level: "info",
  message:
    "Paper and wax coupling capacitors leak more as they warm and age. Measure the leakage at the capacitor's working voltage, " +
    "or the grid's DC voltage with the set running: the capacitor's other side sits at the driving plate's voltage.",
};

export const calculator = defineCalculator({
  slug: "coupling-cap",
  title: "Coupling capacitor",
  purpose: "Where a coupling capacitor rolls off the bass, and how far a leaky one pulls the next grid positive.",
  bench: {
    group: "stages",
    example: { capacitance: ".05 mfd", gridResistance: "470k", sourceResistance: "47k", leakageCurrent: "2 uA" },
    headlines: ["cornerFrequency", "gridShift"],
    // The capacitor's other side sits at the driving plate's B+.
    alwaysDanger: true,
    chart: "coupling-response",
  },
  inputs: [
    { name: "capacitance", label: "Coupling capacitance", unit: "F", required: true, control: "quantity", quantity: "capacitance" },
    {
      name: "gridResistance",
      label: "Grid resistor",
      unit: "Ω",
      required: true,
      control: "quantity",
      quantity: "resistance",
      help: "The resistor from the next tube's grid to ground (or to the bias supply).",
    },
    {
      name: "sourceResistance",
      label: "Driving stage's output resistance",
      unit: "Ω",
      required: false,
      default: 0,
      control: "quantity",
      quantity: "resistance",
      help: "The plate resistor in parallel with the driving tube's plate resistance; 0 leaves it out.",
    },
    {
      name: "leakageCurrent",
      label: "Capacitor leakage current",
      unit: "A",
      required: false,
      control: "quantity",
      quantity: "current",
      help: "Measured on a capacitor tester at working voltage, or worked back from the grid voltage.",
    },
    {
      name: "maxGridResistance",
      label: "Data sheet's maximum grid resistance",
      unit: "Ω",
      required: false,
      control: "quantity",
      quantity: "resistance",
      help: "From the next tube's data sheet (lower with fixed bias than with cathode bias).",
    },
    {
      name: "biasVoltage",
      label: "The next stage's bias (magnitude)",
      unit: "V",
      required: false,
      control: "quantity",
      quantity: "voltage",
      help: `What the grid shift is compared with; without it, the ${TYPICAL_BIAS} V of a typical output stage.`,
    },
  ],
  outputs: [
    { name: "cornerFrequency", label: "Low-frequency corner (−3 dB)", unit: "Hz" },
    { name: "gridShift", label: "Grid pulled positive by the leakage", unit: "V" },
  ],
  schema: couplingCapSchema,
  formulas: [
    { label: "Low-frequency corner", latex: tex`f_c = \frac{1}{2\pi\,C\,(R_g + R_s)}` },
    { label: "At the corner", latex: tex`X_C = \frac{1}{2\pi f_c C} = R_g + R_s, \quad \frac{V_g}{V_s} = \frac{1}{\sqrt{2}}` },
    { label: "Grid shift from leakage", latex: tex`\Delta V_g = I_\text{leak}\,R_g` },
  ],
  references: [
    {
      title: "Radiotron Designer's Handbook, 4th ed.",
      detail: "Chapter 12, resistance-capacitance coupled amplifiers: low-frequency response and the grid-circuit resistance (chapter cited from memory)",
    },
    {
      title: "F. E. Terman, Radio Engineers' Handbook",
      detail: "Resistance-coupled amplifiers: low-frequency response, 3 dB down where the coupling reactance equals the series resistance (from memory)",
    },
    { title: "Tube data sheets (RCA receiving tube manual, RC-series)", detail: "Maximum grid-circuit resistance, fixed and cathode bias (from memory)" },
  ],
  whyItMatters:
    "The coupling capacitor and the grid resistor set where the bass starts to fall: at the corner the next grid gets 71 % of the signal, " +
    "and below it the response falls 6 dB per octave. The capacitor also has to block the driving plate's full DC. Once a paper " +
    "capacitor leaks, that DC flows through the grid resistor and pulls the grid positive, eating into the bias: an output tube then " +
    "draws more current, overheats and can run away, taking the output transformer with it. That is why coupling capacitors are replaced first.",
  compute(input: CouplingCapInput) {
    const { capacitance: c, gridResistance: rg, sourceResistance: rs, leakageCurrent, maxGridResistance, biasVoltage } = input;
    const cornerFrequency = 1 / (2 * Math.PI * c * (rg + rs));
    const gridShift = leakageCurrent === undefined ? null : leakageCurrent * rg;
    const warnings: Warning[] = [ALWAYS_DANGER];
    if (gridShift !== null && gridShift > 0) {
      const bias = biasVoltage ?? TYPICAL_BIAS;
      const against =
        biasVoltage === undefined ? `the ${TYPICAL_BIAS} V bias of a typical output stage (6V6GT, class A)` : `the ${formatQuantity(bias, "V")} bias you gave`;
      if (gridShift > SHIFT_FRACTION * bias) {
        warnings.push({
          level: "caution",
          message:
            `The leakage pulls the grid ${formatQuantity(gridShift, "V")} positive: more than a tenth of ${against}. ` +
            "Common practice replaces a coupling capacitor that shifts the grid this far: the stage's current rises well above its design, " +
            "and an output tube can overheat and run away.",
        });
      } else {
        warnings.push({
          level: "info",
          message:
            `The leakage pulls the grid ${formatQuantity(gridShift, "V")} positive, under a tenth of ${against} (the common-practice line for replacing it). ` +
            "Leakage grows as the capacitor warms; a small-signal stage biased at 1 to 2 V feels a few tenths of a volt, so enter its bias.",
        });
      }
    }
    if (maxGridResistance !== undefined && rg > maxGridResistance) {
      warnings.push({
        level: "caution",
        message:
          `The ${formatQuantity(rg, "Ω")} grid resistor is above the data sheet's ${formatQuantity(maxGridResistance, "Ω")} maximum. Grid current from gas ` +
          "or grid emission develops a positive voltage across it, which raises the plate current, which heats the grid further: thermal runaway.",
      });
    }
    warnings.push(PAPER, CHOSEN_VALUE);
    return { outputs: { cornerFrequency, gridShift }, warnings };
  },
  explain(input: CouplingCapInput, o) {
    const { capacitance: c, gridResistance: rg, sourceResistance: rs, leakageCurrent } = input;
    const r = texQuantity(rg + rs, "Ω", 4);
    const steps: Step[] = [
      {
        label: "Low-frequency corner (−3 dB)",
        latex: tex`f_c = \frac{1}{2\pi \times ${texQuantity(c, "F", 4)} \times (${texQuantity(rg, "Ω", 4)} + ${texQuantity(rs, "Ω", 4)})} = ${texQuantity(o.cornerFrequency, "Hz", 4)}`,
      },
      { label: "Check: the capacitor's reactance at the corner equals the series resistance", latex: tex`X_C = \frac{1}{2\pi f_c C} = ${r}` },
    ];
    if (leakageCurrent !== undefined && o.gridShift !== null) {
      steps.push({
        label: "Grid pulled positive by the leakage",
        latex: tex`\Delta V_g = ${texQuantity(leakageCurrent, "A", 4)} \times ${texQuantity(rg, "Ω", 4)} = ${texQuantity(o.gridShift, "V", 4)}`,
      });
    }
    return steps;
  },
});
