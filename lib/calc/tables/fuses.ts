/**
 * Rated currents of miniature cartridge fuse-links (5 × 20 mm and 6.3 × 32 mm).
 *
 * IEC 60127-1 and the standard sheets of IEC 60127-2 take rated currents from one series, each
 * decade 1 – 1.25 – 1.6 – 2 – 2.5 – 3.15 – 4 – 5 – 6.3 – 8 (the R10 preferred numbers of ISO 3, with
 * 3.15 and 6.3 as written). The span here, 32 mA to 10 A, is that of the 5 × 20 mm sheets as recalled
 * FROM MEMORY (the sheets write the series' 31.5 mA as 32 mA): some sheets start or stop elsewhere, so
 * check the sheet of the fuse you fit.
 */

export const FUSE_SERIES_SOURCE = "IEC 60127-1 and IEC 60127-2 (standard sheets), rated currents 1–1.25–1.6–2–2.5–3.15–4–5–6.3–8 × 10ⁿ A";

/** One decade of the series, as the standard writes it. */
export const FUSE_MANTISSAS: readonly number[] = [1, 1.25, 1.6, 2, 2.5, 3.15, 4, 5, 6.3, 8];

/** How the series reads on screen (an output of the fuse calculator). */
export const FUSE_SERIES_TEXT = "IEC 60127: 1 – 1.25 – 1.6 – 2 – 2.5 – 3.15 – 4 – 5 – 6.3 – 8 × 10ⁿ A (32 mA to 10 A listed)";

/** Every listed rated current in amperes, ascending: 32 mA … 10 A. */
export const FUSE_RATINGS: readonly number[] = [
  0.032, 0.04, 0.05, 0.063, 0.08, 0.1, 0.125, 0.16, 0.2, 0.25, 0.315, 0.4, 0.5, 0.63, 0.8, 1, 1.25, 1.6, 2, 2.5, 3.15, 4, 5, 6.3, 8, 10,
];

// Products like 0.8 × 1.25 land a hair above 1 in binary; a rating this close counts as "at or above".
const EPS = 1e-9;

/** The smallest listed rating at or above `amps`, or null above the largest. */
export function ratingAtLeast(amps: number): number | null {
  for (let k = 0; k < FUSE_RATINGS.length; k++) if (FUSE_RATINGS[k] >= amps * (1 - EPS)) return FUSE_RATINGS[k];
  return null;
}
