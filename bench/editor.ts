// Benchmark of the field editor (run by npm run bench against the throwaway stack; APP_URL set).
// Builds a 300-performer set in the demo show, then measures:
//   dragFrameP50Ms / dragFrameP95Ms  main-thread work per animation frame while dragging all 300
//                                   performers in headless Chromium (move the konva nodes, evaluate
//                                   the live box mix, render the mix panel, draw the layer)
//   analysisMedianMs                 GET …/analysis after a change of positions (recomputed and stored),
//                                   25 rounds after 5 unmeasured ones
//   analysisReusedMedianMs           GET …/analysis with unchanged inputs (the stored result)
// Prints readable lines, then one JSON line.
import { Client, DEMO, demoIds, signedIn } from "../tests/support/api";
import { launchBrowser, signIn } from "../tests/support/browser";
import { editorState, openSet, screenOf } from "../tests/browser/editor-support";

const PERFORMERS = 300;
const DRAG_MOVES = 120;

const median = (xs: number[]) => quantile(xs, 0.5);
function quantile(xs: number[], q: number): number {
  const s = [...xs].sort((a, b) => a - b);
  const i = (s.length - 1) * q;
  const lo = Math.floor(i);
  return s[lo] + (s[Math.min(lo + 1, s.length - 1)] - s[lo]) * (i - lo);
}

async function ok<T>(res: Promise<{ status: number; body: T }>, what: string): Promise<T> {
  const r = await res;
  if (r.status >= 300) throw new Error(`${what} answered ${r.status}: ${JSON.stringify(r.body)}`);
  return r.body;
}

/** A set of the demo show with PERFORMERS placed: the demo's roster plus added players on a 2-step grid. */
async function bigSet(designer: Client, ids: Awaited<ReturnType<typeof demoIds>>) {
  const show = (await designer.get(`/api/shows/${ids.showId}`)).body;
  const instruments = ["trumpet", "mellophone", "trombone", "baritone", "tuba", "clarinet", "flute", "alto-sax", "snare"];
  let missing = PERFORMERS - show.performers.length;
  for (let k = 0; missing > 0; k++) {
    const count = Math.min(50, missing);
    await ok(designer.post(`/api/shows/${ids.showId}/performers`, { instrument: instruments[k % instruments.length], count }), "add performers");
    missing -= count;
  }
  const roster = (await designer.get(`/api/shows/${ids.showId}`)).body.performers as { id: string }[];
  const set = (await ok(designer.post(`/api/shows/${ids.showId}/sets`, { duplicateOf: ids.setIds[5] }), "duplicate set")) as any;
  const placed = new Set(((await designer.get(`/api/shows/${ids.showId}/sets/${set.set.id}`)).body.positions as any[]).map((p) => p.performerId));
  const step = 0.5715;
  const extra = roster.filter((p) => !placed.has(p.id)).slice(0, PERFORMERS - placed.size);
  const positions = extra.map((p, i) => ({ performerId: p.id, x: -40 + (i % 36) * 2 * step * 2, y: 30 + Math.floor(i / 36) * 2 * step, facingDeg: 0 }));
  const saved = (await ok(designer.put(`/api/shows/${ids.showId}/sets/${set.set.id}/positions`, { version: set.set.version, positions }), "place performers")) as any;
  return { setId: set.set.id as string, version: saved.version as number, count: placed.size + positions.length };
}

async function analysisTimes(designer: Client, ids: Awaited<ReturnType<typeof demoIds>>, setId: string, version: number) {
  const path = `/api/shows/${ids.showId}/sets/${setId}`;
  const analysis = `${path}/analysis?listeningPointId=${ids.pressBoxId}`;
  const first = (await designer.get(`${path}`)).body.positions[0];
  const changed: number[] = [];
  const reused: number[] = [];
  let v = version;
  // The first rounds only warm the server's JIT, as a running server is warm (the load bench does the same).
  const WARM_UP = 5;
  for (let i = 0; i < WARM_UP + 25; i++) {
    v = ((await ok(designer.put(`${path}/positions`, { version: v, positions: [{ ...first, x: first.x + (i % 2) * 0.5715 }] }), "nudge")) as any).version;
    let t = performance.now();
    const a = await designer.get(analysis);
    if (i >= WARM_UP) changed.push(performance.now() - t);
    if (a.body.reused !== false || a.body.mix.performers.length < PERFORMERS) throw new Error("the analysis was not recomputed for the whole set");
    t = performance.now();
    const b = await designer.get(analysis);
    if (i >= WARM_UP) reused.push(performance.now() - t);
    if (b.body.reused !== true) throw new Error("the analysis was not reused");
  }
  return { changed, reused, version: v };
}

async function dragFrames(ids: Awaited<ReturnType<typeof demoIds>>, setId: string) {
  const session = await launchBrowser({ width: 1366, height: 850 });
  try {
    const { page } = session;
    await signIn(page, DEMO.designer);
    await openSet(page, ids.showId, setId);
    const state = await editorState(page);
    const lps = ids.show.listeningPoints as { x: number; y: number }[];
    // Grab the performer of the added grid nearest its middle, after selecting everyone.
    const [, spot] = Object.entries(state.layout).filter(([, s]) => s.y >= 30).sort((a, b) => Math.abs(a[1].x) - Math.abs(b[1].x))[0];
    const from = await screenOf(page, lps, spot.x, spot.y);
    await page.mouse.click(from.x, from.y);
    await page.keyboard.press("Control+a");
    await page.evaluate(() => (window.__farfieldEditor!.frameTimes.length = 0));
    await page.mouse.move(from.x, from.y);
    await page.mouse.down();
    for (let i = 1; i <= DRAG_MOVES; i++) {
      await page.mouse.move(from.x + Math.sin(i / 10) * 60, from.y - i * 0.6);
      await page.evaluate(() => new Promise((r) => requestAnimationFrame(() => requestAnimationFrame(r))));
    }
    await page.mouse.up();
    const frames = await page.evaluate(() => [...window.__farfieldEditor!.frameTimes]);
    const selected = Object.keys(state.layout).length;
    return { frames, selected, problems: session.problems };
  } finally {
    await session.close();
  }
}

async function main() {
  const ids = await demoIds();
  const designer = await signedIn(DEMO.designer);
  const big = await bigSet(designer, ids);
  console.log(`editor bench: a set of ${big.count} performers`);
  const times = await analysisTimes(designer, ids, big.setId, big.version);
  const analysisMedianMs = median(times.changed);
  const analysisReusedMedianMs = median(times.reused);
  console.log(`analysis of ${big.count} performers after a change: median ${analysisMedianMs.toFixed(1)} ms (25 requests); unchanged (stored): median ${analysisReusedMedianMs.toFixed(1)} ms`);
  const drag = await dragFrames(ids, big.setId);
  if (drag.frames.length < DRAG_MOVES / 2) throw new Error(`only ${drag.frames.length} drag frames were recorded`);
  const dragFrameP50Ms = median(drag.frames);
  const dragFrameP95Ms = quantile(drag.frames, 0.95);
  console.log(`drag of ${drag.selected} performers: ${drag.frames.length} frames, work per frame median ${dragFrameP50Ms.toFixed(2)} ms, 95th percentile ${dragFrameP95Ms.toFixed(2)} ms (target under 16 ms)`);
  if (drag.problems.length) console.log(`browser problems: ${drag.problems.join("; ")}`);
  const round = (x: number) => Math.round(x * 100) / 100;
  console.log(
    JSON.stringify({
      dragFrameP50Ms: round(dragFrameP50Ms),
      dragFrameP95Ms: round(dragFrameP95Ms),
      analysisMedianMs: round(analysisMedianMs),
      analysisReusedMedianMs: round(analysisReusedMedianMs),
    }),
  );
}

main().then(
  () => process.exit(0),
  (err) => {
    console.error(err);
    process.exit(1);
  },
);
