import { round15 } from "./precision";
import { SERIES_NAMES, seriesValues, type SeriesName } from "./tables/preferred-values";

/**
 * The pair of preferred values whose series or parallel combination comes closest to a target.
 * Each series' members from 1 Ω to the top of the 10 MΩ decade are listed once, ascending; a search
 * walks the larger part of a series pair (or the smaller of a parallel pair) over one octave of the
 * target and finds its partner by a galloping search that only ever moves one way, so a call costs a
 * few dozen steps even in E96, never a double loop over every decade.
 */

export const PART_MIN = 1;
/** Last decade listed: 10 MΩ … 97.6 MΩ (E96), so a 10 MΩ target still has parallel partners. */
const TOP_DECADE = 7;

const LISTS = new Map<SeriesName, Float64Array>(SERIES_NAMES.map((s) => [s, Float64Array.from(seriesValues(s, 0, TOP_DECADE))]));

export function partsOf(series: SeriesName): Float64Array {
  return LISTS.get(series)!;
}

export interface Pair {
  /** first ≤ second. */
  first: number;
  second: number;
  combined: number;
  /** (combined − target)/target, signed. */
  error: number;
}

const SAME = 1e-9;

/** Largest index ≥ from whose value is ≤ t (from − 1 when none), galloping upward from `from`. */
function lastAtOrBelowFrom(v: Float64Array, from: number, t: number): number {
  let lo = from - 1; // v[lo] ≤ t holds (or lo is before the list)
  if (from >= v.length || v[from] > t) return lo;
  let step = 1;
  let hi = from;
  while (hi < v.length && v[hi] <= t) {
    lo = hi;
    hi = from + step;
    step *= 2;
  }
  if (hi > v.length) hi = v.length;
  // v[lo] ≤ t < v[hi] (or hi is past the end): bisect between them.
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (v[mid] <= t) lo = mid;
    else hi = mid;
  }
  return lo;
}

/** Largest index ≤ from whose value is ≤ t (−1 when none), galloping downward from `from`. */
function lastAtOrBelowDown(v: Float64Array, from: number, t: number): number {
  if (from < 0 || v[from] <= t) return from;
  let hi = from; // v[hi] > t holds
  let step = 1;
  let lo = from - 1;
  while (lo >= 0 && v[lo] > t) {
    hi = lo;
    lo = from - 2 * step;
    step *= 2;
  }
  if (lo < -1) lo = -1;
  // v[lo] ≤ t < v[hi] (or lo is before the list): bisect between them.
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (v[mid] <= t) lo = mid;
    else hi = mid;
  }
  return lo;
}

/**
 * Best a + b, a ≤ b < x: for each larger part b in [x/2, x) the partner nearest x − b (the error is monotonic
 * on each side of it), then the pair of equal parts below x/2. b = x (a member plus a trim) and b > x (the sum
 * then exceeds x by more than the trim) are not pairs we offer.
 */
export function bestSeries(x: number, series: SeriesName): Pair | null {
  const v = partsOf(series);
  let j = lastAtOrBelowFrom(v, 0, x * (1 + SAME));
  if (j >= 0 && Math.abs(v[j] - x) <= SAME * x) j--;
  let bestA = 0;
  let bestB = 0;
  let bestErr = Infinity;
  const n = v.length;
  let i = -1; // v[i] ≤ t < v[i + 1]; t only grows as b falls, so i only moves up
  for (; j >= 0 && v[j] * 2 >= x * (1 - SAME); j--) {
    const b = v[j];
    const t = x - b;
    if (i + 1 < n && v[i + 1] <= t) i = lastAtOrBelowFrom(v, i + 1, t);
    // The sum's error is monotonic on each side of t, so only the two neighbours can be best.
    if (i >= 0) {
      const e = t - v[i];
      if (e < bestErr) {
        bestErr = e;
        bestA = v[i];
        bestB = b;
      }
    }
    if (i + 1 < n) {
      const e = v[i + 1] - t;
      if (e < bestErr) {
        bestErr = e;
        bestA = v[i + 1];
        bestB = b;
      }
    }
  }
  // Both parts below x/2: the best of those is the largest member there, twice.
  if (j >= 0 && Math.abs(2 * v[j] - x) < bestErr) {
    bestErr = Math.abs(2 * v[j] - x);
    bestA = bestB = v[j];
  }
  if (bestErr === Infinity) return null;
  return pair(bestA, bestB, round15(bestA + bestB), x);
}

/**
 * Best a∥b, x < a ≤ b: for each smaller part a in (x, 2x] the neighbours of b = a·x/(a − x), then the pair of
 * equal parts above 2x. a ≤ x is no pair: the result is then below a, however large b is.
 */
export function bestParallel(x: number, series: SeriesName): Pair | null {
  const v = partsOf(series);
  const n = v.length;
  let i = lastAtOrBelowFrom(v, 0, x * (1 + SAME)) + 1; // first member above x
  let k = n - 1; // partner index, only ever moves down
  let bestA = 0;
  let bestB = 0;
  let bestErr = Infinity;
  const top = 2 * x * (1 + SAME);
  for (; i < n && v[i] <= top; i++) {
    const a = v[i];
    const t = (a * x) / (a - x);
    if (v[k] > t) k = lastAtOrBelowDown(v, k, t);
    // The combination is monotonic in b, so only the two neighbours of t can be best.
    if (k >= 0) {
      const b = v[k];
      const e = Math.abs((a * b) / (a + b) - x);
      if (e < bestErr) {
        bestErr = e;
        bestA = a;
        bestB = b;
      }
    }
    if (k + 1 < n) {
      const b = v[k + 1];
      const e = Math.abs((a * b) / (a + b) - x);
      if (e < bestErr) {
        bestErr = e;
        bestA = a;
        bestB = b;
      }
    }
  }
  // Both parts above 2x: the best of those is the smallest member there, twice.
  if (i < n && Math.abs(v[i] / 2 - x) < bestErr) {
    bestErr = Math.abs(v[i] / 2 - x);
    bestA = bestB = v[i];
  }
  if (bestErr === Infinity) return null;
  return pair(bestA, bestB, round15((bestA * bestB) / (bestA + bestB)), x);
}

function pair(a: number, b: number, combined: number, x: number): Pair {
  return a <= b ? { first: a, second: b, combined, error: (combined - x) / x } : { first: b, second: a, combined, error: (combined - x) / x };
}
