// A local stand-in for a hosted SMTP service: accepts every message on loopback and keeps it as
// an .eml file plus one line of index.jsonl (read by the development mailbox page and the tests).
// `npx tsx scripts/fake-smtp.ts` listens on SMTP_PORT and writes into MAIL_DIR (lib/env.ts);
// FAKE_SMTP_WATCH_PID makes it exit when that process (the script that started it) is gone.
import { randomUUID } from "node:crypto";
import { appendFile, mkdir, writeFile } from "node:fs/promises";
import path from "node:path";
import { simpleParser, type AddressObject } from "mailparser";
import { SMTPServer } from "smtp-server";
import { MAILBOX_INDEX, type KeptMessage } from "@/lib/mail/mailbox";

const MAX_MESSAGE_BYTES = 5_000_000;

const addresses = (a: AddressObject | AddressObject[] | undefined) =>
  (Array.isArray(a) ? a : a ? [a] : []).flatMap((o) => o.value.map((v) => v.address ?? "")).filter(Boolean);

/** Parses and stores one raw message; returns its index entry. */
export async function keepMessage(dir: string, raw: Buffer, envelopeTo: string[]): Promise<KeptMessage> {
  const parsed = await simpleParser(raw);
  const id = `${new Date().toISOString().replace(/[:.]/g, "-")}-${randomUUID().slice(0, 8)}`;
  const file = `${id}.eml`;
  await mkdir(dir, { recursive: true }); // the folder may have been cleared while the server runs
  await writeFile(path.join(dir, file), raw);
  const entry: KeptMessage = {
    id,
    receivedAt: new Date().toISOString(),
    from: parsed.from?.text ?? "",
    to: envelopeTo.length ? envelopeTo : addresses(parsed.to),
    subject: parsed.subject ?? "",
    text: parsed.text ?? "",
    html: typeof parsed.html === "string" ? parsed.html : "",
    file,
  };
  await appendFile(path.join(dir, MAILBOX_INDEX), JSON.stringify(entry) + "\n");
  return entry;
}

/** Starts the server on 127.0.0.1 (port 0 picks a free one). */
export async function startFakeSmtp(opts: { port: number; dir: string; onMessage?: (m: KeptMessage) => void }) {
  await mkdir(opts.dir, { recursive: true });
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ["STARTTLS"], // loopback only: no certificate to offer
    size: MAX_MESSAGE_BYTES,
    logger: false,
    onAuth: (_auth, _session, done) => done(null, { user: "local" }),
    onData(stream, session, done) {
      const chunks: Buffer[] = [];
      stream.on("data", (c: Buffer) => chunks.push(c));
      stream.on("end", () => {
        if (stream.sizeExceeded) return done(Object.assign(new Error("Message too large"), { responseCode: 552 }));
        keepMessage(opts.dir, Buffer.concat(chunks), session.envelope.rcptTo.map((r) => r.address)).then(
          (m) => {
            opts.onMessage?.(m);
            done();
          },
          (err: Error) => done(err),
        );
      });
    },
  });
  await new Promise<void>((resolve, reject) => {
    server.once("error", reject);
    server.listen(opts.port, "127.0.0.1", () => resolve());
  });
  const address = server.server.address();
  const port = typeof address === "object" && address ? address.port : opts.port;
  return { port, close: () => new Promise<void>((resolve) => server.close(() => resolve())) };
}

async function main() {
  const { env } = await import("@/lib/env");
  const dir = path.resolve(env.MAIL_DIR);
  const smtp = await startFakeSmtp({
    port: env.SMTP_PORT,
    dir,
    onMessage: (m) => console.log(`[fake-smtp] kept "${m.subject}" for ${m.to.join(", ")}`),
  });
  console.log(`[fake-smtp] listening on 127.0.0.1:${smtp.port}, keeping messages in ${path.relative(process.cwd(), dir) || "."}`);
  const stop = () => smtp.close().then(() => process.exit(0));
  process.on("SIGTERM", stop);
  process.on("SIGINT", stop);
  const watched = Number(process.env.FAKE_SMTP_WATCH_PID ?? "");
  if (watched > 0) {
    setInterval(() => {
      try {
        process.kill(watched, 0);
      } catch {
        void stop();
      }
    }, 1000).unref();
  }
}

if (require.main === module) {
  main().catch((err) => {
    console.error("[fake-smtp] could not start:", err instanceof Error ? err.message : err);
    process.exit(1);
  });
}
