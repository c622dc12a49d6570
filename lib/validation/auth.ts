// Sign-in and sign-up input, shared by the forms and the route handlers.
import { z } from "./zod";
import { MIN_PASSWORD_LENGTH, weakPasswordReason } from "@/lib/auth/password-rules";

const email = z
  .string()
  .trim()
  .toLowerCase()
  .max(254, "That e-mail address is too long.")
  .email("Enter a valid e-mail address.");

/** Any password a person chooses (sign-up, reset, invitation): long enough and hard to guess. */
export const newPassword = z
  .string()
  .min(MIN_PASSWORD_LENGTH, `Use at least ${MIN_PASSWORD_LENGTH} characters.`)
  .max(200, "That password is too long.")
  .superRefine((password, ctx) => {
    if (password.length < MIN_PASSWORD_LENGTH || password.length > 200) return;
    const reason = weakPasswordReason(password);
    if (reason) ctx.addIssue({ code: "custom", message: reason });
  });

export const signInSchema = z.object({
  email,
  password: z.string().min(1, "Enter your password.").max(200, "That password is too long."),
});

export const signUpSchema = z.object({
  name: z.string().trim().min(1, "Enter your name.").max(120, "That name is too long."),
  email,
  password: newPassword,
  programName: z.string().trim().min(1, "Name your band program.").max(160, "That name is too long."),
});

/** The link of the sign-up message, sent back to create the account. */
export const signUpConfirmSchema = z.object({ token: z.string().min(1).max(200) });

export type SignInInput = z.infer<typeof signInSchema>;
export type SignUpInput = z.infer<typeof signUpSchema>;
