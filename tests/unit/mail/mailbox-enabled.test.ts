// When the local mailbox may open, and whose messages it shows (the security review's first finding:
// every program's mail, reset and invitation links included, was readable by any demo director).
import { readFileSync } from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { mailboxEnabledFor, messagesFor } from "@/lib/mail/mailbox-enabled";

const local = { DEV_MAILBOX: "true" as const, SMTP_HOST: "127.0.0.1" };

describe("the local mailbox opens only when the fake SMTP server is the transport", () => {
  it("opens for the start scripts' loopback fake server", () => {
    expect(mailboxEnabledFor(local)).toBe(true);
    expect(mailboxEnabledFor({ ...local, SMTP_HOST: "localhost" })).toBe(true);
  });

  it("stays closed when the scripts did not start the fake server", () => {
    expect(mailboxEnabledFor({ SMTP_HOST: "127.0.0.1" })).toBe(false);
    expect(mailboxEnabledFor({ ...local, DEV_MAILBOX: "false" })).toBe(false);
  });

  it("stays closed with real SMTP settings, even when DEV_MAILBOX was left set", () => {
    expect(mailboxEnabledFor({ ...local, SMTP_HOST: "smtp.example.org" })).toBe(false);
    expect(mailboxEnabledFor({ ...local, SMTP_USER: "mailer" })).toBe(false);
    expect(mailboxEnabledFor({ ...local, SMTP_PASSWORD: "secret" })).toBe(false);
  });
});

describe("each reader sees only their own messages", () => {
  const messages = [
    { id: "a", to: ["director@harbor-ridge.example"] },
    { id: "b", to: ["director@westbrook.example"] },
    { id: "c", to: ["Staff@Harbor-Ridge.example", "director@westbrook.example"] },
  ];
  it("keeps the messages addressed to the reader, whatever the letter case", () => {
    expect(messagesFor(messages, "director@harbor-ridge.example").map((m) => m.id)).toEqual(["a"]);
    expect(messagesFor(messages, "director@westbrook.example").map((m) => m.id)).toEqual(["b", "c"]);
    expect(messagesFor(messages, "staff@harbor-ridge.example").map((m) => m.id)).toEqual(["c"]);
    expect(messagesFor(messages, "nobody@test.example")).toEqual([]);
  });
});

describe("the README", () => {
  it("says the local mailbox is for local use and shows each person only their own mail", () => {
    const readme = readFileSync(path.resolve(__dirname, "../../../README.md"), "utf8");
    const mail = readme.slice(readme.indexOf("## E-mail"));
    const section = mail.slice(0, mail.indexOf("\n## ", 5));
    expect(section).toMatch(/local use only/i);
    expect(section).toMatch(/only the messages sent to their own address/i);
  });
});
