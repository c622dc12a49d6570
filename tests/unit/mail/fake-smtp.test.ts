// The nodemailer transport against the fake SMTP server, both real, over loopback TCP.
import { mkdtemp, readFile, rm } from "node:fs/promises";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { startFakeSmtp } from "@/scripts/fake-smtp";
import { readMailbox } from "@/lib/mail/mailbox";
import { invitationMessage } from "@/lib/mail/invitation-message";
import { createTransport } from "@/lib/mail/smtp";

let dir: string;
let smtp: Awaited<ReturnType<typeof startFakeSmtp>>;

beforeAll(async () => {
  await import("node:fs/promises").then((fs) => fs.mkdir(".tmp", { recursive: true }));
  dir = await mkdtemp(path.resolve(".tmp/mail-unit-"));
  smtp = await startFakeSmtp({ port: 0, dir });
});
afterAll(async () => {
  await smtp?.close();
  await rm(dir, { recursive: true, force: true });
});

describe("fake SMTP server", () => {
  it("keeps a sent message as .eml and in the index, with both parts", async () => {
    const message = invitationMessage({
      baseUrl: "http://127.0.0.1:3000",
      token: "abc",
      programName: "Harbor Ridge High School Marching Band",
      role: "designer",
      inviterName: "Dana Whitfield",
      expiresAt: new Date("2031-01-01T00:00:00Z"),
    });
    const transport = createTransport({ host: "127.0.0.1", port: smtp.port, user: "any", password: "thing" });
    await transport.sendMail({ from: "Farfield <no-reply@farfield.example>", to: "newcomer@test.example", ...message });

    const [kept, ...rest] = await readMailbox(dir);
    expect(rest).toHaveLength(0);
    expect(kept!.to).toEqual(["newcomer@test.example"]);
    expect(kept!.subject).toBe(message.subject);
    expect(kept!.text).toContain("http://127.0.0.1:3000/invitations/abc");
    expect(kept!.html).toContain('href="http://127.0.0.1:3000/invitations/abc"');
    const eml = await readFile(path.join(dir, kept!.file), "utf8");
    expect(eml).toMatch(/Content-Type: multipart\/alternative/i);
    expect(eml).toMatch(/Content-Type: text\/plain/i);
    expect(eml).toMatch(/Content-Type: text\/html/i);
  });

  it("lists messages newest first", async () => {
    const transport = createTransport({ host: "127.0.0.1", port: smtp.port });
    for (const subject of ["first", "second"]) {
      await transport.sendMail({ from: "a@farfield.example", to: "order@test.example", subject, text: subject, html: `<p>${subject}</p>` });
    }
    const subjects = (await readMailbox(dir)).filter((m) => m.to.includes("order@test.example")).map((m) => m.subject);
    expect(subjects).toEqual(["second", "first"]);
  });
});
