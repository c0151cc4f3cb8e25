import { z } from "zod";
import { requiredText } from "./fields";

/** Marking a supplier's group ordered: the parts on the list the member saw (and sent to the supplier), no others. */
export const markOrderedSchema = z.object({
  supplier: requiredText(80, "The supplier", "Name the supplier whose parts were ordered."),
  partIds: z
    .array(z.number({ error: "Each part id must be a number." }).int("Each part id must be a whole number.").positive("Each part id must be positive."), {
      error: "Send the ids of the parts ordered.",
    })
    .min(1, "Send the ids of the parts ordered.")
    .max(500, "Mark at most 500 parts at a time."),
});
export type MarkOrdered = z.output<typeof markOrderedSchema>;

/** GET /api/orders/csv: one supplier's rows, or every supplier's without it. */
export const orderCsvQuerySchema = z.object({
  supplier: z.string().trim().max(80, "Keep the supplier under 80 characters.").optional(),
});
