// The show on a phone (390 × 844): the show's pages fold into one menu so content starts near the top,
// the field fills the width, and a performer's own page lists every set with a picture. Screenshots of
// each go to .tmp/screenshots/ for a person to look at.
import { mkdir } from "node:fs/promises";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { APP_URL, DEMO, demoIds } from "../support/api";
import { launchBrowser, signIn, type BrowserSession } from "../support/browser";

const SHOTS = path.join(process.cwd(), ".tmp", "screenshots");
let session: BrowserSession;
let ids: Awaited<ReturnType<typeof demoIds>>;

beforeAll(async () => {
  ids = await demoIds();
  await mkdir(SHOTS, { recursive: true });
  session = await launchBrowser({ width: 390, height: 844 });
  await signIn(session.page, DEMO.staff);
}, 120_000);
afterAll(async () => session?.close());

describe("on a phone", () => {
  it("folds the show's pages into one menu above the content", async () => {
    const { page } = session;
    await page.goto(`${APP_URL}/shows/${ids.showId}/music`);
    const nav = page.getByRole("navigation", { name: "Show pages" });
    const menu = nav.getByText("Show pages: Music");
    await menu.waitFor();
    expect((await nav.boundingBox())!.height).toBeLessThan(60);
    const title = await page.getByRole("heading", { level: 1, name: "Music" }).boundingBox();
    expect(title!.y).toBeLessThan(300);
    await page.screenshot({ path: path.join(SHOTS, "phone-music.png") });
    await menu.click();
    await nav.getByRole("link", { name: "Timeline" }).click();
    await page.waitForURL(/\/timeline$/);
    expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390);
  }, 90_000);

  it("gives the field editor the width of the screen", async () => {
    const { page } = session;
    await page.goto(`${APP_URL}/shows/${ids.showId}/sets/${ids.setIds[0]}`);
    const canvas = page.locator("canvas").first();
    await canvas.waitFor();
    await page.screenshot({ path: path.join(SHOTS, "phone-editor.png") });
    const box = (await canvas.boundingBox())!;
    expect(box.width).toBeGreaterThanOrEqual(370);
    expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390);
  }, 90_000);

  it("shows a performer their own dots, set by set, with a picture", async () => {
    const { page, problems } = session;
    const t1 = ids.show.performers.find((p: { label: string }) => p.label === "T1");
    await page.goto(`${APP_URL}/shows/${ids.showId}/performer/${t1.label}`);
    await page.getByRole("heading", { level: 1, name: "T1" }).waitFor();
    const first = page.getByRole("listitem").filter({ has: page.getByRole("heading", { name: /^Set 1\b/ }) });
    await first.getByText(/yard line|on the 50/).first().waitFor();
    const picture = first.getByRole("img", { name: "Set 1: T1 among the band" });
    expect((await picture.boundingBox())!.width).toBeGreaterThan(300);
    const sets = await page.getByRole("heading", { level: 2, name: /^Set / }).count();
    expect(sets).toBe(ids.setIds.length);
    await page.screenshot({ path: path.join(SHOTS, "phone-performer.png"), fullPage: false });
    expect(problems).toEqual([]);
  }, 90_000);

  it("lets staff mark a kept rehearsal plan's items done on the phone, and the mark is shared", async () => {
    const { page, problems } = session;
    const phrases = (await ids.director.get(`/api/shows/${ids.showId}/rehearsal-plan`)).body.phrases;
    const kept = await ids.director.post(`/api/shows/${ids.showId}/rehearsal-plans`, { name: "At the stadium (phone)", choice: { phraseIds: phrases.slice(0, 2).map((p: any) => p.id), budgetMinutes: 20 } });
    expect(kept.status).toBe(201);
    await page.goto(`${APP_URL}/shows/${ids.showId}/rehearsal/plans/${kept.body.plan.id}`);
    await page.getByRole("heading", { level: 1, name: "At the stadium (phone)" }).waitFor();
    const first = page.locator('[data-item="item-1"]');
    const button = first.getByRole("button", { name: "Mark done" });
    const box = (await button.boundingBox())!;
    expect(box.height).toBeGreaterThanOrEqual(44); // a thumb's target
    expect(box.width).toBeGreaterThan(300);
    await button.click();
    await expect.poll(() => first.getAttribute("data-done")).toBe("yes");
    expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390);
    await page.screenshot({ path: path.join(SHOTS, "phone-rehearsal-plan.png") });
    const seen = (await ids.director.get(`/api/shows/${ids.showId}/rehearsal-plans/${kept.body.plan.id}`)).body.done;
    expect(seen.map((d: any) => d.itemKey)).toEqual(["item-1"]);
    expect(problems).toEqual([]);
  }, 90_000);
});
