// A heavy request beside light ones (scripts/bench.sh serves the built app): the timeline of a show of
// 150 performers with four transitions of 999 counts (about 600 000 evaluations, computed in a worker
// thread), while four clients call GET /api/health one request after another. Last line: JSON figures.
//   heavyTimelineMs            the timeline request, computed and stored
//   healthDuringHeavyP50Ms/P99Ms/MaxMs   health response times while it ran
import { inArray } from "drizzle-orm";
import { db, sql } from "@/db/client";
import { sets } from "@/db/schema";
import { createLargeShow } from "./support/large-show";

const APP_URL = process.env.APP_URL ?? "http://127.0.0.1:3000";

async function main() {
  const show = await createLargeShow({ performers: 150, sets: 5 });
  await db.update(sets).set({ counts: 999 }).where(inArray(sets.id, show.setIds.slice(1)));
  const res = await fetch(`${APP_URL}/api/auth/sign-in`, { method: "POST", headers: { "content-type": "application/json" }, body: JSON.stringify({ email: show.email, password: show.password }) });
  const cookie = res.headers.get("set-cookie")!.split(";")[0]!;

  let done = false;
  const t0 = performance.now();
  const heavy = fetch(`${APP_URL}/api/shows/${show.showId}/timeline?listeningPointId=${show.listeningPointId}`, { headers: { cookie } })
    .then(async (r) => {
      if (r.status !== 200) throw new Error(`timeline answered ${r.status}: ${await r.text()}`);
      await r.arrayBuffer();
      return performance.now() - t0;
    })
    .finally(() => (done = true));
  const times: number[] = [];
  const client = async () => {
    while (!done) {
      const s = performance.now();
      await (await fetch(`${APP_URL}/api/health`)).arrayBuffer();
      times.push(performance.now() - s);
    }
  };
  await Promise.all([client(), client(), client(), client()]);
  const heavyMs = await heavy;
  times.sort((a, b) => a - b);
  const at = (q: number) => Math.round(times[Math.min(times.length - 1, Math.floor(q * times.length))]! * 10) / 10;
  console.log(`timeline of 150 performers × 4 × 999 counts: ${heavyMs.toFixed(0)} ms; meanwhile ${times.length} health checks, p50 ${at(0.5)} ms, p99 ${at(0.99)} ms, max ${at(1)} ms`);
  await sql.end();
  console.log(JSON.stringify({ heavyTimelineMs: Math.round(heavyMs), healthDuringHeavyP50Ms: at(0.5), healthDuringHeavyP99Ms: at(0.99), healthDuringHeavyMaxMs: at(1) }));
}

main().catch((err) => {
  console.error(err);
  process.exit(1);
});
