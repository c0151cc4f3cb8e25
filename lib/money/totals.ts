/**
 * The money rules of Glowbench (DEVELOPERS.md, "Money"):
 * - amounts are integers of the currency's minor unit; quantities are integer thousandths;
 * - a line's amount is quantityMilli × unitPriceMinor / 1000, rounded once per line, half away from zero;
 * - the subtotal is the sum of the rounded lines;
 * - tax is subtotal × taxRateBp / 10 000, rounded once on the subtotal, half away from zero;
 * - the total is subtotal + tax.
 * Products are taken in BigInt so no intermediate value ever loses precision.
 */

export interface PricedLine {
  quantityMilli: number;
  unitPriceMinor: number;
}

/** n / d rounded to the nearest integer, halves away from zero (d > 0). */
export function divideRoundHalfAwayFromZero(n: bigint, d: bigint): bigint {
  if (d <= 0n) throw new RangeError("The divisor must be positive.");
  const magnitude = (2n * (n < 0n ? -n : n) + d) / (2n * d);
  return n < 0n ? -magnitude : magnitude;
}

function toSafeNumber(value: bigint, what: string): number {
  if (value > BigInt(Number.MAX_SAFE_INTEGER) || value < BigInt(Number.MIN_SAFE_INTEGER)) {
    throw new RangeError(`${what} is too large to hold exactly.`);
  }
  return Number(value);
}

export function lineAmountMinor(line: PricedLine): number {
  if (!Number.isSafeInteger(line.quantityMilli) || !Number.isSafeInteger(line.unitPriceMinor)) {
    throw new RangeError("Quantities and prices must be whole thousandths and whole minor units.");
  }
  const amount = divideRoundHalfAwayFromZero(BigInt(line.quantityMilli) * BigInt(line.unitPriceMinor), 1000n);
  return toSafeNumber(amount, "A line amount");
}

export function taxMinor(subtotalMinor: number, taxRateBp: number): number {
  if (!Number.isSafeInteger(taxRateBp) || taxRateBp < 0) throw new RangeError("The tax rate must be whole basis points.");
  return toSafeNumber(divideRoundHalfAwayFromZero(BigInt(subtotalMinor) * BigInt(taxRateBp), 10_000n), "The tax");
}

export interface Totals {
  lines: number[];
  subtotalMinor: number;
  taxMinor: number;
  totalMinor: number;
}

export function computeTotals(lines: readonly PricedLine[], taxRateBp: number): Totals {
  const amounts = lines.map(lineAmountMinor);
  const subtotal = amounts.reduce((sum, a) => sum + a, 0);
  if (!Number.isSafeInteger(subtotal)) throw new RangeError("The subtotal is too large to hold exactly.");
  const tax = taxMinor(subtotal, taxRateBp);
  return { lines: amounts, subtotalMinor: subtotal, taxMinor: tax, totalMinor: subtotal + tax };
}

/** "20%" for 2000 bp, "17.5%" for 1750. */
export function formatTaxRate(taxRateBp: number): string {
  return `${(taxRateBp / 100).toFixed(2).replace(/\.?0+$/, "")}%`;
}
