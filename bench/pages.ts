// Browser benchmark of what a person feels (run by npm run bench against the throwaway stack; APP_URL set).
// Signed in as the demo director in headless Chromium, on a warm server:
//   pages    every page of the demo show, 10 loads each: the time from navigation until its main
//            content is usable (the marker below appears), p50 and p95 per page; pageP95Ms is the worst page's p95
//   editorMixMs   opening the field editor until the box mix from the server shows (median of the 10 loads)
//   dragSaveMs    releasing a dragged performer until the editor says the move is saved (median of 8 drags)
// Prints readable lines, then one JSON line.
import type { Page } from "playwright-core";
import { APP_URL, DEMO, demoIds } from "../tests/support/api";
import { launchBrowser, signIn } from "../tests/support/browser";
import { drag, editorState, isolated, openSet, screenOf } from "../tests/browser/editor-support";

const LOADS = 10;
const DRAGS = 8;

const quantile = (xs: number[], q: number) => {
  const s = [...xs].sort((a, b) => a - b);
  const i = (s.length - 1) * q;
  const lo = Math.floor(i);
  return s[lo]! + (s[Math.min(lo + 1, s.length - 1)]! - s[lo]!) * (i - lo);
};
const round = (x: number) => Math.round(x);

type Ids = Awaited<ReturnType<typeof demoIds>>;

/** Each page, and the selector that appears once its main content is there to use. */
function pages(ids: Ids): { name: string; path: string; ready: string }[] {
  const show = `/shows/${ids.showId}`;
  return [
    { name: "programs", path: "/programs", ready: "main a[href^='/programs/']" },
    { name: "program", path: `/programs/${ids.programId}`, ready: `main a[href^='/shows/']` },
    { name: "overview", path: show, ready: "main table caption" },
    { name: "field editor", path: `${show}/sets/${ids.setIds[3]}`, ready: '[data-testid="mix-panel"][data-source="stored"]' },
    { name: "music", path: `${show}/music`, ready: "#voicing-title" },
    { name: "timeline", path: `${show}/timeline`, ready: "#checks-title ~ * [aria-label^='Set 1:'], [aria-label^='Set 1:']" },
    { name: "compare", path: `${show}/compare`, ready: "#voices-title" },
    { name: "readings", path: `${show}/readings`, ready: "#record-title" },
    { name: "hearing map", path: `${show}/hearing`, ready: "[aria-label='Legend']" },
    { name: "rehearsal", path: `${show}/rehearsal`, ready: "#choose-title" },
    { name: "sheets", path: `${show}/sheets`, ready: "[id^='sheet-']" },
    { name: "imports", path: `${show}/imports`, ready: "#upload-title" },
    { name: "targets", path: `${show}/targets`, ready: "main form input" },
  ];
}

async function timeLoad(page: Page, url: string, ready: string): Promise<number> {
  const t = Date.now();
  await page.goto(url, { waitUntil: "commit" });
  await page.waitForSelector(ready, { timeout: 60_000 });
  return Date.now() - t;
}

/** Releasing a performer until "saved": the page's own clock, from the mouse-up event to the status change. */
async function dragSaves(page: Page, ids: Ids): Promise<number[]> {
  const setId = ids.setIds[10]!;
  await openSet(page, ids.showId, setId);
  const state = await editorState(page);
  const lps = ids.show.listeningPoints as { x: number; y: number }[];
  const id = isolated(state.layout).find((k) => state.layout[k]!.y < 30)!;
  const times: number[] = [];
  for (let i = 0; i < DRAGS; i++) {
    const at = (await editorState(page)).layout[id]!;
    await page.evaluate(() => {
      const w = window as unknown as { __saveTimes: { up: number; saved: number } };
      w.__saveTimes = { up: 0, saved: 0 };
      const status = document.querySelector('[data-testid="save-status"]')!;
      window.addEventListener("mouseup", () => (w.__saveTimes.up = performance.now()), { once: true, capture: true });
      const seen: string[] = [];
      new MutationObserver((_m, obs) => {
        const s = status.getAttribute("data-status")!;
        seen.push(s);
        if (s === "saved" && seen.length > 1) {
          w.__saveTimes.saved = performance.now();
          obs.disconnect();
        }
      }).observe(status, { attributes: true });
    });
    const from = await screenOf(page, lps, at.x, at.y);
    const to = await screenOf(page, lps, at.x, at.y + (i % 2 ? -2.5 : 2.5));
    await drag(page, from, to, 6);
    await page.waitForFunction(() => (window as unknown as { __saveTimes: { saved: number } }).__saveTimes.saved > 0, undefined, { timeout: 30_000 });
    const t = await page.evaluate(() => (window as unknown as { __saveTimes: { up: number; saved: number } }).__saveTimes);
    times.push(t.saved - t.up);
  }
  return times;
}

async function main() {
  const ids = await demoIds();
  const session = await launchBrowser({ width: 1366, height: 850 });
  try {
    const { page } = session;
    await signIn(page, DEMO.director);
    const list = pages(ids);
    // One unmeasured pass: a running server has compiled its routes and filled its stored analyses.
    for (const p of list) await timeLoad(page, APP_URL + p.path, p.ready);
    const results: { name: string; p50: number; p95: number }[] = [];
    let editor: number[] = [];
    for (const p of list) {
      const times: number[] = [];
      for (let i = 0; i < LOADS; i++) times.push(await timeLoad(page, APP_URL + p.path, p.ready));
      if (p.name === "field editor") editor = times;
      results.push({ name: p.name, p50: quantile(times, 0.5), p95: quantile(times, 0.95) });
      console.log(`${p.name.padEnd(13)} usable after p50 ${round(quantile(times, 0.5))} ms, p95 ${round(quantile(times, 0.95))} ms (${LOADS} loads)`);
    }
    const worst = results.reduce((a, b) => (b.p95 > a.p95 ? b : a));
    const editorMixMs = quantile(editor, 0.5);
    const saves = await dragSaves(page, ids);
    const dragSaveMs = quantile(saves, 0.5);
    console.log(`worst page: ${worst.name}, p95 ${round(worst.p95)} ms (target under 1000 ms)`);
    console.log(`field editor until the box mix shows: median ${round(editorMixMs)} ms (target under 1000 ms)`);
    console.log(`drag released until saved: median ${round(dragSaveMs)} ms over ${saves.length} drags, max ${round(Math.max(...saves))} ms (target under 300 ms)`);
    if (session.problems.length) console.log(`browser problems: ${session.problems.join("; ")}`);
    console.log(JSON.stringify({ pageP95Ms: round(worst.p95), pageP95Page: worst.name, editorMixMs: round(editorMixMs), dragSaveMs: round(dragSaveMs) }));
  } finally {
    await session.close();
  }
}

main().then(
  () => process.exit(0),
  (err) => {
    console.error(err);
    process.exit(1);
  },
);
