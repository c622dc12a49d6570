// Single-use links (invitations, password resets, sign-up confirmations): a random token for the e-mail, only its SHA-256 kept.
import { hashToken, newToken } from "./token";

export const INVITATION_LIFETIME_MS = 7 * 24 * 60 * 60 * 1000;
export const RESET_LIFETIME_MS = 60 * 60 * 1000;
export const SIGN_UP_LIFETIME_MS = 24 * 60 * 60 * 1000;

/** A fresh token, the hash to store and when it stops working. */
export function issueLinkToken(lifetimeMs: number, now = new Date()) {
  const token = newToken();
  return { token, tokenHash: hashToken(token), expiresAt: new Date(now.getTime() + lifetimeMs) };
}

/** Tokens arrive in URLs: anything that is not base64url of the right length is unknown without a lookup. */
export function linkTokenHash(token: string): string | null {
  return /^[A-Za-z0-9_-]{43}$/.test(token) ? hashToken(token) : null;
}

export type LinkState = "open" | "used" | "revoked" | "expired";

export function linkState(link: { usedAt: Date | null; revokedAt?: Date | null; expiresAt: Date }, now = new Date()): LinkState {
  if (link.usedAt) return "used";
  if (link.revokedAt) return "revoked";
  return link.expiresAt.getTime() <= now.getTime() ? "expired" : "open";
}

export const CLOSED_INVITATION_WORDS: Record<Exclude<LinkState, "open">, string> = {
  used: "This invitation has already been used. Sign in to reach the program.",
  revoked: "This invitation was withdrawn. Ask the director for a new one.",
  expired: "This invitation has expired. Ask the director to send it again.",
};
