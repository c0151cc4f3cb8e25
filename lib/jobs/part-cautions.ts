import type { PartKind } from "@/db/enums";

/**
 * Cautions on a parts list: a replacement capacitor rated for less voltage than the part it
 * replaces, or less than the highest supply voltage measured on the set. A capacitor run above
 * its rating can fail short — in a B+ filter that can take the rectifier and transformer with it.
 */

const CAPACITORS: readonly PartKind[] = ["paper", "electrolytic", "mica", "ceramic", "film"];

/** Reads a voltage rating from bench text: "400 V", "630VDC", "1.5 kV", "450 WV", "250". */
export function ratingVolts(text: string | null | undefined): number | null {
  if (!text) return null;
  const m = /(\d+(?:[.,]\d+)?)\s*(k)?\s*(?:v|vdc|wv|wvdc|volts?)?\b/i.exec(text.trim());
  if (!m) return null;
  // A bare number is taken as volts only when the text has nothing else (so "0.5 W" is not 0.5 V).
  const hasV = /v/i.test(text);
  if (!hasV && !/^\s*\d+(?:[.,]\d+)?\s*$/.test(text)) return null;
  const n = Number(m[1].replace(",", ".")) * (m[2] ? 1000 : 1);
  return Number.isFinite(n) && n > 0 ? n : null;
}

export interface PartCaution {
  partId: number;
  designator: string;
  message: string;
}

export function capacitorCautions(
  parts: { id: number; designator: string; kind: PartKind; originalRating: string | null; replacementRating: string | null }[],
  measuredSupply: number | null,
): PartCaution[] {
  const out: PartCaution[] = [];
  for (const p of parts) {
    if (!CAPACITORS.includes(p.kind)) continue;
    const replacement = ratingVolts(p.replacementRating);
    if (replacement === null) continue;
    const original = ratingVolts(p.originalRating);
    if (original !== null && replacement < original) {
      out.push({ partId: p.id, designator: p.designator, message: `${p.designator}: the replacement is rated ${replacement} V, below the original ${original} V. Fit one rated at least as high as the original.` });
    } else if (measuredSupply !== null && replacement < measuredSupply) {
      out.push({ partId: p.id, designator: p.designator, message: `${p.designator}: the replacement is rated ${replacement} V, below the ${Math.round(measuredSupply)} V measured on this set. Check where it sits and choose a higher rating.` });
    }
  }
  return out;
}

/** Highest voltage measured at any test point of the job, as the supply the parts must stand. */
export function highestMeasuredVoltage(readings: { kind: string; measured: number | null }[]): number | null {
  const volts = readings.filter((r) => r.kind === "voltage" && r.measured !== null).map((r) => Math.abs(r.measured!));
  return volts.length ? Math.max(...volts) : null;
}
