import { DERATING_FACTOR, STANDARD_WATTAGES } from "./wattage";

/**
 * Limiting element voltage: IEC 60115-1 (fixed resistors, generic specification) names the
 * highest DC or AC rms voltage that may stand continuously across a resistor's element, whatever
 * its value; the rated voltage is √(P·R) but never more than that limit (definition from memory).
 * The standard sets no figure: each data sheet states one, and it follows the body size.
 *
 * The figures below are typical of leaded carbon-film, metal-film and metal-oxide data sheets for
 * the body that carries each rating (from memory), taken at the low end of what those sheets give:
 * 1/8 W (0204 body) 200 V, 1/4 W (0207) 250 V, 1/2 W (0309/0411) 350 V, 1 W (0414) 350 V,
 * 2 W (0617) and larger 500 V. Wirewound power parts vary; purpose-made high-voltage resistors are
 * rated for kilovolts, and then their own data sheet governs.
 */
export const LIMITING_VOLTAGE_SOURCE =
  "IEC 60115-1 limiting element voltage; typical leaded film and metal-oxide data-sheet figures by body size (from memory)";

/** [rating in W, typical limiting element voltage in V], by rating. */
const BY_RATING: readonly (readonly [number, number])[] = STANDARD_WATTAGES.map((w) => [w, w <= 0.125 ? 200 : w <= 0.25 ? 250 : w <= 1 ? 350 : 500]);

/** The highest typical limit we use for any ordinary part, V. */
export const MAX_LIMITING_VOLTAGE = 500;

/** Typical limiting element voltage of a part with this standard power rating, V. */
export function limitingVoltage(rating: number): number {
  for (const [w, v] of BY_RATING) if (rating <= w) return v;
  return MAX_LIMITING_VOLTAGE;
}

/**
 * The smallest standard rating that carries `watts` with the house derating (rating ≥ 2 × watts,
 * DERATING_FACTOR, common practice) and whose body stands `volts`; null when no listed part does both.
 */
export function ratingForPowerAndVoltage(watts: number, volts: number): number | null {
  const needed = DERATING_FACTOR * watts;
  for (const [w, v] of BY_RATING) if (w >= needed && v >= volts) return w;
  return null;
}
