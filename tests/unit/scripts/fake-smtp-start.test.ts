// start_fake_smtp (scripts/lib/mail.sh), as npm start, npm run dev and npm test use it: each instance
// gets a port of its own (two npm starts once shared 2525, so one read the other's mail), a port in use
// fails clearly, and the server ends with the script that started it.
import { spawn, spawnSync } from "node:child_process";
import { mkdirSync, mkdtempSync, rmSync } from "node:fs";
import net from "node:net";
import path from "node:path";
import { afterAll, describe, expect, it } from "vitest";

const ROOT = path.resolve(__dirname, "../../..");
mkdirSync(path.join(ROOT, ".tmp"), { recursive: true });
const work = mkdtempSync(path.join(ROOT, ".tmp/fake-smtp-start-"));
afterAll(() => rmSync(work, { recursive: true, force: true }));

const starter = (dir: string, extra = "") =>
  `source "${ROOT}/scripts/lib/common.sh"; source "${ROOT}/scripts/lib/mail.sh"; ${extra} start_fake_smtp "${dir}" "${dir}.log"; echo "port=$SMTP_PORT mailbox=$DEV_MAILBOX host=$SMTP_HOST"`;

/** The SMTP greeting on a port, or null when nothing listens. */
function greeting(port: number): Promise<string | null> {
  return new Promise((resolve) => {
    const s = net.connect(port, "127.0.0.1");
    s.once("data", (d) => (s.destroy(), resolve(d.toString())));
    s.once("error", () => resolve(null));
  });
}

/** Polls until nothing listens on the port (true) or 30 s pass (false). A wait for a condition, not a timing. */
async function closes(port: number): Promise<boolean> {
  for (const end = Date.now() + 30_000; Date.now() < end; await new Promise((r) => setTimeout(r, 200))) {
    if ((await greeting(port)) === null) return true;
  }
  return false;
}

/** Runs the starter in a bash whose parent never reaps it, so once it ends it lingers as a zombie, the way an orphan does under a PID 1 that does not reap. */
function startUnreaped(dir: string): Promise<{ port: number; line: string; holder: ReturnType<typeof spawn> }> {
  const holder = spawn("bash", ["-c", `bash -c '${starter(dir).replace(/'/g, "'\\''")}' & exec sleep 300`], { stdio: ["ignore", "pipe", "inherit"] });
  return new Promise((resolve, reject) => {
    let out = "";
    holder.stdout!.on("data", (d) => {
      out += d.toString();
      const m = out.match(/port=(\d+).*\n/);
      if (m) resolve({ port: Number(m[1]), line: m[0], holder });
    });
    holder.once("exit", () => reject(new Error(`the starter ended without a port: ${out}`)));
  });
}

describe("start_fake_smtp", () => {
  it("gives two instances different free ports and ends each server once its script has ended", { timeout: 90_000 }, async () => {
    const [a, b] = await Promise.all([startUnreaped(path.join(work, "a")), startUnreaped(path.join(work, "b"))]);
    try {
      expect(a.port).not.toBe(b.port);
      expect(a.line).toContain("mailbox=true host=127.0.0.1");
      // The starters have printed and exited (left unreaped); each server either still answers or is ending.
      expect(await closes(a.port)).toBe(true);
      expect(await closes(b.port)).toBe(true);
    } finally {
      a.holder.kill();
      b.holder.kill();
    }
  });

  it("fails clearly when a fixed FAKE_SMTP_PORT is taken", { timeout: 60_000 }, async () => {
    const taken = net.createServer().listen(0, "127.0.0.1");
    await new Promise((r) => taken.once("listening", r));
    const port = (taken.address() as net.AddressInfo).port;
    try {
      const dir = path.join(work, "taken");
      const run = spawnSync("bash", ["-c", starter(dir, `FAKE_SMTP_PORT=${port}`)], { encoding: "utf8", timeout: 55_000 });
      expect(run.status).not.toBe(0);
      expect(run.stdout).not.toContain("port=");
      expect(run.stderr).toContain(`port ${port} on 127.0.0.1 is in use`);
      expect(run.stderr).toContain("did not start");
    } finally {
      taken.close();
    }
  });
});
