/**
 * IEC 60063 preferred-number series for resistors and capacitors, as decade mantissas in [1, 10).
 * E6/E12/E24 carry the standard's historic values (2.7, 3.3, 3.9, 4.7, 8.2 …), which differ from a
 * pure 10^(k/n) rounding; E48 and E96 follow the standard's three-figure table.
 */

export const SERIES_NAMES = ["E6", "E12", "E24", "E48", "E96"] as const;
export type SeriesName = (typeof SERIES_NAMES)[number];

export const E6: readonly number[] = [1.0, 1.5, 2.2, 3.3, 4.7, 6.8];

export const E12: readonly number[] = [1.0, 1.2, 1.5, 1.8, 2.2, 2.7, 3.3, 3.9, 4.7, 5.6, 6.8, 8.2];

export const E24: readonly number[] = [1.0, 1.1, 1.2, 1.3, 1.5, 1.6, 1.8, 2.0, 2.2, 2.4, 2.7, 3.0, 3.3, 3.6, 3.9, 4.3, 4.7, 5.1, 5.6, 6.2, 6.8, 7.5, 8.2, 9.1];

export const E96: readonly number[] = [
  1.0, 1.02, 1.05, 1.07, 1.1, 1.13, 1.15, 1.18, 1.21, 1.24, 1.27, 1.3, 1.33, 1.37, 1.4, 1.43, 1.47, 1.5, 1.54, 1.58, 1.62, 1.65, 1.69, 1.74, 1.78, 1.82, 1.87,
  1.91, 1.96, 2.0, 2.05, 2.1, 2.15, 2.21, 2.26, 2.32, 2.37, 2.43, 2.49, 2.55, 2.61, 2.67, 2.74, 2.8, 2.87, 2.94, 3.01, 3.09, 3.16, 3.24, 3.32, 3.4, 3.48, 3.57,
  3.65, 3.74, 3.83, 3.92, 4.02, 4.12, 4.22, 4.32, 4.42, 4.53, 4.64, 4.75, 4.87, 4.99, 5.11, 5.23, 5.36, 5.49, 5.62, 5.76, 5.9, 6.04, 6.19, 6.34, 6.49, 6.65,
  6.81, 6.98, 7.15, 7.32, 7.5, 7.68, 7.87, 8.06, 8.25, 8.45, 8.66, 8.87, 9.09, 9.31, 9.53, 9.76,
];

/** E48 is every second member of E96 in the standard's table. */
export const E48: readonly number[] = [
  1.0, 1.05, 1.1, 1.15, 1.21, 1.27, 1.33, 1.4, 1.47, 1.54, 1.62, 1.69, 1.78, 1.87, 1.96, 2.05, 2.15, 2.26, 2.37, 2.49, 2.61, 2.74, 2.87, 3.01, 3.16, 3.32, 3.48,
  3.65, 3.83, 4.02, 4.22, 4.42, 4.64, 4.87, 5.11, 5.36, 5.62, 5.9, 6.19, 6.49, 6.81, 7.15, 7.5, 7.87, 8.25, 8.66, 9.09, 9.53,
];

export const SERIES: Readonly<Record<SeriesName, readonly number[]>> = { E6, E12, E24, E48, E96 };

/** Figures a series member is quoted to: two for E6–E24, three for E48/E96. */
export function seriesDigits(series: SeriesName): number {
  return series === "E48" || series === "E96" ? 3 : 2;
}

/** mantissa × 10^decade without binary noise (4.7 × 10³ = 4700, not 4700.000000000001). */
function scale(mantissa: number, decade: number): number {
  return Number((mantissa * 10 ** decade).toPrecision(12));
}

/** Every member of a series from decade `fromDecade` to `toDecade` inclusive (decade 3 gives 1 k … 9.x k). */
export function seriesValues(series: SeriesName, fromDecade: number, toDecade: number): number[] {
  if (!Number.isInteger(fromDecade) || !Number.isInteger(toDecade)) throw new RangeError("Decades must be whole numbers");
  const out: number[] = [];
  for (let d = fromDecade; d <= toDecade; d++) for (const m of SERIES[series]) out.push(scale(m, d));
  return out;
}

function assertPositive(value: number): void {
  if (!(value > 0) || !Number.isFinite(value)) throw new RangeError("A preferred value needs a positive, finite number");
}

/** Members of the decade around `value` and its neighbours, ascending; cached, since every compute asks. */
const aroundCache: Record<SeriesName, Map<number, readonly number[]>> = { E6: new Map(), E12: new Map(), E24: new Map(), E48: new Map(), E96: new Map() };
function around(value: number, series: SeriesName): readonly number[] {
  const d = Math.floor(Math.log10(value));
  const cache = aroundCache[series];
  let list = cache.get(d);
  if (!list) {
    list = seriesValues(series, d - 1, d + 1); // at most ~650 decades × 5 series: bounded
    cache.set(d, list);
  }
  return list;
}

// Relative slack so that 4700 typed as 4.7e3 counts as an exact member.
const SAME = 1e-9;

/** The largest series member ≤ value (an exact member returns itself). */
export function preferredBelow(value: number, series: SeriesName): number {
  assertPositive(value);
  const list = around(value, series);
  const limit = value * (1 + SAME);
  let i = list.length - 1;
  while (i > 0 && list[i] > limit) i--;
  return list[i];
}

/** The smallest series member ≥ value (an exact member returns itself). */
export function preferredAbove(value: number, series: SeriesName): number {
  assertPositive(value);
  const list = around(value, series);
  const limit = value * (1 - SAME);
  let i = 0;
  while (i < list.length - 1 && list[i] < limit) i++;
  return list[i];
}

/**
 * The member nearest to value on a logarithmic scale (the scale the series is built on), so
 * 5 kΩ in E12 goes to 4.7 kΩ, not 5.6 kΩ. Works across decade boundaries (9.6 → 10 in E12).
 * On an exact log-scale tie the lower member is returned.
 */
export function nearestPreferred(value: number, series: SeriesName): number {
  const below = preferredBelow(value, series);
  const above = preferredAbove(value, series);
  return Math.log(value / below) <= Math.log(above / value) ? below : above;
}
