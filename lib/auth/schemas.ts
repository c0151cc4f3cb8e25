import { z } from "zod";

/** Shared by the sign-in/sign-up forms (zodResolver) and their route handlers (safeParse). Browser-safe: no node imports. */

export const PASSWORD_MIN = 8;
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
  .min(PASSWORD_MIN, `Use at least ${PASSWORD_MIN} characters.`)
  .max(PASSWORD_MAX, `Use at most ${PASSWORD_MAX} characters.`);

export const signInSchema = z.object({
  email: emailField,
  password: z.string({ error: "Enter your password." }).min(1, "Enter your password.").max(PASSWORD_MAX, "That password is too long."),
});
export type SignInInput = z.input<typeof signInSchema>;

export const signUpSchema = z.object({
  workshopName: z.string({ error: "Name your workshop." }).trim().min(2, "Name your workshop (2 characters or more).").max(80, "Keep the workshop name under 80 characters."),
  name: z.string({ error: "Enter your name." }).trim().min(1, "Enter your name.").max(80, "Keep your name under 80 characters."),
  email: emailField,
  password: newPasswordField,
});
export type SignUpInput = z.input<typeof signUpSchema>;
