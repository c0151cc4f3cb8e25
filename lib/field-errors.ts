import type { z } from "zod";

/** Zod issues → `{ fieldName: message }`, first message per field, all fields (docs/PRODUCT.md's error shape). */
export function fieldErrors(error: z.ZodError): Record<string, string> {
  const fields: Record<string, string> = {};
  for (const issue of error.issues) {
    const key = issue.path.length ? issue.path.map(String).join(".") : "_";
    fields[key] ??= issue.message;
  }
  return fields;
}
