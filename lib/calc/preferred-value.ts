import { z } from "zod";
import { toEngineering, tex } from "./format";
import { SERIES, SERIES_NAMES, nearestPreferred, preferredAbove, preferredBelow, type SeriesName } from "./tables/preferred-values";
import { defineCalculator, type Step, type Warning } from "./types";
import { parseQuantity, type ParseResult, type QuantityKind } from "./units";

/**
 * Nearest, next-lower and next-higher member of an IEC 60063 series. The series are geometric,
 * so "nearest" is judged on a logarithmic scale.
 */

const MIN = 1e-15;
const MAX = 1e15;

/** A value of a resistor, capacitor or inductor: a plain number, "4k7", "470n", "2.2 MΩ", "47 uF", "10 mH". */
const partValue = z.unknown().transform((raw, ctx): number => {
  if (raw === undefined || raw === null || (typeof raw === "string" && raw.trim() === "")) {
    ctx.addIssue({ code: "custom", message: "Value is required" });
    return z.NEVER;
  }
  const kinds: QuantityKind[] = ["resistance", "capacitance", "inductance"];
  // Stop at the first kind that reads it: a plain "4k7" never needs the other two.
  let first: ParseResult | undefined;
  let hit: ParseResult | undefined;
  for (const k of kinds) {
    const t = parseQuantity(raw, k);
    if (t.ok) {
      hit = t;
      break;
    }
    first ??= t;
  }
  if (!hit || !hit.ok) {
    first = first as ParseResult;
    const message =
      !first.ok && /expected a resistance, got/.test(first.message)
        ? "Value must be a resistance, capacitance or inductance (or a plain number)"
        : `Value ${first.ok ? "" : first.message}`;
    ctx.addIssue({ code: "custom", message });
    return z.NEVER;
  }
  if (!(hit.value >= MIN && hit.value <= MAX)) {
    ctx.addIssue({ code: "custom", message: hit.value > 0 ? `Value must be between ${MIN} and ${MAX}` : "Value must be greater than zero" });
    return z.NEVER;
  }
  return hit.value;
});

const seriesField = z.preprocess(
  (v) => (v === undefined || v === null || (typeof v === "string" && v.trim() === "") ? undefined : typeof v === "string" ? v.trim().toUpperCase() : v),
  z.enum(SERIES_NAMES, { error: `Series must be one of ${SERIES_NAMES.join(", ")}` }).default("E12"),
);

export const preferredValueSchema = z.object({ value: partValue, series: seriesField });

export type PreferredValueInput = z.output<typeof preferredValueSchema>;

/** LaTeX for a bare number with an engineering prefix: 4.7\,\mathrm{k}. */
function texNumber(v: number, sig = 3): string {
  const e = toEngineering(v, "x", sig);
  return e.texPrefix ? `${e.mantissa}\\,\\mathrm{${e.texPrefix.trim()}}` : e.mantissa;
}

export const calculator = defineCalculator({
  slug: "preferred-value",
  title: "Preferred value",
  purpose: "The standard value nearest to a calculated one, and the next ones below and above it.",
  bench: {
    group: "parts",
    example: { value: "5.13k" },
    headlines: ["nearest", "errorOfNearest"],
    alwaysDanger: false,
    chart: null,
    // A preferred value may be ohms or farads, so it reads best as a bare prefix.
    format: { errorOfNearest: "signed-percent", nearest: "bare-prefix", below: "bare-prefix", above: "bare-prefix" },
  },
  inputs: [
    {
      name: "value",
      label: "Calculated value",
      unit: "",
      required: true,
      control: "quantity",
      quantity: "resistance",
      help: "A resistance, capacitance or inductance: 5k, 4k7, 0.033u, 470n, 2.2 MΩ. The answer comes back in the same base unit.",
    },
    {
      name: "series",
      label: "Series",
      unit: "",
      required: false,
      default: "E12",
      control: "select",
      options: SERIES_NAMES,
      help: "E6 ±20 %, E12 ±10 %, E24 ±5 %, E48 ±2 %, E96 ±1 % parts.",
    },
  ],
  outputs: [
    { name: "nearest", label: "Nearest preferred value", unit: "" },
    { name: "below", label: "Next value at or below", unit: "" },
    { name: "above", label: "Next value at or above", unit: "" },
    { name: "errorOfNearest", label: "Error of the nearest value (fraction, signed)", unit: "" },
  ],
  schema: preferredValueSchema,
  formulas: [
    { label: "Members of an E-n series", latex: tex`E_k \approx 10^{k/n}\times 10^{d},\quad k = 0 \ldots n-1` },
    { label: "Nearest on a log scale", latex: tex`E^{*} = \arg\min_{E}\,\left|\ln\frac{x}{E}\right|` },
    { label: "Error of the nearest value", latex: tex`\varepsilon = \frac{E^{*} - x}{x}` },
  ],
  references: [
    { title: "IEC 60063, Preferred number series for resistors and capacitors", detail: "Tables of the E6, E12, E24, E48 and E96 series" },
    {
      title: "Radiotron Designer's Handbook, 4th ed.",
      detail: "Chapter on resistors: preferred values and tolerances (chapter cited from memory)",
    },
  ],
  whyItMatters:
    "A formula gives 5.13 kΩ, but nobody sells that. Standard values are spaced so that each one's tolerance " +
    "band meets the next, so the nearest standard part is always within the series' tolerance of what you asked for. " +
    "Because the spacing is by ratio, not by difference, the nearest value is judged on a log scale.",
  compute(input: PreferredValueInput) {
    const { value: x } = input;
    const series: SeriesName = input.series;
    const nearest = nearestPreferred(x, series);
    const below = preferredBelow(x, series);
    const above = preferredAbove(x, series);
    const errorOfNearest = (nearest - x) / x;
    const n = SERIES[series].length;

    const warnings: Warning[] = [];
    if (below === above) {
      warnings.push({ level: "info", message: `${texPlain(x)} is itself a member of ${series}.` });
    }
    warnings.push({
      level: "info",
      message: `${series} has ${n} values per decade; the step between neighbours is about ${((10 ** (1 / n) - 1) * 100).toFixed(0)} %.`,
    });
    return { outputs: { nearest, below, above, errorOfNearest }, warnings };
  },
  explain(input: PreferredValueInput, o) {
    const { value: x, series } = input;
    const { nearest, below, above, errorOfNearest } = o;
    return [
      {
        label: `Neighbours in ${series}`,
        latex: tex`${texNumber(below)} \le ${texNumber(x, 4)} \le ${texNumber(above)}`,
      },
      {
        label: "Distance on a log scale",
        latex: tex`\left|\ln\tfrac{${texNumber(x, 4)}}{${texNumber(below)}}\right| = ${Math.abs(Math.log(x / below)).toFixed(4)},\quad \left|\ln\tfrac{${texNumber(above)}}{${texNumber(x, 4)}}\right| = ${Math.abs(Math.log(above / x)).toFixed(4)}`,
      },
      { label: "Nearest preferred value", latex: tex`E^{*} = ${texNumber(nearest)}` },
      {
        label: "Error of the nearest value",
        latex: tex`\varepsilon = \frac{${texNumber(nearest)} - ${texNumber(x, 4)}}{${texNumber(x, 4)}} = ${(errorOfNearest * 100).toFixed(2)}\,\%`,
      },
    ] satisfies Step[];
  },
});

function texPlain(v: number): string {
  const e = toEngineering(v, "x", 4);
  return `${e.mantissa}${e.prefix ? ` ${e.prefix}` : ""}`;
}
