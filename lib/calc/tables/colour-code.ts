/**
 * IEC 60062 colour code for resistors. Glowbench spells the colours the British way
 * ("grey", "violet") and also reads "gray".
 */

export const COLOURS = [
  "black",
  "brown",
  "red",
  "orange",
  "yellow",
  "green",
  "blue",
  "violet",
  "grey",
  "white",
  "gold",
  "silver",
  "pink",
  "none",
] as const;
export type Colour = (typeof COLOURS)[number];

/** Significant-figure bands: black 0 … white 9. */
export const DIGIT: Readonly<Partial<Record<Colour, number>>> = {
  black: 0,
  brown: 1,
  red: 2,
  orange: 3,
  yellow: 4,
  green: 5,
  blue: 6,
  violet: 7,
  grey: 8,
  white: 9,
};

/** Multiplier band as a power of ten: black 10⁰ … white 10⁹, gold 10⁻¹, silver 10⁻², pink 10⁻³. */
export const MULTIPLIER_EXPONENT: Readonly<Partial<Record<Colour, number>>> = {
  ...DIGIT,
  gold: -1,
  silver: -2,
  pink: -3,
};

/** Tolerance band as a fraction; "none" is a resistor with no tolerance band (±20 %). */
export const TOLERANCE: Readonly<Partial<Record<Colour, number>>> = {
  brown: 0.01,
  red: 0.02,
  green: 0.005,
  blue: 0.0025,
  violet: 0.001,
  grey: 0.0005,
  gold: 0.05,
  silver: 0.1,
  none: 0.2,
};

const ALIASES: Readonly<Record<string, Colour>> = { gray: "grey" };

/** Every accepted spelling, lower case, to its colour: one Map lookup per band. */
const BY_NAME = new Map<string, Colour>([...COLOURS.map((c) => [c, c] as const), ...Object.entries(ALIASES)]);

/** Read a colour name (any case, surrounding spaces, "gray" for "grey"); null when it is not one of ours. */
export function parseColour(name: string): Colour | null {
  return BY_NAME.get(name) ?? BY_NAME.get(name.trim().toLowerCase()) ?? null;
}

/** A table as [colour, value] pairs, built once for the reverse lookups below. */
function reverse(table: Readonly<Partial<Record<Colour, number>>>): [Colour, number][] {
  return Object.entries(table) as [Colour, number][];
}
const DIGIT_ENTRIES = reverse(DIGIT);
const MULTIPLIER_ENTRIES = reverse(MULTIPLIER_EXPONENT);
const TOLERANCE_ENTRIES = reverse(TOLERANCE);

/** The colour for a digit 0–9. */
export function digitColour(digit: number): Colour {
  for (const [c, d] of DIGIT_ENTRIES) if (d === digit) return c;
  throw new RangeError(`No colour for digit ${digit}`);
}

/** The multiplier colour for 10^exponent, or null when the code has none (below 10⁻³ or above 10⁹). */
export function multiplierColour(exponent: number): Colour | null {
  for (const [c, e] of MULTIPLIER_ENTRIES) if (e === exponent) return c;
  return null;
}

/** The tolerance colour for a fraction (0.05 → gold), or null when none is coded. */
export function toleranceColour(tolerance: number): Colour | null {
  for (const [c, t] of TOLERANCE_ENTRIES) if (Math.abs(t - tolerance) <= 1e-12) return c;
  return null;
}
