/**
 * Standard power ratings of resistors as makers catalogue them (common practice): carbon and
 * film parts from 1/8 W to 2 W, wirewound and power parts above.
 */
export const STANDARD_WATTAGES: readonly number[] = [0.125, 0.25, 0.5, 1, 2, 3, 5, 7, 10, 15, 20, 25, 50, 100];

/** Derating used across Glowbench: choose a part rated for at least twice what it dissipates (common practice). */
export const DERATING_FACTOR = 2;

export type RatingChoice =
  | { inTable: true; watts: number }
  /** More than the largest standard part: the caller should warn (parallel parts or a special order). */
  | { inTable: false; needed: number; largest: number };

/** The smallest standard rating ≥ watts. */
export function nextRatingAtLeast(watts: number): RatingChoice {
  if (!(watts >= 0) || !Number.isFinite(watts)) throw new RangeError("A power rating needs a non-negative, finite number");
  const found = STANDARD_WATTAGES.find((w) => w >= watts);
  return found === undefined ? { inTable: false, needed: watts, largest: STANDARD_WATTAGES[STANDARD_WATTAGES.length - 1] } : { inTable: true, watts: found };
}

/**
 * The suggested rating for a part that dissipates `dissipation` watts: next standard rating
 * ≥ 2 × dissipation. `rating` is null when no single standard part is large enough, and then
 * `warning` explains it.
 */
export function suggestedRating(dissipation: number): {
  rating: number | null;
  warning: { level: "caution"; message: string } | null;
} {
  const choice = nextRatingAtLeast(DERATING_FACTOR * dissipation);
  if (choice.inTable) return { rating: choice.watts, warning: null };
  return {
    rating: null,
    warning: {
      level: "caution",
      message:
        `Twice the dissipation is ${choice.needed.toPrecision(3)} W, more than the largest standard rating we list ` +
        `(${choice.largest} W). Share the load between several resistors or use a chassis-mounted power resistor, and check the design.`,
    },
  };
}
