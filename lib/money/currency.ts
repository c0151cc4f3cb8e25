/**
 * Currencies as ISO 4217 codes, with their minor-unit exponent (GBP 2, JPY 0, KWD 3) taken from
 * Intl.NumberFormat's resolvedOptions, which follows the ISO 4217 / CLDR minor-unit table.
 * Amounts are always integers of the minor unit; these helpers only convert at the edges.
 */

const ISO_CODE = /^[A-Z]{3}$/;

function supportedCurrencies(): Set<string> | null {
  const intl = Intl as unknown as { supportedValuesOf?: (key: string) => string[] };
  return intl.supportedValuesOf ? new Set(intl.supportedValuesOf("currency")) : null;
}
const SUPPORTED = supportedCurrencies();

export function isCurrency(code: string): boolean {
  return ISO_CODE.test(code) && (SUPPORTED ? SUPPORTED.has(code) : true);
}

/** Digits after the decimal point in the currency's minor unit (ISO 4217). */
export function minorExponent(currency: string): number {
  return new Intl.NumberFormat("en", { style: "currency", currency }).resolvedOptions().maximumFractionDigits ?? 2;
}

/** Exact decimal text of a minor-unit amount: (12345, 2) → "123.45"; no floating point involved. */
export function toDecimalString(minor: number, exponent: number): string {
  const negative = minor < 0;
  const digits = String(Math.abs(minor)).padStart(exponent + 1, "0");
  const whole = exponent ? digits.slice(0, -exponent) : digits;
  const fraction = exponent ? `.${digits.slice(-exponent)}` : "";
  return `${negative ? "-" : ""}${whole}${fraction}`;
}

/** "£1,234.50" for (123450, "GBP"). Intl formats the exact decimal string, so nothing is rounded. */
export function formatMoney(minor: number, currency: string, locale = "en-GB"): string {
  const exponent = minorExponent(currency);
  const format = new Intl.NumberFormat(locale, { style: "currency", currency, minimumFractionDigits: exponent });
  return format.format(toDecimalString(minor, exponent) as unknown as number);
}

/**
 * Parse what a person types ("12", "12.5", "12.50", "1,250.00") into minor units of the currency.
 * Returns null when it is not a plain non-negative amount or has more decimals than the currency has.
 */
export function parseMoney(text: string, currency: string): number | null {
  const exponent = minorExponent(currency);
  const cleaned = text.trim().replace(/,/g, "");
  const match = /^(\d+)(?:\.(\d*))?$/.exec(cleaned);
  if (!match) return null;
  const fraction = match[2] ?? "";
  if (fraction.length > exponent) return null;
  const minor = Number(match[1] + fraction.padEnd(exponent, "0"));
  return Number.isSafeInteger(minor) ? minor : null;
}

/** Quantities are thousandths (1.5 h → 1500): parse "1.5" exactly, at most three decimals. */
export function parseQuantityMilli(text: string): number | null {
  const match = /^(\d+)(?:\.(\d{0,3}))?$/.exec(text.trim());
  if (!match) return null;
  const milli = Number(match[1] + (match[2] ?? "").padEnd(3, "0"));
  return Number.isSafeInteger(milli) ? milli : null;
}

/** 1500 → "1.5", 1000 → "1", 250 → "0.25". */
export function formatQuantity(milli: number): string {
  return toDecimalString(milli, 3).replace(/\.?0+$/, "");
}
