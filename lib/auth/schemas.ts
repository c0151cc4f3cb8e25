import { z } from "zod";

/** Shared by the sign-in/sign-up forms (zodResolver) and their route handlers (safeParse). Browser-safe: no node imports. */

/** NIST SP 800-63B allows 8; we ask 12 and check guessability on the server (lib/auth/strength.ts). */
export const PASSWORD_MIN = 12;
export const PASSWORD_MAX = 128;

export const emailField = z
  .string({ error: "Enter your e-mail address." })
  .trim()
  .min(1, "Enter your e-mail address.")
  .max(254, "That e-mail address is too long.")
  .email("Enter a valid e-mail address, like name@example.com.")
  .transform((s) => s.toLowerCase());

export const newPasswordField = z
  .string({ error: "Choose a password." })
  .min(PASSWORD_MIN, `Use at least ${PASSWORD_MIN} characters; a few words in a row make a good passphrase.`)
  .max(PASSWORD_MAX, `Use at most ${PASSWORD_MAX} characters.`);

export const signInSchema = z.object({
  email: emailField,
  password: z.string({ error: "Enter your password." }).min(1, "Enter your password.").max(PASSWORD_MAX, "That password is too long."),
});
export type SignInInput = z.input<typeof signInSchema>;

export const signUpSchema = z.object({
  workshopName: z
    .string({ error: "Name your workshop." })
    .trim()
    .min(2, "Name your workshop (2 characters or more).")
    .max(80, "Keep the workshop name under 80 characters."),
  name: z.string({ error: "Enter your name." }).trim().min(1, "Enter your name.").max(80, "Keep your name under 80 characters."),
  email: emailField,
  password: newPasswordField,
});
export type SignUpInput = z.input<typeof signUpSchema>;

/** Changing one's password: the current one proves it is really them, not someone at an unlocked screen. */
export const changePasswordSchema = z.object({
  currentPassword: z.string({ error: "Enter your current password." }).min(1, "Enter your current password.").max(PASSWORD_MAX, "That password is too long."),
  newPassword: newPasswordField,
});
export type ChangePasswordInput = z.input<typeof changePasswordSchema>;

/** The words under every new-password field. */
export const NEW_PASSWORD_HINT = `At least ${PASSWORD_MIN} characters. A few unrelated words are easier to remember than a short jumble, and harder to guess.`;
