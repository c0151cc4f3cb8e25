import { formatQuantity } from "./format";
import {
  DIGIT,
  MULTIPLIER_EXPONENT,
  TEMPERATURE_COEFFICIENT,
  TOLERANCE,
  digitColour,
  multiplierColour,
  parseColour,
  temperatureCoefficientColour,
  toleranceColour,
  type Colour,
} from "./tables/colour-code";
import { tidy } from "./units";

/**
 * Reading and writing IEC 60062:2016 colour markings: 3 bands (two figures, multiplier, ±20 %),
 * 4 (two figures, multiplier, tolerance), 5 (three figures, multiplier, tolerance) and 6 (five
 * bands and a temperature-coefficient band, §3.4). Bands are listed from the end nearest a lead.
 */

export type Decoded = {
  ok: true;
  digits: number[];
  exponent: number;
  resistance: number;
  tolerance: number;
  /** ppm/K from a sixth band, or null when the marking has none. */
  temperatureCoefficient: number | null;
  colours: Colour[];
};
export type Failure = { ok: false; field: "bands" | "resistance" | "tolerance" | "temperatureCoefficient"; message: string };

const ORDINAL = ["First", "Second", "Third", "Fourth", "Fifth", "Sixth"];

/** Read a marking. The tolerance band follows the multiplier; on six bands the TC band comes last. */
export function decodeBands(names: readonly string[]): Decoded | Failure {
  const n = names.length;
  if (n < 3 || n > 6) return { ok: false, field: "bands", message: `Bands: give 3, 4, 5 or 6 colours (got ${n})` };
  const colours: Colour[] = [];
  for (let i = 0; i < n; i++) {
    const c = parseColour(names[i]);
    if (!c) return { ok: false, field: "bands", message: `${ORDINAL[i]} band "${names[i]}" is not a colour of the code` };
    colours.push(c);
  }
  const digitCount = n >= 5 ? 3 : 2;
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
    const at = digitCount + 1;
    const t = TOLERANCE[colours[at]];
    if (t === undefined) {
      return { ok: false, field: "bands", message: `${ORDINAL[at]} band (the tolerance) cannot be ${colours[at]}` };
    }
    tolerance = t;
  }
  let temperatureCoefficient: number | null = null;
  if (n === 6) {
    const tc = TEMPERATURE_COEFFICIENT[colours[5]];
    if (tc === undefined) {
      return { ok: false, field: "bands", message: `Sixth band (the temperature coefficient) cannot be ${colours[5]}: TC bands run black to grey` };
    }
    temperatureCoefficient = tc;
  }
  let significand = 0;
  for (const d of digits) significand = significand * 10 + d;
  return { ok: true, digits, exponent, resistance: tidy(significand * 10 ** exponent), tolerance, temperatureCoefficient, colours };
}

const TC_LIST = Object.values(TEMPERATURE_COEFFICIENT)
  .sort((a, b) => (b as number) - (a as number))
  .join(", ");

/**
 * Code a resistance: four bands for two significant figures, five for three, six (always three
 * figures) when a temperature coefficient in ppm/K is given.
 */
export function encodeResistance(resistance: number, tolerance: number, temperatureCoefficient?: number): Decoded | Failure {
  const tolColour = toleranceColour(tolerance);
  if (!tolColour) {
    const list = Object.values(TOLERANCE)
      .map((t) => `${tidy((t as number) * 100)} %`)
      .join(", ");
    return { ok: false, field: "tolerance", message: `Tolerance ±${tidy(tolerance * 100)} % has no colour; the code has ${list}` };
  }
  const withTc = temperatureCoefficient !== undefined;
  const tcColour = withTc ? temperatureCoefficientColour(temperatureCoefficient) : null;
  if (withTc && !tcColour) {
    return {
      ok: false,
      field: "temperatureCoefficient",
      message: `Temperature coefficient ${temperatureCoefficient} ppm/K has no colour; the code has ${TC_LIST} ppm/K`,
    };
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
  const digitCount = figures.length === 3 || withTc ? 3 : 2;
  const digits = figures.padEnd(digitCount, "0").split("").map(Number);
  const exponent = Number(exp) - (digitCount - 1);
  const multColour = multiplierColour(exponent);
  if (!multColour) {
    return {
      ok: false,
      field: "resistance",
      message: `Resistance ${formatQuantity(resistance, "Ω")} is outside the colour code's range for ${digitCount} figures (multipliers run from ×0.001 to ×10⁹)`,
    };
  }
  if (digitCount === 3 && tolColour === "none") {
    const kind = withTc ? "A six-band marking (with a temperature coefficient)" : "A five-band (three-figure) marking";
    return { ok: false, field: "tolerance", message: `${kind} always has a tolerance band; ±20 % has none` };
  }
  const colours: Colour[] = [...digits.map(digitColour), multColour];
  if (tolColour !== "none") colours.push(tolColour);
  if (tcColour) colours.push(tcColour);
  return { ok: true, digits, exponent, resistance, tolerance, temperatureCoefficient: withTc ? temperatureCoefficient : null, colours };
}

/** The five-band form of a two-figure value (4.7 k → yellow, violet, black, brown, …). */
export function encodeFive(resistance: number, tolerance: number): Colour[] | null {
  const [mant, exp] = resistance.toExponential(2).split("e");
  const digits = mant.replace(".", "").split("").map(Number);
  const m = multiplierColour(Number(exp) - 2);
  const t = toleranceColour(tolerance);
  return m && t && t !== "none" ? [...digits.map(digitColour), m, t] : null;
}
