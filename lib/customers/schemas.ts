import { z } from "zod";
import { blankToUndefined, optionalText, requiredText } from "@/lib/jobs/fields";

/** One schema per customer form, used by react-hook-form (zodResolver) and the routes (safeParse). */

export const customerEmailField = optionalText(254, "E-mail").refine(
  (v) => v == null || z.email().safeParse(v).success,
  "Enter a valid e-mail address, like name@example.com, or leave it blank.",
);

export const customerFields = {
  name: requiredText(120, "The name", "Give the customer's name."),
  email: customerEmailField,
  phone: optionalText(40, "Phone").refine(
    (v) => v == null || /^[+\d][\d\s().-]{3,}$/.test(v),
    "Enter a phone number of digits, spaces and + ( ) - only, or leave it blank.",
  ),
  address: optionalText(400, "Address"),
  notes: optionalText(4000, "Notes"),
};

export const customerSchema = z.object(customerFields);
export type CustomerInput = z.input<typeof customerSchema>;
export type CustomerValues = z.output<typeof customerSchema>;

/** PATCH: any subset; an absent key is left as it is. */
export const customerUpdateSchema = z
  .object({ ...customerFields, name: customerFields.name.optional() })
  .refine((v) => Object.values(v).some((x) => x !== undefined), { message: "Send at least one field to change." });
export type CustomerUpdate = z.output<typeof customerUpdateSchema>;

/** GET /api/customers: an optional search over name, e-mail and phone. */
export const customerListQuerySchema = z.object({
  q: z.preprocess(blankToUndefined, z.string().trim().max(100, "Keep the search under 100 characters").optional()),
});
