import { z } from "zod";

/** Small zod building blocks shared by the job, part, reading and log schemas. */

/** Optional free text: blank becomes null (cleared), an absent key stays undefined (untouched on PATCH). */
export function optionalText(max: number, label: string) {
  return z
    .string({ error: `${label} must be text.` })
    .trim()
    .max(max, `Keep ${label.toLowerCase()} under ${max} characters.`)
    .nullable()
    .optional()
    .transform((v) => (v === undefined ? undefined : v ? v : null));
}

export function requiredText(max: number, label: string, missing: string) {
  return z.string({ error: missing }).trim().min(1, missing).max(max, `Keep ${label.toLowerCase()} under ${max} characters.`);
}

/** URLSearchParams give "" for an empty parameter; treat it as absent. */
export const blankToUndefined = (v: unknown) => (v === "" ? undefined : v);
