import { DIGIT, MULTIPLIER_EXPONENT, parseColour, type Colour } from "./colour-code";

/**
 * Resistor markings older than today's bands. The body-end-dot scheme of the 1920s–40s is the RMA
 * (Radio Manufacturers Association) standard colour code for fixed composition resistors, as the
 * trade's charts and handbooks of the era print it (recalled FROM MEMORY of those charts):
 *  - the body colour is the first figure, the end (tip) colour the second, the dot (a spot or short
 *    band on the body) the multiplier, the number of zeros;
 *  - the figures are the ones IEC 60062 still uses: black 0, brown 1 … white 9; gold ×0.1 and
 *    silver ×0.01 as dots appear on later parts;
 *  - a part whose end or dot is the body colour shows no separate end or dot, since paint of the same
 *    colour cannot be seen (common practice): a missing end or dot is read as the body colour;
 *  - the other end, when painted, is the tolerance: gold ±5 %, silver ±10 %, none ±20 %.
 */

export const VINTAGE_SCHEMES = ["body-end-dot"] as const;
export type VintageScheme = (typeof VINTAGE_SCHEMES)[number];

export const BODY_END_DOT_SOURCE =
  "RMA standard colour code for fixed composition resistors (body = first figure, end = second, dot = multiplier), as printed in the era's charts; from memory";

/** Colours that are figures (body, end): black 0 … white 9. */
export const FIGURE_COLOURS: readonly Colour[] = (Object.keys(DIGIT) as Colour[]).filter((c) => DIGIT[c] !== undefined);

/** Colours a dot may carry: the figures, and gold and silver for ×0.1 and ×0.01 (not pink, an IEC 60062:2016 addition). */
export const DOT_COLOURS: readonly Colour[] = [...FIGURE_COLOURS, "gold", "silver"];

/** The tolerance end: gold, silver or none (unpainted). */
export const TOLERANCE_END_COLOURS = ["gold", "silver", "none"] as const;
export type ToleranceEnd = (typeof TOLERANCE_END_COLOURS)[number];
export const TOLERANCE_END: Readonly<Record<ToleranceEnd, number>> = { gold: 0.05, silver: 0.1, none: 0.2 };

export function figureOf(c: Colour): number | undefined {
  return DIGIT[c];
}

export function exponentOf(c: Colour): number | undefined {
  return c === "pink" ? undefined : MULTIPLIER_EXPONENT[c];
}

export { parseColour, type Colour };
