// Builds and sends the sign-up messages on the configured base URL.
import "server-only";
import { env } from "@/lib/env";
import { signUpConfirmMessage, signUpExistingMessage } from "./sign-up-message";
import { trySendMail } from "./transport";

export function sendSignUpConfirm(input: { email: string; token: string; name: string; programName: string; expiresAt: Date }) {
  return trySendMail(input.email, signUpConfirmMessage({ baseUrl: env.APP_BASE_URL, ...input }));
}

export function sendSignUpExisting(input: { email: string; name: string }) {
  return trySendMail(input.email, signUpExistingMessage({ baseUrl: env.APP_BASE_URL, name: input.name }));
}
