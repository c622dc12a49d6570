// Members, invitations and password resets: input shared by the forms and the route handlers.
import { z } from "./zod";
import { newPassword } from "./auth";
import type { Role } from "@/lib/auth/permissions";

const email = z.string().trim().toLowerCase().max(254, "That e-mail address is too long.").email("Enter a valid e-mail address.");
const role = z.enum(["director", "designer", "staff"] satisfies Role[], { error: "Choose director, designer or staff." });

export const inviteSchema = z.object({ email, role });
export const roleChangeSchema = z.object({ role });

/** A new person gives a name and a password; someone with an account gives its password (or is signed in). */
export const acceptInvitationSchema = z.object({
  name: z.string().trim().min(1, "Enter your name.").max(120, "That name is too long.").optional(),
  password: z.string().min(1, "Enter a password.").max(200, "That password is too long.").optional(),
});
export const newAccountPassword = newPassword;

export const resetRequestSchema = z.object({ email });
export const resetConfirmSchema = z.object({ token: z.string().min(1).max(200), password: newPassword });

export type InviteInput = z.infer<typeof inviteSchema>;
