// Builds and sends one password-reset message on the configured base URL.
import "server-only";
import { env } from "@/lib/env";
import { resetMessage } from "./reset-message";
import { trySendMail } from "./transport";

export function sendReset(input: { email: string; name: string; token: string; expiresAt: Date }) {
  return trySendMail(input.email, resetMessage({ baseUrl: env.APP_BASE_URL, ...input }));
}
