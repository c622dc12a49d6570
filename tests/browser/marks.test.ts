// Performer marks of our own: on the field editor, the compare view, the hearing map and the sheets
// every performer is a sound wedge toward their facing (its spread from the catalog's directivity,
// lib/field/marks.ts) with the voice on the dot, and a legend says so. No shape-per-family code is
// left. Screenshots for a person to look at go to .tmp/shots/marks-*.png (or MARKS_SHOTS).
import { mkdirSync } from "node:fs";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { APP_URL, DEMO, demoIds } from "../support/api";
import { launchBrowser, signIn, type BrowserSession } from "../support/browser";
import { openSet } from "./editor-support";

const SHOTS = process.env.MARKS_SHOTS ?? path.resolve(__dirname, "../../.tmp/shots");
let ids: Awaited<ReturnType<typeof demoIds>>;
let session: BrowserSession;

beforeAll(async () => {
  ids = await demoIds();
  mkdirSync(SHOTS, { recursive: true });
  session = await launchBrowser({ width: 1366, height: 1000 });
  await signIn(session.page, DEMO.designer);
}, 120_000);
afterAll(async () => session?.close());

describe("performer marks", () => {
  it("the field editor's legend explains the wedges by instrument and the voices by colour and outline", async () => {
    const { page, problems } = session;
    await openSet(page, ids.showId, ids.setIds[4]!);
    const legend = page.getByTestId("marks-legend");
    await legend.waitFor();
    const text = await legend.innerText();
    expect(text).toContain("Wedge: where the player faces, as wide as the instrument throws its sound");
    expect(text).toMatch(/Narrow \(Trumpet, Mellophone, Trombone/);
    expect(text).toMatch(/Wide \(Piccolo, Flute, Clarinet/);
    expect(text).toMatch(/All round \(Snare line/);
    expect(text).toMatch(/Melody\s+\(solid\)/);
    expect(text).not.toMatch(/Shape|family/i);
    await page.locator('[data-testid="field-stage"]').scrollIntoViewIfNeeded();
    await page.screenshot({ path: path.join(SHOTS, "marks-editor.png"), fullPage: true });
    await legend.screenshot({ path: path.join(SHOTS, "marks-legend.png") });
    expect(problems).toEqual([]);
  }, 120_000);

  it("the compare view, the hearing map and the sheets draw a wedge for every performer", async () => {
    const { page, problems } = session;
    const setA = await ids.director.get(`/api/shows/${ids.showId}/sets/${ids.setIds[4]}`);
    await page.goto(`${APP_URL}/shows/${ids.showId}/compare?a=${ids.setIds[4]}&b=${ids.setIds[5]}`);
    const field = page.getByRole("img", { name: /^Field at set / }).first();
    await field.waitFor({ timeout: 60_000 });
    await expect.poll(() => field.locator("path").count(), { timeout: 30_000 }).toBe(setA.body.positions.length);
    await page.getByTestId("spread-legend").first().waitFor();
    await page.screenshot({ path: path.join(SHOTS, "marks-compare.png"), fullPage: true });

    await page.goto(`${APP_URL}/shows/${ids.showId}/hearing`);
    const map = page.getByRole("img", { name: /coloured by the estimated level/ });
    await map.waitFor({ timeout: 60_000 });
    const players = map.locator("g.cursor-pointer");
    await expect.poll(() => players.count(), { timeout: 30_000 }).toBeGreaterThan(10);
    expect(await map.locator("g.cursor-pointer path").count()).toBe(await players.count());
    await page.screenshot({ path: path.join(SHOTS, "marks-hearing.png"), fullPage: true });

    const sheets = await ids.director.get(`/api/shows/${ids.showId}/sheets`);
    await page.goto(`${APP_URL}/shows/${ids.showId}/sheets?by=sets`);
    const first = sheets.body.sets[0];
    const picture = page.getByRole("img", { name: `Set ${first.number}: every dot on the field` });
    await picture.waitFor({ timeout: 60_000 });
    expect(await picture.locator("path:not([data-part])").count()).toBe(first.dots.length);
    await picture.screenshot({ path: path.join(SHOTS, "marks-sheet.png") });
    expect(problems).toEqual([]);
  }, 180_000);
});
