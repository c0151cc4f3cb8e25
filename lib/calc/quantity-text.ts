import { round15 } from "./precision";

/**
 * Reading typed quantities without mathjs: a number, an SI prefix, the RKM code of IEC 60062
 * ("4k7"), the kind's own unit symbol ("250 V", "47 uF"), a decimal comma ("4,7 uF") and the
 * trade's vintage capacitor markings ("0.047 mfd", "100 mmf", "8 MFD"). Nothing here loads mathjs,
 * so the Bench form can read a typed voltage before the calculator module arrives; units.ts hands
 * anything else (kPa, mm, °C, "kilovolt", a wrong unit) to mathjs.
 */

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

export type ParseResult = { ok: true; value: number } | { ok: false; message: string };
/** Text the quick reader leaves to mathjs: a number and a unit it does not know. */
export type QuickResult = ParseResult | { ok: "unit"; number: string; unit: string };

export const PREFIXES: Record<string, number> = { p: 1e-12, n: 1e-9, u: 1e-6, µ: 1e-6, μ: 1e-6, m: 1e-3, k: 1e3, K: 1e3, M: 1e6, meg: 1e6, G: 1e9 };

const NUMBER = String.raw`[+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?`;
const PLAIN = new RegExp(`^(${NUMBER})\\s*(meg|[pnuµμmkKMG])?$`);
// RKM code: 4k7, 2R2, 1M5, 470R (IEC 60062 letter-and-digit code)
const RKM = /^(\d+)([pnuµμmkKMGR])(\d+)$/;
const WITH_UNIT = new RegExp(`^(${NUMBER})\\s*(.+)$`);

/**
 * A kind's own unit symbol after an optional prefix ("250 V", "2.2 MΩ", "4.7 kohm"): ~0.2 µs against
 * mathjs's ~13 µs. Capacitance leaves out m and M: on old parts "MF" and "mf" mean microfarads (below).
 * Temperature is left to mathjs: its units are offsets, not scales.
 */
const OWN_UNIT: Partial<Record<QuantityKind, [string, string]>> = {
  voltage: ["V", "pnuµμmkMG"],
  current: ["A", "pnuµμmkMG"],
  resistance: ["(?:[ΩΩ]|[oO]hms?)", "pnuµμmkMG"],
  capacitance: ["F", "pnuµμkG"],
  inductance: ["H", "pnuµμmkMG"],
  frequency: ["Hz", "pnuµμmkMG"],
  time: ["s", "pnuµμmkMG"],
  length: ["m", "pnuµμmkMG"],
  pressure: ["Pa", "pnuµμmkMG"],
  power: ["W", "pnuµμmkMG"],
  conductance: ["S", "pnuµμmkMG"],
};
const FAST: Partial<Record<QuantityKind, RegExp>> = Object.fromEntries(
  Object.entries(OWN_UNIT).map(([kind, [symbol, prefixes]]) => [kind, new RegExp(`^(${NUMBER})\\s*([${prefixes}])?${symbol}$`)]),
);

/**
 * Capacitor markings as the trade writes them (PRODUCT.md, "Vintage markings"): mfd, mf, MF, MFD, uf
 * = microfarads (before SI, "m" on a capacitor meant micro); mmf, mmfd, µµF, uuF = micro-micro-farads,
 * that is picofarads; lower-case pf and nf. Keys are lower case with µ written u.
 */
const VINTAGE_CAPACITANCE: Record<string, number> = {
  mfd: 1e-6,
  mf: 1e-6,
  uf: 1e-6,
  ufd: 1e-6,
  mmf: 1e-12,
  mmfd: 1e-12,
  uuf: 1e-12,
  uufd: 1e-12,
  pf: 1e-12,
  pfd: 1e-12,
  nf: 1e-9,
};

/** Round away binary noise from prefix scaling (470e-9 rather than 4.7000000000000005e-7). */
export function tidy(value: number): number {
  // Whole numbers below 10^15 have at most 15 figures, so rounding to 15 returns them unchanged:
  // skip the string round trip (it is most of the cost of some computes).
  if (Number.isInteger(value) && value < 1e15 && value > -1e15) return value;
  return Number.isFinite(value) && value !== 0 ? round15(value) : value;
}

export function finite(value: number): ParseResult {
  return Number.isFinite(value) ? { ok: true, value } : { ok: false, message: "must be a finite number" };
}

// "4,7 uF", "0,047 mfd", "-1,5 kV": one comma between digits, the rest of the text after it.
const DECIMAL_COMMA = /^([+-]?\d*),(\d+)([^,]*)$/;

/** A decimal comma read as a point; "2,200" (a comma before three digits) is refused as ambiguous. */
function decimalComma(text: string): { ok: true; text: string } | { ok: false; message: string } {
  const m = DECIMAL_COMMA.exec(text);
  if (!m || m[3].includes(".")) return { ok: false, message: `could not read "${text}": write one decimal comma or point, without thousands separators` };
  const [, whole, frac, rest] = m;
  if (frac.length === 3 && /[1-9]/.test(whole)) {
    return { ok: false, message: `"${text}" reads two ways, ${Number(`${whole}.${frac}`)} or ${whole}${frac}: write it with a point, or without the comma` };
  }
  return { ok: true, text: `${whole}.${frac}${rest}` };
}

/** For a capacitance, a number with no unit or multiplier is never taken as farads. */
const bareCapacitance = (n: string): ParseResult => ({
  ok: false,
  message: `needs a unit: a bare "${n}" is not read as farads. Give one, e.g. ${n} uF, ${n} mfd or ${n} pF`,
});

/** "mF" and a lone "m": millifarads in SI, microfarads on old parts; the two differ a thousandfold. */
const ambiguousMilli = (n: string): ParseResult => ({
  ok: false,
  message: `"${n} mF" is ambiguous (old parts mean microfarads by it, SI means millifarads): write ${n} uF, or ${tidy(Number(n) * 1000)} uF for millifarads`,
});

/** Parse one value of the given kind into SI, except units only mathjs knows. Never throws. */
export function readQuantityText(raw: unknown, kind: QuantityKind): QuickResult {
  const info = QUANTITY_KINDS[kind];
  if (typeof raw === "number") return Number.isFinite(raw) ? { ok: true, value: raw } : { ok: false, message: "must be a finite number" };
  if (typeof raw !== "string") return { ok: false, message: `expected ${info.noun} as a number or text like "4.7k"` };
  let text = raw.trim();
  if (text === "") return { ok: false, message: "is required" };
  if (text.includes(",")) {
    const c = decimalComma(text);
    if (!c.ok) return c;
    text = c.text;
  }

  const plain = PLAIN.exec(text);
  // For a length a lone "m" is the metre ("0.005 m"), not the milli prefix.
  if (plain && !(kind === "length" && plain[2] === "m")) {
    if (kind === "ratio" && plain[2]) return { ok: false, message: "expected a plain number without a prefix" };
    if (kind === "capacitance" && (plain[2] === undefined || plain[2] === "m")) return plain[2] ? ambiguousMilli(plain[1]) : bareCapacitance(plain[1]);
    return finite(tidy(Number(plain[1]) * (plain[2] ? PREFIXES[plain[2]] : 1)));
  }
  const rkm = RKM.exec(text);
  if (rkm && kind !== "ratio") {
    if (kind === "capacitance" && (rkm[2] === "R" || rkm[2] === "m"))
      return rkm[2] === "R" ? bareCapacitance(`${rkm[1]}.${rkm[3]}`) : ambiguousMilli(`${rkm[1]}.${rkm[3]}`);
    const scale = rkm[2] === "R" ? 1 : PREFIXES[rkm[2]];
    return finite(tidy(Number(`${rkm[1]}.${rkm[3]}`) * scale));
  }
  const fast = FAST[kind]?.exec(text);
  if (fast) return finite(tidy(Number(fast[1]) * (fast[2] ? PREFIXES[fast[2]] : 1)));
  const withUnit = WITH_UNIT.exec(text);
  if (!withUnit) return { ok: false, message: `could not read "${raw}" as ${info.noun}` };
  if (!info.base) return { ok: false, message: "expected a plain number without a unit" };
  const unit = withUnit[2].trim();
  if (kind === "capacitance") {
    if (unit === "mF") return ambiguousMilli(withUnit[1]);
    const scale = VINTAGE_CAPACITANCE[unit.toLowerCase().replace(/[µμ]/g, "u")];
    if (scale !== undefined) return finite(tidy(Number(withUnit[1]) * scale));
  }
  return { ok: "unit", number: withUnit[1], unit };
}
