// Password rules shared by the browser forms and the server (no hashing code here, so the browser can import it).
import { ZxcvbnFactory } from "@zxcvbn-ts/core";
import { adjacencyGraphs, dictionary as commonDictionary } from "@zxcvbn-ts/language-common";
import { dictionary as englishDictionary, translations } from "@zxcvbn-ts/language-en";

export const MIN_PASSWORD_LENGTH = 10;

/**
 * zxcvbn's score 3 of 4, "safely unguessable": at least 10^8 guesses, far beyond what the sign-in
 * limits let anyone try online (zxcvbn-ts 4.2.0, scoring documentation).
 */
export const MIN_PASSWORD_SCORE = 3;

let estimator: ZxcvbnFactory | null = null; // built on first use: loading the word lists takes a moment

// Unbounded, the l33t matcher takes seconds on 16 characters like "a1a1…" or "p4$$w0rd…" (measured with
// zxcvbn-ts 4.2.0); 8 substitutions and the first 64 characters keep every check well under a second.
const LIMITS = { l33tMaxSubstitutions: 8, maxLength: 64 };

/** Why `password` is too easy to guess, in words for the person choosing it; null when it is strong enough. */
export function weakPasswordReason(password: string): string | null {
  estimator ??= new ZxcvbnFactory({ translations, graphs: adjacencyGraphs, dictionary: { ...commonDictionary, ...englishDictionary }, ...LIMITS });
  const { score, feedback } = estimator.check(password);
  if (score >= MIN_PASSWORD_SCORE) return null;
  const advice = [feedback.warning, ...feedback.suggestions].filter(Boolean).join(" ");
  return `This password is too easy to guess.${advice ? ` ${advice}` : ""} A few unrelated words together make a strong one.`;
}
