// A designer brings a drill in from CSV as a new user would: upload, read the preview (every set and
// every bad row), confirm, then see the dots on the field editor where the file put them.
import { mkdirSync, writeFileSync } from "node:fs";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { launchBrowser, signIn, type BrowserSession } from "../support/browser";
import { privateShowCopy } from "../support/upload";
import { editorState } from "./editor-support";

const SHOTS = path.resolve(__dirname, "../../.tmp/shots");
const STEP = 0.5715; // 8 to 5 (common practice)
const YARD = 0.9144;
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

const HEADER = "set,counts,label,side,yard_line,steps_side,in_out,reference,steps_fb,front_back,facing";
// A company front of the trumpets on the front hash, 2 steps apart, centred on the 50.
const TRUMPETS = ["T1", "T2", "T3", "T4", "T5", "T6", "T7", "T8"];
const frontRow = TRUMPETS.map((label, i) => {
  const fromFifty = (i - 3.5) * 2; // steps, side 1 negative
  const side = fromFifty < 0 ? 1 : 2;
  const steps = Math.abs(fromFifty);
  return `77,16,${label},${side},50,${steps},outside,front hash,0,,front`;
});

describe("drill import in the browser", () => {
  it("a bad file shows every bad row by line and cannot be confirmed", async () => {
    const { page } = session;
    const file = path.join(SHOTS, "bad-drill.csv");
    writeFileSync(file, [HEADER, frontRow[0], "77,16,ZZ9,1,50,2,outside,front hash,0,,front", "77,16,T2,1,33,0,,front hash,0,,front"].join("\n"));
    await page.goto(`${process.env.APP_URL}/shows/${copy.showId}/imports`);
    await page.getByLabel("CSV file", { exact: true }).setInputFiles(file);
    await page.getByRole("button", { name: "Preview the import" }).click();
    const errors = page.getByTestId("import-errors");
    await errors.waitFor();
    expect(await errors.locator("li").allInnerTexts()).toEqual([
      expect.stringMatching(/^Line 3: no performer labelled ZZ9/),
      expect.stringMatching(/^Line 4: "33" is not a yard line/),
    ]);
    expect(await page.getByRole("button", { name: "Confirm the import" }).isDisabled()).toBe(true);
    await page.screenshot({ path: path.join(SHOTS, "team-import-errors.png"), fullPage: true });
  });

  it("uploads a drill, reads the preview, confirms and sees the dots on the field", async () => {
    const { page, problems } = session;
    const file = path.join(SHOTS, "good-drill.csv");
    writeFileSync(file, [HEADER, ...frontRow].join("\n") + "\n");
    await page.goto(`${process.env.APP_URL}/shows/${copy.showId}/imports`);
    await page.getByLabel("CSV file", { exact: true }).setInputFiles(file);
    await page.getByRole("button", { name: "Preview the import" }).click();
    const preview = page.getByTestId("import-preview");
    await preview.waitFor();
    expect(await preview.getAttribute("data-writable")).toBe("true");
    expect(await page.getByTestId("preview-sets").innerText()).toMatch(/77\s+16\s+new set: 8 placed, 0 moved, 0 unchanged/);
    await page.screenshot({ path: path.join(SHOTS, "team-import-preview.png"), fullPage: true });

    await page.getByRole("button", { name: "Confirm the import" }).click();
    await page.getByText("Imported: 8 positions in 1 sets (1 new).").waitFor();

    const show = (await copy.director.get(`/api/shows/${copy.showId}`)).body;
    const set = show.sets.find((s: any) => s.number === "77");
    expect(set).toBeTruthy();
    await page.goto(`${process.env.APP_URL}/shows/${copy.showId}/sets/${set.id}`);
    await page.waitForSelector('[data-testid="field-stage"] canvas', { timeout: 60_000 });
    await page.waitForFunction(() => Boolean((window as any).__farfieldEditor?.layout()), null, { timeout: 30_000 });
    const { layout } = await editorState(page);
    const idOf = new Map(show.performers.map((p: any) => [p.label, p.id]));
    TRUMPETS.forEach((label, i) => {
      const dot = layout[idOf.get(label) as string]!;
      expect(dot.x, label).toBeCloseTo((i - 3.5) * 2 * STEP, 6);
      expect(dot.y, label).toBeCloseTo(16.256, 6); // front hash, high-school rules
    });
    // Seven 2-step intervals: 14 steps = 8.75 yards from T1 to T8.
    expect(Math.abs(layout[idOf.get("T8") as string]!.x - layout[idOf.get("T1") as string]!.x) / YARD).toBeCloseTo(8.75, 6);
    await page.screenshot({ path: path.join(SHOTS, "team-import-field.png") });
    expect(problems).toEqual([]);
  });
});
