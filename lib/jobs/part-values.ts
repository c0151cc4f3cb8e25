import type { PartKind } from "@/lib/vocabulary";
import { formatQuantity } from "@/lib/calc/format";
import { parseQuantity, type QuantityKind } from "@/lib/calc/units";
import { ratingVolts } from "./part-cautions";

/**
 * A part's value and rating texts read into SI numbers with the calculators' unit parser, so the Parts
 * tab can sort by them and the order list can check them. What a person typed stays as typed; these
 * numbers sit beside it (parts.*_si). Capacitor ratings go through part-cautions' ratingVolts, the one
 * reader of the trade's voltage markings ("450 WV", "630VDC").
 */

export const CAPACITOR_KINDS: readonly PartKind[] = ["paper", "electrolytic", "mica", "ceramic", "film"];

/** What a kind's value is measured in; tubes and "other" carry a type or a note, not a number. */
export function valueKindOf(kind: PartKind): QuantityKind | null {
  if (CAPACITOR_KINDS.includes(kind)) return "capacitance";
  return kind === "resistor" ? "resistance" : null;
}

/** A capacitor is rated in volts, a resistor in watts. */
export function ratingKindOf(kind: PartKind): "voltage" | "power" | null {
  if (CAPACITOR_KINDS.includes(kind)) return "voltage";
  return kind === "resistor" ? "power" : null;
}

export const SI_UNIT: Record<"capacitance" | "resistance" | "voltage" | "power", string> = { capacitance: "F", resistance: "Ω", voltage: "V", power: "W" };

// A rating written after the value in one field: "47 uF 450 V", "0.047 mfd 600 V", "47uF/450V", "2.2 MΩ 0.5 W".
const TRAILING_VOLTS = /^(.*?\S)\s*[\s/@,]\s*(\d[\d.,]*\s*(?:kv|v|wv|wvdc|vdc|volts?)\.?)$/i;
const TRAILING_WATTS = /^(.*?\S)\s*[\s/@,]\s*(\d[\d./]*\s*(?:w|watts?))$/i;

/** Splits "47 uF 450 V" into the value "47 uF" and the rating "450 V"; text without a rating comes back whole. */
export function splitValueAndRating(text: string, kind: PartKind): { value: string; rating: string | null } {
  const trimmed = text.trim();
  const rating = ratingKindOf(kind);
  const m = rating === "voltage" ? TRAILING_VOLTS.exec(trimmed) : rating === "power" ? TRAILING_WATTS.exec(trimmed) : null;
  return m ? { value: m[1].trim(), rating: m[2].trim() } : { value: trimmed, rating: null };
}

/** "0.5 W", "1/2 W", "2W", "1 watt", "3" (watts on a resistor's rating field). */
export function ratingWatts(text: string | null | undefined): number | null {
  if (!text?.trim()) return null;
  const t = text.trim().replace(/\s*watts?$/i, " W");
  const fraction = /^(\d+)\s*\/\s*(\d+)\s*W?$/i.exec(t);
  if (fraction) return Number(fraction[2]) > 0 && Number(fraction[1]) > 0 ? Number(fraction[1]) / Number(fraction[2]) : null;
  const parsed = parseQuantity(/^[\d.,]+$/.test(t) ? `${t} W` : t, "power");
  return parsed.ok && parsed.value > 0 ? parsed.value : null;
}

function readValue(text: string, kind: PartKind): number | null {
  const q = valueKindOf(kind);
  if (!q || !text) return null;
  const parsed = parseQuantity(text, q);
  return parsed.ok && parsed.value > 0 ? parsed.value : null;
}

function readRating(text: string | null, kind: PartKind): number | null {
  const r = ratingKindOf(kind);
  if (!r || !text) return null;
  return r === "voltage" ? ratingVolts(text) : ratingWatts(text);
}

/** One side (original or replacement) of a part: its value and rating in SI, or null for each it cannot read. */
export function readPartSide(
  kind: PartKind,
  valueText: string | null | undefined,
  ratingText: string | null | undefined,
): { value: number | null; rating: number | null } {
  const { value, rating: inValue } = splitValueAndRating(valueText ?? "", kind);
  const ratingSource = ratingText?.trim() ? ratingText : inValue;
  return { value: readValue(value, kind), rating: readRating(ratingSource, kind) };
}

export interface PartTexts {
  kind: PartKind;
  originalValue: string | null;
  originalRating: string | null;
  replacementValue: string | null;
  replacementRating: string | null;
}

export interface PartSi {
  originalValueSi: number | null;
  originalRatingSi: number | null;
  replacementValueSi: number | null;
  replacementRatingSi: number | null;
}

/** The four SI columns for a part's texts. */
export function readPartValues(p: PartTexts): PartSi {
  const o = readPartSide(p.kind, p.originalValue, p.originalRating);
  const r = readPartSide(p.kind, p.replacementValue, p.replacementRating);
  return { originalValueSi: o.value, originalRatingSi: o.rating, replacementValueSi: r.value, replacementRatingSi: r.rating };
}

/** "47 µF", "450 V": an SI number as the bench writes it. */
export function formatPartQuantity(value: number, what: keyof typeof SI_UNIT): string {
  return formatQuantity(value, SI_UNIT[what], 3);
}
