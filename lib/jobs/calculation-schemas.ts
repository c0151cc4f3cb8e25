import { z } from "zod";

/** Body of POST /api/jobs/[id]/calculations; the server recomputes from the inputs. */
export const calculationSaveSchema = z.object({
  slug: z.string({ error: "Say which calculator (slug)." }).trim().min(1, "Say which calculator (slug).").max(60, "Unknown calculator."),
  inputs: z.record(z.string(), z.unknown(), { error: "Send the calculator's inputs as an object." }),
  note: z
    .string({ error: "The note must be text." })
    .trim()
    .max(1000, "Keep the note under 1000 characters.")
    .nullable()
    .optional()
    .transform((v) => (v ? v : null)),
});
export type CalculationSave = z.output<typeof calculationSaveSchema>;
