// Load on the built app (scripts/bench.sh serves it): 50 clients reading a 300-performer set's analysis for 10 s,
// then 10 clients saving positions (each on its own set, following its version). Last line: JSON figures.
// For scale, the same 50 clients first read GET /api/health (no session, one `select 1`): the floor of any
// route on this machine, measured in the same run since a shared machine's speed varies from run to run.
import autocannon from "autocannon";
import { sql } from "@/db/client";
import { createLargeShow } from "./support/large-show";

const APP_URL = process.env.APP_URL ?? "http://127.0.0.1:3000";

async function signIn(email: string, password: string) {
  const res = await fetch(`${APP_URL}/api/auth/sign-in`, { method: "POST", headers: { "content-type": "application/json" }, body: JSON.stringify({ email, password }) });
  if (!res.ok) throw new Error(`sign-in failed: ${res.status}`);
  return res.headers.get("set-cookie")!.split(";")[0]!;
}

type Run = autocannon.Result & { p50: number; p95: number; p99: number };

/** autocannon's summary has no p95, so every response time is kept and the percentiles are taken from them. */
function run(opts: autocannon.Options): Promise<Run> {
  const times: number[] = [];
  return new Promise((resolve, reject) => {
    const instance = autocannon(opts, (err, result) => {
      if (err) return reject(err);
      times.sort((a, b) => a - b);
      const at = (q: number) => Math.round(times[Math.min(times.length - 1, Math.floor(q * times.length))]! * 10) / 10;
      resolve({ ...result, p50: at(0.5), p95: at(0.95), p99: at(0.99) });
    });
    instance.on("response", (_client: unknown, _status: number, _bytes: number, ms: number) => times.push(ms));
  });
}

const summary = (name: string, r: Run) => {
  console.log(`${name}: ${r.requests.average.toFixed(0)} req/s, p50 ${r.p50} ms, p95 ${r.p95} ms, p99 ${r.p99} ms, errors ${r.errors}, timeouts ${r.timeouts}, non-2xx ${r.non2xx}`);
};

async function main() {
  const show = await createLargeShow({ performers: 300, sets: 10 });
  const cookie = await signIn(show.email, show.password);
  const analysisPath = `/api/shows/${show.showId}/sets/${show.setIds[0]}/analysis?listeningPointId=${show.listeningPointId}`;
  await fetch(APP_URL + analysisPath, { headers: { cookie } }); // store it once
  // A running server is warm: let the JIT settle before measuring, as the engine bench does.
  await run({ url: APP_URL + analysisPath, connections: 50, duration: 3, headers: { cookie } });
  await run({ url: APP_URL + "/api/health", connections: 50, duration: 2 });
  const floor = await run({ url: APP_URL + "/api/health", connections: 50, duration: 5 });
  summary("floor: GET /api/health (50 clients, 5 s)", floor);

  const read = await run({ url: APP_URL + analysisPath, connections: 50, duration: 10, headers: { cookie } });
  summary("read analysis (50 clients, 10 s)", read);
  console.log(`read p95 / floor p95: ${(read.p95 / floor.p95).toFixed(2)} (target at most 1.15)`);

  const versions = show.setIds.map(() => 1);
  const busy = show.setIds.map(() => false);
  let conflicts = 0;
  const write = await run({
    url: APP_URL,
    connections: 10,
    duration: 10,
    requests: [
      {
        method: "PUT",
        setupRequest: (req: any, ctx: any) => {
          const i = busy.findIndex((b) => !b);
          ctx.set = i;
          busy[i] = true;
          const positions = show.performerIds.slice(0, 30).map((performerId, k) => ({ performerId, x: -20 + k + Math.random(), y: 10 + Math.random(), facingDeg: 0 }));
          return { ...req, path: `/api/shows/${show.showId}/sets/${show.setIds[i]}/positions`, headers: { ...req.headers, cookie, "content-type": "application/json" }, body: JSON.stringify({ version: versions[i], positions }) };
        },
        onResponse: (status: number, body: string, ctx: any) => {
          if (status === 200) versions[ctx.set] = JSON.parse(body).version;
          else if (status === 409) conflicts++;
          busy[ctx.set] = false;
        },
      },
    ],
  } as autocannon.Options);
  summary("save positions (10 clients, 10 s)", write);
  if (conflicts) console.log(`conflicts: ${conflicts}`);

  const figures = {
    loadFloorRps: Math.round(floor.requests.average),
    loadFloorP95Ms: floor.p95,
    loadReadRps: Math.round(read.requests.average),
    loadReadP50Ms: read.p50,
    loadReadP95Ms: read.p95,
    loadReadP99Ms: read.p99,
    // The app's own share: on this 2-core machine the absolute p95 is set by the framework (target ≤ 1.15).
    loadReadRatio: Math.round((read.p95 / floor.p95) * 100) / 100,
    loadWriteRps: Math.round(write.requests.average),
    loadWriteP50Ms: write.p50,
    loadWriteP95Ms: write.p95,
    loadWriteP99Ms: write.p99,
    loadErrors: read.errors + read.timeouts + read.non2xx + write.errors + write.timeouts + write.non2xx,
  };
  await sql.end();
  console.log(JSON.stringify(figures));
}

main().catch((err) => {
  console.error(err);
  process.exit(1);
});
