import { tex, texQuantity } from "./format";
import { plateDissipationSchema, STAGE_CLASSES, TUBE_TYPES, TUBES as TUBES_BY_TYPE, type PlateDissipationInput } from "./plate-dissipation-schema";
import { AB_IDLE_MARGIN, dissipationWarnings as dissipationWarningsOf } from "./plate-dissipation-warnings";
import { highVoltageWarning } from "./safety";
import { defineCalculator, type Step, type Warning } from "./types";

export { plateDissipationSchema, type PlateDissipationInput } from "./plate-dissipation-schema";
export { AB_IDLE_MARGIN } from "./plate-dissipation-warnings";

// Module-level copies of what compute reads: under the CommonJS interop the benchmark runs in, every
// read of an imported binding is a getter call (as in arc-clearance.ts).
const TUBES = TUBES_BY_TYPE;
const dissipationWarnings = dissipationWarningsOf;

/**
 * Plate (and screen) dissipation at the operating point: the DC power the electrode turns into heat,
 * P = (Vp − Vk)·Ip, voltages measured to chassis so the plate-to-cathode voltage is Vp − Vk
 * (Radiotron Designer's Handbook 4th ed., ch. 13, power output stages; the data sheet's rating is on
 * this average power). The fraction of the data-sheet maximum is the figure to compare.
 * Margin (common practice): a push-pull class AB output stage idles at no more than about 70 % of the
 * maximum, leaving room for signal and a high line; a single-ended class A stage is designed nearer 100 %.
 */

export const calculator = defineCalculator({
  slug: "plate-dissipation",
  title: "Plate dissipation",
  purpose: "How hot a tube's plate runs at its operating point, as a fraction of the data sheet's maximum.",
  bench: {
    group: "stages",
    example: { plateVoltage: "250 V", cathodeVoltage: "12.5 V", plateCurrent: "45 mA", tube: "6V6GT", stageClass: "A" },
    headlines: ["dissipation", "fractionOfMax"],
    alwaysDanger: false,
    chart: null,
    format: { fractionOfMax: "percent", screenFractionOfMax: "percent" },
  },
  inputs: [
    { name: "plateVoltage", label: "Plate voltage (to chassis)", unit: "V", required: true, control: "quantity", quantity: "voltage" },
    {
      name: "cathodeVoltage",
      label: "Cathode voltage (to chassis)",
      unit: "V",
      required: false,
      default: 0,
      control: "quantity",
      quantity: "voltage",
      help: "Across the cathode resistor; 0 with fixed bias.",
    },
    { name: "plateCurrent", label: "Plate current", unit: "A", required: true, control: "quantity", quantity: "current", help: "At idle, no signal." },
    {
      name: "tube",
      label: "Tube type",
      unit: "",
      required: false,
      control: "select",
      options: TUBE_TYPES,
      help: "Its data-sheet maximum is used; or leave it blank and enter the maximum below.",
    },
    {
      name: "maxDissipation",
      label: "Maximum plate dissipation",
      unit: "W",
      required: false,
      control: "quantity",
      quantity: "power",
      help: "From the data sheet; replaces the table's figure when given.",
    },
    {
      name: "screenVoltage",
      label: "Screen voltage (to chassis)",
      unit: "V",
      required: false,
      control: "quantity",
      quantity: "voltage",
      help: "Pentodes and beam tubes, optional.",
    },
    { name: "screenCurrent", label: "Screen current", unit: "A", required: false, control: "quantity", quantity: "current" },
    {
      name: "maxScreenDissipation",
      label: "Maximum screen dissipation",
      unit: "W",
      required: false,
      control: "quantity",
      quantity: "power",
      help: "Replaces the table's figure when given.",
    },
    {
      name: "stageClass",
      label: "Stage class",
      unit: "",
      required: false,
      control: "select",
      options: STAGE_CLASSES,
      help: "Single-ended class A stages are designed near the maximum; push-pull class AB idles lower.",
    },
  ],
  outputs: [
    { name: "dissipation", label: "Plate dissipation", unit: "W" },
    { name: "fractionOfMax", label: "Fraction of the data-sheet maximum", unit: "" },
    { name: "ratedDissipation", label: "Data-sheet maximum used", unit: "W" },
    { name: "screenDissipation", label: "Screen dissipation", unit: "W" },
    { name: "screenFractionOfMax", label: "Screen: fraction of its maximum", unit: "" },
  ],
  schema: plateDissipationSchema,
  formulas: [
    { label: "Plate dissipation", latex: tex`P_a = (V_p - V_k)\,I_p` },
    { label: "Fraction of the data-sheet maximum", latex: tex`\frac{P_a}{P_{a,\max}}` },
    { label: "Screen dissipation", latex: tex`P_{g2} = (V_{g2} - V_k)\,I_{g2}` },
  ],
  references: [
    {
      title: "Radiotron Designer's Handbook, 4th ed.",
      detail: "Chapter 13, audio power output stages: plate dissipation at the operating point (chapter cited from memory)",
    },
    {
      title: "RCA receiving tube manual (RC-series) and tube data sheets",
      detail: "Maximum plate and screen dissipation of each type (the built-in table, from memory)",
    },
    {
      title: "Output-stage biasing practice",
      detail: `Class AB push-pull idles at no more than about ${AB_IDLE_MARGIN * 100} % of the maximum plate dissipation (common practice)`,
    },
  ],
  whyItMatters:
    "Every watt the plate does not pass on as signal is heat. Above the data sheet's maximum the plate glows red, the tube gasses and " +
    "its life shortens to hours, and a tube that runs away can take the output transformer or the rectifier with it. Worked out from the " +
    "plate and cathode voltages and the plate current, the dissipation tells you whether a set's bias is where the designer put it before you change anything.",
  compute(input: PlateDissipationInput) {
    const { plateVoltage: vp, cathodeVoltage: vk, plateCurrent: ip, maxDissipation, screenVoltage: vs, screenCurrent: is, maxScreenDissipation } = input;
    const tube = input.tube === undefined ? undefined : TUBES.get(input.tube);
    const ratedDissipation = maxDissipation ?? tube!.maxPlateDissipation;
    const vpk = vp - vk;
    const dissipation = vpk * ip;
    const fractionOfMax = dissipation / ratedDissipation;
    let screenDissipation: number | null = null;
    let screenFractionOfMax: number | null = null;
    if (vs !== undefined && is !== undefined) {
      screenDissipation = (vs - vk) * is;
      const screenRated = maxScreenDissipation ?? tube?.maxScreenDissipation;
      if (screenRated !== undefined) screenFractionOfMax = screenDissipation / screenRated;
    }
    const warnings: Warning[] = highVoltageWarning(vp, vs);
    dissipationWarnings(warnings, input, tube, { vpk, dissipation, fractionOfMax, ratedDissipation, screenDissipation, screenFractionOfMax });
    return { outputs: { dissipation, fractionOfMax, ratedDissipation, screenDissipation, screenFractionOfMax }, warnings };
  },
  explain(input: PlateDissipationInput, o) {
    const { plateVoltage: vp, cathodeVoltage: vk, plateCurrent: ip, screenVoltage: vs, screenCurrent: is } = input;
    const steps: Step[] = [
      {
        label: "Plate dissipation (plate to cathode voltage times plate current)",
        latex: tex`P_a = (${texQuantity(vp, "V", 4)} - ${texQuantity(vk, "V", 4)}) \times ${texQuantity(ip, "A", 4)} = ${texQuantity(o.dissipation, "W", 4)}`,
      },
      {
        label: "Fraction of the data-sheet maximum",
        latex: tex`\frac{${texQuantity(o.dissipation, "W", 4)}}{${texQuantity(o.ratedDissipation, "W")}} = ${texQuantity(100 * o.fractionOfMax, "%", 3)}`,
      },
    ];
    if (o.screenDissipation !== null && vs !== undefined && is !== undefined) {
      steps.push({
        label: "Screen dissipation",
        latex: tex`P_{g2} = (${texQuantity(vs, "V", 4)} - ${texQuantity(vk, "V", 4)}) \times ${texQuantity(is, "A", 4)} = ${texQuantity(o.screenDissipation, "W", 4)}`,
      });
      if (o.screenFractionOfMax !== null) {
        steps.push({ label: "Screen: fraction of its maximum", latex: tex`${texQuantity(100 * o.screenFractionOfMax, "%", 3)}` });
      }
    }
    return steps;
  },
});
