import { create, unitDependencies, type Unit } from "mathjs";
import { z } from "zod";
import { QUANTITY_KINDS, readQuantityText, finite, tidy, type ParseResult, type QuantityKind } from "./quantity-text";
import { magnitudeMessage } from "./unit-limits";

/**
 * Engineering-notation parsing for calculator inputs: one parser for every calculator.
 * Accepts SI numbers, "4.7k", "4k7" (the RKM code of IEC 60062), "47 uF", "2.2 MΩ", "250 V", a decimal
 * comma and the trade's capacitor markings ("0.047 mfd"); quantity-text.ts reads all of those without
 * mathjs, and only other units ("101.3 kPa", "5 mm", "20 degC", "250 kilovolt") come here.
 * The schema helpers also refuse magnitudes no bench quantity has (unit-limits.ts).
 */

export { QUANTITY_KINDS, tidy, type ParseResult, type QuantityKind };

// Only the unit machinery, so the browser bundle does not carry all of mathjs.
const { unit: mathUnit } = create({ unitDependencies });

function normaliseUnitText(text: string): string {
  return text
    .replace(/[µμ]/g, "u")
    .replace(/[ΩΩ]/g, "ohm")
    .replace(/^meg(?:ohms?)?$/i, "Mohm") // "1 meg", "1 megohm"; not the "meg" of "megavolt"
    .replace(/^([pnumkMG]?)ohms?$/i, (_, p: string) => `${p}ohm`)
    .replace(/^(k|M)$/, "$1") // bare prefix handled elsewhere
    .replace(/°C$/, "degC")
    .replace(/°F$/, "degF")
    .trim();
}

function describeUnit(u: Unit): string {
  for (const info of Object.values(QUANTITY_KINDS)) {
    if (info.base && u.equalBase(mathUnit(info.base))) return info.unitName;
  }
  return `"${u.formatUnits()}"`;
}

/** Parse one value of the given kind into SI. Never throws. */
export function parseQuantity(raw: unknown, kind: QuantityKind): ParseResult {
  const quick = readQuantityText(raw, kind);
  if (quick.ok !== "unit") return quick;
  const info = QUANTITY_KINDS[kind];
  let parsed: Unit;
  try {
    parsed = mathUnit(`${quick.number} ${normaliseUnitText(quick.unit)}`);
  } catch {
    return { ok: false, message: `unknown unit "${quick.unit}"; expected ${info.noun} in ${info.symbol}` };
  }
  if (!parsed.equalBase(mathUnit(info.base as string))) {
    return { ok: false, message: `expected ${info.noun}, got ${describeUnit(parsed)}` };
  }
  return finite(tidy(parsed.toNumber(info.base as string)));
}

export interface QuantityOptions {
  /** Value must be > 0 (the default for most physical magnitudes). */
  positive?: boolean;
  /** Value must be ≥ 0. */
  nonNegative?: boolean;
  min?: number;
  max?: number;
  /** Plain-words name for messages, e.g. "Plate current". */
  label?: string;
}

function rangeMessage(value: number, kind: QuantityKind, o: QuantityOptions): string | null {
  if (o.positive && !(value > 0)) return "must be greater than zero";
  if (o.nonNegative && value < 0) return "cannot be negative";
  // A field that refuses zero (positive, or a minimum above zero) also refuses what is next to nothing.
  const absurd = magnitudeMessage(value, kind, !(o.positive || (o.min !== undefined && o.min > 0)));
  if (absurd) return absurd;
  if (o.min !== undefined && value < o.min) return `must be at least ${o.min}`;
  if (o.max !== undefined && value > o.max) return `must be at most ${o.max}`;
  return null;
}

function check(raw: unknown, kind: QuantityKind, o: QuantityOptions, ctx: z.RefinementCtx): number {
  const parsed = parseQuantity(raw, kind);
  const prefix = o.label ? `${o.label} ` : "";
  if (!parsed.ok) {
    ctx.addIssue({ code: "custom", message: `${prefix}${parsed.message}` });
    return z.NEVER;
  }
  const bad = rangeMessage(parsed.value, kind, o);
  if (bad) {
    ctx.addIssue({ code: "custom", message: `${prefix}${bad}` });
    return z.NEVER;
  }
  return parsed.value;
}

const isBlank = (v: unknown) => v === undefined || v === null || (typeof v === "string" && v.trim() === "");

/** A required quantity: number or engineering text in, SI number out. */
export function quantity(kind: QuantityKind, o: QuantityOptions = { positive: true }) {
  return z.unknown().transform((raw, ctx) => {
    if (isBlank(raw)) {
      ctx.addIssue({ code: "custom", message: `${o.label ? `${o.label} ` : ""}is required` });
      return z.NEVER;
    }
    return check(raw, kind, o, ctx);
  });
}

/** An optional quantity: blank gives undefined. */
export function optionalQuantity(kind: QuantityKind, o: QuantityOptions = { positive: true }) {
  // .optional() so an absent key is accepted by z.object (zod 4 treats a bare transform as required).
  return z
    .unknown()
    .transform((raw, ctx): number | undefined => (isBlank(raw) ? undefined : check(raw, kind, o, ctx)))
    .optional();
}

/** A quantity with a default used when the field is blank or absent. */
export function quantityWithDefault(kind: QuantityKind, fallback: number, o: QuantityOptions = { positive: true }) {
  return z
    .unknown()
    .transform((raw, ctx): number => (isBlank(raw) ? fallback : check(raw, kind, o, ctx)))
    .default(fallback);
}
