import { z } from "zod";
import { formatQuantity, texQuantity, tex } from "./format";
import {
  DIGIT,
  MULTIPLIER_EXPONENT,
  TOLERANCE,
  digitColour,
  multiplierColour,
  parseColour,
  toleranceColour,
  type Colour,
} from "./tables/colour-code";
import { defineCalculator, type Step, type Warning } from "./types";
import { optionalQuantity, tidy } from "./units";

/**
 * IEC 60062 resistor colour code, both ways: 3-, 4- or 5-band markings to a resistance and
 * tolerance, or a resistance and tolerance to the bands. Two significant figures give four
 * bands (every E6–E24 value), three give five (E48/E96 values); no band means ±20 %.
 */

type Decoded = { ok: true; digits: number[]; exponent: number; resistance: number; tolerance: number; colours: Colour[] };
type Failure = { ok: false; field: "bands" | "resistance" | "tolerance"; message: string };

const ORDINAL = ["First", "Second", "Third", "Fourth", "Fifth"];

/** Read a marking. Bands are listed from the end nearest a lead, the tolerance band last. */
export function decodeBands(names: readonly string[]): Decoded | Failure {
  const n = names.length;
  if (n < 3 || n > 5) return { ok: false, field: "bands", message: `Bands: give 3, 4 or 5 colours (got ${n})` };
  const colours: Colour[] = [];
  for (let i = 0; i < n; i++) {
    const c = parseColour(names[i]);
    if (!c) return { ok: false, field: "bands", message: `${ORDINAL[i]} band "${names[i]}" is not a colour of the code` };
    colours.push(c);
  }
  const digitCount = n === 5 ? 3 : 2;
  const digits: number[] = [];
  for (let i = 0; i < digitCount; i++) {
    const d = DIGIT[colours[i]];
    if (d === undefined) return { ok: false, field: "bands", message: `${ORDINAL[i]} band cannot be ${colours[i]}: figure bands run black to white` };
    digits.push(d);
  }
  if (digits[0] === 0) {
    return { ok: false, field: "bands", message: "First band cannot be black; the resistor may be read from the wrong end" };
  }
  const exponent = MULTIPLIER_EXPONENT[colours[digitCount]];
  if (exponent === undefined) {
    return { ok: false, field: "bands", message: `${ORDINAL[digitCount]} band (the multiplier) cannot be ${colours[digitCount]}` };
  }
  let tolerance = TOLERANCE.none as number;
  if (n > 3) {
    const t = TOLERANCE[colours[n - 1]];
    if (t === undefined) {
      return { ok: false, field: "bands", message: `${ORDINAL[n - 1]} band (the tolerance) cannot be ${colours[n - 1]}` };
    }
    tolerance = t;
  }
  let significand = 0;
  for (const d of digits) significand = significand * 10 + d;
  return { ok: true, digits, exponent, resistance: tidy(significand * 10 ** exponent), tolerance, colours };
}

/** Code a resistance: four bands for two significant figures, five for three. */
export function encodeResistance(resistance: number, tolerance: number): Decoded | Failure {
  const tolColour = toleranceColour(tolerance);
  if (!tolColour) {
    const list = Object.values(TOLERANCE).map((t) => `${(t as number) * 100} %`).join(", ");
    return { ok: false, field: "tolerance", message: `Tolerance ±${tidy(tolerance * 100)} % has no colour; the code has ${list}` };
  }
  const [mant, exp] = resistance.toExponential(11).split("e");
  const figures = mant.replace(".", "").replace(/0+$/, "");
  if (figures.length > 3) {
    return {
      ok: false,
      field: "resistance",
      message: `Resistance ${formatQuantity(resistance, "Ω", 6)} needs more than three significant figures; the colour code cannot show it`,
    };
  }
  const digitCount = figures.length === 3 ? 3 : 2;
  const digits = figures.padEnd(digitCount, "0").split("").map(Number);
  const exponent = Number(exp) - (digitCount - 1);
  const multColour = multiplierColour(exponent);
  if (!multColour) {
    return {
      ok: false,
      field: "resistance",
      message: `Resistance ${formatQuantity(resistance, "Ω")} is outside the colour code's range (multipliers run from ×0.001 to ×10⁹)`,
    };
  }
  if (digitCount === 3 && tolColour === "none") {
    return { ok: false, field: "tolerance", message: "A five-band (three-figure) marking always has a tolerance band; ±20 % has none" };
  }
  const colours: Colour[] = [...digits.map(digitColour), multColour];
  if (tolColour !== "none") colours.push(tolColour);
  return { ok: true, digits, exponent, resistance, tolerance, colours };
}

const bandsField = z.unknown().transform((raw, ctx): string[] | undefined => {
  if (raw === undefined || raw === null || (typeof raw === "string" && raw.trim() === "")) return undefined;
  if (Array.isArray(raw) && raw.length === 0) return undefined;
  if (typeof raw === "string") return raw.split(/[\s,;\-–]+/).filter(Boolean);
  if (Array.isArray(raw) && raw.every((b) => typeof b === "string")) return raw as string[];
  ctx.addIssue({ code: "custom", message: "Bands must be a list of colour names, such as yellow, violet, red, gold" });
  return z.NEVER;
}).optional(); // zod 4 treats an absent key as an error for a bare transform

export const colourCodeSchema = z
  .object({
    bands: bandsField,
    resistance: optionalQuantity("resistance", { positive: true, max: 1e12, label: "Resistance" }).optional(),
    tolerance: optionalQuantity("ratio", { positive: true, max: 1, label: "Tolerance" }).optional(),
  })
  .superRefine((v, ctx) => {
    if (v.bands && v.resistance !== undefined) {
      ctx.addIssue({ code: "custom", path: ["resistance"], message: "Give either the bands or a resistance, not both" });
      return;
    }
    if (!v.bands && v.resistance === undefined) {
      ctx.addIssue({ code: "custom", path: ["bands"], message: "Enter the colour bands, or a resistance to code" });
      ctx.addIssue({ code: "custom", path: ["resistance"], message: "Enter a resistance to code, or the colour bands" });
      return;
    }
    const r = v.bands ? decodeBands(v.bands) : encodeResistance(v.resistance as number, v.tolerance ?? DEFAULT_TOLERANCE);
    if (!r.ok) ctx.addIssue({ code: "custom", path: [r.field], message: r.message });
  });

export type ColourCodeInput = z.output<typeof colourCodeSchema>;

/** Used when a resistance is given without a tolerance: gold, the commonest band. */
export const DEFAULT_TOLERANCE = 0.05;

function pct(t: number): string {
  return `${tidy(t * 100)}\\,\\%`;
}

export const calculator = defineCalculator({
  slug: "colour-code",
  title: "Resistor colour code",
  purpose: "Read a resistor's colour bands, or find the bands for a value.",
  group: "parts",
  inputs: [
    {
      name: "bands",
      label: "Colour bands",
      unit: "",
      required: false,
      control: "list",
      options: ["black", "brown", "red", "orange", "yellow", "green", "blue", "violet", "grey", "white", "gold", "silver", "pink", "none"],
      help: "From the end the bands crowd towards, tolerance band last: 3, 4 or 5 colours. Leave empty to code a resistance instead.",
    },
    {
      name: "resistance",
      label: "Resistance to code",
      unit: "Ω",
      required: false,
      control: "quantity",
      quantity: "resistance",
      help: "Two or three significant figures, e.g. 4k7 or 10.2k. Leave empty when reading bands.",
    },
    {
      name: "tolerance",
      label: "Tolerance",
      unit: "",
      required: false,
      default: DEFAULT_TOLERANCE,
      control: "quantity",
      quantity: "ratio",
      help: "As a fraction: 0.05 for ±5 %, 0.01 for ±1 %, 0.2 for no band. Used only when coding a resistance.",
    },
  ],
  outputs: [
    { name: "resistance", label: "Resistance", unit: "Ω" },
    { name: "tolerance", label: "Tolerance (fraction)", unit: "" },
    { name: "bands", label: "Bands", unit: "" },
  ],
  schema: colourCodeSchema,
  formulas: [
    { label: "Four bands", latex: tex`R = (10\,d_1 + d_2)\times 10^{m},\quad \pm t` },
    { label: "Five bands", latex: tex`R = (100\,d_1 + 10\,d_2 + d_3)\times 10^{m},\quad \pm t` },
    { label: "Three bands", latex: tex`R = (10\,d_1 + d_2)\times 10^{m},\quad \pm 20\,\%` },
  ],
  references: [
    { title: "IEC 60062, Marking codes for resistors and capacitors", detail: "Colour code table: figures, multipliers and tolerances" },
    { title: "Radiotron Designer's Handbook, 4th ed.", detail: "Chapter on resistors: colour code (chapter cited from memory)" },
  ],
  whyItMatters:
    "Old sets are full of resistors whose bands have faded or browned with heat. Reading the code tells you what " +
    "the part should be before you measure it; coding a value tells you what to look for in the parts drawer. " +
    "If a reading makes no sense, try the bands from the other end — and when colours are doubtful, trust the schematic and your meter.",
  compute(input: ColourCodeInput) {
    const coded = code(input);
    const { digits, resistance, tolerance, colours } = coded;
    const warnings: Warning[] = [];
    if (input.bands && input.tolerance !== undefined && Math.abs(input.tolerance - tolerance) > 1e-12) {
      warnings.push({ level: "info", message: "The tolerance field is ignored when reading bands; the last band sets it." });
    }
    if (!input.bands && digits.length === 2 && tolerance <= 0.02) {
      const five = encodeFive(resistance, tolerance);
      if (five) warnings.push({ level: "info", message: `Close-tolerance parts are often marked with five bands instead: ${five.join(", ")}.` });
    }
    warnings.push({
      level: "info",
      message: "Heat darkens old bands: red can pass for brown and orange for red. Check with a meter out of circuit.",
    });
    return { outputs: { resistance, tolerance, bands: colours as string[] }, warnings };
  },
  explain(input: ColourCodeInput) {
    const { digits, exponent, resistance, tolerance, colours } = code(input);
    return [
      { label: "Bands", latex: tex`\text{${colours.join(", ")}}` },
      {
        label: "Figures and multiplier",
        latex: tex`R = ${digits.join("")}\times 10^{${exponent}}\,\Omega = ${texQuantity(resistance, "Ω")}`,
      },
      { label: "Tolerance", latex: tex`\pm ${pct(tolerance)}\quad(${texQuantity(resistance * (1 - tolerance), "Ω")}\ \text{to}\ ${texQuantity(resistance * (1 + tolerance), "Ω")})` },
    ] satisfies Step[];
  },
});

function code(input: ColourCodeInput): Decoded {
  const coded = input.bands
    ? decodeBands(input.bands)
    : encodeResistance(input.resistance as number, input.tolerance ?? DEFAULT_TOLERANCE);
  if (!coded.ok) throw new Error(coded.message); // the schema has already refused this
  return coded;
}

/** The five-band form of a two-figure value (4.7 k → yellow, violet, black, brown, …). */
function encodeFive(resistance: number, tolerance: number): Colour[] | null {
  const [mant, exp] = resistance.toExponential(2).split("e");
  const digits = mant.replace(".", "").split("").map(Number);
  const m = multiplierColour(Number(exp) - 2);
  const t = toleranceColour(tolerance);
  return m && t && t !== "none" ? [...digits.map(digitColour), m, t] : null;
}
