import { formatQuantity } from "../calc/format";
import { toPrecision } from "../calc/precision";
import { QUANTITY_KINDS, parseQuantity, type QuantityKind } from "../calc/units";
import type { Asked, AskedUnit } from "./types";

/**
 * Reading an answer as people write it, with the Bench's own parser: "1.5k", "1k5", "250 mW",
 * "0.25 W", "4.7 uF", "2,2 kΩ", "25 ms", "1/4 W". A bare number is read in the asked unit (per cent
 * for a "%" ask), except a capacitance, which the Bench never reads as farads without a unit
 * (docs/PRODUCT.md, vintage markings); a JSON number is likewise in the asked unit. An answer in another
 * quantity's unit ("0.25 V" when W is asked) is told apart as a wrong unit.
 */

export const UNIT_KIND: Partial<Record<AskedUnit, QuantityKind>> = {
  V: "voltage",
  A: "current",
  Ω: "resistance",
  W: "power",
  F: "capacitance",
  H: "inductance",
  Hz: "frequency",
  s: "time",
  m: "length",
  S: "conductance",
};

export type AnswerReading =
  | { ok: true; value: number | string }
  | { ok: false; verdict: "wrong-unit"; message: string; value: number; kind: QuantityKind }
  | { ok: false; verdict: "unreadable"; message: string };

/** The "answer in …" line shown with every problem. */
export function askedHelp(asked: Asked): string {
  switch (asked.unit) {
    case "text":
      return asked.choices ? `Answer in words: ${listWords(asked.choices)}.` : "Answer in words.";
    case "%":
      return "Answer in per cent (e.g. 12 % or -3.5 %).";
    case "":
      return "Answer as a plain number.";
    case "F":
      return "Answer in F with its prefix, e.g. 47 uF, 100 nF or 0.1 mfd (a bare number is not read as farads).";
    case "Ω":
      return "Answer in Ω; prefixes welcome (1.5k, 1k5, 2,2 kΩ).";
    default:
      return `Answer in ${asked.unit}; prefixes welcome (e.g. ${example(asked.unit)}).`;
  }
}

const EXAMPLES: Partial<Record<AskedUnit, string>> = { W: "250 mW or 0.25 W", A: "45 mA", V: "12.5 V", s: "25 ms", Hz: "4.2 kHz", m: "5 mm", H: "10 H" };
const example = (unit: AskedUnit) => EXAMPLES[unit] ?? `1.5 k${unit}`;
const listWords = (w: readonly string[]) => (w.length < 2 ? w.join("") : `${w.slice(0, -1).join(", ")} or ${w[w.length - 1]}`);

/** An answer written for a person: "253 Ω", "28 %", "56.5", "yellow violet red gold". */
export function formatAnswer(value: number | string, unit: AskedUnit, sig = 3): string {
  if (typeof value === "string") return value;
  if (unit === "%") return `${trimNumber(toPrecision(value * 100, sig))} %`;
  if (unit === "" || unit === "text") return trimNumber(toPrecision(value, sig));
  return formatQuantity(value, unit, sig);
}

const trimNumber = (s: string) => String(Number(s));

const FRACTIONS: Record<string, string> = { "½": "1/2", "¼": "1/4", "¾": "3/4", "⅛": "1/8" };

/** Spellings the shared parser leaves out: a unicode minus, "1/4 W", "4k7 Ω" (the RKM code with a unit). */
function tidyText(raw: string): string {
  let t = raw
    .trim()
    .replace(/^(?:≈|~|about\s+)/i, "")
    .replace(/[−–]/g, "-")
    .trim();
  t = t.replace(/[½¼¾⅛]/g, (c) => FRACTIONS[c]);
  const frac = /^(\d+)\s*\/\s*(\d+)\s*(.*)$/.exec(t);
  if (frac && Number(frac[2]) !== 0) t = `${Number(frac[1]) / Number(frac[2])} ${frac[3]}`.trim();
  const rkm = /^(\d+)([pnuµμmkKMGR])(\d+)\s*([^\d\s].*)$/.exec(t);
  if (rkm) t = `${rkm[1]}.${rkm[3]} ${rkm[2] === "R" ? "" : rkm[2]}${rkm[4]}`;
  return t;
}

/** Lower case, one space between words, grey however it is spelt: "Yellow-Violet, Red" → "yellow violet red". */
export function normaliseWords(text: string): string {
  return text
    .toLowerCase()
    .split(/[\s,;/–-]+/)
    .filter(Boolean)
    .map((w) => (w === "gray" ? "grey" : w))
    .join(" ");
}

/** The quantity another unit belongs to, when the text has one ("0.25 V" → voltage). */
function otherKind(text: string, asked: QuantityKind | null): { kind: QuantityKind; value: number } | null {
  if (!/[a-zA-ZΩΩµμ°]/.test(text)) return null; // a bare number has no unit to be wrong
  for (const kind of Object.keys(QUANTITY_KINDS) as QuantityKind[]) {
    if (kind === asked || kind === "ratio") continue;
    const r = parseQuantity(text, kind);
    if (r.ok) return { kind, value: r.value };
  }
  return null;
}

function wrongUnit(text: string, asked: Asked, askedKind: QuantityKind | null): AnswerReading | null {
  const other = otherKind(text, askedKind);
  if (!other) return null;
  const wanted = askedKind ? `${QUANTITY_KINDS[askedKind].noun} in ${asked.unit}` : asked.unit === "%" ? "a percentage" : "a plain number";
  return {
    ok: false,
    verdict: "wrong-unit",
    value: other.value,
    kind: other.kind,
    message: `That is ${QUANTITY_KINDS[other.kind].noun}; the question asks for ${wanted}.`,
  };
}

/** Read one answer for the asked unit. Never throws. */
export function readAnswer(raw: unknown, asked: Asked): AnswerReading {
  if (asked.unit === "text") {
    if (typeof raw !== "string" || raw.trim() === "") return { ok: false, verdict: "unreadable", message: "Write the answer in words." };
    return { ok: true, value: normaliseWords(raw) };
  }
  if (typeof raw === "number") {
    if (!Number.isFinite(raw)) return { ok: false, verdict: "unreadable", message: "The answer must be a finite number." };
    return { ok: true, value: asked.unit === "%" ? raw / 100 : raw };
  }
  if (typeof raw !== "string" || raw.trim() === "") return { ok: false, verdict: "unreadable", message: "Write a number, with its unit if you like." };
  const text = tidyText(raw);
  if (asked.unit === "%" || asked.unit === "") {
    const pct = asked.unit === "%" ? /^(.*?)\s*(?:%|per\s?cent)$/i.exec(text) : null;
    const plain = (pct ? pct[1] : text).replace(/\s*(?:x|×|times)$/i, "");
    const r = parseQuantity(plain, "ratio");
    if (r.ok) return { ok: true, value: asked.unit === "%" ? r.value / 100 : r.value };
    return wrongUnit(text, asked, null) ?? { ok: false, verdict: "unreadable", message: `Could not read "${raw.trim()}" as a number.` };
  }
  const kind = UNIT_KIND[asked.unit] as QuantityKind;
  const r = parseQuantity(text, kind);
  if (r.ok) return { ok: true, value: r.value };
  return wrongUnit(text, asked, kind) ?? { ok: false, verdict: "unreadable", message: `Could not read "${raw.trim()}": ${r.message}.` };
}
