import { z } from "zod";

// Shared by the forms in the browser and the route handlers, so both say the same thing.
export const email = z
  .string({ error: "Enter your e-mail address." })
  .trim()
  .min(1, "Enter your e-mail address.")
  .max(254, "An e-mail address has at most 254 characters.")
  .pipe(z.email({ error: "Enter a valid e-mail address, like name@example.org." }))
  .transform((value) => value.toLowerCase());

export const newPassword = z
  .string({ error: "Choose a password." })
  .min(10, "Use at least 10 characters.")
  .max(200, "Use at most 200 characters.");

const currentPassword = z
  .string({ error: "Enter your password." })
  .min(1, "Enter your password.")
  .max(200, "Use at most 200 characters.");

const token = z
  .string({ error: "The link is missing its code." })
  .min(16, "The link is incomplete.")
  .max(128, "The link is not valid.");

export const signUpBody = z.object({ email, password: newPassword });
export const signInBody = z.object({ email, password: currentPassword });
export const emailOnlyBody = z.object({ email });
export const verifyEmailBody = z.object({ token });
export const resetPasswordBody = z.object({ token, password: newPassword });

export type SignUpBody = z.input<typeof signUpBody>;
export type SignInBody = z.input<typeof signInBody>;
export type EmailOnlyBody = z.input<typeof emailOnlyBody>;
export type ResetPasswordBody = z.input<typeof resetPasswordBody>;
