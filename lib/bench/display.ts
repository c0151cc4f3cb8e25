import { formatQuantity, toEngineering } from "@/lib/calc/format";
import type { BenchDescriptor, OutputMeta, OutputValue } from "@/lib/calc/types";

/**
 * Turning calculator outputs into what the Bench shows: engineering notation, plain words for the rest.
 * How each output reads (a percentage, a bare prefix, words, a warning colour) comes from the calculator's
 * descriptor (`bench` in lib/calc/<slug>.ts); without one a number reads in its unit.
 */

export type OutputView = Pick<BenchDescriptor, "format" | "words" | "tones">;

const isPercent = (view: OutputView | undefined, name: string) => {
  const f = view?.format?.[name];
  return f === "percent" || f === "signed-percent";
};

/** The label without "(fraction)" when the value is shown as a percentage ("(fraction of the true voltage)" keeps "of …"). */
export function outputLabel(view: OutputView | undefined, meta: OutputMeta): string {
  if (!isPercent(view, meta.name)) return meta.label;
  return meta.label.replace(/\s*\((signed )?fraction(, signed)?\)/, "").replace(/\(fraction of /, "(of ");
}

/** Significant figures: four for a resistance someone will pick a part for, three otherwise. */
function sigFor(unit: string): number {
  return unit === "Ω" ? 4 : 3;
}

export function formatOutput(view: OutputView | undefined, meta: OutputMeta, value: OutputValue): string {
  if (value === null || value === undefined) return "—";
  if (typeof value === "boolean") return value ? "Yes" : "No";
  if (typeof value === "string") return view?.words?.[meta.name]?.[value] ?? value.charAt(0).toUpperCase() + value.slice(1);
  if (typeof value === "number") {
    const format = view?.format?.[meta.name];
    if (format === "percent" || format === "signed-percent") {
      const pct = Number((value * 100).toPrecision(3));
      return `${pct > 0 && format === "signed-percent" ? "+" : ""}${pct} %`;
    }
    if (format === "bare-prefix") {
      const e = toEngineering(value, "Ω", 3);
      return `${e.mantissa}${e.prefix}`;
    }
    return formatQuantity(value, meta.unit, sigFor(meta.unit));
  }
  if (Array.isArray(value)) return value.map((v) => (typeof v === "object" ? JSON.stringify(v) : String(v))).join(", ");
  return JSON.stringify(value);
}

/** The colour a figure is shown in when its value is bad news: hazard (danger alone), caution, or none. */
export function outputTone(view: OutputView | undefined, name: string, value: OutputValue): "hazard" | "caution" | null {
  for (const rule of view?.tones ?? []) {
    if (rule.output !== name) continue;
    if ("when" in rule ? value === rule.when : value !== rule.unless) return rule.tone;
  }
  return null;
}

/** Plain-text quantity for tables inside a result (stage rows and the like). */
export function formatPlain(value: OutputValue, unit: string, sig = 3): string {
  return typeof value === "number" ? formatQuantity(value, unit, sig) : formatOutput(undefined, { name: "", label: "", unit }, value);
}
