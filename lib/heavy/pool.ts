// Whole-show work off the request thread: a piscina pool of worker threads running lib/heavy/tasks.ts,
// so one long computation never delays other requests (GET /api/health included).
//
// The workers load plain JavaScript: on first use the server bundles lib/heavy/tasks.ts and the pure
// lib code it imports with esbuild (in esbuild's own process, so this thread stays free) into
// .next/cache/farfield-heavy/, named by its content so processes of one checkout share it. npm
// packages stay outside the bundle and resolve from the project's node_modules.
import { createHash } from "node:crypto";
import { mkdir, rename, writeFile } from "node:fs/promises";
import { availableParallelism } from "node:os";
import path from "node:path";
import { pathToFileURL } from "node:url";
import { Piscina } from "piscina";
import { HttpError } from "@/lib/http/errors";
import runTask, { type HeavyArgs, type HeavyResult, type HeavyTask } from "./tasks";

/** Tasks waiting for a thread beyond this are refused (503) rather than left to pile up. */
const MAX_QUEUE = 32;

async function bundleTasks(root: string): Promise<string> {
  const { build } = await import("esbuild");
  const out = await build({
    absWorkingDir: root,
    entryPoints: ["lib/heavy/tasks.ts"],
    bundle: true,
    packages: "external",
    platform: "node",
    format: "esm",
    target: "node20",
    tsconfig: "tsconfig.json",
    write: false,
    logLevel: "silent",
  });
  const code = out.outputFiles[0]!.contents;
  const dir = path.join(root, ".next", "cache", "farfield-heavy");
  const file = path.join(dir, `tasks-${createHash("sha256").update(code).digest("hex").slice(0, 16)}.mjs`);
  await mkdir(dir, { recursive: true });
  const temp = `${file}.${process.pid}.tmp`;
  await writeFile(temp, code);
  await rename(temp, file);
  return file;
}

async function createPool(): Promise<Piscina> {
  const file = await bundleTasks(process.cwd());
  const threads = Math.max(1, availableParallelism() - 1);
  return new Piscina({ filename: pathToFileURL(file).href, minThreads: threads, maxThreads: threads, idleTimeout: Infinity, maxQueue: MAX_QUEUE });
}

// One pool per process, kept across Next's module reloads in development.
const holder = globalThis as typeof globalThis & { farfieldHeavyPool?: Promise<Piscina> };

function pool(): Promise<Piscina> {
  holder.farfieldHeavyPool ??= createPool().catch((err) => {
    holder.farfieldHeavyPool = undefined;
    throw err;
  });
  return holder.farfieldHeavyPool;
}

/**
 * Runs a task of lib/heavy/tasks.ts in a worker thread. Under `next dev` it runs in this thread
 * instead, so edits to lib/ take effect at once.
 */
export async function runHeavy<K extends HeavyTask>(task: K, ...args: HeavyArgs<K>): Promise<HeavyResult<K>> {
  if (process.env.NODE_ENV !== "production") return runTask({ task, args });
  const p = await pool();
  if (p.queueSize >= MAX_QUEUE) throw new HttpError(503, "The server is busy with other long computations. Try again in a minute.");
  return p.run({ task, args });
}

/** Starts the pool (bundle and threads) ahead of the first heavy request; called once at server start. */
export function warmHeavyPool(): void {
  if (process.env.NODE_ENV !== "production") return;
  pool().catch((err) => console.error("[farfield] the worker threads could not start:", err));
}
