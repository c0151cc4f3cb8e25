/** Engineering-notation formatting shared by steps (LaTeX) and the UI (plain text). */
import { toPrecision } from "./precision";

const PREFIX_STEPS: { exp: number; symbol: string; tex: string; scale: number }[] = [
  { exp: 9, symbol: "G", tex: "G" },
  { exp: 6, symbol: "M", tex: "M" },
  { exp: 3, symbol: "k", tex: "k" },
  { exp: 0, symbol: "", tex: "" },
  { exp: -3, symbol: "m", tex: "m" },
  { exp: -6, symbol: "µ", tex: "\\mu " },
  { exp: -9, symbol: "n", tex: "n" },
  { exp: -12, symbol: "p", tex: "p" },
].map((s) => ({ ...s, scale: 10 ** s.exp })); // the very divisor `10 ** exp` gave, computed once

/** Units that take no engineering prefix when shown. */
const NO_PREFIX = new Set(["", "%", "K", "Pa", "×", "dB"]);

export interface Engineering {
  mantissa: string;
  prefix: string;
  texPrefix: string;
}

/** Split a value into a mantissa with `sig` significant figures and an SI prefix. */
export function toEngineering(value: number, unit: string, sig = 3): Engineering {
  if (!Number.isFinite(value)) return { mantissa: String(value), prefix: "", texPrefix: "" };
  if (value === 0 || NO_PREFIX.has(unit)) return { mantissa: trim(toPrecision(value, sig)), prefix: "", texPrefix: "" };
  // A power rating reads better as "0.5 W" than "500 mW" (the wattages of the parts catalogue).
  const abs = Math.abs(value);
  if (unit === "W" && abs >= 0.1 && abs < 1) return { mantissa: trim(toPrecision(value, sig)), prefix: "", texPrefix: "" };
  const exp = Math.floor(Math.log10(abs));
  let k = 0;
  while (k < PREFIX_STEPS.length - 1 && exp < PREFIX_STEPS[k].exp) k++;
  let step = PREFIX_STEPS[k];
  let scaled = value / step.scale;
  let digits = toPrecision(scaled, sig);
  // 999.96 rounds to "1.00e+3": move up a prefix instead. Below 900 no rounding reaches 1000,
  // so the check (a number parse) is skipped for nearly every value; toPrecision runs once.
  if (k > 0 && (scaled >= 900 || scaled <= -900) && Math.abs(Number(digits)) >= 1000) {
    step = PREFIX_STEPS[k - 1];
    scaled = value / step.scale;
    digits = toPrecision(scaled, sig);
  }
  return { mantissa: trim(digits), prefix: step.symbol, texPrefix: step.tex };
}

/** "4.70" → "4.7", "250." → "250", "1.00e+3" → "1000": no trailing zeros, no regex (this runs per value shown). */
function trim(s: string): string {
  if (s.includes("e")) return String(Number(s));
  if (!s.includes(".")) return s;
  let end = s.length;
  while (s.charCodeAt(end - 1) === 48) end--; // "0"
  if (s.charCodeAt(end - 1) === 46) end--; // "."
  return s.slice(0, end);
}

/** "4.7 kΩ", "1.25 mA", "0.5 W". */
export function formatQuantity(value: number, unit: string, sig = 3): string {
  const e = toEngineering(value, unit, sig);
  return unit || e.prefix ? `${e.mantissa} ${e.prefix}${unit}` : e.mantissa;
}

const TEX_UNIT: Record<string, string> = { Ω: "\\Omega", µ: "\\mu ", "%": "\\%", "×": "\\times" };

const texUnits = new Map<string, string>(); // a handful of unit symbols, so this stays tiny

function texUnit(unit: string): string {
  let tex = texUnits.get(unit);
  if (tex === undefined) {
    tex = unit.replace(/[Ωµ%×]/g, (c) => TEX_UNIT[c]);
    if (texUnits.size < 64) texUnits.set(unit, tex);
  }
  return tex;
}

/** LaTeX for a quantity: `4.7\,\mathrm{k\Omega}`. */
export function texQuantity(value: number, unit: string, sig = 3): string {
  const e = toEngineering(value, unit, sig);
  const u = `${e.texPrefix}${texUnit(unit)}`;
  return u ? `${e.mantissa}\\,\\mathrm{${u}}` : e.mantissa;
}

/**
 * Tag for LaTeX templates: the raw text (backslashes kept) with the values in between, like
 * String.raw but several times faster in V8 — and its strings serialise faster too — which
 * counts in explain, run on every API request.
 */
export function tex(strings: TemplateStringsArray, ...values: unknown[]): string {
  const raw = strings.raw;
  let out = raw[0];
  for (let i = 0; i < values.length; i++) out += `${values[i]}${raw[i + 1]}`;
  return out;
}
