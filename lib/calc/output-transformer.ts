import { z } from "zod";
import { texQuantity, tex } from "./format";
import { ALWAYS_DANGER } from "./safety";
import { defineCalculator, type Step, type Warning } from "./types";
import { optionalQuantity, quantity } from "./units";

/**
 * Output transformer as an ideal impedance transformer: Zp/Zs = n², so the turns ratio is
 * n = √(Zp/Zs) and a load Z_L on the secondary reflects to the primary as n²·Z_L
 * (Radiotron Designer's Handbook 4th ed., ch. 5, transformers: impedance ratio = turns ratio squared;
 * ARRL Handbook, impedance matching with transformers). Winding resistance and leakage are ignored.
 */

/** A load this far off the tap's rating (either way) gets a caution: common practice. */
export const MISMATCH_FACTOR = 2;

export const outputTransformerSchema = z
  .object({
    primaryImpedance: quantity("resistance", { positive: true, min: 10, max: 1e6, label: "Primary impedance" }),
    secondaryImpedance: quantity("resistance", { positive: true, min: 0.1, max: 1e5, label: "Secondary impedance" }),
    newLoad: optionalQuantity("resistance", { positive: true, min: 0.1, max: 1e5, label: "New load" }),
  })
  .superRefine((v, ctx) => {
    if (v.primaryImpedance <= v.secondaryImpedance) {
      ctx.addIssue({
        code: "custom",
        path: ["secondaryImpedance"],
        message:
          "Secondary impedance must be below the primary's: an output transformer steps a plate load of thousands of ohms down to the speaker. Check the two are not swapped.",
      });
    }
  });

export type OutputTransformerInput = z.output<typeof outputTransformerSchema>;

const NO_LOAD: Warning = {
  level: "caution",
  message:
    "Never run the amplifier with the speaker disconnected or the secondary open. With no load the primary's inductance meets every signal peak " +
    "with a voltage spike many times B+, which can arc across the winding insulation or the output tube's socket and destroy both (common practice). " +
    "Keep a load resistor of the tap's rating connected when testing without a speaker.",
};
const NOMINAL: Warning = {
  level: "info",
  message:
    "A speaker's marked impedance is nominal: it rises at the cone's resonance and in the treble, and the transformer's winding resistance adds loss, " +
    "so the plate load swings about the figure shown.",
};

const LOWER =
  "the plate load falls in proportion. A lower plate load makes a pentode or beam tube give less power with more distortion, and draws more peak plate and screen current.";
const HIGHER =
  "the plate load rises in proportion. A higher plate load lets the plate voltage swing further on peaks, stressing the transformer's insulation the way no load does, and heats a pentode's screen.";
const near = (side: string, why: string): Warning => ({
  level: "info",
  message: `The speaker's impedance is ${side} the tap's, within a factor of ${MISMATCH_FACTOR}: ${why} Most sets tolerate it (common practice).`,
});
const far = (side: string, why: string): Warning => ({
  level: "caution",
  message: `The speaker's impedance is more than a factor of ${MISMATCH_FACTOR} ${side} the tap's: ${why} Use the tap that matches the speaker (common practice).`,
});
/** Fixed messages (the figures are in the outputs), so compute does no formatting. */
const MISMATCH = { nearLow: near("below", LOWER), nearHigh: near("above", HIGHER), farLow: far("below", LOWER), farHigh: far("above", HIGHER) };

function mismatch(ratio: number): Warning {
  if (ratio < 1) return ratio < 1 / MISMATCH_FACTOR ? MISMATCH.farLow : MISMATCH.nearLow;
  return ratio > MISMATCH_FACTOR ? MISMATCH.farHigh : MISMATCH.nearHigh;
}

export const calculator = defineCalculator({
  slug: "output-transformer",
  title: "Output transformer",
  purpose: "The turns ratio of an output transformer, and the plate load a different speaker presents.",
  bench: {
    group: "stages",
    example: { primaryImpedance: "5k", secondaryImpedance: "8 ohm", newLoad: "4 ohm" },
    headlines: ["turnsRatio", "reflectedImpedance"],
    // The primary carries the plate's B+ and an unloaded secondary lets its voltage soar.
    alwaysDanger: true,
    chart: null,
  },
  inputs: [
    {
      name: "primaryImpedance",
      label: "Primary impedance (plate load)",
      unit: "Ω",
      required: true,
      control: "quantity",
      quantity: "resistance",
      help: "The load the output tube wants, from its data sheet or the transformer's marking; plate to plate for push-pull.",
    },
    {
      name: "secondaryImpedance",
      label: "Secondary impedance (tap)",
      unit: "Ω",
      required: true,
      control: "quantity",
      quantity: "resistance",
      help: "The speaker impedance the winding or tap is made for.",
    },
    {
      name: "newLoad",
      label: "Speaker actually connected",
      unit: "Ω",
      required: false,
      control: "quantity",
      quantity: "resistance",
      help: "Optional: the speaker you mean to use on that tap.",
    },
  ],
  outputs: [
    { name: "turnsRatio", label: "Turns ratio (primary : secondary)", unit: "" },
    { name: "reflectedImpedance", label: "Plate load with the new speaker", unit: "Ω" },
  ],
  schema: outputTransformerSchema,
  formulas: [
    { label: "Turns ratio", latex: tex`n = \frac{N_p}{N_s} = \sqrt{\frac{Z_p}{Z_s}}` },
    { label: "Reflected impedance", latex: tex`Z_p' = n^2 Z_L = Z_p\,\frac{Z_L}{Z_s}` },
  ],
  references: [
    {
      title: "Radiotron Designer's Handbook, 4th ed.",
      detail: "Chapter 5, transformers: the impedance ratio is the square of the turns ratio; output transformers (chapter cited from memory)",
    },
    { title: "The ARRL Handbook for Radio Communications", detail: "Impedance matching with transformers: Zp = n²·Zs (from memory)" },
    {
      title: "Output-stage practice",
      detail: "Never run an output stage without a load; a speaker within a factor of two of the tap's impedance is usually tolerated (common practice)",
    },
  ],
  whyItMatters:
    "The output tube delivers its power only into the plate load its data sheet names, and the transformer makes the speaker look like that " +
    "load. Put a 4 Ω speaker on an 8 Ω tap and the tube sees half its design load: less power, more distortion and more peak current. " +
    "Put nothing on it and the load goes sky-high: the first loud passage can arc the transformer over.",
  compute(input: OutputTransformerInput) {
    const { primaryImpedance: zp, secondaryImpedance: zs, newLoad } = input;
    const turnsRatio = Math.sqrt(zp / zs);
    const reflectedImpedance = newLoad === undefined ? null : (zp * newLoad) / zs;
    const warnings: Warning[] = [ALWAYS_DANGER, NO_LOAD];
    if (newLoad !== undefined && newLoad !== zs) warnings.push(mismatch(newLoad / zs));
    warnings.push(NOMINAL);
    return { outputs: { turnsRatio, reflectedImpedance }, warnings };
  },
  explain(input: OutputTransformerInput, o) {
    const { primaryImpedance: zp, secondaryImpedance: zs, newLoad } = input;
    const steps: Step[] = [
      {
        label: "Turns ratio",
        latex: tex`n = \sqrt{\frac{${texQuantity(zp, "Ω", 4)}}{${texQuantity(zs, "Ω", 4)}}} = ${texQuantity(o.turnsRatio, "", 4)} : 1`,
      },
    ];
    if (newLoad !== undefined && o.reflectedImpedance !== null) {
      steps.push({
        label: "Plate load with the new speaker",
        latex: tex`Z_p' = n^2 Z_L = (${texQuantity(o.turnsRatio, "", 4)})^2 \times ${texQuantity(newLoad, "Ω", 4)} = ${texQuantity(o.reflectedImpedance, "Ω", 4)}`,
      });
      steps.push({
        label: "Against the plate load the tube was designed for",
        latex: tex`\frac{Z_p'}{Z_p} = \frac{Z_L}{Z_s} = \frac{${texQuantity(newLoad, "Ω", 4)}}{${texQuantity(zs, "Ω", 4)}} = ${texQuantity(newLoad / zs, "", 3)}`,
      });
    }
    return steps;
  },
});
