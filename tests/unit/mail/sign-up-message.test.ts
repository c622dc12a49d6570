// The sign-up messages: the confirmation carries its one-time link on the base URL; the notice to an
// existing account's owner carries no link that creates anything. Text is escaped in the HTML part.
import { describe, expect, it } from "vitest";
import { signUpConfirmMessage, signUpExistingMessage } from "@/lib/mail/sign-up-message";

describe("sign-up messages", () => {
  it("the confirmation links to /sign-up/{token} under the base URL's path, in both parts", () => {
    const msg = signUpConfirmMessage({ baseUrl: "https://school.example/farfield", token: "tok_A-1", name: "Ada <b>", programName: "Lakeview & Co", expiresAt: new Date("2030-05-04T18:30:00Z") });
    expect(msg.text).toContain("https://school.example/farfield/sign-up/tok_A-1");
    expect(msg.html).toContain('href="https://school.example/farfield/sign-up/tok_A-1"');
    expect(msg.text).toContain("Lakeview & Co");
    expect(msg.html).toContain("Lakeview &amp; Co");
    expect(msg.html).not.toContain("<b>");
    expect(msg.text).toContain("May 4, 2030");
  });

  it("the notice to an existing account points to sign-in and reset, never to a sign-up link", () => {
    const msg = signUpExistingMessage({ baseUrl: "http://127.0.0.1:3000", name: "Owner" });
    expect(msg.text).toContain("http://127.0.0.1:3000/sign-in");
    expect(msg.text).toContain("http://127.0.0.1:3000/reset");
    expect(msg.text + msg.html).not.toContain("/sign-up");
    expect(msg.subject).toMatch(/someone tried/i);
  });
});
