// A local stand-in for a hosted SMTP service: accepts every message on loopback and keeps it as
// an .eml file plus one line of index.jsonl (read by the development mailbox page and the tests).
// `npx tsx scripts/fake-smtp.ts` listens on SMTP_PORT (0: a free port the system picks) and writes
// into MAIL_DIR (lib/env.ts). The start scripts use start_fake_smtp (scripts/lib/mail.sh), which sets:
// FAKE_SMTP_PORT_FILE, where the port is written once the server listens; FAKE_SMTP_EXIT_ON_EOF=1, to
// exit when stdin (a pipe the starting script holds) closes; FAKE_SMTP_WATCH_PID, to exit when that
// process is gone.
import { randomUUID } from "node:crypto";
import { appendFile, mkdir, rename, writeFile } from "node:fs/promises";
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

/** The links in a message's text, for the console of whoever runs the server locally. */
const linksIn = (text: string) => text.match(/https?:\/\/\S+/g) ?? [];

async function main() {
  const { env } = await import("@/lib/env");
  const dir = path.resolve(env.MAIL_DIR);
  const smtp = await startFakeSmtp({
    port: env.SMTP_PORT,
    dir,
    onMessage: (m) => console.log([`[fake-smtp] kept "${m.subject}" for ${m.to.join(", ")}`, ...linksIn(m.text).map((l) => `  ${l}`)].join("\n")),
  }).catch((err: NodeJS.ErrnoException) => {
    if (err.code === "EADDRINUSE") {
      throw new Error(`port ${env.SMTP_PORT} on 127.0.0.1 is in use (another npm start?). Leave FAKE_SMTP_PORT unset (npm start) or set SMTP_PORT=0 to take a free one.`);
    }
    throw err;
  });
  console.log(`[fake-smtp] listening on 127.0.0.1:${smtp.port}, keeping messages in ${path.relative(process.cwd(), dir) || "."}`);
  const stop = () => smtp.close().then(() => process.exit(0));
  process.on("SIGTERM", stop);
  process.on("SIGINT", stop);
  const portFile = process.env.FAKE_SMTP_PORT_FILE;
  if (portFile) {
    // Written whole, then renamed, so the waiting script never reads half a number.
    await writeFile(`${portFile}.part`, String(smtp.port));
    await rename(`${portFile}.part`, portFile);
  }
  if (process.env.FAKE_SMTP_EXIT_ON_EOF === "1") {
    // Every holder of the pipe's other end (the script, the app it became) has ended, however it ended.
    process.stdin.on("end", () => void stop());
    process.stdin.on("error", () => void stop());
    process.stdin.resume();
  }
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
