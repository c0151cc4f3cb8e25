import { formatQuantity, toEngineering } from "@/lib/calc/format";
import type { OutputMeta, OutputValue } from "@/lib/calc/types";

/** Turning calculator outputs into what the Bench shows: engineering notation, plain words for the rest. */

/** Fractions a person reads as percentages. */
const PERCENT = new Set(["resistor-drift.deviation", "colour-code.tolerance", "preferred-value.errorOfNearest"]);
/** Unitless values that still read best with a prefix (a preferred value may be ohms or farads). */
const BARE_PREFIX = new Set(["preferred-value.nearest", "preferred-value.below", "preferred-value.above"]);

const WORDS: Record<string, string> = { within: "Within tolerance", high: "Drifted high", low: "Drifted low", open: "Open circuit" };

/** The label without "(fraction)" when the value is shown as a percentage. */
export function outputLabel(slug: string, meta: OutputMeta): string {
  return PERCENT.has(`${slug}.${meta.name}`) ? meta.label.replace(/\s*\((signed )?fraction(, signed)?\)/, "") : meta.label;
}

/** Significant figures: four for a resistance someone will pick a part for, three otherwise. */
function sigFor(unit: string): number {
  return unit === "Ω" ? 4 : 3;
}

export function formatOutput(slug: string, meta: OutputMeta, value: OutputValue): string {
  if (value === null || value === undefined) return "—";
  if (typeof value === "boolean") return value ? "Yes" : "No";
  if (typeof value === "string") return WORDS[value] ?? value.charAt(0).toUpperCase() + value.slice(1);
  if (typeof value === "number") {
    const key = `${slug}.${meta.name}`;
    if (PERCENT.has(key)) {
      const pct = Number((value * 100).toPrecision(3));
      return `${pct > 0 && key !== "colour-code.tolerance" ? "+" : ""}${pct} %`;
    }
    if (BARE_PREFIX.has(key)) {
      const e = toEngineering(value, "Ω", 3);
      return `${e.mantissa}${e.prefix}`;
    }
    return formatQuantity(value, meta.unit, sigFor(meta.unit));
  }
  if (Array.isArray(value)) return value.map((v) => (typeof v === "object" ? JSON.stringify(v) : String(v))).join(", ");
  return JSON.stringify(value);
}

/** Plain-text quantity for tables inside a result (stage rows and the like). */
export function formatPlain(value: OutputValue, unit: string, sig = 3): string {
  return typeof value === "number" ? formatQuantity(value, unit, sig) : formatOutput("", { name: "", label: "", unit }, value);
}
