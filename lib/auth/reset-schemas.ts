import { z } from "zod";
import { emailField, newPasswordField } from "./schemas";

/** Password reset by e-mail: the request form and the new-password form, client and server. */

export const resetRequestSchema = z.object({ email: emailField });
export type ResetRequestForm = z.input<typeof resetRequestSchema>;

export const newPasswordFormSchema = z
  .object({ password: newPasswordField, confirm: z.string() })
  .refine((v) => v.password === v.confirm, { path: ["confirm"], message: "The two passwords differ; type the same one twice." });
export type NewPasswordForm = z.input<typeof newPasswordFormSchema>;

export const resetPasswordSchema = z.object({
  token: z.string({ error: "The link is incomplete." }).regex(/^[A-Za-z0-9_-]{32,64}$/, "The link is incomplete; open it again from the e-mail."),
  password: newPasswordField,
});

/** The one answer to every well-formed request, whether or not the address has an account. */
export const RESET_ANSWER = "If that address has a Glowbench account, a link to set a new password is on its way. It works for an hour.";
