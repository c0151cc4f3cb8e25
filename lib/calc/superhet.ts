import { z } from "zod";
import { formatQuantity, texQuantity, tex } from "./format";
import { defineCalculator, type Step, type Warning } from "./types";
import { tunedCircuitRejection } from "./tuned-circuit";
import { optionalQuantity, quantity, quantityWithDefault } from "./units";

/**
 * Superheterodyne frequency plan. The mixer turns the signal into the IF with an oscillator one IF away:
 * f_o = f_s + f_IF (above) or f_s − f_IF (below). A station at the image, one IF on the far side of the
 * oscillator (f_s ± 2 f_IF), mixes to the same IF and only the tuned circuits ahead of the mixer can keep it
 * out. A single tuned circuit of loaded Q rejects it by α = √(1 + Q²ρ²), ρ = f_im/f_s − f_s/f_im (Kennedy &
 * Davis, Electronic Communication Systems, receivers chapter: image frequency and its rejection, from memory).
 * Below the oscillator, when f_s < 2 f_IF, the other response comes from the sum (f + f_o = f_IF): 2 f_IF − f_s.
 */

const oscillatorField = z
  .unknown()
  .transform((raw, ctx): boolean => {
    if (raw === undefined || raw === null || raw === "") return true;
    if (raw === true || raw === "true" || raw === "on" || raw === "above") return true;
    if (raw === false || raw === "false" || raw === "off" || raw === "below") return false;
    ctx.addIssue({ code: "custom", message: "Oscillator above must be true (above the signal) or false (below it)" });
    return z.NEVER;
  })
  .default(true);

export const superhetSchema = z
  .object({
    signalFrequency: quantity("frequency", { positive: true, min: 1000, max: 1e10, label: "Signal frequency" }),
    intermediateFrequency: quantityWithDefault("frequency", 455e3, { positive: true, min: 1000, max: 1e10, label: "Intermediate frequency" }),
    oscillatorAbove: oscillatorField,
    loadedQ: optionalQuantity("ratio", { positive: true, min: 1, max: 10_000, label: "Loaded Q" }),
  })
  .superRefine((v, ctx) => {
    if (!v.oscillatorAbove && v.intermediateFrequency >= v.signalFrequency) {
      ctx.addIssue({
        code: "custom",
        path: ["intermediateFrequency"],
        message: "Intermediate frequency must be below the signal frequency when the oscillator runs below the signal",
      });
    } else if (!v.oscillatorAbove && Math.abs(v.signalFrequency - 2 * v.intermediateFrequency) <= 1e-9 * v.signalFrequency) {
      // f_o = f_IF: the oscillator itself sits in the IF strip and the image falls to 0 Hz.
      ctx.addIssue({
        code: "custom",
        path: ["intermediateFrequency"],
        message: "Intermediate frequency of half the signal puts an oscillator below the signal on the IF itself; choose the oscillator above",
      });
    }
  });

export type SuperhetInput = z.output<typeof superhetSchema>;

/** Image rejection of one tuned circuit: √(1 + Q²ρ²) (lib/calc/tuned-circuit.ts). */
const rejection = tunedCircuitRejection;

const BELOW_NOTE: Warning = {
  level: "info",
  message:
    "Most broadcast sets run the oscillator above the signal: for 540–1600 kHz with a 455 kHz IF it tunes 995–2055 kHz, about 2.1 : 1 " +
    "against the signal's 3 : 1, which one gang of the tuning capacitor can track (Kennedy & Davis, receivers chapter, from memory).",
};
const SUM_NOTE: Warning = {
  level: "info",
  message: "With the oscillator below a signal less than twice the IF, the other response comes from the sum of oscillator and signal (f + f_o = f_IF).",
};
const IF_NEAR: Warning = {
  level: "caution",
  message:
    "The signal is within 10 % of the IF: a strong station near the IF leaks straight through the mixer into the IF amplifier, whatever the " +
    "oscillator does. Sets tuned near their IF need an IF wave trap at the aerial.",
};

export const calculator = defineCalculator({
  slug: "superhet",
  title: "Superhet frequencies",
  purpose: "Where a superhet's oscillator and its image sit for a signal and IF, and how well one tuned circuit keeps the image out.",
  bench: {
    group: "radio",
    example: { signalFrequency: "1000 kHz", intermediateFrequency: "455 kHz", loadedQ: "100" },
    headlines: ["oscillatorFrequency", "imageFrequency"],
    alwaysDanger: false,
    chart: "superhet-dial",
  },
  inputs: [
    {
      name: "signalFrequency",
      label: "Signal frequency",
      unit: "Hz",
      required: true,
      control: "quantity",
      quantity: "frequency",
      help: "The station the set is tuned to, e.g. 1000 kHz.",
    },
    {
      name: "intermediateFrequency",
      label: "Intermediate frequency",
      unit: "Hz",
      required: false,
      default: 455e3,
      control: "quantity",
      quantity: "frequency",
      help: "455 kHz for most AM sets (some older ones 175, 262 or 465 kHz); 10.7 MHz for FM.",
    },
    {
      name: "oscillatorAbove",
      label: "Oscillator above the signal",
      unit: "",
      required: false,
      default: true,
      control: "boolean",
      help: "Usual for broadcast sets; clear it for an oscillator below the signal.",
    },
    {
      name: "loadedQ",
      label: "Loaded Q of the front end (optional)",
      unit: "",
      required: false,
      control: "quantity",
      quantity: "ratio",
      help: "Of the one tuned circuit ahead of the mixer, for the image rejection; typically 50–100 for a broadcast aerial coil.",
    },
  ],
  outputs: [
    { name: "oscillatorFrequency", label: "Oscillator frequency", unit: "Hz" },
    { name: "imageFrequency", label: "Image frequency", unit: "Hz" },
    { name: "imageSeparation", label: "Image to signal", unit: "Hz" },
    { name: "imageRejection", label: "Image rejection, one tuned circuit (ratio)", unit: "" },
    { name: "imageRejectionDb", label: "Image rejection, one tuned circuit", unit: "dB" },
  ],
  schema: superhetSchema,
  formulas: [
    { label: "Oscillator", latex: tex`f_o = f_s \pm f_\text{IF}\quad(+\ \text{above},\ -\ \text{below})` },
    {
      label: "Image",
      latex: tex`f_\text{im} = \left|f_s \pm 2 f_\text{IF}\right|, \qquad \left|f_\text{im} - f_o\right| = f_\text{IF}\ \text{or}\ f_\text{im} + f_o = f_\text{IF}`,
    },
    {
      label: "Image rejection of one tuned circuit",
      latex: tex`\alpha = \sqrt{1 + Q^2 \rho^2}, \qquad \rho = \frac{f_\text{im}}{f_s} - \frac{f_s}{f_\text{im}}`,
    },
  ],
  references: [
    {
      title: "Kennedy & Davis, Electronic Communication Systems",
      detail: "Receivers chapter: the superheterodyne, image frequency and its rejection, the worked example at 1000 kHz and 25 MHz (from memory)",
    },
    {
      title: "Radiotron Designer's Handbook, 4th ed.",
      detail: "Chapter on frequency changers and the superheterodyne: oscillator tracking and second-channel (image) interference (chapter cited from memory)",
    },
    { title: "The ARRL Handbook for Radio Communications", detail: "Receivers chapter: mixing, IF choice and image response" },
  ],
  whyItMatters:
    "In a superhet the oscillator sits one IF away from the station, and so does a second station on its far side: the image. " +
    "Both mix down to the same IF, and once they are in the IF strip nothing can tell them apart — only the aerial and RF tuned " +
    "circuits ahead of the mixer can keep the image out. That is why a misaligned front end lets a station be heard twice on the " +
    "dial, 2 × IF apart, and why shortwave sets with a 455 kHz IF suffer images that a broadcast set never shows.",
  compute(input: SuperhetInput) {
    const { signalFrequency: fs, intermediateFrequency: fif, oscillatorAbove: above, loadedQ: q } = input;
    const oscillatorFrequency = above ? fs + fif : fs - fif;
    const raw = above ? fs + 2 * fif : fs - 2 * fif;
    const imageFrequency = raw < 0 ? -raw : raw;
    const imageSeparation = imageFrequency > fs ? imageFrequency - fs : fs - imageFrequency;
    const imageRejection = q === undefined ? null : rejection(q, fs, imageFrequency);
    const imageRejectionDb = imageRejection === null ? null : 20 * Math.log10(imageRejection);
    const warnings: Warning[] = [
      {
        level: "info",
        message:
          `A station at ${formatQuantity(imageFrequency, "Hz", 4)} also mixes to the ${formatQuantity(fif, "Hz", 4)} IF. Only the tuned circuits ahead of the mixer keep it out: ` +
          `it lies ${formatQuantity(imageSeparation, "Hz", 3)} (${Math.round((imageSeparation / fs) * 100)} % of the signal) away from them.`,
      },
    ];
    if (imageRejectionDb !== null && imageRejectionDb < 20) {
      warnings.push({
        level: "caution",
        message: `One tuned circuit of Q ${q} rejects the image by only ${imageRejectionDb.toFixed(1)} dB: expect the station to be heard a second time. An RF stage (a second tuned circuit) or a higher IF is the usual cure.`,
      });
    }
    if (Math.abs(fs - fif) < 0.1 * fif) warnings.push(IF_NEAR);
    if (!above) {
      warnings.push(BELOW_NOTE);
      if (raw < 0) warnings.push(SUM_NOTE);
    }
    return { outputs: { oscillatorFrequency, imageFrequency, imageSeparation, imageRejection, imageRejectionDb }, warnings };
  },
  explain(input: SuperhetInput, o) {
    const { signalFrequency: fs, intermediateFrequency: fif, oscillatorAbove: above, loadedQ: q } = input;
    const hz = (x: number) => texQuantity(x, "Hz", 5);
    const sign = above ? "+" : "-";
    const steps: Step[] = [
      { label: `Oscillator (${above ? "above" : "below"} the signal)`, latex: tex`f_o = ${hz(fs)} ${sign} ${hz(fif)} = ${hz(o.oscillatorFrequency)}` },
      { label: "Image", latex: tex`f_\text{im} = \left|${hz(fs)} ${sign} 2 \times ${hz(fif)}\right| = ${hz(o.imageFrequency)}` },
      {
        label: "Check: the image also lands on the IF",
        latex:
          !above && fs < 2 * fif
            ? tex`f_\text{im} + f_o = ${hz(o.imageFrequency)} + ${hz(o.oscillatorFrequency)} = ${hz(o.imageFrequency + o.oscillatorFrequency)}`
            : tex`\left|f_\text{im} - f_o\right| = \left|${hz(o.imageFrequency)} - ${hz(o.oscillatorFrequency)}\right| = ${hz(Math.abs(o.imageFrequency - o.oscillatorFrequency))}`,
      },
    ];
    if (q !== undefined && o.imageRejection !== null && o.imageRejectionDb !== null) {
      const rho = o.imageFrequency / fs - fs / o.imageFrequency;
      steps.push(
        {
          label: "Image ratio ρ",
          latex: tex`\rho = \frac{${hz(o.imageFrequency)}}{${hz(fs)}} - \frac{${hz(fs)}}{${hz(o.imageFrequency)}} = ${rho.toFixed(4)}`,
        },
        {
          label: "Image rejection of one tuned circuit",
          latex: tex`\alpha = \sqrt{1 + ${q}^2 \times ${rho.toFixed(4)}^2} = ${o.imageRejection.toPrecision(4)} \;(${o.imageRejectionDb.toFixed(1)}\,\mathrm{dB})`,
        },
      );
    }
    return steps;
  },
});
