import { z } from "zod";

// One schema per form, imported by the form and by the route handler that receives it.
export const PASSWORD_MIN = 10;

export const email = z
  .string({ error: "Enter an e-mail address." })
  .trim()
  .toLowerCase()
  // RFC 5321 allows a path of 256 octets, so an address of at most 254 characters.
  .max(254, { error: "Use an e-mail address of at most 254 characters." })
  .pipe(z.email({ error: "That is not an e-mail address: use the form name@example.org." }));

export const newPassword = z
  .string({ error: "Enter a password." })
  .min(PASSWORD_MIN, { error: `Use at least ${PASSWORD_MIN} characters.` })
  .max(200, { error: "Use at most 200 characters." });

const personName = z.string({ error: "Enter your name." }).trim().min(1, { error: "Enter your name." }).max(100, { error: "Use at most 100 characters." });

export const SignInSchema = z.object({
  email,
  password: z.string({ error: "Enter your password." }).min(1, { error: "Enter your password." }).max(200, { error: "Use at most 200 characters." }),
});

export const SignUpSchema = z.object({ name: personName, email, password: newPassword });

export const ForgotPasswordSchema = z.object({ email });

export const ResetPasswordSchema = z.object({
  token: z
    .string({ error: "The reset link is incomplete: open the link from the e-mail again." })
    .min(20, { error: "The reset link is incomplete: open the link from the e-mail again." })
    .max(200, { error: "The reset link is not one Spanwright sent: open the link from the e-mail again." }),
  password: newPassword,
});

/** The current password is asked only when the e-mail changes. */
export const ProfileSchema = z.object({
  name: personName,
  email,
  currentPassword: z.string({ error: "Enter your current password." }).max(200, { error: "Use at most 200 characters." }).optional(),
});

const INCOMPLETE_CONFIRMATION = "The confirmation link is incomplete: open the link from the e-mail again.";
export const ConfirmEmailSchema = z.object({
  token: z.string({ error: INCOMPLETE_CONFIRMATION }).min(20, INCOMPLETE_CONFIRMATION).max(200, INCOMPLETE_CONFIRMATION),
});

export const ChangePasswordSchema = z.object({
  currentPassword: z
    .string({ error: "Enter your current password." })
    .min(1, { error: "Enter your current password." })
    .max(200, { error: "Use at most 200 characters." }),
  newPassword,
});
