// apt_install (scripts/lib/common.sh) waits while another package manager holds Debian's lock instead
// of failing at once (a fresh machine's first npm test stopped with apt-get's exit 100). A stand-in
// apt-get on PATH plays the locked system: the real one is never run here.
import { spawnSync } from "node:child_process";
import { chmodSync, mkdirSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import path from "node:path";
import { afterAll, describe, expect, it } from "vitest";

const ROOT = path.resolve(__dirname, "../../..");
mkdirSync(path.join(ROOT, ".tmp"), { recursive: true });
const work = mkdtempSync(path.join(ROOT, ".tmp/apt-lock-"));
afterAll(() => rmSync(work, { recursive: true, force: true }));

/** A fake apt-get that logs its arguments and answers the first `locked` calls as apt does when locked (the message apt 2.6 prints). */
function fakeApt(name: string, locked: number, otherError = false) {
  const bin = path.join(work, name);
  mkdirSync(bin, { recursive: true });
  writeFileSync(
    path.join(bin, "apt-get"),
    `#!/usr/bin/env bash
echo "$*" >> "${bin}/calls"
n=$(($(cat "${bin}/count" 2>/dev/null || echo 0) + 1)); echo $n > "${bin}/count"
${otherError ? `echo "E: Unable to locate package no-such-package" >&2; exit 100` : ""}
if [ $n -le ${locked} ]; then
  echo "E: Could not get lock /var/lib/apt/lists/lock. It is held by process 4242 (apt-get)" >&2
  echo "E: Unable to lock directory /var/lib/apt/lists/" >&2
  exit 100
fi
exit 0
`,
  );
  chmodSync(path.join(bin, "apt-get"), 0o755);
  const run = spawnSync(
    "bash",
    ["-c", `source "${ROOT}/scripts/lib/common.sh"; as_root() { "$@"; }; apt_install some-package`],
    { encoding: "utf8", env: { ...process.env, PATH: `${bin}:${process.env.PATH}`, APT_LOCK_RETRY_SECONDS: "0", APT_LOCK_WAIT_SECONDS: "600" }, timeout: 30_000 },
  );
  const calls = readFileSync(path.join(bin, "calls"), "utf8").trim().split("\n");
  return { run, calls };
}

describe("apt_install and Debian's lock", () => {
  it("waits while the lock is held, then installs; every call asks apt to wait for dpkg's lock too", () => {
    const { run, calls } = fakeApt("locked", 2);
    expect(run.status, run.stderr).toBe(0);
    expect(calls.filter((c) => c.includes("update"))).toHaveLength(3);
    expect(calls.filter((c) => c.includes("install"))).toEqual([expect.stringContaining("some-package")]);
    for (const c of calls) expect(c).toContain("-o DPkg::Lock::Timeout=600");
    expect(run.stderr).toContain("waiting");
  });

  it("still fails at once, with apt's words, on any other error", () => {
    const { run, calls } = fakeApt("broken", 0, true);
    expect(run.status).toBe(100);
    expect(calls).toHaveLength(1);
    expect(run.stderr).toContain("Unable to locate package");
  });
});
