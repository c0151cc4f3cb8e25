import { z } from "zod";
import { formatQuantity, texQuantity, tex } from "./format";
import { highVoltageWarning } from "./safety";
import { RECEIVING_TUBES, findTube, type ReceivingTube } from "./tables/tubes";
import { defineCalculator, type Step, type Warning } from "./types";
import { optionalQuantity, quantity, quantityWithDefault } from "./units";

/**
 * Plate (and screen) dissipation at the operating point: the DC power the electrode turns into heat,
 * P = (Vp − Vk)·Ip, voltages measured to chassis so the plate-to-cathode voltage is Vp − Vk
 * (Radiotron Designer's Handbook 4th ed., ch. 13, power output stages; the data sheet's rating is on
 * this average power). The fraction of the data-sheet maximum is the figure to compare.
 * Margin (common practice): a push-pull class AB output stage idles at no more than about 70 % of the
 * maximum, leaving room for signal and a high line; a single-ended class A stage is designed nearer 100 %.
 */

/** Idle fraction of the maximum above which a class AB (or unstated) stage gets a caution: common practice. */
export const AB_IDLE_MARGIN = 0.7;

const TUBES = new Map<string, ReceivingTube>(RECEIVING_TUBES.map((t) => [t.type, t]));

/** Each tube's fixed notes, made once: compute only picks them up. */
function tubeNotes(tube: ReceivingTube): { always: Warning[]; fromTable: Warning } {
  const always: Warning[] = [];
  if (tube.sections === 2)
    always.push({
      level: "info",
      message: `The ${tube.type}'s rating is per section: work out each section on its own. The data sheet also limits both together.`,
    });
  if (tube.maxPeakPulseVoltage !== undefined) {
    always.push({
      level: "info",
      message: `In a television's horizontal output the ${tube.type}'s plate sees flyback pulses up to ${formatQuantity(tube.maxPeakPulseVoltage, "V")}; the DC figures here give the average dissipation only.`,
    });
  }
  const fromTable: Warning = {
    level: "info",
    message: `The ${tube.type}'s maximum is from the built-in table, recalled from memory of its data sheet; suffixes and makers differ, so check the sheet of the tube in the set.`,
  };
  return { always, fromTable };
}
const NOTES = new Map(RECEIVING_TUBES.map((t) => [t.type, tubeNotes(t)]));
const TUBE_TYPES = RECEIVING_TUBES.map((t) => t.type);
const STAGE_CLASSES = ["A", "AB"] as const;
type StageClass = (typeof STAGE_CLASSES)[number];

const isBlank = (v: unknown) => v === undefined || v === null || (typeof v === "string" && v.trim() === "");

const tubeField = z
  .unknown()
  .transform((raw, ctx): string | undefined => {
    if (isBlank(raw)) return undefined;
    // The form sends the table's own type numbers: look those up directly before reading a typed name.
    const found = typeof raw === "string" ? (TUBES.get(raw) ?? findTube(raw)) : undefined;
    if (!found) {
      ctx.addIssue({ code: "custom", message: "Tube type is not in the built-in table; leave it blank and enter the maximum dissipation from its data sheet" });
      return z.NEVER;
    }
    if (found.category !== "receiving") {
      ctx.addIssue({ code: "custom", message: `Tube type ${found.type} is a picture tube, rated by anode voltage, not plate dissipation` });
      return z.NEVER;
    }
    return found.type;
  })
  .optional();

const stageClassField = z
  .unknown()
  .transform((raw, ctx): StageClass | undefined => {
    if (isBlank(raw)) return undefined;
    if (raw === "A" || raw === "AB") return raw;
    const typed =
      typeof raw === "string"
        ? raw
            .trim()
            .toUpperCase()
            .replace(/^CLASS\s*/, "")
        : "";
    if (typed === "A" || typed === "AB") return typed;
    ctx.addIssue({ code: "custom", message: 'Stage class must be "A" or "AB"' });
    return z.NEVER;
  })
  .optional();

export const plateDissipationSchema = z
  .object({
    plateVoltage: quantity("voltage", { positive: true, max: 1e5, label: "Plate voltage" }),
    cathodeVoltage: quantityWithDefault("voltage", 0, { nonNegative: true, max: 1e4, label: "Cathode voltage" }),
    plateCurrent: quantity("current", { positive: true, min: 1e-9, max: 10, label: "Plate current" }),
    tube: tubeField,
    maxDissipation: optionalQuantity("power", { positive: true, min: 1e-3, max: 1e5, label: "Maximum dissipation" }),
    screenVoltage: optionalQuantity("voltage", { positive: true, max: 1e4, label: "Screen voltage" }),
    screenCurrent: optionalQuantity("current", { nonNegative: true, max: 10, label: "Screen current" }),
    maxScreenDissipation: optionalQuantity("power", { positive: true, min: 1e-3, max: 1e5, label: "Maximum screen dissipation" }),
    stageClass: stageClassField,
  })
  .superRefine((v, ctx) => {
    if (v.cathodeVoltage >= v.plateVoltage) {
      ctx.addIssue({ code: "custom", path: ["cathodeVoltage"], message: "Cathode voltage must be below the plate voltage (both measured to chassis)" });
    }
    if (v.tube === undefined && v.maxDissipation === undefined) {
      ctx.addIssue({ code: "custom", path: ["tube"], message: "Tube type is required, or enter the maximum plate dissipation from its data sheet" });
    }
    if (v.screenVoltage !== undefined && v.screenCurrent === undefined) {
      ctx.addIssue({ code: "custom", path: ["screenCurrent"], message: "Screen current is required with a screen voltage" });
    } else if (v.screenCurrent !== undefined && v.screenVoltage === undefined) {
      ctx.addIssue({ code: "custom", path: ["screenVoltage"], message: "Screen voltage is required with a screen current" });
    } else if (v.screenVoltage !== undefined && v.screenVoltage <= v.cathodeVoltage) {
      ctx.addIssue({ code: "custom", path: ["screenVoltage"], message: "Screen voltage must be above the cathode voltage (both measured to chassis)" });
    }
  });

export type PlateDissipationInput = z.output<typeof plateDissipationSchema>;

const percent = (x: number) => `${Math.round(1000 * x) / 10} %`;

// Fixed wording (the fraction itself is an output), so the common cases format nothing.
const ABOVE_AB_MARGIN: Warning = {
  level: "caution",
  message:
    `Above ${AB_IDLE_MARGIN * 100} % of the data-sheet maximum, the most a push-pull class AB stage commonly idles at (common practice), leaving room for signal and a high line. ` +
    "A single-ended class A stage is designed nearer the maximum: if that is this stage, choose class A.",
};
const CLASS_A_NEAR_MAX: Warning = {
  level: "info",
  message:
    `Above ${AB_IDLE_MARGIN * 100} % of the data-sheet maximum, and below it: a single-ended class A stage is designed near the maximum ` +
    "(the 6V6GT's own typical operation is about 94 %), with no signal swing to allow for. A line running high raises it further.",
};

const CATHODE_READING: Warning = {
  level: "info",
  message:
    "Use the plate current alone. A reading worked out from the cathode resistor's voltage also carries the screen current, and with it the " +
    "plate dissipation comes out too high. The figure is at idle (no signal); a class AB stage's dissipation changes with signal.",
};

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
    const {
      plateVoltage: vp,
      cathodeVoltage: vk,
      plateCurrent: ip,
      maxDissipation,
      screenVoltage: vs,
      screenCurrent: is,
      maxScreenDissipation,
      stageClass,
    } = input;
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
    if (fractionOfMax > 1) {
      warnings.push({
        level: "danger",
        message: `The plate dissipates ${formatQuantity(dissipation, "W")}, ${percent(fractionOfMax)} of the ${formatQuantity(ratedDissipation, "W")} data-sheet maximum: beyond its rating. Expect a red plate, gas and a short life, and a runaway that can take the output transformer or rectifier with it. Check the bias, the grid's coupling capacitor and the screen supply.`,
      });
    } else if (fractionOfMax > AB_IDLE_MARGIN && stageClass !== "A") {
      warnings.push(ABOVE_AB_MARGIN);
    } else if (fractionOfMax > AB_IDLE_MARGIN) {
      warnings.push(CLASS_A_NEAR_MAX);
    }
    if (tube?.maxPlateVoltage !== undefined && vpk > tube.maxPlateVoltage) {
      warnings.push({
        level: "caution",
        message: `${formatQuantity(vpk, "V")} plate to cathode is above the ${tube.type}'s ${formatQuantity(tube.maxPlateVoltage, "V")} maximum plate voltage (table, from memory of the data sheet).`,
      });
    }
    if (screenFractionOfMax !== null && screenFractionOfMax > 1) {
      warnings.push({
        level: "danger",
        message: `The screen dissipates ${formatQuantity(screenDissipation!, "W")}, ${percent(screenFractionOfMax)} of its maximum: beyond its rating; a screen grid this hot warps and glows.`,
      });
    }
    if (tube) {
      const notes = NOTES.get(tube.type)!;
      for (const w of notes.always) warnings.push(w);
      if (maxDissipation === undefined) warnings.push(notes.fromTable);
    }
    warnings.push(CATHODE_READING);
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
