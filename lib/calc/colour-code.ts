import { z } from "zod";
import { texQuantity, tex } from "./format";
import { decodeBands, encodeFive, encodeResistance, type Decoded } from "./colour-code-bands";
import { OLDER_CHARTS, TOLERANCE, TOLERANCE_LETTER, toleranceColour, type Colour } from "./tables/colour-code";
import { defineCalculator, type Step, type Warning } from "./types";
import { optionalQuantity, tidy } from "./units";

export { decodeBands, encodeResistance } from "./colour-code-bands";

/**
 * IEC 60062:2016 resistor colour code, both ways: 3-, 4-, 5- or 6-band markings to a resistance,
 * tolerance and (six bands) temperature coefficient, or a value to its bands. Two significant
 * figures give four bands (every E6–E24 value), three give five (E48/E96 values), and a
 * temperature coefficient adds a sixth; no band means ±20 %.
 */

const bandsField = z
  .unknown()
  .transform((raw, ctx): string[] | undefined => {
    if (raw === undefined || raw === null || (typeof raw === "string" && raw.trim() === "")) return undefined;
    if (Array.isArray(raw) && raw.length === 0) return undefined;
    if (typeof raw === "string") return raw.split(/[\s,;\-–]+/).filter(Boolean);
    if (Array.isArray(raw) && raw.every((b) => typeof b === "string")) return raw as string[];
    ctx.addIssue({ code: "custom", message: "Bands must be a list of colour names, such as yellow, violet, red, gold" });
    return z.NEVER;
  })
  .optional(); // zod 4 treats an absent key as an error for a bare transform

// "50", 50, "50 ppm", "50 ppm/K", "50ppm/°C": a temperature coefficient in ppm/K (1 ppm/K = 1 ppm/°C).
const TC_TEXT = /^\s*(\d+(?:\.\d+)?)\s*(?:ppm(?:\s*\/\s*(?:K|°C|C))?)?\s*$/i;
const tcField = z
  .unknown()
  .transform((raw, ctx): number | undefined => {
    if (raw === undefined || raw === null || (typeof raw === "string" && raw.trim() === "")) return undefined;
    const m = typeof raw === "string" ? TC_TEXT.exec(raw) : null;
    const value = typeof raw === "number" ? raw : m ? Number(m[1]) : Number.NaN;
    if (Number.isFinite(value) && value > 0) return value;
    ctx.addIssue({ code: "custom", message: "Temperature coefficient: expected a positive number of ppm/K, such as 50" });
    return z.NEVER;
  })
  .optional();

export const colourCodeSchema = z
  .object({
    bands: bandsField,
    resistance: optionalQuantity("resistance", { positive: true, max: 1e12, label: "Resistance" }).optional(),
    tolerance: optionalQuantity("ratio", { positive: true, max: 1, label: "Tolerance" }).optional(),
    temperatureCoefficient: tcField,
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
    const r = v.bands ? decodeBands(v.bands) : encodeResistance(v.resistance as number, v.tolerance ?? DEFAULT_TOLERANCE, v.temperatureCoefficient);
    if (!r.ok) ctx.addIssue({ code: "custom", path: [r.field], message: r.message });
  });

export type ColourCodeInput = z.output<typeof colourCodeSchema>;

/** Used when a resistance is given without a tolerance: gold, the commonest band. */
export const DEFAULT_TOLERANCE = 0.05;

function pct(t: number): string {
  return `${tidy(t * 100)}\\,\\%`;
}

/** Enough figures that the limits of a ±0.01 % part do not both round to the nominal value. */
function limitFigures(tolerance: number): number {
  return Math.max(3, Math.ceil(-Math.log10(tolerance)) + 2);
}

export const calculator = defineCalculator({
  slug: "colour-code",
  title: "Resistor colour code",
  purpose: "Read a resistor's colour bands, or find the bands for a value.",
  bench: {
    group: "parts",
    example: { bands: ["yellow", "violet", "red", "gold"] },
    headlines: ["resistance", "tolerance"],
    alwaysDanger: false,
    chart: null,
    modes: [
      { id: "bands", label: "Read the bands", fields: ["bands"] },
      { id: "value", label: "Code a value", fields: ["resistance", "tolerance", "temperatureCoefficient"] },
    ],
    format: { tolerance: "percent" },
  },
  inputs: [
    {
      name: "bands",
      label: "Colour bands",
      unit: "",
      required: false,
      control: "list",
      options: ["black", "brown", "red", "orange", "yellow", "green", "blue", "violet", "grey", "white", "gold", "silver", "pink", "none"],
      help: "From the end the bands crowd towards: 3, 4, 5 or 6 colours, the tolerance band after the multiplier and a temperature-coefficient band sixth. Leave empty to code a resistance instead.",
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
      help: "As a fraction: 0.05 for ±5 %, 0.01 for ±1 %, 0.0005 for ±0.05 %, 0.2 for no band. Used only when coding a resistance.",
    },
    {
      name: "temperatureCoefficient",
      label: "Temperature coefficient (optional)",
      unit: "ppm/K",
      required: false,
      control: "quantity",
      quantity: "ratio",
      help: "In ppm/K, e.g. 50. Gives a six-band marking with a temperature-coefficient band. Used only when coding a resistance.",
    },
  ],
  outputs: [
    { name: "resistance", label: "Resistance", unit: "Ω" },
    { name: "tolerance", label: "Tolerance (fraction)", unit: "" },
    { name: "bands", label: "Bands", unit: "" },
    { name: "temperatureCoefficient", label: "Temperature coefficient", unit: "ppm/K" },
    { name: "toleranceLetter", label: "Tolerance letter (IEC 60062)", unit: "" },
  ],
  schema: colourCodeSchema,
  formulas: [
    { label: "Four bands", latex: tex`R = (10\,d_1 + d_2)\times 10^{m},\quad \pm t` },
    { label: "Five bands", latex: tex`R = (100\,d_1 + 10\,d_2 + d_3)\times 10^{m},\quad \pm t` },
    { label: "Six bands", latex: tex`R = (100\,d_1 + 10\,d_2 + d_3)\times 10^{m},\quad \pm t,\quad \alpha\ \text{in ppm/K}` },
    { label: "Three bands", latex: tex`R = (10\,d_1 + d_2)\times 10^{m},\quad \pm 20\,\%` },
  ],
  references: [
    {
      title: "IEC 60062:2016, Marking codes for resistors and capacitors",
      detail:
        "§3.2 code colours, §3.3 resistance value and tolerance, §3.4 temperature-coefficient (TCR) marking: figures, multipliers (pink ×0.001 new in 2016), " +
        "tolerances with their letters (orange ±0.05 % W, yellow ±0.02 % P, grey ±0.01 % L) and TC bands in ppm/K (table values from memory). " +
        "Charts older than this edition give grey as ±0.05 % and orange and yellow no tolerance.",
    },
    { title: "Radiotron Designer's Handbook, 4th ed.", detail: "Chapter on resistors: colour code (chapter cited from memory)" },
  ],
  whyItMatters:
    "Old sets are full of resistors whose bands have faded or browned with heat. Reading the code tells you what " +
    "the part should be before you measure it; coding a value tells you what to look for in the parts drawer. " +
    "If a reading makes no sense, try the bands from the other end — and when colours are doubtful, trust the schematic and your meter.",
  compute(input: ColourCodeInput) {
    const coded = code(input);
    const { digits, resistance, tolerance, temperatureCoefficient, colours } = coded;
    const tolColour = toleranceColour(tolerance);
    const warnings: Warning[] = [];
    if (input.bands && input.tolerance !== undefined && Math.abs(input.tolerance - tolerance) > 1e-12) {
      warnings.push({ level: "info", message: "The tolerance field is ignored when reading bands; the band after the multiplier sets it." });
    }
    if (input.bands && input.temperatureCoefficient !== undefined && input.temperatureCoefficient !== temperatureCoefficient) {
      warnings.push({ level: "info", message: "The temperature-coefficient field is ignored when reading bands; only a sixth band sets it." });
    }
    if (!input.bands && digits.length === 2 && tolerance <= 0.02) {
      const five = encodeFive(resistance, tolerance);
      if (five) warnings.push({ level: "info", message: `Close-tolerance parts are often marked with five bands instead: ${five.join(", ")}.` });
    }
    const older = tolColour && OLDER_NOTES[tolColour];
    if (older) warnings.push(older);
    warnings.push(HEAT_NOTE);
    return {
      outputs: {
        resistance,
        tolerance,
        bands: colours as string[],
        temperatureCoefficient,
        toleranceLetter: (tolColour && TOLERANCE_LETTER[tolColour]) ?? null,
      },
      warnings,
    };
  },
  explain(input: ColourCodeInput) {
    const { digits, exponent, resistance, tolerance, temperatureCoefficient: tc, colours } = code(input);
    const tolColour = toleranceColour(tolerance);
    const letter = tolColour ? TOLERANCE_LETTER[tolColour] : undefined;
    const sig = limitFigures(tolerance);
    const steps: Step[] = [
      { label: "Bands", latex: tex`\text{${colours.join(", ")}}` },
      {
        label: "Figures and multiplier",
        latex: tex`R = ${digits.join("")}\times 10^{${exponent}}\,\Omega = ${texQuantity(resistance, "Ω")}`,
      },
      {
        label: "Tolerance",
        latex: tex`\pm ${pct(tolerance)}${letter ? tex`\ (\text{${letter}})` : ""}\quad(${texQuantity(resistance * (1 - tolerance), "Ω", sig)}\ \text{to}\ ${texQuantity(resistance * (1 + tolerance), "Ω", sig)})`,
      },
    ];
    if (tc !== null) {
      steps.push({
        label: "Temperature coefficient (sixth band): change per kelvin",
        latex: tex`\Delta R = ${tc}\times 10^{-6}\,\mathrm{K^{-1}} \times ${texQuantity(resistance, "Ω")} = ${texQuantity(resistance * tc * 1e-6, "Ω")}/\mathrm{K}`,
      });
    }
    return steps;
  },
});

/** Where charts older than IEC 60062:2016 read a tolerance band otherwise; made once, compute only picks one. */
const OLDER_NOTES: Partial<Record<Colour, Warning>> = Object.fromEntries(
  Object.entries(OLDER_CHARTS).map(([c, older]) => {
    const colour = c as Colour;
    const now = `±${tidy((TOLERANCE[colour] as number) * 100)} % (${TOLERANCE_LETTER[colour]})`;
    const article = /^[aeiou]/.test(colour) ? "an" : "a";
    return [
      colour,
      {
        level: "info",
        message: `In IEC 60062:2016 ${article} ${colour} tolerance band means ${now}; charts older than that edition give ${colour} ${older}. Check the part's age and maker's chart if it matters.`,
      },
    ];
  }),
);

const HEAT_NOTE: Warning = {
  level: "info",
  message: "Heat darkens old bands: red can pass for brown and orange for red. Check with a meter out of circuit.",
};

function code(input: ColourCodeInput): Decoded {
  const coded = input.bands
    ? decodeBands(input.bands)
    : encodeResistance(input.resistance as number, input.tolerance ?? DEFAULT_TOLERANCE, input.temperatureCoefficient);
  if (!coded.ok) throw new Error(coded.message); // the schema has already refused this
  return coded;
}
