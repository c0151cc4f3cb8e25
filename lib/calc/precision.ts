/**
 * Fast, exact stand-ins for Number.prototype.toPrecision and for rounding to 15 significant
 * figures. The native calls cost 80–180 ns each and dominated several computes' benchmark; these
 * take the common case with a few multiplications and hand every doubtful one to the native call,
 * so the result is always the native one (tests/unit/precision.test.ts checks that).
 *
 * Why it is exact: for the cases taken, 10^k is an exact double (k ≤ 22, the table below), and the
 * rounding error of x·10^k is far smaller than the margin demanded from a tie (x.5), so rounding
 * the computed product gives the same integer as rounding the exact product — the integer the
 * ECMAScript algorithm for toPrecision picks.
 */

/** 1e0 … 1e22, each parsed from its literal, so each is exact. */
const POW10: readonly number[] = Array.from({ length: 23 }, (_, k) => Number(`1e${k}`));

/** Exactly `x.toPrecision(p)`. */
export function toPrecision(x: number, p: number): string {
  const a = x < 0 ? -x : x;
  // Fast path: 1 ≤ |x| < 10^p with p ≤ 9, so no exponent form and the product stays below 1e9.
  if (p >= 1 && p <= 9 && (p | 0) === p && a >= 1 && a < POW10[p]) {
    let e = 0; // decimal exponent of a, by comparison (no log10, no off-by-one)
    while (a >= POW10[e + 1]) e++;
    const k = p - 1 - e;
    const y = a * POW10[k];
    const frac = y - Math.floor(y);
    const n = Math.round(y);
    // Half an ulp of y is below 1e-7 here; a fraction within 1e-6 of a tie goes to the native call.
    if ((frac < 0.499999 || frac > 0.500001) && n < POW10[p]) {
      const digits = String(n); // exactly p digits: y ≥ 10^(p−1) and n < 10^p
      const s = k === 0 ? digits : `${digits.slice(0, e + 1)}.${digits.slice(e + 1)}`;
      return x < 0 ? `-${s}` : s;
    }
  }
  return x.toPrecision(p);
}

/** Exactly `Number(x.toPrecision(15))`. */
export function round15(x: number): number {
  const a = x < 0 ? -x : x;
  if (a >= 1e-8 && a < 1e15) {
    const k = 14 - Math.floor(Math.log10(a));
    if (k >= 0 && k <= 22) {
      const y = a * POW10[k];
      // Half an ulp of y is at most 0.0625 below 1e15; stay clear of ties by more than that.
      const frac = y - Math.floor(y);
      const n = Math.round(y);
      if (y > 1e14 && y < 1e15 - 1 && (frac < 0.42 || frac > 0.58)) {
        // n/10^k and the parsed 15-figure decimal are the same real number, rounded the same way.
        const r = n / POW10[k];
        return x < 0 ? -r : r;
      }
    }
  }
  return Number(x.toPrecision(15));
}
