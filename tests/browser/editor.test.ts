// The field editor in headless Chromium: a designer drags a performer away from the box and the
// box mix follows; staff cannot move anything; two sessions on one set get a conflict and lose
// nothing; the browser preview agrees with the server's stored analysis; a failing balance check marks
// its players. Screenshots go to .tmp/shots.
import { mkdirSync } from "node:fs";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { DEMO, demoIds } from "../support/api";
import { launchBrowser, signIn, type BrowserSession } from "../support/browser";
import { drag, editorState, isolated, openSet, screenOf, waitForStoredMix, waitSaved } from "./editor-support";

const SHOTS = path.resolve(__dirname, "../../.tmp/shots");
let ids: Awaited<ReturnType<typeof demoIds>>;
const sessions: BrowserSession[] = [];
const open = async (email: string, size?: { width: number; height: number }) => {
  const s = await launchBrowser(size);
  sessions.push(s);
  await signIn(s.page, email);
  return s;
};
const lps = () => ids.show.listeningPoints as { x: number; y: number }[];

beforeAll(async () => {
  ids = await demoIds();
  mkdirSync(SHOTS, { recursive: true });
});

afterAll(async () => {
  for (const s of sessions) await s.close();
});

const num = async (page: BrowserSession["page"], selector: string) => Number(await page.locator(selector).getAttribute("data-db"));

describe("field editor", () => {
  it("a designer drags a performer away from the box: its contribution and its voice's level fall, and the move is kept", async () => {
    const { page, problems } = await open(DEMO.designer);
    const setId = ids.setIds[10]; // outside the clarinet phrase (sets 7–8), which the balance suites read
    await openSet(page, ids.showId, setId);
    const before = await editorState(page);
    // A sounding player (melody if one stands clear) in front of the back hash, clear of the others.
    const free = new Set(isolated(before.layout));
    const melody = before.stored!.mix.performers.filter((p) => free.has(p.performerId));
    const input = await page.evaluate(async (url) => (await fetch(url)).json(), `/api/shows/${ids.showId}/sets/${setId}/mix-input`);
    const voiceOf = new Map(input.input.performers.map((p: any) => [p.id, p.voice]));
    const target = melody
      .map((p) => ({ ...p, voice: voiceOf.get(p.performerId) as string, spot: before.layout[p.performerId] }))
      .filter((p) => p.voice !== "tacet" && p.spot.y < 30)
      .sort((a, b) => Number(b.voice === "melody") - Number(a.voice === "melody") || a.spot.y - b.spot.y)[0];
    expect(target, "a sounding player in front of the back hash, clear of the others").toBeTruthy();
    const voiceBar = `[data-testid="voice-${target.voice}"]`;
    const from = await screenOf(page, lps(), target.spot.x, target.spot.y);
    await page.mouse.click(from.x, from.y);
    await expect.poll(() => page.locator('[data-testid="selection"]').getAttribute("data-performer")).toBe(target.performerId);
    const contributionBefore = await num(page, '[data-testid="selection-contribution"]');
    const voiceBefore = await num(page, voiceBar);
    expect(contributionBefore).toBeCloseTo(target.dbA!, 6);
    await page.screenshot({ path: path.join(SHOTS, "editor-laptop-selected.png") });

    const to = await screenOf(page, lps(), target.spot.x, 47);
    await drag(page, from, to);
    await waitSaved(page);
    await waitForStoredMix(page);
    const contributionAfter = await num(page, '[data-testid="selection-contribution"]');
    const voiceAfter = await num(page, voiceBar);
    expect(contributionAfter).toBeLessThan(contributionBefore - 1);
    expect(voiceAfter).toBeLessThan(voiceBefore);
    expect(await page.locator('[data-testid="selection-words"]').textContent()).toMatch(/back sideline/);
    await page.screenshot({ path: path.join(SHOTS, "editor-laptop-after-drag.png") });

    await page.reload();
    await waitForStoredMix(page);
    const after = await editorState(page);
    expect(after.layout[target.performerId].y).toBeCloseTo(47, 0);
    expect(after.layout[target.performerId].x).toBeCloseTo(target.spot.x, 0);
    expect(after.version).toBeGreaterThan(before.version!);
    expect(problems).toEqual([]);
  });

  it("the browser preview and the server's stored analysis agree within 0.01 dB", async () => {
    const { page } = await open(DEMO.director);
    for (const i of [0, 6, 8]) {
      await openSet(page, ids.showId, ids.setIds[i]);
      const { preview, stored } = await editorState(page);
      expect(preview && stored).toBeTruthy();
      expect(Math.abs(preview!.totalDbA - stored!.mix.totalDbA)).toBeLessThan(0.01);
      expect(Math.abs(preview!.arrivalSpreadMs - stored!.mix.arrivalSpreadMs)).toBeLessThan(0.01);
      for (const [v, { dbA }] of Object.entries(stored!.mix.voices)) expect(Math.abs((preview!.voices as any)[v].dbA - dbA), v).toBeLessThan(0.01);
      for (const [s, { dbA }] of Object.entries(stored!.mix.sections)) {
        if (dbA !== null) expect(Math.abs(preview!.sections[s].dbA - dbA), s).toBeLessThan(0.01);
      }
      for (const p of stored!.mix.performers) if (p.dbA !== null) expect(Math.abs(preview!.performers[p.performerId] - p.dbA)).toBeLessThan(0.01);
    }
  });

  it("plays the transition from the previous set count by count, the box mix following", async () => {
    const { page, problems } = await open(DEMO.staff);
    // A set whose performers move well away from where the previous set has them.
    const positionsOf = async (i: number) => new Map(((await ids.director.get(`/api/shows/${ids.showId}/sets/${ids.setIds[i]}`)).body.positions as any[]).map((p) => [p.performerId, p]));
    let chosen = -1;
    for (let i = 1; i < ids.setIds.length && chosen < 0; i++) {
      const [a, b] = [await positionsOf(i - 1), await positionsOf(i)];
      const far = [...b].filter(([id, q]) => a.has(id) && Math.hypot(q.x - a.get(id).x, q.y - a.get(id).y) > 8).length;
      if (far > 20) chosen = i;
    }
    expect(chosen).toBeGreaterThan(0);
    await openSet(page, ids.showId, ids.setIds[chosen]);
    const storedTotal = Number(await page.locator('[data-testid="mix-total"]').getAttribute("data-db"));
    await page.locator('[data-testid="play-transition"]').click();
    await expect.poll(() => page.locator('[data-testid="mix-panel"]').getAttribute("data-source")).toBe("preview");
    const totals = new Set<string>();
    for (let k = 0; k < 8; k++) {
      totals.add((await page.locator('[data-testid="mix-total"]').getAttribute("data-db"))!);
      await page.waitForTimeout(450);
    }
    expect(await page.getByText(/^Count \d+ of \d+$/).count()).toBe(1);
    expect(totals.size).toBeGreaterThan(1); // the mix changes as the performers move
    await page.locator('[data-testid="play-transition"]').click(); // pause on the count shown
    await page.getByRole("button", { name: /^Show set / }).click();
    await waitForStoredMix(page);
    expect(Number(await page.locator('[data-testid="mix-total"]').getAttribute("data-db"))).toBeCloseTo(storedTotal, 1);
    expect(problems).toEqual([]);
  });

  it("staff see the set but cannot move anything, and no save is sent", async () => {
    const { page, problems } = await open(DEMO.staff);
    const setId = ids.setIds[11];
    await openSet(page, ids.showId, setId);
    expect(await page.locator('[data-testid="read-only"]').isVisible()).toBe(true);
    expect(await page.locator('[data-testid="edit-tools"]').count()).toBe(0);
    expect(await page.getByRole("button", { name: "Add set" }).count()).toBe(0);
    const writes: string[] = [];
    page.on("request", (r) => {
      if (r.method() !== "GET") writes.push(`${r.method()} ${r.url()}`);
    });
    const before = await editorState(page);
    const id = isolated(before.layout)[0];
    const spot = before.layout[id];
    const from = await screenOf(page, lps(), spot.x, spot.y);
    await page.mouse.click(from.x, from.y);
    await expect.poll(() => page.locator('[data-testid="selection"]').getAttribute("data-performer")).toBe(id);
    await drag(page, from, { x: from.x + 120, y: from.y - 80 });
    await page.keyboard.press("ArrowRight");
    await page.keyboard.press("Delete");
    await page.waitForTimeout(500);
    const after = await editorState(page);
    expect(after.layout).toEqual(before.layout);
    expect(after.version).toBe(before.version);
    expect(writes).toEqual([]);
    await page.screenshot({ path: path.join(SHOTS, "editor-laptop-staff.png") });
    expect(problems).toEqual([]);
  });

  it("two sessions on one set: the second save gets the conflict message, shows theirs, and re-applies its change", async () => {
    const a = await open(DEMO.designer);
    const b = await open(DEMO.director);
    const setId = ids.setIds[9];
    await openSet(a.page, ids.showId, setId);
    await openSet(b.page, ids.showId, setId);
    const start = await editorState(a.page);
    const free = isolated(start.layout, 3).sort((p, q) => start.layout[p].x - start.layout[q].x);
    const [idA, idB] = [free[0], free[free.length - 1]];
    const [spotA, spotB] = [start.layout[idA], start.layout[idB]];

    // A moves one performer with the keyboard (shift+arrow: four steps toward side 2) and saves.
    const pa = await screenOf(a.page, lps(), spotA.x, spotA.y);
    await a.page.mouse.click(pa.x, pa.y);
    await a.page.keyboard.press("Shift+ArrowRight");
    await expect.poll(async () => (await editorState(a.page)).version, { timeout: 30_000 }).toBe(start.version! + 1);
    await waitSaved(a.page);

    // B, still on the old version, moves another performer: 409.
    const pb = await screenOf(b.page, lps(), spotB.x, spotB.y);
    await b.page.mouse.click(pb.x, pb.y);
    await b.page.keyboard.press("ArrowUp");
    await b.page.waitForSelector('[data-testid="conflict"]', { timeout: 30_000 });
    expect(await b.page.locator('[data-testid="conflict"]').textContent()).toContain("Someone else changed this set");
    await b.page.screenshot({ path: path.join(SHOTS, "editor-laptop-conflict.png") });
    const shown = await editorState(b.page);
    expect(shown.layout[idA].x).toBeCloseTo(spotA.x + 4 * 0.5715, 6); // theirs is shown
    expect(shown.layout[idB].y).toBeCloseTo(spotB.y, 6);

    await b.page.getByRole("button", { name: "Re-apply my change" }).click();
    await waitSaved(b.page);
    const server = await b.page.evaluate(async (url) => (await fetch(url)).json(), `/api/shows/${ids.showId}/sets/${setId}`);
    const at = (id: string) => server.positions.find((p: any) => p.performerId === id);
    expect(at(idA).x).toBeCloseTo(spotA.x + 4 * 0.5715, 6); // A's change kept
    expect(at(idB).y).toBeCloseTo(spotB.y + 0.5715, 6); // B's change re-applied, nothing lost
    expect(server.set.version).toBe(start.version! + 2);
  });

  it("a designer adds an empty set, places performers from the roster with clicks, and deletes the set after confirming", async () => {
    const { page, problems } = await open(DEMO.designer);
    const last = ids.setIds[ids.setIds.length - 1];
    await openSet(page, ids.showId, last);
    await page.getByRole("button", { name: "Add empty set" }).click();
    await page.waitForURL((url) => !url.pathname.endsWith(last), { timeout: 30_000 });
    await page.waitForSelector('[data-testid="field-stage"] canvas', { timeout: 60_000 });
    await expect.poll(async () => (await editorState(page)).version).toBe(1);
    expect(Object.keys((await editorState(page)).layout)).toEqual([]);
    const unplaced = page.locator('[data-testid="unplaced"] button');
    const total = await unplaced.count();
    expect(total).toBeGreaterThan(50);
    await unplaced.first().click();
    for (const [x, y] of [[-4.572, 16.256], [4.572, 16.256]]) {
      const p = await screenOf(page, lps(), x, y);
      await page.mouse.click(p.x, p.y);
    }
    await page.keyboard.press("Escape");
    await expect.poll(async () => (await editorState(page)).version, { timeout: 30_000 }).toBeGreaterThan(1);
    await waitSaved(page);
    await waitForStoredMix(page);
    const placed = Object.values((await editorState(page)).layout);
    expect(placed).toHaveLength(2);
    expect(placed.map((s) => Math.round(s.x))).toEqual(expect.arrayContaining([-5, 5]));
    expect(await unplaced.count()).toBe(total - 2);
    await page.screenshot({ path: path.join(SHOTS, "editor-laptop-new-set.png") });
    const url = page.url();
    await page.getByRole("button", { name: "Delete set…" }).click();
    await page.getByRole("alertdialog").getByRole("button", { name: "Delete" }).click();
    await page.waitForURL((u) => u.toString() !== url, { timeout: 30_000 });
    const show = await page.evaluate(async (u) => (await fetch(u)).json(), `/api/shows/${ids.showId}`);
    expect(show.sets.map((s: any) => s.id)).toEqual(ids.setIds);
    expect(problems).toEqual([]);
  });

  it("choosing a failing balance check marks and selects its players on the field, and the legend explains the mark", async () => {
    const { page, problems } = await open(DEMO.staff);
    // The first demo set with a failing check at the press box that names players.
    let found: { setId: string; check: { id: string; detail: string; performerIds: string[] } } | null = null;
    for (const setId of ids.setIds) {
      const a = await ids.director.get(`/api/shows/${ids.showId}/sets/${setId}/analysis?listeningPointId=${ids.pressBoxId}`);
      const check = (a.body.checks as any[]).find((c) => !c.passed && c.performerIds.length > 0);
      if (check) {
        found = { setId, check };
        break;
      }
    }
    expect(found, "a demo set with a failing check that names players").toBeTruthy();
    const { setId, check } = found!;
    await openSet(page, ids.showId, setId);
    const item = page.locator(`[data-testid="check-${check.id}"]`);
    expect(await item.getAttribute("data-passed")).toBe("false");
    expect(await item.textContent()).toContain("Fails"); // a word, not colour alone
    expect(await item.textContent()).toContain(check.detail);
    const state = () => page.evaluate(() => ({ flagged: window.__farfieldEditor!.flagged().sort(), selected: window.__farfieldEditor!.selected().sort() }));
    expect((await state()).flagged).toEqual([]);
    const button = item.getByRole("button");
    await button.click();
    const want = [...check.performerIds].sort();
    await expect.poll(async () => (await state()).flagged).toEqual(want);
    expect((await state()).selected).toEqual(want);
    expect(await button.getAttribute("aria-pressed")).toBe("true");
    expect(await page.locator('[data-testid="legend-flagged"]').textContent()).toContain("Dashed ring");
    await page.screenshot({ path: path.join(SHOTS, "editor-laptop-check-marked.png") });
    await button.click(); // choosing it again clears the mark
    await expect.poll(async () => (await state()).flagged).toEqual([]);
    expect(await page.locator('[data-testid="legend-flagged"]').count()).toBe(0);
    expect(problems).toEqual([]);
  });

  it("the stored box mix shows the band's loudness in sones and, for each sounding voice, heard or masked in words", async () => {
    const { page, problems } = await open(DEMO.staff);
    await openSet(page, ids.showId, ids.setIds[6]);
    expect(await page.locator('[data-testid="mix-loudness"]').textContent()).toMatch(/Perceived [\d.]+ sone \(\d+ phon\)/);
    let sounding = 0;
    for (const v of ["melody", "countermelody", "accompaniment", "bass", "percussion"]) {
      const row = page.locator(`[data-testid="voice-${v}"]`);
      if (!(await row.getAttribute("data-db"))) continue;
      sounding++;
      const heard = await row.getAttribute("data-heard");
      expect(["true", "false"]).toContain(heard);
      expect(await row.textContent()).toMatch(heard === "true" ? /sone, adds [\d.]+ to the whole · heard/ : /masked/);
    }
    expect(sounding).toBeGreaterThan(0);
    await page.locator('[data-testid="mix-panel"]').screenshot({ path: path.join(SHOTS, "editor-mix-loudness.png") });
    expect(problems).toEqual([]);
  });

  it("fits a tablet-size window (820 × 1180)", async () => {
    const { page, problems } = await open(DEMO.designer, { width: 820, height: 1180 });
    await openSet(page, ids.showId, ids.setIds[4]);
    const box = (await page.locator('[data-testid="field-stage"]').boundingBox())!;
    expect(box.width).toBeGreaterThan(700);
    expect(box.x + box.width).toBeLessThanOrEqual(820);
    expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(820); // nothing spills sideways
    await page.screenshot({ path: path.join(SHOTS, "editor-tablet.png"), fullPage: true });
    expect(problems).toEqual([]);
  });
});
