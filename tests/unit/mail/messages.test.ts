// Message builders: both parts present, the link on the configured base URL, text escaped in HTML.
import { describe, expect, it } from "vitest";
import { escapeHtml } from "@/lib/mail/html";
import { invitationMessage, invitationPath } from "@/lib/mail/invitation-message";
import { absoluteLink } from "@/lib/mail/message";
import { resetMessage } from "@/lib/mail/reset-message";

const expiresAt = new Date("2030-05-04T18:30:00Z");

describe("absoluteLink", () => {
  it.each([
    ["http://127.0.0.1:3000", "/invitations/abc", "http://127.0.0.1:3000/invitations/abc"],
    ["https://band.example/", "/reset/x", "https://band.example/reset/x"],
    // A deployment under a sub-path keeps it (WHATWG URL resolution would drop it for "/path").
    ["https://school.example/farfield", "/invitations/t", "https://school.example/farfield/invitations/t"],
    ["https://school.example/farfield/", "invitations/t", "https://school.example/farfield/invitations/t"],
  ])("%s + %s", (base, path, want) => {
    expect(absoluteLink(base, path)).toBe(want);
  });
});

describe("invitationMessage", () => {
  const msg = invitationMessage({
    baseUrl: "https://school.example/farfield",
    token: "tok_EN-123",
    programName: "Harbor Ridge <High> & Co",
    role: "staff",
    inviterName: "Dana \"D\" Whitfield",
    expiresAt,
  });
  const link = "https://school.example/farfield/invitations/tok_EN-123";

  it("carries the link in the text on a line of its own and in the HTML", () => {
    expect(msg.text.split("\n")).toContain(link);
    expect(msg.html).toContain(`href="${link}"`);
    expect(invitationPath("a/b")).toBe("/invitations/a%2Fb");
  });

  it("names the program, the inviter, the role and the expiry in both parts", () => {
    expect(msg.subject).toBe('Dana "D" Whitfield invited you to Harbor Ridge <High> & Co on Farfield');
    for (const part of [msg.text, msg.html]) {
      expect(part).toMatch(/staff member/);
      expect(part).toContain("May 4, 2030");
    }
  });

  it("escapes names in the HTML part and leaves them plain in the text", () => {
    expect(msg.text).toContain("Harbor Ridge <High> & Co");
    expect(msg.html).toContain("Harbor Ridge &lt;High&gt; &amp; Co");
    expect(msg.html).not.toContain("<High>");
    expect(msg.html).toContain("Dana &quot;D&quot; Whitfield");
  });
});

describe("resetMessage", () => {
  const msg = resetMessage({ baseUrl: "http://127.0.0.1:4000", token: "r1", name: "Priya <b>", expiresAt });
  it("links to the reset page and says every session ends", () => {
    expect(msg.text).toContain("http://127.0.0.1:4000/reset/r1");
    expect(msg.html).toContain('href="http://127.0.0.1:4000/reset/r1"');
    expect(msg.text).toMatch(/signs you out everywhere/);
    expect(msg.html).toContain("Priya &lt;b&gt;");
  });
});

describe("escapeHtml", () => {
  it("escapes the five characters that matter in elements and attributes", () => {
    expect(escapeHtml(`<a href="x">'&'</a>`)).toBe("&lt;a href=&quot;x&quot;&gt;&#39;&amp;&#39;&lt;/a&gt;");
  });
});
