import { z } from "zod";
import { LINE_KINDS } from "@/lib/vocabulary";

/**
 * One schema for the estimate and invoice line editors, shared by react-hook-form (zodResolver) and the
 * route handlers. Quantities and prices travel as the text a person typed ("1.5", "12.50"); the server
 * turns them into integer thousandths and minor units with the workshop's currency (lib/money).
 */

const decimal = /^\d{1,9}(\.\d{1,3})?$/;

export const lineSchema = z
  .object({
    kind: z.enum(LINE_KINDS, { error: "Choose labour, part or fee." }),
    description: z.string({ error: "Describe the line." }).trim().min(1, "Describe the line.").max(200, "Keep it under 200 characters."),
    quantity: z
      .string({ error: "Enter a quantity." })
      .trim()
      .regex(decimal, "Enter a number like 1.5 (up to three decimals).")
      .refine((q) => Number(q) > 0, "The quantity must be more than zero.")
      .refine((q) => Number(q) <= 100_000, "That quantity is too large."),
    /** Ignored for labour, which always uses the workshop's hourly rate. Blank on a part uses its unit cost. */
    unitPrice: z
      .string()
      .trim()
      .refine((p) => p === "" || decimal.test(p.replace(/,/g, "")), "Enter an amount like 12.50.")
      .optional(),
    partId: z.number().int().positive().nullable().optional(),
  })
  .superRefine((line, ctx) => {
    if (line.kind === "part" && !line.partId) ctx.addIssue({ code: "custom", path: ["partId"], message: "Pick the part from the job's Parts list." });
    if (line.kind === "fee" && !line.unitPrice) ctx.addIssue({ code: "custom", path: ["unitPrice"], message: "Enter the fee." });
  });

export const linesSchema = z.object({
  lines: z.array(lineSchema, { error: "Send a list of lines." }).max(100, "An estimate holds at most 100 lines."),
});
export type LinesInput = z.input<typeof linesSchema>;
export type LinesValues = z.output<typeof linesSchema>;

export const answerSchema = z.object({
  token: z.string({ error: "The link is missing its token." }).min(20, "The link is not complete.").max(200, "The link is not valid."),
  decision: z.enum(["approve", "decline"], { error: "Choose approve or decline." }),
  note: z.string().trim().max(1000, "Keep the note under 1000 characters.").optional(),
});
export type AnswerInput = z.input<typeof answerSchema>;

export const issueInvoiceSchema = z.object({
  /** The lines to invoice; left out, the approved estimate's lines are copied. */
  lines: linesSchema.shape.lines.min(1, "An invoice needs at least one line.").optional(),
});
