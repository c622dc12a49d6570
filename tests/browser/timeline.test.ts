// The show timeline in headless Chromium: a director opens the demo's timeline, follows a failing
// check to its set in the editor, adopts the clarinet phrase's balance plan on the music page and
// sees the timeline's melody check turn green there. Screenshots go to .tmp/shots.
import { mkdirSync } from "node:fs";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { APP_URL, DEMO, demoIds } from "../support/api";
import { launchBrowser, signIn, type BrowserSession } from "../support/browser";

const SHOTS = path.resolve(__dirname, "../../.tmp/shots");
let ids: Awaited<ReturnType<typeof demoIds>>;
let session: BrowserSession;
let phraseId: string;
const setId = (number: string) => ids.show.sets.find((s: any) => s.number === number).id as string;

beforeAll(async () => {
  ids = await demoIds();
  mkdirSync(SHOTS, { recursive: true });
  const music = await ids.director.get(`/api/shows/${ids.showId}/music`);
  phraseId = music.body.phrases.find((p: any) => p.name === "Clarinet song").id;
  await ids.director.call("DELETE", `/api/shows/${ids.showId}/phrases/${phraseId}/plan`);
  session = await launchBrowser();
  await signIn(session.page, DEMO.director);
});

afterAll(async () => {
  await session?.close();
  await ids.director.call("DELETE", `/api/shows/${ids.showId}/phrases/${phraseId}/plan`);
});

describe("show timeline", () => {
  it("shows the melody not forward in the clarinet phrase and a failing check leads to its set", async () => {
    const { page, problems } = session;
    await page.goto(`${APP_URL}/shows/${ids.showId}/timeline`);
    const cell = page.getByRole("link", { name: "Set 7: Melody forward fails" });
    await cell.waitFor({ timeout: 60_000 });
    await page.screenshot({ path: path.join(SHOTS, "balance-timeline-browser.png"), fullPage: true });
    expect(problems).toEqual([]);
    await cell.click();
    await page.waitForURL((url) => url.pathname === `/shows/${ids.showId}/sets/${setId("7")}`, { timeout: 30_000 });
  });

  it("after the director adopts the clarinet phrase's plan, the melody check at set 7 turns green", async () => {
    const { page, problems } = session;
    await page.goto(`${APP_URL}/shows/${ids.showId}/music?phrase=${phraseId}`);
    await page.getByRole("button", { name: "Adopt this plan" }).click();
    await page.getByText("Plan adopted").waitFor({ timeout: 60_000 });
    await page.screenshot({ path: path.join(SHOTS, "balance-music-adopted.png"), fullPage: true });
    await page.goto(`${APP_URL}/shows/${ids.showId}/timeline`);
    await page.getByRole("link", { name: "Set 7: Melody forward passes" }).waitFor({ timeout: 60_000 });
    // Set 7A too; set 8 stays short within the four steps the phrase's limits allow (the plan says so).
    await expect(page.getByRole("link", { name: "Set 7A: Melody forward passes" }).count()).resolves.toBe(1);
    await page.screenshot({ path: path.join(SHOTS, "balance-timeline-adopted.png"), fullPage: true });
    expect(problems.filter((p) => !p.includes("/sets/"))).toEqual([]);
  });
});
