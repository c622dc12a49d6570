// Playing a transition in the field editor: at a tempo chosen by the user, through every count in
// order, then one count back and forward at a time and to any count with the scrubber. Count 0 shows
// the previous set's positions and the last count this set's (what a transition is; common practice,
// no source); in between, every performer stands on the path between the two.
import { mkdirSync } from "node:fs";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { APP_URL, DEMO, demoIds } from "../support/api";
import { copyDemoShow } from "../support/show-copy";
import { launchBrowser, signIn, type BrowserSession } from "../support/browser";
import { editorState, openSet } from "./editor-support";

const SHOTS = path.resolve(__dirname, "../../.tmp/shots");
let ids: Awaited<ReturnType<typeof demoIds>>;
let session: BrowserSession;

beforeAll(async () => {
  ids = await demoIds();
  mkdirSync(SHOTS, { recursive: true });
  session = await launchBrowser();
  await signIn(session.page, DEMO.staff);
}, 120_000);
afterAll(async () => session?.close());

type Spot = { x: number; y: number };
const shown = (page: BrowserSession["page"]) => page.evaluate(() => ({ count: window.__farfieldEditor!.shownCount(), at: window.__farfieldEditor!.shown() }));

describe("transition playback", () => {
  it("plays at a set tempo count by count, steps one count back and forward, and scrubs", async () => {
    const { page, problems } = session;
    const k = 4;
    const setId = ids.setIds[k]!;
    const [prev, here] = await Promise.all([ids.director.get(`/api/shows/${ids.showId}/sets/${ids.setIds[k - 1]}`), ids.director.get(`/api/shows/${ids.showId}/sets/${setId}`)]);
    const counts = ids.show.sets[k].counts as number;
    expect(counts).toBeGreaterThan(2);
    const before = new Map<string, Spot>(prev.body.positions.map((p: any) => [p.performerId, p]));
    const after = new Map<string, Spot>(here.body.positions.map((p: any) => [p.performerId, p]));
    await openSet(page, ids.showId, setId);

    // The fastest tempo offered keeps the test short; what is checked is the order of the counts, not their timing.
    await page.getByTestId("tempo").fill("240");
    await page.getByTestId("play-transition").click();
    const seen: number[] = [];
    await expect
      .poll(
        async () => {
          const c = (await shown(page)).count;
          if (c !== null && seen.at(-1) !== c) seen.push(c);
          return c === null && seen.length > 0;
        },
        { timeout: 60_000, interval: 40 },
      )
      .toBe(true);
    expect(seen[0]).toBeLessThanOrEqual(1); // count 0 lasts one beat; a busy machine may poll after it
    expect(seen.at(-1)).toBe(counts);
    for (let i = 1; i < seen.length; i++) expect(seen[i]! - seen[i - 1]!).toBeGreaterThan(0);
    expect(seen.length).toBeGreaterThan(counts / 2); // most counts were shown, one after another

    // From the set itself, one count back, then back to count 1 and forward.
    await page.getByTestId("count-back").click();
    expect((await shown(page)).count).toBe(counts - 1);
    expect(await page.getByTestId("shown-count").textContent()).toBe(`Count ${counts - 1} of ${counts}`);
    await page.getByTestId("count-scrubber").fill("0");
    const zero = await shown(page);
    expect(zero.count).toBe(0);
    for (const [id, p] of Object.entries(zero.at)) {
      const b = before.get(id);
      if (b && after.has(id)) {
        expect(p.x).toBeCloseTo(b.x, 6);
        expect(p.y).toBeCloseTo(b.y, 6);
      }
    }
    await page.getByTestId("count-forward").click();
    await page.getByTestId("count-forward").click();
    const two = await shown(page);
    expect(two.count).toBe(2);
    // Between the sets, each performer on the segment from where they were to where they go.
    for (const [id, p] of Object.entries(two.at)) {
      const a = before.get(id);
      const b = after.get(id);
      if (!a || !b) continue;
      const len = Math.hypot(b.x - a.x, b.y - a.y);
      expect(Math.hypot(p.x - a.x, p.y - a.y) + Math.hypot(b.x - p.x, b.y - p.y)).toBeLessThan(len + 0.05 + len * 1e-6);
    }
    await page.screenshot({ path: path.join(SHOTS, "transition-count-2.png") });
    await page.getByTestId("count-scrubber").fill(String(counts));
    const end = await shown(page);
    expect(end.count).toBe(counts);
    for (const [id, p] of Object.entries(end.at)) {
      const b = after.get(id);
      if (b) expect(Math.hypot(p.x - b.x, p.y - b.y)).toBeLessThan(1e-6);
    }
    await page.getByRole("button", { name: /^Show set / }).click();
    expect((await shown(page)).count).toBeNull();
    expect(problems).toEqual([]);
  });

  it("adds a set that starts from this set's positions, with snap to steps on", async () => {
    const copy = await copyDemoShow("add-from");
    const s = await launchBrowser();
    try {
      await signIn(s.page, copy.email, copy.password);
      const from = copy.show.sets[2];
      await openSet(s.page, copy.showId, from.id);
      expect(await s.page.getByLabel("Snap to steps").isChecked()).toBe(true);
      await s.page.getByRole("button", { name: "Add set", exact: true }).click();
      await s.page.waitForURL((url) => !url.pathname.endsWith(from.id), { timeout: 30_000 });
      await s.page.waitForSelector('[data-testid="field-stage"] canvas', { timeout: 60_000 });
      const newId = new URL(s.page.url()).pathname.split("/").at(-1)!;
      const [source, added] = await Promise.all([copy.client.get(`/api/shows/${copy.showId}/sets/${from.id}`), copy.client.get(`/api/shows/${copy.showId}/sets/${newId}`)]);
      expect(added.body.positions).toEqual(source.body.positions);
      const order = (await copy.client.get(`/api/shows/${copy.showId}`)).body.sets;
      expect(order[3]).toMatchObject({ id: newId, counts: 8 }); // right after the set it came from
      await expect.poll(async () => Object.keys((await editorState(s.page)).layout).length).toBe(source.body.positions.length);
      expect(s.page.url()).toContain(APP_URL);
      expect(s.problems).toEqual([]);
    } finally {
      await s.close();
    }
  }, 120_000);
});
