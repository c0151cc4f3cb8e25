import { z } from "zod";
import { texQuantity, tex } from "./format";
import { defineCalculator, type Step, type Warning } from "./types";
import {
  BODY_END_DOT_SOURCE,
  DOT_COLOURS,
  FIGURE_COLOURS,
  TOLERANCE_END,
  TOLERANCE_END_COLOURS,
  VINTAGE_SCHEMES,
  exponentOf,
  figureOf,
  parseColour,
  type Colour,
  type ToleranceEnd,
} from "./tables/vintage-markings";

/**
 * Reads a resistor marked in the body-end-dot scheme of the 1920s–40s (RMA colour code, see the table):
 * R = (10·body + end) × 10^dot, a missing end or dot being the body colour. Same figures as IEC 60062,
 * so the value equals today's three-band reading of body, end, dot.
 */

const blank = (v: unknown) => v === undefined || v === null || (typeof v === "string" && v.trim() === "");

/** A colour field: a name we know, of the allowed kinds; blank gives undefined. */
function colourField(label: string, allowed: readonly Colour[], why: (c: Colour) => string) {
  return z
    .unknown()
    .transform((raw, ctx): Colour | undefined => {
      if (blank(raw)) return undefined;
      const c = typeof raw === "string" ? parseColour(raw) : null;
      if (!c) {
        ctx.addIssue({ code: "custom", message: `${label} must be a colour name such as brown, red or orange` });
        return z.NEVER;
      }
      if (!allowed.includes(c)) {
        ctx.addIssue({ code: "custom", message: `${label}: ${why(c)}` });
        return z.NEVER;
      }
      return c;
    })
    .optional();
}

const notFigure = (c: Colour) => `${c} is not a figure in this code (black 0 … white 9)`;

export const vintageMarkingsSchema = z
  .object({
    scheme: z.preprocess(
      (v) => (blank(v) ? undefined : typeof v === "string" ? v.trim().toLowerCase() : v),
      z.enum(VINTAGE_SCHEMES, { error: 'Scheme must be "body-end-dot"' }).default("body-end-dot"),
    ),
    body: colourField("Body", FIGURE_COLOURS, notFigure),
    end: colourField("End", FIGURE_COLOURS, notFigure),
    dot: colourField("Dot", DOT_COLOURS, (c) => `${c} is not a multiplier in this code (black ×1 … white ×10⁹, gold ×0.1, silver ×0.01)`),
    toleranceEnd: z.preprocess(
      (v) => (blank(v) ? undefined : typeof v === "string" ? v.trim().toLowerCase() : v),
      z.enum(TOLERANCE_END_COLOURS, { error: "Tolerance end must be gold, silver or none" }).default("none"),
    ),
  })
  .superRefine((v, ctx) => {
    if (v.body === undefined) ctx.addIssue({ code: "custom", path: ["body"], message: "Body colour is required" });
    else if (v.body === "black") {
      ctx.addIssue({ code: "custom", path: ["body"], message: "Body: black is 0, never the first figure; check which end is the painted tip" });
    }
  });

export type VintageMarkingsInput = z.output<typeof vintageMarkingsSchema>;

/** The three colours as read: a missing end or dot is the body colour. */
function read(input: VintageMarkingsInput) {
  const body = input.body as Colour;
  const end = input.end ?? body;
  const dot = input.dot ?? body;
  const n = 10 * (figureOf(body) as number) + (figureOf(end) as number);
  const e = exponentOf(dot) as number;
  // Divide for gold and silver so 47 × 0.1 comes out as 4.7, not 4.7000000000000002.
  return { body, end, dot, n, e, resistance: e >= 0 ? n * 10 ** e : n / 10 ** -e };
}

const SAME_END: Warning = {
  level: "info",
  message: "No end colour given: read as the body colour. Paint of the body's own colour cannot be seen, so such parts show no separate end (common practice).",
};
const SAME_DOT: Warning = {
  level: "info",
  message: "No dot given: read as the body colour. A dot of the body's own colour cannot be seen, so such parts show no dot (common practice).",
};
const DRIFT: Warning = {
  level: "info",
  message:
    "Composition resistors of this age usually read high, often by 10–30 %, and heat darkens the paint: a faded red passes for brown. " +
    "Check the value against the schematic and measure it out of circuit (common practice).",
};

export const calculator = defineCalculator({
  slug: "vintage-markings",
  title: "Vintage resistor markings",
  purpose: "Read a pre-war body-end-dot resistor: body, end and dot colours to its value.",
  bench: {
    group: "parts",
    example: { scheme: "body-end-dot", body: "brown", end: "black", dot: "orange" },
    headlines: ["resistance", "tolerance"],
    alwaysDanger: false,
    chart: null,
    format: { tolerance: "percent" },
  },
  inputs: [
    {
      name: "scheme",
      label: "Marking scheme",
      unit: "",
      required: false,
      default: "body-end-dot",
      control: "select",
      options: VINTAGE_SCHEMES,
      help: "Body-end-dot: the 1920s–40s RMA colour code.",
    },
    {
      name: "body",
      label: "Body colour",
      unit: "",
      required: true,
      control: "select",
      options: FIGURE_COLOURS.filter((c) => c !== "black"),
      help: "The colour of the whole body: the first figure.",
    },
    {
      name: "end",
      label: "End (tip) colour",
      unit: "",
      required: false,
      control: "select",
      options: FIGURE_COLOURS,
      help: "The painted tip: the second figure. None shown means the body colour.",
    },
    {
      name: "dot",
      label: "Dot colour",
      unit: "",
      required: false,
      control: "select",
      options: DOT_COLOURS,
      help: "The spot or short band on the body: the multiplier. None shown means the body colour.",
    },
    {
      name: "toleranceEnd",
      label: "Other end",
      unit: "",
      required: false,
      default: "none",
      control: "select",
      options: TOLERANCE_END_COLOURS,
      help: "Gold ±5 %, silver ±10 %, unpainted ±20 %.",
    },
  ],
  outputs: [
    { name: "resistance", label: "Resistance", unit: "Ω" },
    { name: "tolerance", label: "Tolerance (fraction)", unit: "" },
    { name: "equivalentBands", label: "The same value in today's bands", unit: "" },
  ],
  schema: vintageMarkingsSchema,
  formulas: [{ label: "Body, end, dot", latex: tex`R = (10\,d_\text{body} + d_\text{end}) \times 10^{m_\text{dot}},\quad \pm t_\text{other end}` }],
  references: [
    { title: "RMA standard colour code for fixed composition resistors", detail: BODY_END_DOT_SOURCE },
    {
      title: "IEC 60062:2016, Marking codes for resistors and capacitors",
      detail: "§3.2 code colours: the same figures and multipliers, now as bands (from memory)",
    },
    {
      title: "Radiotron Designer's Handbook, 4th ed.",
      detail: "Chapter on resistors: colour code, including the body-end-dot marking (chapter cited from memory)",
    },
  ],
  whyItMatters:
    "Sets of the 1920s to the 1940s carry resistors painted in the RMA body-end-dot code rather than bands: the body colour " +
    "is the first figure, the painted end the second, and the dot on the body the multiplier. A brown body, black end and " +
    "orange dot is 10 kΩ. Where the end or the dot would be the body's own colour it is simply not there to see, so a " +
    "missing dot reads as the body colour: an all-red part is 2.2 kΩ.",
  compute(input: VintageMarkingsInput) {
    const { body, end, dot, resistance } = read(input);
    const tolerance = TOLERANCE_END[input.toleranceEnd as ToleranceEnd];
    const warnings: Warning[] = [];
    if (input.end === undefined) warnings.push(SAME_END);
    if (input.dot === undefined) warnings.push(SAME_DOT);
    warnings.push(DRIFT);
    return { outputs: { resistance, tolerance, equivalentBands: [body, end, dot, input.toleranceEnd] }, warnings };
  },
  explain(input: VintageMarkingsInput, o) {
    const { body, end, dot, n, e } = read(input);
    const given = (c: Colour | undefined, name: string) => (c === undefined ? `${name} (not shown: the body colour)` : name);
    const steps: Step[] = [
      {
        label: `Body ${body} = first figure, ${given(input.end, `end ${end}`)} = second figure`,
        latex: tex`10 \times ${figureOf(body)} + ${figureOf(end)} = ${n}`,
      },
      { label: `${given(input.dot, `Dot ${dot}`)} = multiplier`, latex: tex`R = ${n} \times 10^{${e}}\,\Omega = ${texQuantity(o.resistance, "Ω")}` },
      {
        label: `Other end ${input.toleranceEnd}: tolerance`,
        latex: tex`\pm ${Math.round(o.tolerance * 100)}\,\%\quad(${texQuantity(o.resistance * (1 - o.tolerance), "Ω")}\ \text{to}\ ${texQuantity(o.resistance * (1 + o.tolerance), "Ω")})`,
      },
    ];
    return steps;
  },
});
