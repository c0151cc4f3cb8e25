import { z } from "zod";
import { ROLES } from "@/lib/vocabulary";
import { PASSWORD_MAX, emailField, newPasswordField } from "@/lib/auth/schemas";

/** Shared by the /workshop forms (zodResolver) and the /api/workshop route handlers (safeParse). */

/** Blank means "not set": stored as null. */
const optionalText = (max: number, message: string) =>
  z
    .string()
    .trim()
    .max(max, message)
    .transform((s) => (s === "" ? null : s));

export const workshopSettingsSchema = z.object({
  name: z
    .string({ error: "Name your workshop." })
    .trim()
    .min(2, "Name your workshop (2 characters or more).")
    .max(80, "Keep the workshop name under 80 characters."),
  contactEmail: z
    .string()
    .trim()
    .max(254, "That e-mail address is too long.")
    .refine((s) => s === "" || z.email().safeParse(s).success, "Enter a valid e-mail address, like bench@example.com.")
    .transform((s) => (s === "" ? null : s.toLowerCase())),
  contactPhone: optionalText(40, "Keep the phone number under 40 characters."),
  address: optionalText(200, "Keep the address under 200 characters."),
  readyMessageTemplate: optionalText(2000, "Keep the message under 2,000 characters."),
});
export type WorkshopSettingsForm = z.input<typeof workshopSettingsSchema>;
export type WorkshopSettingsInput = z.output<typeof workshopSettingsSchema>;

export const roleField = z.enum(ROLES, { error: "Choose owner, technician or apprentice." });

export const roleChangeSchema = z.object({ role: roleField }).strict();

export const invitationSchema = z.object({ email: emailField, role: roleField });
export type InvitationForm = z.input<typeof invitationSchema>;

const tokenField = z.string({ error: "The link is incomplete." }).regex(/^[A-Za-z0-9_-]{32,64}$/, "The link is incomplete; open it again from the e-mail.");

/** Joining: a new account (name + password), an existing one (its password), or the session already signed in as the invitee. */
export const acceptInvitationSchema = z.discriminatedUnion(
  "mode",
  [
    z.object({
      mode: z.literal("sign-up"),
      token: tokenField,
      name: z.string({ error: "Enter your name." }).trim().min(1, "Enter your name.").max(80, "Keep your name under 80 characters."),
      password: newPasswordField,
    }),
    z.object({
      mode: z.literal("sign-in"),
      token: tokenField,
      password: z.string({ error: "Enter your password." }).min(1, "Enter your password.").max(PASSWORD_MAX, "That password is too long."),
    }),
    z.object({ mode: z.literal("session"), token: tokenField }),
  ],
  { error: "Say how you are joining: sign-up, sign-in or session." },
);

export const joinNewSchema = z.object({ name: acceptInvitationSchema.options[0].shape.name, password: newPasswordField });
export type JoinNewForm = z.input<typeof joinNewSchema>;
export const joinExistingSchema = z.object({ password: acceptInvitationSchema.options[1].shape.password });
export type JoinExistingForm = z.input<typeof joinExistingSchema>;

export { tokenField };
