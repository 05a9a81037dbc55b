/**
 * Form schemas for signing up, signing in and resetting a password. Usable on both sides: the
 * actions parse FormData through them, and the forms mirror their limits in HTML attributes.
 */
import { z } from "zod";

/** Fewest characters in a password: long enough to resist guessing, short enough to type. */
export const PASSWORD_MIN_LENGTH = 10;
/** bcrypt reads only the first 72 bytes of a password; longer ones are refused, not cut short. */
export const PASSWORD_MAX_BYTES = 72;
export const NAME_MAX_LENGTH = 80;

const utf8 = new TextEncoder();

/** An e-mail address, trimmed and lower-cased (accounts are keyed by the normalised address). */
export const emailField = z
  .string({ error: "Enter your e-mail address." })
  .trim()
  .toLowerCase()
  .min(1, { error: "Enter your e-mail address." })
  .max(254, { error: "The e-mail address is too long (at most 254 characters)." })
  .pipe(z.email({ error: "Enter a valid e-mail address, like name@example.org." }));

/** A new password: at least 10 characters and at most 72 bytes. */
export const newPasswordField = z
  .string({ error: "Choose a password." })
  .min(PASSWORD_MIN_LENGTH, {
    error: `The password must be at least ${PASSWORD_MIN_LENGTH} characters long.`,
  })
  .refine((p) => utf8.encode(p).length <= PASSWORD_MAX_BYTES, {
    error: `The password is too long (at most ${PASSWORD_MAX_BYTES} bytes; accented letters count as two).`,
  })
  .refine((p) => p.trim().length > 0, { error: "The password cannot be only spaces." });

const confirmField = z
  .string({ error: "Type the password again." })
  .min(1, { error: "Type the password again." });

/** Where to go after signing in or up; checked again by safeRedirect before use. */
const redirectToField = z.string().max(500).optional();

/** Both passwords must match; the error shows beside the second one. */
function passwordsMatch(v: { password: string; confirm: string }) {
  return v.password === v.confirm;
}
const mismatch = { error: "The two passwords do not match.", path: ["confirm"] };

export const signUpSchema = z
  .object({
    name: z
      .string({ error: "Enter your name." })
      .trim()
      .min(1, { error: "Enter your name." })
      .max(NAME_MAX_LENGTH, { error: `The name is too long (at most ${NAME_MAX_LENGTH} characters).` }),
    email: emailField,
    password: newPasswordField,
    confirm: confirmField,
    redirectTo: redirectToField,
  })
  .refine(passwordsMatch, mismatch);
export type SignUpInput = z.infer<typeof signUpSchema>;

export const signInSchema = z.object({
  email: emailField,
  // No length rule here: old passwords must still be accepted, and the rule would hint at it.
  password: z
    .string({ error: "Enter your password." })
    .min(1, { error: "Enter your password." })
    .max(1000, { error: "The password is too long." }),
  redirectTo: redirectToField,
});
export type SignInInput = z.infer<typeof signInSchema>;

export const forgotPasswordSchema = z.object({ email: emailField });
export type ForgotPasswordInput = z.infer<typeof forgotPasswordSchema>;

export const resetPasswordSchema = z
  .object({ password: newPasswordField, confirm: confirmField })
  .refine(passwordsMatch, mismatch);
export type ResetPasswordInput = z.infer<typeof resetPasswordSchema>;
