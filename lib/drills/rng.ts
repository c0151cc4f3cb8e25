import { SERIES, type SeriesName } from "../calc/tables/preferred-values";

/**
 * A small seeded random source, so a drill is fully described by its kind and a 32-bit seed: the
 * server can store the seed and regenerate the same problem (and its answer) later, and tests repeat.
 * mulberry32 (a public-domain 32-bit generator): fast, and plenty for choosing bench figures.
 */
export interface Rng {
  /** Uniform in [0, 1). */
  next(): number;
  /** Whole number in [lo, hi], both included. */
  int(lo: number, hi: number): number;
  pick<T>(list: readonly T[]): T;
  /** True with probability p. */
  chance(p: number): boolean;
  /** A member of an IEC 60063 series between lo and hi (both included), chosen evenly among the members. */
  preferred(series: SeriesName, lo: number, hi: number): number;
}

/** murmur3's final mix: neighbouring seeds (1, 2, 3 …) start far apart, which mulberry32 alone does not give. */
function mix(h: number): number {
  h = Math.imul(h ^ (h >>> 16), 0x85ebca6b);
  h = Math.imul(h ^ (h >>> 13), 0xc2b2ae35);
  return (h ^ (h >>> 16)) >>> 0;
}

export function createRng(seed: number): Rng {
  let a = mix(seed >>> 0);
  const next = () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
  const int = (lo: number, hi: number) => lo + Math.floor(next() * (hi - lo + 1));
  const pick = <T>(list: readonly T[]): T => {
    if (list.length === 0) throw new RangeError("Cannot pick from an empty list");
    return list[int(0, list.length - 1)];
  };
  return {
    next,
    int,
    pick,
    chance: (p) => next() < p,
    preferred: (series, lo, hi) => pick(seriesBetween(series, lo, hi)),
  };
}

/** Series members in [lo, hi], ascending, without binary noise (4.7 × 10³ is 4700). */
export function seriesBetween(series: SeriesName, lo: number, hi: number): number[] {
  const out: number[] = [];
  for (let d = Math.floor(Math.log10(lo)); d <= Math.ceil(Math.log10(hi)); d++) {
    for (const m of SERIES[series]) {
      const v = Number((m * 10 ** d).toPrecision(12));
      if (v >= lo * (1 - 1e-9) && v <= hi * (1 + 1e-9)) out.push(v);
    }
  }
  if (out.length === 0) throw new RangeError(`No ${series} member between ${lo} and ${hi}`);
  return out;
}

/** A fresh seed for a new drill: crypto where there is one (browser and Node both have it). */
export function newSeed(): number {
  const c = globalThis.crypto;
  if (c?.getRandomValues) return c.getRandomValues(new Uint32Array(1))[0];
  return Math.floor(Math.random() * 4294967296);
}

/** The seed of "try a similar one": another problem of the same kind, never the same seed. */
export function similarSeed(seed: number): number {
  const next = newSeed();
  return next === seed >>> 0 ? (next + 1) >>> 0 : next;
}
