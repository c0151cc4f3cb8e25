import { z } from "zod";
import { formatQuantity, texQuantity, tex } from "./format";
import { defineCalculator, type Step, type Warning } from "./types";
import { optionalQuantity } from "./units";

/**
 * Reactance of a capacitor and of an inductor at a frequency, and the resonant frequency of
 * the pair: Xc = 1/(2πfC), XL = 2πfL, f0 = 1/(2π√(LC)). The frequency may be left out when
 * both L and C are given (then only f0 is found). Bounds keep every result finite.
 */

export const reactanceSchema = z
  .object({
    frequency: optionalQuantity("frequency", { positive: true, min: 1e-6, max: 1e12, label: "Frequency" }).optional(),
    capacitance: optionalQuantity("capacitance", { positive: true, min: 1e-18, max: 1e4, label: "Capacitance" }).optional(),
    inductance: optionalQuantity("inductance", { positive: true, min: 1e-15, max: 1e6, label: "Inductance" }).optional(),
  })
  .superRefine((v, ctx) => {
    if (v.capacitance === undefined && v.inductance === undefined) {
      const message = "Enter a capacitance, an inductance, or both";
      ctx.addIssue({ code: "custom", path: ["capacitance"], message });
      ctx.addIssue({ code: "custom", path: ["inductance"], message });
      return;
    }
    if (v.frequency === undefined && (v.capacitance === undefined || v.inductance === undefined)) {
      ctx.addIssue({
        code: "custom",
        path: ["frequency"],
        message: "Frequency is required unless both capacitance and inductance are given",
      });
    }
  });

export type ReactanceInput = z.output<typeof reactanceSchema>;

export const calculator = defineCalculator({
  slug: "reactance",
  title: "Reactance and resonance",
  purpose: "The reactance of a capacitor or inductor at a frequency, and where a pair resonates.",
  bench: {
    group: "radio",
    example: { frequency: "1 kHz", capacitance: "100 nF", inductance: "10 mH" },
    headlines: ["capacitiveReactance", "resonantFrequency"],
    alwaysDanger: false,
    chart: null,
  },
  inputs: [
    {
      name: "frequency",
      label: "Frequency",
      unit: "Hz",
      required: false,
      control: "quantity",
      quantity: "frequency",
      help: "Needed for reactances; may be left empty when both L and C are given.",
    },
    { name: "capacitance", label: "Capacitance", unit: "F", required: false, control: "quantity", quantity: "capacitance" },
    { name: "inductance", label: "Inductance", unit: "H", required: false, control: "quantity", quantity: "inductance" },
  ],
  outputs: [
    { name: "capacitiveReactance", label: "Capacitive reactance Xc", unit: "Ω" },
    { name: "inductiveReactance", label: "Inductive reactance XL", unit: "Ω" },
    { name: "resonantFrequency", label: "Resonant frequency f₀", unit: "Hz" },
  ],
  schema: reactanceSchema,
  formulas: [
    { label: "Capacitive reactance", latex: tex`X_C = \frac{1}{2\pi f C}` },
    { label: "Inductive reactance", latex: tex`X_L = 2\pi f L` },
    { label: "Resonant frequency", latex: tex`f_0 = \frac{1}{2\pi\sqrt{L C}}` },
  ],
  references: [
    {
      title: "The ARRL Handbook for Radio Communications",
      detail: "Electrical fundamentals chapter: capacitive and inductive reactance, resonance of LC circuits",
    },
    {
      title: "Radiotron Designer's Handbook, 4th ed.",
      detail: "Chapter on circuit theory (reactance and resonance) and its reactance charts (chapters cited from memory)",
    },
  ],
  whyItMatters:
    "A coupling or bypass capacitor only does its job where its reactance is small beside the resistance around it, " +
    "so reactance tells you whether a replacement value will pass the bass or cut it. An IF or tuned circuit " +
    "resonates where the two reactances are equal; changing either part moves the frequency by the square root.",
  compute(input: ReactanceInput) {
    const { frequency: f, capacitance: c, inductance: l } = input;
    const warnings: Warning[] = [];
    const capacitiveReactance = f !== undefined && c !== undefined ? 1 / (2 * Math.PI * f * c) : null;
    const inductiveReactance = f !== undefined && l !== undefined ? 2 * Math.PI * f * l : null;
    const resonantFrequency = c !== undefined && l !== undefined ? 1 / (2 * Math.PI * Math.sqrt(l * c)) : null;
    if (resonantFrequency !== null && f !== undefined) {
      const ratio = f / resonantFrequency;
      if (Math.abs(ratio - 1) > 1e-6) {
        warnings.push({
          level: "info",
          message:
            ratio < 1
              ? `At ${formatQuantity(f, "Hz")} you are below resonance: a series pair looks capacitive, a parallel pair inductive.`
              : `At ${formatQuantity(f, "Hz")} you are above resonance: a series pair looks inductive, a parallel pair capacitive.`,
        });
      }
    }
    warnings.push({
      level: "info",
      message: "Ideal parts assumed: real capacitors have leakage and series resistance, and coils have winding resistance and self-capacitance.",
    });
    return { outputs: { capacitiveReactance, inductiveReactance, resonantFrequency }, warnings };
  },
  explain(input: ReactanceInput, o) {
    const { frequency: f, capacitance: c, inductance: l } = input;
    const steps: Step[] = [];
    if (f !== undefined && c !== undefined && o.capacitiveReactance !== null) {
      steps.push({
        label: "Capacitive reactance",
        latex: tex`X_C = \frac{1}{2\pi \times ${texQuantity(f, "Hz", 4)} \times ${texQuantity(c, "F", 4)}} = ${texQuantity(o.capacitiveReactance, "Ω", 4)}`,
      });
    }
    if (f !== undefined && l !== undefined && o.inductiveReactance !== null) {
      steps.push({
        label: "Inductive reactance",
        latex: tex`X_L = 2\pi \times ${texQuantity(f, "Hz", 4)} \times ${texQuantity(l, "H", 4)} = ${texQuantity(o.inductiveReactance, "Ω", 4)}`,
      });
    }
    if (c !== undefined && l !== undefined && o.resonantFrequency !== null) {
      steps.push(
        {
          label: "Resonant frequency",
          latex: tex`f_0 = \frac{1}{2\pi\sqrt{${texQuantity(l, "H", 4)} \times ${texQuantity(c, "F", 4)}}} = ${texQuantity(o.resonantFrequency, "Hz", 4)}`,
        },
        {
          label: "Reactance of either part at resonance",
          latex: tex`X_C = X_L = \sqrt{L/C} = ${texQuantity(Math.sqrt(l / c), "Ω", 4)}`,
        },
      );
    }
    return steps;
  },
});
