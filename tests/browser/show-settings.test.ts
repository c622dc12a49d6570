// The show's settings in the browser: a director sets the evening's weather, adds a judge on the field as
// a second listening point (placed by words, with a crowd behind), and reads the box mix there in the
// field editor; the figures shown are the server's stored analysis at that point. Screenshots in .tmp/shots.
import { mkdirSync } from "node:fs";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { APP_URL } from "../support/api";
import { launchBrowser, signIn, type BrowserSession } from "../support/browser";
import { copyDemoShow } from "../support/show-copy";
import { waitForStoredMix } from "./editor-support";

const SHOTS = path.resolve(__dirname, "../../.tmp/shots");
let copy: Awaited<ReturnType<typeof copyDemoShow>>;
let session: BrowserSession;

beforeAll(async () => {
  mkdirSync(SHOTS, { recursive: true });
  copy = await copyDemoShow("settings-ui");
  session = await launchBrowser();
  await signIn(session.page, copy.email, copy.password);
}, 120_000);
afterAll(async () => session?.close());

describe("show settings page", () => {
  it("sets the weather, adds a judge on the field with a crowd behind, and reads the box mix there", async () => {
    const { page, problems } = session;
    const { client, showId } = copy;
    await page.goto(`${APP_URL}/shows/${showId}/settings`);
    const details = page.getByRole("form", { name: "Name, field rules and weather" });
    await details.getByLabel("Temperature (°C)").fill("12.5");
    await details.getByLabel("Relative humidity (%)").fill("85");
    await details.getByRole("button", { name: "Save name and weather" }).click();
    await page.getByText("Saved. Every analysis now uses this weather.").waitFor();
    expect((await client.get(`/api/shows/${showId}`)).body.show.conditions).toMatchObject({ temperatureC: 12.5, relativeHumidityPct: 85 });

    // A refusal is said in words and nothing changes.
    await details.getByLabel("Relative humidity (%)").fill("3");
    await details.getByRole("button", { name: "Save name and weather" }).click();
    await page.getByText("Not saved: Humidity must be between 10 and 100 %.").waitFor();
    expect((await client.get(`/api/shows/${showId}`)).body.show.conditions.relativeHumidityPct).toBe(85);

    await page.getByRole("button", { name: "Add a listening point" }).click();
    const point = page.getByRole("form", { name: "New listening point" });
    await point.getByLabel("Name").fill("Judge on the field");
    await point.getByLabel("In words").fill("side 1: on the 40, 20 yards in from the front sideline, 1.7 m up");
    await point.getByRole("button", { name: "Use these words" }).click();
    await expect.poll(() => point.getByTestId("point-words").textContent()).toBe("side 1: on the 40 yard line, 20 yards in from the front sideline, 1.7 m up");
    await point.getByLabel(/^Background noise/).selectOption("crowd-during-performance");
    await page.screenshot({ path: path.join(SHOTS, "settings-new-point.png"), fullPage: true });
    await point.getByRole("button", { name: "Add this listening point" }).click();
    await page.getByText(/^Saved\. Choose "Judge on the field"/).waitFor();
    const judge = (await client.get(`/api/shows/${showId}`)).body.listeningPoints.find((l: any) => l.name === "Judge on the field");
    // The 40 on side 1 is 10 yd (9.144 m) from the 50; 20 yd in from the front sideline is 18.288 m.
    expect(judge).toMatchObject({ z: 1.7, background: { preset: "crowd-during-performance" } });
    expect(judge.y).toBeCloseTo(18.288, 2);
    expect(judge.x).toBeCloseTo(-9.14, 2);

    // The box mix at the judge, in the field editor.
    const setId = copy.show.sets[5].id;
    await page.goto(`${APP_URL}/shows/${showId}/sets/${setId}`);
    await page.waitForSelector('[data-testid="field-stage"] canvas', { timeout: 60_000 });
    await page.getByLabel(/^Listening point/).selectOption({ label: "Judge on the field" });
    await page.getByText("Box mix at Judge on the field").waitFor();
    await waitForStoredMix(page);
    const stored = (await client.get(`/api/shows/${showId}/sets/${setId}/analysis?listeningPointId=${judge.id}`)).body;
    await expect.poll(async () => Number(await page.getByTestId("mix-total").getAttribute("data-db"))).toBe(stored.mix.totalDbA);
    expect(stored.loudness.backgroundSone).toBeGreaterThan(0);
    await page.getByTestId("mix-loudness").getByText(`background ${stored.loudness.backgroundSone.toFixed(1)} sone`).waitFor();
    // A judge 20 yards in front of the band hears it louder than the box 25 m behind the sideline and 18 m up.
    const box = (await client.get(`/api/shows/${showId}/sets/${setId}/analysis?listeningPointId=${copy.pressBoxId}`)).body;
    expect(stored.mix.totalDbA).toBeGreaterThan(box.mix.totalDbA);
    await page.screenshot({ path: path.join(SHOTS, "settings-judge-mix.png") });
    // The one refusal above is the humidity of 3 %, which the browser logs as a failed request.
    expect(problems.filter((p) => !p.includes("status of 400"))).toEqual([]);
    expect(problems.filter((p) => p.includes("status of 400"))).toHaveLength(1);
  });

  it("staff read the settings and change nothing", async () => {
    // The settings page for a read-only member: the demo staff on the demo show.
    const s = await launchBrowser();
    try {
      await signIn(s.page, "staff@harbor-ridge.example");
      const me = await s.page.evaluate(() => fetch("/api/me").then((r) => r.json()));
      const programId = me.memberships.find((m: any) => m.programName.startsWith("Harbor Ridge")).programId;
      const shows = await s.page.evaluate((id) => fetch(`/api/programs/${id}/shows`).then((r) => r.json()), programId);
      await s.page.goto(`${APP_URL}/shows/${shows.shows[0].id}/settings`);
      await s.page.getByText("Read only: a director or designer changes these.").waitFor();
      expect(await s.page.getByRole("button", { name: "Save name and weather" }).count()).toBe(0);
      expect(await s.page.getByRole("button", { name: "Add a listening point" }).count()).toBe(0);
      expect(await s.page.getByLabel("Show name").isDisabled()).toBe(true);
      expect(s.problems).toEqual([]);
    } finally {
      await s.close();
    }
  });
});
