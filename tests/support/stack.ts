// Private PostgreSQL clusters and app processes for fault tests (outage, restarts, several processes).
import { execFileSync, spawn, type ChildProcess } from "node:child_process";
import { chmodSync, chownSync, mkdirSync, rmSync } from "node:fs";
import net from "node:net";
import path from "node:path";
import { runMigrations } from "@/db/migrate";

const ROOT = path.resolve(__dirname, "../..");
const PG_BIN = process.env.PG_BIN ?? "/usr/lib/postgresql/15/bin";
const asRoot = process.getuid?.() === 0;

function pg(tool: string, args: string[]) {
  const cmd = asRoot ? "runuser" : path.join(PG_BIN, tool);
  const argv = asRoot ? ["-u", "postgres", "--", path.join(PG_BIN, tool), ...args] : args;
  return execFileSync(cmd, argv, { stdio: "pipe" }).toString();
}

export function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const s = net.createServer();
    s.listen(0, "127.0.0.1", () => {
      const port = (s.address() as net.AddressInfo).port;
      s.close(() => resolve(port));
    });
    s.on("error", reject);
  });
}

export interface Cluster {
  url: string;
  start(): void;
  stop(): void;
  remove(): void;
}

/** A new cluster under .tmp with one migrated database, started. */
export async function createCluster(tag: string): Promise<Cluster> {
  const dir = path.join(ROOT, ".tmp", `pg-${tag}-${process.pid}-${Date.now()}`);
  mkdirSync(dir, { recursive: true });
  chmodSync(dir, 0o700);
  if (asRoot) chownSync(dir, Number(execFileSync("id", ["-u", "postgres"]).toString()), Number(execFileSync("id", ["-g", "postgres"]).toString()));
  const port = await freePort();
  pg("initdb", ["-D", `${dir}/data`, "-U", "postgres", "--auth=trust", "--encoding=UTF8", "--locale=C.UTF-8"]);
  const cluster: Cluster = {
    url: `postgres://postgres@127.0.0.1:${port}/postgres`,
    start: () => pg("pg_ctl", ["-D", `${dir}/data`, "-l", `${dir}/server.log`, "-w", "-t", "30", "-o", `-c listen_addresses=127.0.0.1 -p ${port} -k ${dir} -c fsync=off`, "start"]) && undefined,
    stop: () => {
      try {
        pg("pg_ctl", ["-D", `${dir}/data`, "-m", "fast", "-w", "stop"]);
      } catch {}
    },
    remove: () => {
      cluster.stop();
      rmSync(dir, { recursive: true, force: true });
    },
  };
  cluster.start();
  await runMigrations(cluster.url);
  return cluster;
}

export interface App {
  url: string;
  proc: ChildProcess;
  stop(): Promise<void>;
}

/** The production build served (by server.ts, as npm start does) against `databaseUrl` on a free port; `env` adds or overrides variables. */
export async function startApp(databaseUrl: string, env: Record<string, string> = {}): Promise<App> {
  const port = await freePort();
  const url = `http://127.0.0.1:${port}`;
  const proc = spawn(path.join(ROOT, "node_modules/.bin/tsx"), ["server.ts", "-H", "127.0.0.1", "-p", String(port)], {
    cwd: ROOT,
    env: { ...process.env, DATABASE_URL: databaseUrl, APP_BASE_URL: url, PORT: String(port), ...env },
    stdio: "ignore",
  });
  const deadline = Date.now() + 60_000;
  for (;;) {
    try {
      await fetch(`${url}/api/health`);
      break;
    } catch {
      if (Date.now() > deadline) throw new Error(`app on ${url} did not start`);
      await new Promise((r) => setTimeout(r, 250));
    }
  }
  return {
    url,
    proc,
    stop: () =>
      new Promise<void>((resolve) => {
        if (proc.exitCode !== null) return resolve();
        proc.once("exit", () => resolve());
        proc.kill("SIGTERM");
      }),
  };
}
