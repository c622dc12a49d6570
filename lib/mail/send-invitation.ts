// Builds and sends one invitation message on the configured base URL.
import "server-only";
import { env } from "@/lib/env";
import type { Role } from "@/lib/auth/permissions";
import { invitationMessage } from "./invitation-message";
import { trySendMail } from "./transport";

export function sendInvitation(input: { email: string; token: string; programName: string; role: Role; inviterName: string; expiresAt: Date }) {
  return trySendMail(input.email, invitationMessage({ baseUrl: env.APP_BASE_URL, ...input }));
}
