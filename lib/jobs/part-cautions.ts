import type { PartKind } from "@/lib/vocabulary";
import { formatQuantity } from "@/lib/calc/format";
import { parseQuantity } from "@/lib/calc/units";
import { splitDesignators } from "./reading-schemas";

/**
 * Cautions on a parts list: a replacement capacitor rated for less voltage than the part it
 * replaces, or below a voltage measured *at that capacitor*. A capacitor run above its rating can
 * fail short — in a B+ filter that can take the rectifier and transformer with it. A reading
 * elsewhere on the set (a 6.6 kV CRT anode, the B+ before the dropping resistors) says nothing
 * about a capacitor further down the line, so only readings linked to the part are compared.
 */

const CAPACITORS: readonly PartKind[] = ["paper", "electrolytic", "mica", "ceramic", "film"];

// The trade's ways of writing a working-voltage rating, read as plain volts for the unit parser:
// "450 WV", "500 WVDC", "630VDC", "250 V DC", "400 volts", "3 kv".
const TRADE_VOLTS = /\s*(?:w\.?\s*v\.?(?:\s*d\.?\s*c\.?)?|v\.?\s*d\.?\s*c\.?|volts?|v)\.?$/i;

/** Reads a voltage rating from bench text ("400 V", "630VDC", "1.5 kV", "450 WV", "250") with the calculators' unit parser. */
export function ratingVolts(text: string | null | undefined): number | null {
  if (!text) return null;
  // Only the first figure: "400 V / 525 V surge", "350 V, 85 °C", "350V 85°C".
  const first = text.trim().split(/[/(;]|,\s|\s+(?=\d)/)[0];
  const asVolts = first
    .replace(/(\d),(\d{3})(?!\d)/, "$1$2") // "1,000 V": a thousands comma
    .replace(/(\d),(\d)/, "$1.$2") // "1,5 kV": a decimal comma
    .replace(TRADE_VOLTS, "V");
  const parsed = parseQuantity(asVolts, "voltage");
  return parsed.ok && parsed.value > 0 ? parsed.value : null;
}

export interface PartCaution {
  partId: number;
  designator: string;
  message: string;
}

type CapacitorPart = { id: number; designator: string; kind: PartKind; originalRating: string | null; replacementRating: string | null };
type VoltageReading = { kind: string; designator: string; partDesignators?: string | null; measured: number | null };

const same = (a: string, b: string) => a.trim().toLowerCase() === b.trim().toLowerCase();

/**
 * The voltage readings taken at a part: those that name it among the parts they were measured
 * across, or whose own designator is the part's ("C12"). Matched case-insensitively, trimmed.
 */
export function readingsAt(designator: string, readings: VoltageReading[]): VoltageReading[] {
  return readings.filter(
    (r) =>
      r.kind === "voltage" &&
      r.measured !== null &&
      (same(r.designator, designator) || splitDesignators(r.partDesignators ?? "").some((d) => same(d, designator))),
  );
}

const volts = (v: number) => formatQuantity(v, "V", 4);

export interface CapacitorChecks {
  cautions: PartCaution[];
  /** Per capacitor, what its rating was compared with ("no reading at this capacitor" when nothing). */
  notes: Map<number, string>;
}

export function capacitorChecks(parts: CapacitorPart[], readings: VoltageReading[]): CapacitorChecks {
  const cautions: PartCaution[] = [];
  const notes = new Map<number, string>();
  for (const p of parts) {
    if (!CAPACITORS.includes(p.kind)) continue;
    const replacement = ratingVolts(p.replacementRating);
    const original = ratingVolts(p.originalRating);
    const found: string[] = [];
    if (replacement !== null && original !== null && replacement < original) {
      found.push(`the replacement is rated ${volts(replacement)}, below the original ${volts(original)}. Fit one rated at least as high as the original.`);
    }
    // The highest magnitude among the readings taken at this capacitor.
    const at = readingsAt(p.designator, readings).reduce<VoltageReading | null>(
      (hi, r) => (hi && Math.abs(hi.measured!) >= Math.abs(r.measured!) ? hi : r),
      null,
    );
    if (!at) {
      notes.set(p.id, "no reading at this capacitor");
    } else {
      const measured = Math.abs(at.measured!);
      const where = same(at.designator, p.designator) ? p.designator : `${at.designator} (across ${p.designator})`;
      // The rating that will stand the voltage: the replacement's, or the original's while none is chosen.
      const rating = replacement ?? original;
      const whose = replacement !== null ? "its" : "the original part's";
      if (rating === null) {
        notes.set(p.id, `${volts(measured)} measured at ${where}; no voltage rating could be read for it`);
      } else if (measured > rating) {
        found.push(`measured ${volts(measured)} at ${where} is above ${whose} ${volts(rating)} rating. Choose a higher rating, or recheck the reading.`);
        notes.set(p.id, `${volts(measured)} measured at ${where}, above ${whose} ${volts(rating)} rating`);
      } else {
        notes.set(p.id, `${volts(measured)} measured at ${where}, not above ${whose} ${volts(rating)} rating`);
      }
    }
    if (found.length) cautions.push({ partId: p.id, designator: p.designator, message: `${p.designator}: ${found.join(" ")}` });
  }
  return { cautions, notes };
}

/** The cautions alone (see capacitorChecks). */
export function capacitorCautions(parts: CapacitorPart[], readings: VoltageReading[]): PartCaution[] {
  return capacitorChecks(parts, readings).cautions;
}
