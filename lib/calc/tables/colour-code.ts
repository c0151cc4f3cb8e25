/**
 * IEC 60062:2016 colour code for resistors (§3.2 code colours, §3.3 value and tolerance, §3.4 TCR
 * marking; clause names from the edition's published summary, table values from memory).
 * Glowbench spells the colours the British way ("grey", "violet") and also reads "gray".
 */

export const COLOURS = ["black", "brown", "red", "orange", "yellow", "green", "blue", "violet", "grey", "white", "gold", "silver", "pink", "none"] as const;
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

/**
 * Tolerance band as a fraction, as IEC 60062:2016 gives it; "none" is a resistor with no tolerance
 * band (±20 %). The 2016 table has orange ±0.05 %, yellow ±0.02 % and grey ±0.01 %; charts before
 * it gave grey as ±0.05 % and orange and yellow no tolerance (see OLDER_CHARTS).
 */
export const TOLERANCE: Readonly<Partial<Record<Colour, number>>> = {
  brown: 0.01,
  red: 0.02,
  orange: 0.0005,
  yellow: 0.0002,
  green: 0.005,
  blue: 0.0025,
  violet: 0.001,
  grey: 0.0001,
  gold: 0.05,
  silver: 0.1,
  none: 0.2,
};

/** IEC 60062's letter for each tolerance (as printed in RKM markings such as "4K7J"). */
export const TOLERANCE_LETTER: Readonly<Partial<Record<Colour, string>>> = {
  brown: "F",
  red: "G",
  orange: "W",
  yellow: "P",
  green: "D",
  blue: "C",
  violet: "B",
  grey: "L",
  gold: "J",
  silver: "K",
  none: "M",
};

/**
 * Tolerance bands that charts older than the 2016 edition read otherwise, with what most of them
 * said (common practice: the trade's wall charts; a few give orange and yellow other figures).
 */
export const OLDER_CHARTS: Readonly<Partial<Record<Colour, string>>> = {
  grey: "as ±0.05 % (which the 2016 table gives to orange)",
  orange: "no tolerance (they show ±0.05 % as grey)",
  yellow: "no tolerance",
};

/** Temperature-coefficient band (the sixth), ppm/K, IEC 60062:2016 §3.4 (from memory). */
export const TEMPERATURE_COEFFICIENT: Readonly<Partial<Record<Colour, number>>> = {
  black: 250,
  brown: 100,
  red: 50,
  orange: 15,
  yellow: 25,
  green: 20,
  blue: 10,
  violet: 5,
  grey: 1,
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
const TC_ENTRIES = reverse(TEMPERATURE_COEFFICIENT);

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

/** The tolerance colour for a fraction (0.05 → gold, 0.0005 → orange), or null when none is coded. */
export function toleranceColour(tolerance: number): Colour | null {
  for (const [c, t] of TOLERANCE_ENTRIES) if (Math.abs(t - tolerance) <= 1e-12) return c;
  return null;
}

/** The temperature-coefficient colour for ppm/K (50 → red), or null when none is coded. */
export function temperatureCoefficientColour(ppmPerKelvin: number): Colour | null {
  for (const [c, t] of TC_ENTRIES) if (t === ppmPerKelvin) return c;
  return null;
}
