import { z } from "zod";
import { formatQuantity, texQuantity, tex } from "./format";
import { bestParallel, bestSeries, type Pair } from "./series-parallel-search";
import { SERIES_NAMES, preferredBelow, type SeriesName } from "./tables/preferred-values";
import { defineCalculator, type Step, type Warning } from "./types";
import { quantity } from "./units";

/**
 * Two preferred values (IEC 60063) whose series sum R = R1 + R2 or parallel combination
 * R = R1·R2/(R1 + R2) (Kirchhoff's laws; any circuits text) comes closest to a value the series lacks.
 * "either" takes whichever of the two best pairs is closer (series on a tie: both parts then carry the
 * same current). A target that is itself a member is not paired with itself plus a trim.
 */

export const MODES = ["series", "parallel", "either"] as const;
export type Mode = (typeof MODES)[number];

const TARGET_MIN = 2; // 1 Ω + 1 Ω, the smallest series pair of the parts listed
const TARGET_MAX = 10e6;

const blankToUndefined = (v: unknown) => (v === undefined || v === null || (typeof v === "string" && v.trim() === "") ? undefined : v);

export const seriesParallelSchema = z.object({
  target: quantity("resistance", { positive: true, min: TARGET_MIN, max: TARGET_MAX, label: "Target" }),
  series: z.preprocess(
    (v) => (typeof v === "string" ? blankToUndefined(v.trim().toUpperCase()) : blankToUndefined(v)),
    z.enum(SERIES_NAMES, { error: `Series must be one of ${SERIES_NAMES.join(", ")}` }).default("E12"),
  ),
  mode: z.preprocess((v) => (typeof v === "string" ? v.trim().toLowerCase() : v), z.enum(MODES, { error: 'Mode must be "series", "parallel" or "either"' })),
});

export type SeriesParallelInput = z.output<typeof seriesParallelSchema>;

/** The pair for a mode; "either" picks the closer of the two. Both searches always find a pair in the target's range. */
export function solve(target: number, series: SeriesName, mode: Mode): { pair: Pair; mode: "series" | "parallel" } {
  if (mode === "series") return { pair: bestSeries(target, series)!, mode };
  if (mode === "parallel") return { pair: bestParallel(target, series)!, mode };
  const s = bestSeries(target, series)!;
  const p = bestParallel(target, series)!;
  return Math.abs(p.error) < Math.abs(s.error) ? { pair: p, mode: "parallel" } : { pair: s, mode: "series" };
}

const TOLERANCE: Record<SeriesName, string> = { E6: "±20 %", E12: "±10 %", E24: "±5 %", E48: "±2 %", E96: "±1 %" };

const NOMINAL: Readonly<Record<SeriesName, Warning>> = Object.fromEntries(
  SERIES_NAMES.map((s) => [
    s,
    {
      level: "info",
      message:
        `The error is that of the nominal values. Each ${s} part may still be ${TOLERANCE[s]} off, and so may the pair (worst case): ` +
        "measure the two parts and pick them if the figure matters.",
    },
  ]),
) as Record<SeriesName, Warning>;

const pct = (e: number) => `${(e * 100).toFixed(2)}\\,\\%`;

export const calculator = defineCalculator({
  slug: "series-parallel",
  title: "Two-resistor value",
  purpose: "The two preferred values that make a value the series lacks, in series or in parallel.",
  bench: {
    group: "parts",
    example: { target: "5.13k", series: "E12", mode: "either" },
    headlines: ["combined", "error"],
    alwaysDanger: false,
    chart: null,
    format: { error: "signed-percent" },
  },
  inputs: [
    {
      name: "target",
      label: "Value wanted",
      unit: "Ω",
      required: true,
      control: "quantity",
      quantity: "resistance",
      help: "2 Ω to 10 MΩ, e.g. 3.3k, 5k13, 27.5k.",
    },
    {
      name: "series",
      label: "Series",
      unit: "",
      required: false,
      default: "E12",
      control: "select",
      options: SERIES_NAMES,
      help: "The values in the drawer: E6 ±20 %, E12 ±10 %, E24 ±5 %, E48 ±2 %, E96 ±1 %.",
    },
    {
      name: "mode",
      label: "Connection",
      unit: "",
      required: true,
      control: "select",
      options: MODES,
      help: "Series, parallel, or either (whichever comes closer).",
    },
  ],
  outputs: [
    { name: "first", label: "First part (the smaller)", unit: "Ω" },
    { name: "second", label: "Second part", unit: "Ω" },
    { name: "mode", label: "Connection", unit: "" },
    { name: "combined", label: "Combined value", unit: "Ω" },
    { name: "error", label: "Error (fraction, signed)", unit: "" },
  ],
  schema: seriesParallelSchema,
  formulas: [
    { label: "Series", latex: tex`R = R_1 + R_2` },
    { label: "Parallel", latex: tex`R = \frac{R_1 R_2}{R_1 + R_2}` },
    { label: "Error", latex: tex`\varepsilon = \frac{R - R_\text{target}}{R_\text{target}}` },
  ],
  references: [
    { title: "IEC 60063, Preferred number series for resistors and capacitors", detail: "Tables of the E6, E12, E24, E48 and E96 series" },
    { title: "The ARRL Handbook for Radio Communications", detail: "Electrical fundamentals chapter: resistors in series and in parallel" },
  ],
  whyItMatters:
    "Old service data calls for values no longer stocked, and a calculation rarely lands on a preferred value. Two stock " +
    "parts often make it closely: 1.5 kΩ and 1.8 kΩ in series are exactly 3.3 kΩ. In series the larger part takes the " +
    "larger share of the power; in parallel the smaller one does, so rate each part for its own share.",
  compute(input: SeriesParallelInput) {
    const { target: x, series, mode } = input;
    const found = solve(x, series, mode);
    const { first, second, combined, error } = found.pair;
    const warnings: Warning[] = [];
    if (preferredBelow(x, series) === x) {
      warnings.push({
        level: "info",
        message: `${formatQuantity(x, "Ω", 4)} is itself an ${series} value: one part does it. The pair is for when that part is not to hand.`,
      });
    }
    warnings.push(NOMINAL[series]);
    return { outputs: { first, second, mode: found.mode, combined, error }, warnings };
  },
  explain(input: SeriesParallelInput, o) {
    const { target: x, series, mode } = input;
    const r = (v: number, sig = 3) => texQuantity(v, "Ω", sig);
    const steps: Step[] = [];
    if (mode === "either") {
      const s = bestSeries(x, series)!;
      const p = bestParallel(x, series)!;
      steps.push({
        label: `Closest ${series} pairs each way; the closer one is kept`,
        latex: tex`${r(s.first)} + ${r(s.second)} = ${r(s.combined, 5)}\ (${pct(s.error)}), \qquad ${r(p.first)} \parallel ${r(p.second)} = ${r(p.combined, 5)}\ (${pct(p.error)})`,
      });
    }
    const { first: a, second: b, combined } = o;
    steps.push(
      o.mode === "series"
        ? { label: `In series (${series})`, latex: tex`R = ${r(a)} + ${r(b)} = ${r(combined, 5)}` }
        : { label: `In parallel (${series})`, latex: tex`R = \frac{${r(a)} \times ${r(b)}}{${r(a)} + ${r(b)}} = ${r(combined, 5)}` },
      { label: "Error against the value wanted", latex: tex`\varepsilon = \frac{${r(combined, 5)} - ${r(x, 5)}}{${r(x, 5)}} = ${pct(o.error)}` },
      // Series parts share one current, so power goes as R; parallel parts share one voltage, so as 1/R.
      o.mode === "series"
        ? { label: "Share of the power", latex: tex`\frac{P_2}{P} = \frac{R_2}{R_1 + R_2} = ${((b / (a + b)) * 100).toFixed(0)}\,\%\ \text{in}\ ${r(b)}` }
        : { label: "Share of the power", latex: tex`\frac{P_1}{P} = \frac{R_2}{R_1 + R_2} = ${((b / (a + b)) * 100).toFixed(0)}\,\%\ \text{in}\ ${r(a)}` },
    );
    return steps;
  },
});
