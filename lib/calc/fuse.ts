import { z } from "zod";
import { texQuantity, tex } from "./format";
import { highVoltageWarning } from "./safety";
import { FUSE_RATINGS, FUSE_SERIES_SOURCE, FUSE_SERIES_TEXT, ratingAtLeast } from "./tables/fuses";
import { defineCalculator, type Warning } from "./types";
import { optionalQuantity, quantityWithDefault } from "./units";

/**
 * Mains fuse for a set: running current I = P/(V·cos φ) (ARRL Handbook, AC power and power factor),
 * times the margin the fuse kind needs, rounded up to the next IEC 60127 rated current.
 * Margins (common practice): a time-lag fuse runs at no more than about 80 % of its rating (×1.25);
 * a quick-acting fuse also has to ride through the switch-on surge of transformer, cold heaters and
 * reservoir capacitor, so it gets twice the running current.
 */

export const FUSE_KINDS = ["quick", "time-lag"] as const;
export type FuseKind = (typeof FUSE_KINDS)[number];

export const MARGIN: Readonly<Record<FuseKind, number>> = { quick: 2, "time-lag": 1.25 };

/** Miniature fuses are commonly rated 250 V (from memory); above it the fuse's own voltage rating needs a look. */
const COMMON_FUSE_VOLTAGE = 250;

export const fuseSchema = z
  .object({
    loadPower: optionalQuantity("power", { positive: true, min: 1e-3, max: 1e5, label: "Load power" }),
    loadCurrent: optionalQuantity("current", { positive: true, min: 1e-6, max: 1000, label: "Load current" }),
    lineVoltage: quantityWithDefault("voltage", 120, { positive: true, min: 1, max: 1000, label: "Line voltage" }),
    powerFactor: quantityWithDefault("ratio", 1, { positive: true, min: 0.05, max: 1, label: "Power factor" }),
    kind: z.enum(FUSE_KINDS, { error: 'Kind must be "quick" or "time-lag"' }),
  })
  .superRefine((v, ctx) => {
    if (v.loadPower === undefined && v.loadCurrent === undefined) {
      ctx.addIssue({ code: "custom", path: ["loadPower"], message: "Load power is required, or give the load current instead" });
    } else if (v.loadPower !== undefined && v.loadCurrent !== undefined) {
      ctx.addIssue({ code: "custom", path: ["loadCurrent"], message: "Load current: give either the load power or the load current, not both" });
    }
  });

export type FuseInput = z.output<typeof fuseSchema>;

const NOT_SHOCK: Warning = {
  level: "caution",
  message:
    "A fuse protects the transformer and wiring from overheating and fire on a fault. It does not protect anyone from shock: " +
    "it passes far more current than a body can take. Replace a blown fuse with the same rating and kind, never a larger one.",
};
const QUICK_SURGE: Warning = {
  level: "info",
  message:
    "Transformers, cold heaters and reservoir capacitors draw a switch-on surge of several times the running current. A quick-acting fuse " +
    "gets twice the running current for it; a time-lag fuse is the usual choice in a set's mains lead (common practice).",
};
const ABOVE_TABLE: Warning = {
  level: "caution",
  message:
    "The margin asks for more than 10 A, the largest miniature-fuse rating listed. Check the load, and fuse it as local codes and licensed practice require.",
};
const BELOW_TABLE: Warning = {
  level: "info",
  message: "32 mA is the smallest rating listed here; the load runs well below it. Smaller ratings exist in some standard sheets.",
};
const FUSE_VOLTAGE: Warning = {
  level: "caution",
  message: `Miniature fuses are commonly rated ${COMMON_FUSE_VOLTAGE} V. The fuse's rated voltage must be at least the line voltage: check the one you fit.`,
};

export const calculator = defineCalculator({
  slug: "fuse",
  title: "Mains fuse",
  purpose: "The running current of a set and the IEC 60127 fuse rating that suits it.",
  bench: {
    group: "first-power",
    example: { loadPower: "85 W", lineVoltage: "120 V", kind: "time-lag" },
    headlines: ["suggestedRating", "runningCurrent"],
    alwaysDanger: false,
    chart: null,
  },
  inputs: [
    {
      name: "loadPower",
      label: "Set's power",
      unit: "W",
      required: false,
      control: "quantity",
      quantity: "power",
      help: "From the label or service data. Or give the load current instead.",
    },
    {
      name: "loadCurrent",
      label: "Set's current",
      unit: "A",
      required: false,
      control: "quantity",
      quantity: "current",
      help: "Measured or from the service data (rms). Or give the power instead.",
    },
    { name: "lineVoltage", label: "Line voltage", unit: "V", required: false, default: 120, control: "quantity", quantity: "voltage" },
    {
      name: "powerFactor",
      label: "Power factor",
      unit: "",
      required: false,
      default: 1,
      control: "quantity",
      quantity: "ratio",
      help: "Between 0 and 1; below 1 a transformer set draws more current than P/V.",
    },
    {
      name: "kind",
      label: "Fuse kind",
      unit: "",
      required: true,
      control: "select",
      options: FUSE_KINDS,
      help: "Time-lag (T, slow-blow) or quick-acting (F).",
    },
  ],
  outputs: [
    { name: "runningCurrent", label: "Running current", unit: "A" },
    { name: "margin", label: "Margin for the fuse kind", unit: "×" },
    { name: "suggestedRating", label: "Suggested fuse rating", unit: "A" },
    { name: "ratingSeries", label: "Rating series", unit: "" },
  ],
  schema: fuseSchema,
  formulas: [
    { label: "Running current", latex: tex`I = \frac{P}{V\,\cos\varphi}` },
    { label: "Least rating for the kind", latex: tex`I_n \ge m\,I, \quad m = 1.25\ (\text{time-lag}),\ 2\ (\text{quick})` },
    { label: "IEC 60127 rated currents", latex: tex`I_n \in \{1,\ 1.25,\ 1.6,\ 2,\ 2.5,\ 3.15,\ 4,\ 5,\ 6.3,\ 8\} \times 10^n\,\mathrm{A}` },
  ],
  references: [
    { title: "IEC 60127-1 and IEC 60127-2, Miniature fuses", detail: `${FUSE_SERIES_SOURCE}; the 32 mA to 10 A span of the 5 × 20 mm sheets from memory` },
    { title: "The ARRL Handbook for Radio Communications", detail: "AC power chapter: apparent power and power factor, I = P/(V·cos φ)" },
    {
      title: "Fuse application practice",
      detail:
        "Run a fuse at no more than about 80 % of its rating; allow for switch-on surge with a time-lag fuse or a larger quick-acting one (common practice)",
    },
  ],
  whyItMatters:
    "Many old sets arrive with no fuse, or with whatever would fit the holder. A fuse near the set's real running current " +
    "opens when a rectifier or filter capacitor shorts, before the power transformer cooks; one far too large lets the " +
    "transformer burn first. The rating is only half of it: a time-lag fuse rides through the switch-on surge that would pop a quick one.",
  compute(input: FuseInput) {
    const { loadPower: p, loadCurrent, lineVoltage: v, powerFactor: pf, kind } = input;
    const runningCurrent = loadCurrent ?? p! / (v * pf);
    const margin = MARGIN[kind];
    const needed = margin * runningCurrent;
    const suggestedRating = ratingAtLeast(needed);
    const warnings: Warning[] = highVoltageWarning(v);
    warnings.push(NOT_SHOCK);
    if (kind === "quick") warnings.push(QUICK_SURGE);
    if (suggestedRating === null) warnings.push(ABOVE_TABLE);
    else if (suggestedRating === FUSE_RATINGS[0] && needed < FUSE_RATINGS[0] / 2) warnings.push(BELOW_TABLE);
    if (v > COMMON_FUSE_VOLTAGE) warnings.push(FUSE_VOLTAGE);
    return { outputs: { runningCurrent, margin, suggestedRating, ratingSeries: FUSE_SERIES_TEXT }, warnings };
  },
  explain(input: FuseInput, o) {
    const { loadPower: p, loadCurrent, lineVoltage: v, powerFactor: pf, kind } = input;
    const current =
      loadCurrent !== undefined
        ? { label: "Running current (as given)", latex: tex`I = ${texQuantity(o.runningCurrent, "A")}` }
        : {
            label: "Running current",
            latex: tex`I = \frac{P}{V\,\cos\varphi} = \frac{${texQuantity(p!, "W")}}{${texQuantity(v, "V")} \times ${texQuantity(pf, "")}} = ${texQuantity(o.runningCurrent, "A")}`,
          };
    const needed = o.margin * o.runningCurrent;
    return [
      current,
      { label: `Least rating for a ${kind} fuse`, latex: tex`m\,I = ${o.margin} \times ${texQuantity(o.runningCurrent, "A")} = ${texQuantity(needed, "A")}` },
      {
        label: "Next IEC 60127 rated current at or above it",
        latex:
          o.suggestedRating === null
            ? tex`I_n \ge ${texQuantity(needed, "A")}\ \text{(above the 10 A listed)}`
            : tex`I_n = ${texQuantity(o.suggestedRating, "A")} \ge ${texQuantity(needed, "A")}`,
      },
    ];
  },
});
