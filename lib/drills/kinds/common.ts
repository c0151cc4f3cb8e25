import { formatQuantity } from "../../calc/format";
import { nextRatingAtLeast } from "../../calc/tables/wattage";
import { slipOf } from "../calc";
import type { Rng } from "../rng";
import type { MistakeSpec, ToleranceRule } from "../types";

/** Shared pieces of the drill kinds: how figures are written and the mistakes many kinds share. */

/** A figure as the bench writes it: "45 mA", "12.5 V", "0.5 W". */
export const fmt = (value: number, unit: string, sig = 3) => formatQuantity(value, unit, sig);

/** A computed figure (several steps of arithmetic): 2 % covers rounding the working to three figures. */
export const RELATIVE_2: ToleranceRule = { type: "relative", fraction: 0.02 };
/** Figures worked from a rounded given (a model's current, µ, rp): a little more room. */
export const RELATIVE_3: ToleranceRule = { type: "relative", fraction: 0.03 };
/** Preferred values, standard ratings, table figures, words. */
export const EXACT: ToleranceRule = { type: "exact" };

/** Round to `sig` significant figures, as a figure read off a meter or a label. */
export const roundTo = (value: number, sig = 2) => Number(value.toPrecision(sig));

/** A measured current near a typical one: within ±15 %, read to two figures (a worn or strong tube). */
export function nearby(rng: Rng, typical: number, spread = 0.15, sig = 2): number {
  return roundTo(typical * (1 - spread + 2 * spread * rng.next()), sig);
}

/** "The next standard wattage without the factor of two": the slip at the rating step. */
export function noDerating(dissipation: number, step = "Suggested rating"): MistakeSpec[] {
  const r = nextRatingAtLeast(dissipation);
  if (!r.inTable) return [];
  return [
    {
      value: r.watts,
      step,
      hint: "A resistor is chosen rated for at least twice what it dissipates; double the dissipation first, then take the next standard wattage.",
    },
  ];
}

/** Ohm's law through its own calculator: the figure a slip gives (the whole supply across a resistor, say); NaN if refused. */
export function ohms(given: Record<string, number>, output: "voltage" | "current" | "resistance" | "power"): number {
  return slipOf("ohms-law", given, output);
}

/** Mains of the era: 50 Hz and 60 Hz, with their usual line voltages. */
export const MAINS: readonly { frequency: number; voltage: number }[] = [
  { frequency: 60, voltage: 110 },
  { frequency: 60, voltage: 117 },
  { frequency: 60, voltage: 120 },
  { frequency: 50, voltage: 220 },
  { frequency: 50, voltage: 230 },
  { frequency: 50, voltage: 240 },
];

/** "forgot 2π": the figure in radians per second read as hertz, or the reverse. */
export const TWO_PI = 2 * Math.PI;

/** Filter capacitors and B+ of the era (common practice). */
export const drawCap = (rng: Rng) => rng.pick([8, 10, 16, 20, 32, 40, 47, 50, 100]) * 1e-6;
export const drawBPlus = (rng: Rng) => rng.pick([250, 275, 300, 350, 400, 450]);
