// Runs once when a server process starts (Next.js instrumentation hook).
export async function register() {
  // The worker threads of whole-show computations start now rather than on the first such request.
  if (process.env.NEXT_RUNTIME === "nodejs") (await import("./lib/heavy/pool")).warmHeavyPool();
}
