// A band's own show, start to finish, in the browser with no CSV and no demo data: a new director signs
// up, starts a show, adds twelve performers on screen (and names one), places them in set 1, adds sets 2
// and 3 from the set before, writes two phrases with voices and written dynamics, sets the evening's
// weather, adds a judge on the field as a second listening point, and reads the box mix and the checks
// at both points. Screenshots go to .tmp/screenshots/own-show-*.png.
import { mkdir } from "node:fs/promises";
import { join } from "node:path";
import type { Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { APP_URL, Client, uniqueEmail } from "../support/api";
import { launchBrowser, signIn, type BrowserSession } from "../support/browser";
import { signUp } from "../support/sign-up";
import { editorState, screenOf, waitForStoredMix, waitSaved } from "./editor-support";

const SHOTS = join(process.cwd(), ".tmp", "screenshots");
let session: BrowserSession;
const api = new Client();
let programId: string;
const email = uniqueEmail("own-show");
const password = "own-show-director";

beforeAll(async () => {
  const up = await signUp(api, { name: "Casey Dunmore", email, password, programName: "Lakeside Band" });
  programId = up.body.programId;
  await mkdir(SHOTS, { recursive: true });
  session = await launchBrowser();
  await signIn(session.page, email, password);
}, 120_000);
afterAll(async () => session?.close());

/** The box mix and the checks shown in the editor are the server's stored analysis at the chosen point. */
async function readMixAndChecks(page: Page, showId: string, setId: string, point: { id: string; name: string }) {
  await page.getByLabel(/^Listening point/).selectOption({ label: point.name });
  await waitForStoredMix(page);
  const stored = (await api.get(`/api/shows/${showId}/sets/${setId}/analysis?listeningPointId=${point.id}`)).body;
  expect(stored.mix.totalDbA).toBeGreaterThan(40);
  await expect.poll(async () => Number(await page.getByTestId("mix-total").getAttribute("data-db"))).toBeCloseTo(stored.mix.totalDbA, 6);
  const checks = page.getByTestId("checks-panel");
  for (const c of stored.checks) await checks.getByTestId(`check-${c.id}`).waitFor();
  return stored;
}

describe("a band's own show in the browser", () => {
  it("goes from sign-up to the box mix and checks at two listening points", async () => {
    const { page, problems } = session;
    await page.goto(`${APP_URL}/programs/${programId}`);
    await page.getByLabel("Show name").fill("Lakeside Lights");
    await page.getByRole("button", { name: "Create the show" }).click();
    await page.waitForURL(/\/shows\/[^/]+\/sets\//);
    const showId = new URL(page.url()).pathname.split("/")[2]!;

    // Twelve performers on the overview, one of them named.
    await page.goto(`${APP_URL}/shows/${showId}`);
    const form = page.getByRole("form", { name: "Add performers" });
    for (const [instrument, count, section] of [["Trumpet", 4, "Trumpets"], ["Clarinet", 4, "Clarinets"], ["Tuba / sousaphone", 2, "Tubas"], ["Snare line", 2, "Snares"]] as const) {
      await form.getByLabel(/^Instrument/).selectOption({ label: instrument });
      await form.getByLabel("How many").fill(String(count));
      await form.getByLabel(/^Section/).fill(section);
      await form.getByRole("button", { name: "Add to the roster" }).click();
      await page.getByText(`Added ${count} performers`).waitFor();
    }
    await page.getByRole("button", { name: "Edit T1" }).click();
    const edit = page.getByRole("form", { name: "Edit T1" });
    await edit.getByLabel(/^Name/).fill("Jordan Reyes");
    await edit.getByRole("button", { name: "Save T1" }).click();
    await page.getByRole("cell", { name: "Jordan Reyes" }).waitFor();
    await page.screenshot({ path: join(SHOTS, "own-show-roster.png"), fullPage: true });

    // Set 1: every performer placed with clicks, a block of 6 by 2 between the 45s.
    let show = (await api.get(`/api/shows/${showId}`)).body;
    expect(show.performers).toHaveLength(12);
    const lps = () => show.listeningPoints as { x: number; y: number }[];
    await page.goto(`${APP_URL}/shows/${showId}/sets/${show.sets[0].id}`);
    await page.waitForSelector('[data-testid="field-stage"] canvas', { timeout: 60_000 });
    await page.locator('[data-testid="unplaced"] button').first().click();
    for (let i = 0; i < 12; i++) {
      const spot = await screenOf(page, lps(), -4.572 + (i % 6) * 1.8288, 14 + Math.floor(i / 6) * 2.286);
      await page.mouse.click(spot.x, spot.y);
    }
    await page.keyboard.press("Escape");
    await expect.poll(async () => Object.keys((await editorState(page)).layout).length, { timeout: 30_000 }).toBe(12);
    await waitSaved(page);

    // Sets 2 and 3 start from the set before.
    for (const n of [2, 3]) {
      const here = page.url();
      await page.getByRole("button", { name: "Add set", exact: true }).click();
      await page.waitForURL((u) => u.toString() !== here, { timeout: 30_000 });
      await page.waitForSelector('[data-testid="field-stage"] canvas', { timeout: 60_000 });
      await expect.poll(async () => Object.keys((await editorState(page)).layout).length, { timeout: 30_000 }).toBe(12);
      show = (await api.get(`/api/shows/${showId}`)).body;
      expect(show.sets).toHaveLength(n);
    }

    // Two phrases: the opening over sets 1–2 (trumpet melody), the closer at set 3 (clarinet melody).
    await page.goto(`${APP_URL}/shows/${showId}/music`);
    const voicing: Record<string, Record<string, [string, string]>> = {
      Opening: { Trumpets: ["melody", "f"], Clarinets: ["accompaniment", "mf"], Tubas: ["bass", "mf"], Snares: ["percussion", "mp"] },
      Closer: { Clarinets: ["melody", "f"], Trumpets: ["accompaniment", "mp"], Tubas: ["bass", "mp"], Snares: ["percussion", "p"] },
    };
    for (const [name, last] of [["Opening", "2"], ["Closer", "3"]] as const) {
      await page.getByRole("button", { name: "New phrase" }).click();
      const phrase = page.getByRole("form", { name: "New phrase" });
      await phrase.getByLabel("Name").fill(name);
      await phrase.getByLabel("To").selectOption({ label: `Set ${last}` });
      await page.getByRole("button", { name: "Make the phrase" }).click();
      await page.getByText(`Made ${name}.`).waitFor();
      for (const [section, [voice, dynamic]] of Object.entries(voicing[name]!)) {
        await page.getByLabel(`Voice of ${section}`).selectOption(voice);
        await page.getByText(`Saved ${section}.`).waitFor();
        await page.getByLabel(`Written dynamic of ${section}`).selectOption(dynamic);
        await expect.poll(() => page.getByLabel(`Written dynamic of ${section}`).inputValue()).toBe(dynamic);
      }
    }
    const music = (await api.get(`/api/shows/${showId}/music`)).body;
    expect(music.phrases.map((p: any) => [p.name, p.firstSetNumber, p.lastSetNumber])).toEqual([["Opening", "1", "2"], ["Closer", "3", "3"]]);
    await page.screenshot({ path: join(SHOTS, "own-show-music.png"), fullPage: true });

    // The evening's weather and a judge on the field.
    await page.goto(`${APP_URL}/shows/${showId}/settings`);
    const details = page.getByRole("form", { name: "Name, field rules and weather" });
    await details.getByLabel("Temperature (°C)").fill("14");
    await details.getByLabel("Relative humidity (%)").fill("70");
    await details.getByRole("button", { name: "Save name and weather" }).click();
    await page.getByText("Saved. Every analysis now uses this weather.").waitFor();
    await page.getByRole("button", { name: "Add a listening point" }).click();
    const point = page.getByRole("form", { name: "New listening point" });
    await point.getByLabel("Name").fill("Judge on the field");
    await point.getByLabel("In words").fill("side 1: on the 45, 5 m in from the front sideline, 1.7 m up");
    await point.getByRole("button", { name: "Use these words" }).click();
    await point.getByRole("button", { name: "Add this listening point" }).click();
    await page.getByText(/^Saved\. Choose "Judge on the field"/).waitFor();
    show = (await api.get(`/api/shows/${showId}`)).body;
    expect(show.show.conditions).toMatchObject({ temperatureC: 14, relativeHumidityPct: 70 });
    const judge = show.listeningPoints.find((l: any) => l.name === "Judge on the field");
    const box = show.listeningPoints.find((l: any) => l.name === "Press box");

    // The box mix and the checks at both points, in set 2 (the opening's trumpet melody).
    const setId = show.sets[1].id;
    await page.goto(`${APP_URL}/shows/${showId}/sets/${setId}`);
    await page.waitForSelector('[data-testid="field-stage"] canvas', { timeout: 60_000 });
    const atBox = await readMixAndChecks(page, showId, setId, box);
    await page.screenshot({ path: join(SHOTS, "own-show-box.png") });
    const atJudge = await readMixAndChecks(page, showId, setId, judge);
    await page.screenshot({ path: join(SHOTS, "own-show-judge.png") });
    // The judge stands 5 m from the front sideline, the box 25 m behind it and 18 m up: the judge hears more.
    expect(atJudge.mix.totalDbA).toBeGreaterThan(atBox.mix.totalDbA);
    expect(Object.keys(atBox.mix.voices)).toEqual(expect.arrayContaining(["melody", "bass"]));
    expect(problems).toEqual([]);
  }, 400_000);
});
