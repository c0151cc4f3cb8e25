import { z } from "zod";
import { formatQuantity, texQuantity, tex } from "./format";
import { defineCalculator, type Step, type Warning } from "./types";
import { parseQuantity, quantity, quantityWithDefault } from "./units";

/**
 * How far a measured resistor has drifted from its marked value, and whether it is still in
 * tolerance. Deviation = (measured − nominal) / nominal, a signed fraction.
 *
 * An open resistor: the meter shows over-range, so `measured` also takes the words "open",
 * "OL" / "O.L." (a meter's over-range display), "inf", "infinity" or "∞", and the number
 * Infinity from code. Then the verdict is "open", `deviation` is null (there is no finite
 * figure) and `withinTolerance` is false.
 */

const OPEN_WORDS = new Set(["open", "ol", "o.l", "o.l.", "inf", "infinity", "∞", "overrange", "over range"]);
const MAX_OHMS = 1e15;

const measuredField = z.unknown().transform((raw, ctx): number | "open" => {
  if (raw === Number.POSITIVE_INFINITY) return "open";
  if (typeof raw === "string" && OPEN_WORDS.has(raw.trim().toLowerCase())) return "open";
  if (raw === undefined || raw === null || (typeof raw === "string" && raw.trim() === "")) {
    ctx.addIssue({ code: "custom", message: 'Measured resistance is required (type "open" or "OL" for an open resistor)' });
    return z.NEVER;
  }
  const parsed = parseQuantity(raw, "resistance");
  if (!parsed.ok) {
    ctx.addIssue({ code: "custom", message: `Measured resistance ${parsed.message}` });
    return z.NEVER;
  }
  if (parsed.value < 0) {
    ctx.addIssue({ code: "custom", message: "Measured resistance cannot be negative; check the meter leads" });
    return z.NEVER;
  }
  if (parsed.value > MAX_OHMS) {
    ctx.addIssue({ code: "custom", message: `Measured resistance above ${MAX_OHMS} Ω: type "open" if the meter shows over-range` });
    return z.NEVER;
  }
  return parsed.value;
});

/** ±20 %: the usual tolerance of the carbon-composition resistors in sets of the era (common practice). */
export const DEFAULT_TOLERANCE = 0.2;

export const resistorDriftSchema = z.object({
  nominal: quantity("resistance", { positive: true, max: MAX_OHMS, label: "Nominal resistance" }),
  measured: measuredField,
  tolerance: quantityWithDefault("ratio", DEFAULT_TOLERANCE, { positive: true, max: 1, label: "Tolerance" }).prefault(""),
});

export type ResistorDriftInput = z.output<typeof resistorDriftSchema>;

/** `(t·100).toFixed(0)`; a whole percentage (the usual case) is its own digits, without the slower native call. */
function percent0(t: number): string {
  const pc = t * 100;
  return Number.isInteger(pc) ? String(pc) : pc.toFixed(0);
}

export type DriftVerdict = "within" | "high" | "low" | "open";

/** Deviation and verdict, shared with the job Readings table. */
export function judgeDrift(nominal: number, measured: number | "open", tolerance: number) {
  if (measured === "open") return { deviation: null, withinTolerance: false, verdict: "open" as DriftVerdict };
  const deviation = (measured - nominal) / nominal;
  // A hair of slack so that 120 Ω on a 100 Ω ±20 % part counts as within, despite binary rounding.
  const edge = tolerance * (1 + 1e-9);
  const verdict: DriftVerdict = Math.abs(deviation) <= edge ? "within" : deviation > 0 ? "high" : "low";
  return { deviation, withinTolerance: verdict === "within", verdict };
}

export const calculator = defineCalculator({
  slug: "resistor-drift",
  title: "Resistor drift",
  purpose: "Is a measured resistor still within tolerance of its marked value?",
  bench: {
    group: "parts",
    example: { nominal: "100k", measured: "128k" },
    headlines: ["verdict", "deviation"],
    alwaysDanger: false,
    chart: null,
    format: { deviation: "signed-percent" },
    words: { verdict: { within: "Within tolerance", high: "Drifted high", low: "Drifted low", open: "Open circuit" } },
    tones: [
      { output: "verdict", unless: "within", tone: "caution" },
      { output: "withinTolerance", unless: true, tone: "caution" },
    ],
  },
  inputs: [
    { name: "nominal", label: "Marked (nominal) value", unit: "Ω", required: true, control: "quantity", quantity: "resistance" },
    {
      name: "measured",
      label: "Measured value",
      unit: "Ω",
      required: true,
      control: "quantity",
      quantity: "resistance",
      help: 'Measure with one lead lifted and the set unplugged. Type "open" or "OL" if the meter shows over-range.',
    },
    {
      name: "tolerance",
      label: "Tolerance",
      unit: "",
      required: false,
      default: DEFAULT_TOLERANCE,
      control: "quantity",
      quantity: "ratio",
      help: "As a fraction: 0.2 for ±20 %, the usual tolerance of carbon-composition resistors of the era; 0.1 for a silver band, 0.05 for gold.",
    },
  ],
  outputs: [
    { name: "deviation", label: "Deviation (signed fraction)", unit: "" },
    { name: "withinTolerance", label: "Within tolerance", unit: "" },
    { name: "verdict", label: "Verdict", unit: "" },
  ],
  schema: resistorDriftSchema,
  formulas: [
    { label: "Deviation", latex: tex`\delta = \frac{R_\text{measured} - R_\text{nominal}}{R_\text{nominal}}` },
    { label: "Within tolerance", latex: tex`|\delta| \le t` },
  ],
  references: [
    {
      title: "Radiotron Designer's Handbook, 4th ed.",
      detail: "Chapter on resistors: tolerances and the stability of composition resistors (chapter cited from memory)",
    },
    { title: "IEC 60062, Marking codes for resistors and capacitors", detail: "Tolerance codes (±20 % for no band)" },
  ],
  whyItMatters:
    "Carbon-composition resistors absorb moisture and age, and most of them drift high — a 100 kΩ plate resistor " +
    "reading 150 kΩ is common in an old set. A drifted resistor shifts a stage's voltages and can overload the " +
    "parts around it. Comparing each reading with its tolerance tells you which to replace, and a low reading " +
    "often means you measured a parallel path, not the resistor.",
  compute(input: ResistorDriftInput) {
    const { nominal, measured, tolerance } = input;
    const { deviation, withinTolerance, verdict } = judgeDrift(nominal, measured, tolerance);
    const warnings: Warning[] = [];
    if (verdict === "open") {
      warnings.push({
        level: "caution",
        message:
          "The resistor reads open. Confirm on a higher range and with one lead lifted; a resistor that is truly open must be replaced, " +
          "and look for why it failed (an overloaded resistor often points to a shorted capacitor or tube).",
      });
    } else if (verdict === "high") {
      warnings.push({
        level: "info",
        message:
          "Composition resistors usually drift high with age (common practice). Replace it with a modern film part of the same value and at least the same wattage.",
      });
    } else if (verdict === "low") {
      warnings.push({
        level: "caution",
        message:
          measured === 0
            ? "It reads as a short. Check the meter leads and lift one end of the resistor; a resistor rarely fails short by itself."
            : "Reading low is unusual for a resistor: another part in parallel may be in the path. Lift one lead and measure again.",
      });
    }
    warnings.push({
      level: "info",
      message: `Measure with the set unplugged and the filter capacitors discharged. Allowed at ±${percent0(tolerance)} %: ${formatQuantity(nominal * (1 - tolerance), "Ω")} to ${formatQuantity(nominal * (1 + tolerance), "Ω")}.`,
    });
    return { outputs: { deviation, withinTolerance, verdict }, warnings };
  },
  explain(input: ResistorDriftInput, o) {
    const { nominal, measured, tolerance } = input;
    const { deviation, withinTolerance } = o;
    if (measured === "open" || deviation === null) {
      return [{ label: "Reading", latex: tex`R_\text{measured} = \infty\ (\text{open})` }];
    }
    return [
      {
        label: "Deviation",
        latex: tex`\delta = \frac{${texQuantity(measured, "Ω", 4)} - ${texQuantity(nominal, "Ω", 4)}}{${texQuantity(nominal, "Ω", 4)}} = ${(deviation * 100).toFixed(2)}\,\%`,
      },
      {
        label: "Compare with the tolerance",
        latex: tex`|\delta| = ${(Math.abs(deviation) * 100).toFixed(2)}\,\% ${withinTolerance ? "\\le" : ">"} ${(tolerance * 100).toFixed(2)}\,\%`,
      },
      {
        label: "Allowed range",
        latex: tex`${texQuantity(nominal * (1 - tolerance), "Ω")} \ldots ${texQuantity(nominal * (1 + tolerance), "Ω")}`,
      },
    ] satisfies Step[];
  },
});
