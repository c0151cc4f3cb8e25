import { z } from "zod";
import { formatMoney, isCurrency, minorExponent, parseMoney, toDecimalString } from "@/lib/money";

/**
 * A workshop's charges: currency, hourly labour rate and tax rate. Shared by the Charges form on /workshop
 * (zodResolver) and PATCH /api/workshop/charges (safeParse). People type text ("45.00", "17.5"); the output is
 * integers only — minor units and basis points — so no amount ever passes through a float.
 */

/** The currencies offered, with names in our own words. Each must also be one Intl knows (isCurrency). */
export const CHARGE_CURRENCIES = [
  { value: "GBP", label: "GBP · pound sterling" },
  { value: "EUR", label: "EUR · euro" },
  { value: "USD", label: "USD · US dollar" },
  { value: "CAD", label: "CAD · Canadian dollar" },
  { value: "AUD", label: "AUD · Australian dollar" },
  { value: "NZD", label: "NZD · New Zealand dollar" },
  { value: "JPY", label: "JPY · Japanese yen" },
  { value: "CHF", label: "CHF · Swiss franc" },
  { value: "SEK", label: "SEK · Swedish krona" },
  { value: "NOK", label: "NOK · Norwegian krone" },
  { value: "DKK", label: "DKK · Danish krone" },
] as const;
const CODES: readonly string[] = CHARGE_CURRENCIES.map((c) => c.value);

/** No bench charges more than this many whole units an hour; anything above is a typing slip. */
export const MAX_HOURLY_RATE_UNITS = 100_000;
export const maxHourlyRateMinor = (currency: string) => MAX_HOURLY_RATE_UNITS * 10 ** minorExponent(currency);

const AMOUNT_TEXT = /^\d[\d,]*(\.\d*)?$/;
/** 0–100 with at most two decimals, an optional "%" after it: "20", "7.5", "17.50 %". */
const PERCENT_TEXT = /^(\d{1,3})(?:\.(\d{1,2}))?\s*%?$/;

/** "7.5" → 750 basis points; null when it is not a plain percentage of at most two decimals. */
export function parsePercentBp(text: string): number | null {
  const match = PERCENT_TEXT.exec(text.trim());
  if (!match) return null;
  return Number(match[1] + (match[2] ?? "").padEnd(2, "0"));
}

/** 750 → "7.5", 2000 → "20", 0 → "0": what the form shows for a stored rate. */
export const bpToPercentText = (bp: number) => toDecimalString(bp, 2).replace(/\.?0+$/, "");

export const chargesSchema = z
  .object({
    currency: z
      .string({ error: "Choose the workshop's currency." })
      .trim()
      .toUpperCase()
      .refine((c) => CODES.includes(c) && isCurrency(c), `Choose one of ${CODES.join(", ")}.`),
    hourlyRate: z
      .string({ error: "Enter the hourly rate, like 45.00." })
      .trim()
      .min(1, "Enter the hourly rate, like 45.00 (0 if you do not charge labour by the hour).")
      .refine((s) => AMOUNT_TEXT.test(s), "Enter the hourly rate as a plain amount of 0 or more, like 45.00."),
    taxRate: z
      .string({ error: "Enter the tax rate as a percentage, like 20." })
      .trim()
      .min(1, "Enter the tax rate as a percentage, like 20 (0 if you charge none).")
      .refine((s) => PERCENT_TEXT.test(s), "Enter the tax rate as a percentage with at most two decimals, like 20 or 7.5.")
      .refine((s) => (parsePercentBp(s) ?? 0) <= 10_000, "The tax rate can be at most 100%."),
  })
  // The rate's decimals depend on the currency, so it is checked once both are known.
  // Zod still runs this when a field failed its own refinement, so it looks only at a known currency and an amount-shaped rate.
  .superRefine((v, ctx) => {
    if (typeof v.currency !== "string" || !CODES.includes(v.currency) || typeof v.hourlyRate !== "string" || !AMOUNT_TEXT.test(v.hourlyRate)) return;
    const minor = parseMoney(v.hourlyRate, v.currency);
    if (minor === null) {
      const places = minorExponent(v.currency);
      ctx.addIssue({
        code: "custom",
        path: ["hourlyRate"],
        message: places
          ? `Use at most ${places} decimals for ${v.currency}, like 45.${"0".repeat(places)}.`
          : `${v.currency} has no decimals; enter a whole amount, like 6000.`,
      });
    } else if (minor > maxHourlyRateMinor(v.currency)) {
      ctx.addIssue({
        code: "custom",
        path: ["hourlyRate"],
        message: `Keep the hourly rate at or under ${formatMoney(maxHourlyRateMinor(v.currency), v.currency)}.`,
      });
    }
  })
  .transform((v) => ({ currency: v.currency, hourlyRateMinor: parseMoney(v.hourlyRate, v.currency)!, taxRateBp: parsePercentBp(v.taxRate)! }));

export type ChargesForm = z.input<typeof chargesSchema>;
export type ChargesInput = z.output<typeof chargesSchema>;
