// The password strength rule: zxcvbn-ts 4.2.0 (@zxcvbn-ts/core with the common and English word lists)
// scores each password 0–4; below 3 is refused with its feedback in words.
import { describe, expect, it } from "vitest";
import { weakPasswordReason } from "@/lib/auth/password-rules";
import { signUpSchema } from "@/lib/validation/auth";
import { newAccountPassword, resetConfirmSchema } from "@/lib/validation/team";

describe("password strength", () => {
  it("refuses ten letters of one repeated character, saying why", () => {
    const reason = weakPasswordReason("aaaaaaaaaa");
    expect(reason).toMatch(/^This password is too easy to guess\./);
    // zxcvbn-ts's English feedback for a repeat match (language-en 4.1.1 translations: warnings.simpleRepeat).
    expect(reason).toContain('Repeated characters like "aaa" are easy to guess.');
  });

  // Entries of zxcvbn-ts's common password list (language-common 4.1.3) and keyboard patterns.
  for (const weak of ["password123", "1234567890", "qwertyuiop", "abcabcabcabc"]) {
    it(`refuses ${weak}`, () => expect(weakPasswordReason(weak)).not.toBeNull());
  }

  for (const strong of ["lantern-light-2030", "copper tide meadow", "farfield-demo"]) {
    it(`accepts ${strong}`, () => expect(weakPasswordReason(strong)).toBeNull());
  }

  it("is part of every schema that sets a password", () => {
    const signUp = signUpSchema.safeParse({ name: "A", email: "a@b.example", password: "aaaaaaaaaa", programName: "B" });
    expect(signUp.success).toBe(false);
    expect(signUp.error!.issues[0]!.message).toMatch(/too easy to guess/);
    expect(resetConfirmSchema.safeParse({ token: "t", password: "aaaaaaaaaa" }).success).toBe(false);
    expect(newAccountPassword.safeParse("aaaaaaaaaa").success).toBe(false);
    expect(newAccountPassword.safeParse("lantern-light-2030").success).toBe(true);
  });
});
