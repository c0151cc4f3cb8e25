import type { PartKind } from "@/lib/vocabulary";
import { formatPartQuantity, ratingKindOf, valueKindOf, type PartSi, type PartTexts } from "./part-values";

/**
 * What the Parts tab flags beside a part from its read values (the SI columns). A capacitor's voltage
 * rating against the original and against readings is part-cautions.ts's job; this adds what the
 * numbers alone can tell: text that could not be read (so it is left out of sorting and checks), a
 * resistor rated for less power than the one it replaces, and a replacement value far from the original.
 */

export interface PartFlag {
  level: "caution" | "info";
  message: string;
}

type FlaggedPart = PartTexts & PartSi & { designator: string };

/** Twice or half the original: more than any preferred-value step or tolerance explains (E6 steps are about 1.5×). */
const FAR_RATIO = 2;

function unreadable(label: string, text: string | null, si: number | null, what: string | null): PartFlag | null {
  if (!what || !text?.trim() || si !== null) return null;
  return { level: "info", message: `${label} “${text.trim()}” could not be read as ${what}, so it is left out of sorting and checks.` };
}

export function partFlags(p: FlaggedPart): PartFlag[] {
  const valueKind = valueKindOf(p.kind);
  const ratingKind = ratingKindOf(p.kind);
  const valueWhat =
    valueKind === "capacitance" ? "a capacitance (e.g. 0.047 µF, 0.047 mfd, 100 pF)" : valueKind === "resistance" ? "a resistance (e.g. 2.2 MΩ, 4k7)" : null;
  const ratingWhat = ratingKind === "voltage" ? "a voltage (e.g. 450 V)" : ratingKind === "power" ? "a power (e.g. 0.5 W, 1/2 W)" : null;
  // A rating written in the value field ("47 uF 450 V") counts as read when the rating field is blank.
  const flags = [
    unreadable("Original value", p.originalValue, p.originalValueSi, valueWhat),
    unreadable("Original rating", p.originalRating, p.originalRatingSi, ratingWhat),
    unreadable("Replacement value", p.replacementValue, p.replacementValueSi, valueWhat),
    unreadable("Replacement rating", p.replacementRating, p.replacementRatingSi, ratingWhat),
  ].filter((f): f is PartFlag => f !== null);

  if (p.kind === "resistor" && p.originalRatingSi !== null && p.replacementRatingSi !== null && p.replacementRatingSi < p.originalRatingSi) {
    const w = (v: number) => formatPartQuantity(v, "power");
    flags.push({
      level: "caution",
      message: `The replacement is rated ${w(p.replacementRatingSi)}, below the original ${w(p.originalRatingSi)}: it runs hotter than the part it replaces.`,
    });
  }
  if (valueKind && p.originalValueSi !== null && p.replacementValueSi !== null) {
    const ratio = p.replacementValueSi / p.originalValueSi;
    if (ratio >= FAR_RATIO || ratio <= 1 / FAR_RATIO) {
      const v = (x: number) => formatPartQuantity(x, valueKind as "capacitance" | "resistance");
      flags.push({
        level: "info",
        message: `The replacement value ${v(p.replacementValueSi)} is far from the original ${v(p.originalValueSi)}; check it was meant (a slipped decimal point reads this way).`,
      });
    }
  }
  return flags;
}

/** Sorting keys for the Parts tab: the part as it goes in (replacement, else original). */
export function effectiveValue(p: PartSi): number | null {
  return p.replacementValueSi ?? p.originalValueSi;
}
export function effectiveRating(p: PartSi): number | null {
  return p.replacementRatingSi ?? p.originalRatingSi;
}

export const PART_SORTS = ["ref", "value", "rating", "state", "supplier"] as const;
export type PartSort = (typeof PART_SORTS)[number];

const KIND_ORDER: Record<string, number> = { capacitance: 0, resistance: 1 };
const collator = new Intl.Collator("en", { numeric: true, sensitivity: "base" });
const STATE_ORDER = { "to-order": 0, ordered: 1, fitted: 2 } as const;

type SortablePart = PartSi & { kind: PartKind; designator: string; state: keyof typeof STATE_ORDER; supplier: string | null };

/**
 * Parts in the chosen order. Values sort within their quantity (capacitors, then resistors, then the rest);
 * a part with no readable value goes last; ties fall back to the designator, C2 before C10.
 */
export function sortParts<T extends SortablePart>(parts: readonly T[], sort: PartSort): T[] {
  const byRef = (a: T, b: T) => collator.compare(a.designator, b.designator);
  const numeric = (key: (p: T) => number | null) => (a: T, b: T) => {
    const ka = KIND_ORDER[valueKindOf(a.kind) ?? ""] ?? 2;
    const kb = KIND_ORDER[valueKindOf(b.kind) ?? ""] ?? 2;
    if (ka !== kb) return ka - kb;
    const va = key(a);
    const vb = key(b);
    if (va === null || vb === null) return va === vb ? byRef(a, b) : va === null ? 1 : -1;
    return va - vb || byRef(a, b);
  };
  const compare: Record<PartSort, (a: T, b: T) => number> = {
    ref: byRef,
    value: numeric(effectiveValue),
    rating: numeric(effectiveRating),
    state: (a, b) => STATE_ORDER[a.state] - STATE_ORDER[b.state] || byRef(a, b),
    supplier: (a, b) => (a.supplier && b.supplier ? collator.compare(a.supplier, b.supplier) : a.supplier ? -1 : b.supplier ? 1 : 0) || byRef(a, b),
  };
  return [...parts].sort(compare[sort]);
}
