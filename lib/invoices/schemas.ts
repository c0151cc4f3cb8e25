import { z } from "zod";

/** The owner's "send the invoice" form and the customer's pay request, shared by the form and the routes. */

export const sendInvoiceSchema = z.object({
  /** A few words of the owner's own, put at the top of the e-mail. */
  note: z.string({ error: "Write the note as text." }).trim().max(1000, "Keep the note under 1000 characters.").optional(),
});
export type SendInvoiceInput = z.input<typeof sendInvoiceSchema>;

/** The token from the e-mailed link is the only credential; its length is checked before any lookup. */
export const payLinkSchema = z.object({
  token: z.string({ error: "The link is missing its token." }).min(20, "The link is not complete.").max(200, "The link is not valid."),
});
