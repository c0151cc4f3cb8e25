import { create, unitDependencies, type Unit } from "mathjs";
import { z } from "zod";
import { round15 } from "./precision";

/**
 * Engineering-notation parsing for calculator inputs, built on mathjs units.
 * Accepts SI numbers, "4.7k", "4k7" (the RKM code of IEC 60062), "47 uF", "2.2 MΩ", "250 V".
 */

// Only the unit machinery, so the browser bundle does not carry all of mathjs.
const { unit: mathUnit } = create({ unitDependencies });

export type QuantityKind =
  | "voltage"
  | "current"
  | "resistance"
  | "capacitance"
  | "inductance"
  | "frequency"
  | "time"
  | "length"
  | "pressure"
  | "temperature"
  | "power"
  | "conductance"
  | "ratio";

interface KindInfo {
  /** SI unit symbol, as mathjs spells it (null for dimensionless). */
  base: string | null;
  /** What a person calls it, for messages: "expected a capacitance". */
  noun: string;
  /** Plural of the unit, for "got volts". */
  unitName: string;
  /** Symbol shown beside a field. */
  symbol: string;
}

export const QUANTITY_KINDS: Record<QuantityKind, KindInfo> = {
  voltage: { base: "V", noun: "a voltage", unitName: "volts", symbol: "V" },
  current: { base: "A", noun: "a current", unitName: "amperes", symbol: "A" },
  resistance: { base: "ohm", noun: "a resistance", unitName: "ohms", symbol: "Ω" },
  capacitance: { base: "F", noun: "a capacitance", unitName: "farads", symbol: "F" },
  inductance: { base: "H", noun: "an inductance", unitName: "henries", symbol: "H" },
  frequency: { base: "Hz", noun: "a frequency", unitName: "hertz", symbol: "Hz" },
  time: { base: "s", noun: "a time", unitName: "seconds", symbol: "s" },
  length: { base: "m", noun: "a length", unitName: "metres", symbol: "m" },
  pressure: { base: "Pa", noun: "a pressure", unitName: "pascals", symbol: "Pa" },
  temperature: { base: "K", noun: "a temperature", unitName: "kelvin", symbol: "K" },
  power: { base: "W", noun: "a power", unitName: "watts", symbol: "W" },
  conductance: { base: "S", noun: "a conductance", unitName: "siemens", symbol: "S" },
  ratio: { base: null, noun: "a plain number", unitName: "", symbol: "" },
};

const PREFIXES: Record<string, number> = {
  p: 1e-12,
  n: 1e-9,
  u: 1e-6,
  µ: 1e-6,
  μ: 1e-6,
  m: 1e-3,
  k: 1e3,
  K: 1e3,
  M: 1e6,
  meg: 1e6,
  G: 1e9,
};

const NUMBER = String.raw`[+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?`;
const PLAIN = new RegExp(`^(${NUMBER})\\s*(meg|[pnuµμmkKMG])?$`);
// RKM code: 4k7, 2R2, 1M5, 470R (IEC 60062 letter-and-digit code)
const RKM = /^(\d+)([pnuµμmkKMGR])(\d+)$/;
const WITH_UNIT = new RegExp(`^(${NUMBER})\\s*(.+)$`);

/**
 * The common case without mathjs: a number, an optional SI prefix and the kind's own unit symbol
 * ("250 V", "47 uF", "2.2 MΩ", "4.7 kohm", "60 Hz"). mathjs takes ~13 µs a value; this ~0.2 µs.
 * Anything else (kPa, mm, °C, mho, a wrong unit) falls through to mathjs and its messages.
 * Temperature is left to mathjs: its units are offsets, not scales.
 */
const OWN_UNIT: Partial<Record<QuantityKind, string>> = {
  voltage: "V",
  current: "A",
  resistance: "(?:[ΩΩ]|[oO]hms?)",
  capacitance: "F",
  inductance: "H",
  frequency: "Hz",
  time: "s",
  length: "m",
  pressure: "Pa",
  power: "W",
  conductance: "S",
};
const FAST: Partial<Record<QuantityKind, RegExp>> = Object.fromEntries(
  Object.entries(OWN_UNIT).map(([kind, symbol]) => [kind, new RegExp(`^(${NUMBER})\\s*([pnuµμmkMG])?${symbol}$`)]),
);

/** Round away binary noise from prefix scaling (470e-9 rather than 4.7000000000000005e-7). */
export function tidy(value: number): number {
  // Whole numbers below 10^15 have at most 15 figures, so rounding to 15 returns them unchanged:
  // skip the string round trip (it is most of the cost of some computes).
  if (Number.isInteger(value) && value < 1e15 && value > -1e15) return value;
  return Number.isFinite(value) && value !== 0 ? round15(value) : value;
}

export type ParseResult = { ok: true; value: number } | { ok: false; message: string };

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
  const info = QUANTITY_KINDS[kind];
  if (typeof raw === "number") {
    return Number.isFinite(raw) ? { ok: true, value: raw } : { ok: false, message: "must be a finite number" };
  }
  if (typeof raw !== "string") return { ok: false, message: `expected ${info.noun} as a number or text like "4.7k"` };
  const text = raw.trim();
  if (text === "") return { ok: false, message: "is required" };

  const plain = PLAIN.exec(text);
  // For a length a lone "m" is the metre ("0.005 m"), not the milli prefix.
  if (plain && !(kind === "length" && plain[2] === "m")) {
    const scale = plain[2] ? PREFIXES[plain[2]] : 1;
    if (kind === "ratio" && plain[2]) return { ok: false, message: "expected a plain number without a prefix" };
    return finite(tidy(Number(plain[1]) * scale));
  }
  const rkm = RKM.exec(text);
  if (rkm && kind !== "ratio") {
    const scale = rkm[2] === "R" ? 1 : PREFIXES[rkm[2]];
    return finite(tidy(Number(`${rkm[1]}.${rkm[3]}`) * scale));
  }
  const fast = FAST[kind]?.exec(text);
  if (fast) return finite(tidy(Number(fast[1]) * (fast[2] ? PREFIXES[fast[2]] : 1)));
  const withUnit = WITH_UNIT.exec(text);
  if (!withUnit) return { ok: false, message: `could not read "${raw}" as ${info.noun}` };
  if (!info.base) return { ok: false, message: "expected a plain number without a unit" };

  let parsed: Unit;
  try {
    parsed = mathUnit(`${withUnit[1]} ${normaliseUnitText(withUnit[2])}`);
  } catch {
    return { ok: false, message: `unknown unit "${withUnit[2].trim()}"; expected ${info.noun} in ${info.symbol}` };
  }
  if (!parsed.equalBase(mathUnit(info.base))) {
    return { ok: false, message: `expected ${info.noun}, got ${describeUnit(parsed)}` };
  }
  return finite(tidy(parsed.toNumber(info.base)));
}

function finite(value: number): ParseResult {
  return Number.isFinite(value) ? { ok: true, value } : { ok: false, message: "must be a finite number" };
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

function rangeMessage(value: number, o: QuantityOptions): string | null {
  if (o.positive && !(value > 0)) return "must be greater than zero";
  if (o.nonNegative && value < 0) return "cannot be negative";
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
  const bad = rangeMessage(parsed.value, o);
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
