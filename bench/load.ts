// Load on the built app (scripts/bench.sh serves it): 50 clients reading a 300-performer set's analysis for 10 s,
// then 10 clients saving positions (each on its own set, following its version). Last line: JSON figures.
import autocannon from "autocannon";
import { sql } from "@/db/client";
import { createLargeShow } from "./support/large-show";

const APP_URL = process.env.APP_URL ?? "http://127.0.0.1:3000";

async function signIn(email: string, password: string) {
  const res = await fetch(`${APP_URL}/api/auth/sign-in`, { method: "POST", headers: { "content-type": "application/json" }, body: JSON.stringify({ email, password }) });
  if (!res.ok) throw new Error(`sign-in failed: ${res.status}`);
  return res.headers.get("set-cookie")!.split(";")[0]!;
}

function run(opts: autocannon.Options): Promise<autocannon.Result> {
  return new Promise((resolve, reject) => autocannon(opts, (err, result) => (err ? reject(err) : resolve(result))));
}

const summary = (name: string, r: autocannon.Result) => {
  console.log(`${name}: ${r.requests.average.toFixed(0)} req/s, p50 ${r.latency.p50} ms, p95 ${r.latency.p97_5 ?? "?"}(p97.5) ms, p99 ${r.latency.p99} ms, errors ${r.errors}, timeouts ${r.timeouts}, non-2xx ${r.non2xx}`);
};

async function main() {
  const show = await createLargeShow({ performers: 300, sets: 10 });
  const cookie = await signIn(show.email, show.password);
  const analysisPath = `/api/shows/${show.showId}/sets/${show.setIds[0]}/analysis?listeningPointId=${show.listeningPointId}`;
  await fetch(APP_URL + analysisPath, { headers: { cookie } }); // store it once

  const read = await run({ url: APP_URL + analysisPath, connections: 50, duration: 10, headers: { cookie } });
  summary("read analysis (50 clients, 10 s)", read);

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

  // autocannon reports p97.5 and p99; p95 lies between them, so p97.5 is a conservative stand-in.
  const figures = {
    loadReadRps: Math.round(read.requests.average),
    loadReadP50Ms: read.latency.p50,
    loadReadP95Ms: read.latency.p97_5,
    loadReadP99Ms: read.latency.p99,
    loadWriteRps: Math.round(write.requests.average),
    loadWriteP50Ms: write.latency.p50,
    loadWriteP95Ms: write.latency.p97_5,
    loadWriteP99Ms: write.latency.p99,
    loadErrors: read.errors + read.timeouts + read.non2xx + write.errors + write.timeouts + write.non2xx,
  };
  await sql.end();
  console.log(JSON.stringify(figures));
}

main().catch((err) => {
  console.error(err);
  process.exit(1);
});
