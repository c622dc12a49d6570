// A director brings the arrangement in on the music page: uploads the demo's own MusicXML score, checks
// the parts' sections (leaving one out and taking it back), anchors set 1 on measure 1, previews,
// confirms, and sees a written dynamic for every section at every set.
import { mkdirSync } from "node:fs";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { LANTERNS_FILE } from "@/db/demo/lanterns-score";
import { launchBrowser, signIn, type BrowserSession } from "../support/browser";
import { privateShowCopy } from "../support/upload";

const SHOTS = path.resolve(__dirname, "../../.tmp/shots");
let copy: Awaited<ReturnType<typeof privateShowCopy>>;
let session: BrowserSession;

beforeAll(async () => {
  mkdirSync(SHOTS, { recursive: true });
  copy = await privateShowCopy();
  session = await launchBrowser();
  await signIn(session.page, copy.email, copy.password);
});
afterAll(async () => {
  await session?.close();
});

describe("the score in, on the music page", () => {
  it("uploads the demo arrangement, maps its parts, anchors set 1, confirms and shows written dynamics for every set", async () => {
    const { page, problems } = session;
    const show = (await copy.director.get(`/api/shows/${copy.showId}`)).body;
    const set1 = show.sets.find((s: any) => s.number === "1");
    await page.goto(`${process.env.APP_URL}/shows/${copy.showId}/music`);
    await page.getByText("No score imported yet.").waitFor();
    await page.getByLabel("MusicXML file (.musicxml, .xml or .mxl)").setInputFiles(LANTERNS_FILE);
    await page.getByRole("button", { name: "Upload and preview" }).click();
    await page.getByTestId("score-preview").waitFor({ timeout: 30_000 });

    // The parts arrive suggested; leave the cymbals out, see what that means, then take them back.
    expect(await page.getByLabel("Section for Trumpet in B♭ 2").inputValue()).toBe("Trumpets");
    await page.getByLabel("Section for Cymbals").selectOption({ label: "Leave out" });
    await page.getByRole("button", { name: "Preview with these choices" }).click();
    await page.getByText("No part is mapped to Cymbals").waitFor();
    await page.getByLabel("Section for Cymbals").selectOption("Cymbals");

    // Set 1 on measure 1, beat 1 (the pickup leads into it).
    await page.getByLabel("Set of anchor 1").selectOption(set1.id);
    await page.getByLabel("Measure of anchor 1").fill("1");
    await page.getByLabel("Beat of anchor 1").fill("1");
    expect(await page.getByRole("button", { name: "Confirm the import" }).isDisabled()).toBe(true);
    await page.getByRole("button", { name: "Preview with these choices" }).click();
    await page.getByText("Preview updated. Nothing has changed yet.").waitFor();
    expect(await page.getByText("No part is mapped to Cymbals").count()).toBe(0);
    const firstRow = await page.getByTestId("score-preview-sets").locator("tbody tr").first().innerText();
    expect(firstRow).toMatch(/^1\s+m\. 1, beat 1\s+/);
    await page.screenshot({ path: path.join(SHOTS, "score-preview.png"), fullPage: true });

    await page.getByRole("button", { name: "Confirm the import" }).click();
    await page.getByText(`Imported: 10 phrases with written dynamics for ${show.sets.length} sets.`).waitFor({ timeout: 30_000 });
    await page.getByTestId("score-summary").getByText("lanterns-on-the-water.musicxml").waitFor();

    const table = page.getByTestId("written-by-set");
    const rows = await table.locator("tbody tr").allInnerTexts();
    expect(rows).toHaveLength(show.sets.length);
    const sections = new Set(show.performers.map((p: any) => p.section)).size;
    for (const row of rows) {
      const cells = row.split("\t").map((c) => c.trim());
      // Set, phrase, then one cell per section: a dynamic, or "rest" where the section is tacet.
      expect(cells.slice(2), row).toHaveLength(sections);
      for (const c of cells.slice(2)) expect(c, row).toMatch(/^(pp|p|mp|mf|f|ff|fff|rest)$/);
    }
    // The clarinets' song at set 7 is written p, as the score marks it at letter D.
    const set7 = rows.find((r) => r.startsWith("7\t"))!;
    const header = (await table.locator("thead th").allInnerTexts()).map((h) => h.trim());
    expect(set7.split("\t")[header.indexOf("Clarinets")]!.trim()).toBe("p");
    await page.screenshot({ path: path.join(SHOTS, "score-written-by-set.png"), fullPage: true });
    expect(problems).toEqual([]);
  });
});
