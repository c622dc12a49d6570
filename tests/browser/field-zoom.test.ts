// Zooming the field: two fingers on a touch screen (touch events sent through the DevTools protocol,
// as a tablet's browser would send them), the mouse wheel and the buttons. Zooming moves no one.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { CDPSession, Page } from "playwright-core";
import { DEMO, demoIds } from "../support/api";
import { launchBrowser, signIn, type BrowserSession } from "../support/browser";
import { editorState, openSet } from "./editor-support";

let session: BrowserSession;
let page: Page;
let cdp: CDPSession;

beforeAll(async () => {
  const ids = await demoIds();
  session = await launchBrowser({ width: 820, height: 1180 });
  page = session.page;
  cdp = await session.context.newCDPSession(page);
  await cdp.send("Emulation.setTouchEmulationEnabled", { enabled: true, maxTouchPoints: 5 });
  await signIn(page, DEMO.designer);
  await openSet(page, ids.showId, ids.setIds[3]!);
});

afterAll(async () => {
  await session?.close();
});

const stage = () => page.locator('[data-testid="field-stage"]');
const scale = async () => Number(await stage().getAttribute("data-scale"));

/** Two fingers, level with each other about a point of the end zone (no performer there), from `from` px apart to `to`. */
async function pinch(from: number, to: number) {
  const box = (await stage().boundingBox())!;
  const cx = box.x + box.width * 0.1;
  const cy = box.y + box.height * 0.5;
  const points = (d: number) => [{ x: cx - d / 2, y: cy, id: 1 }, { x: cx + d / 2, y: cy, id: 2 }];
  await cdp.send("Input.dispatchTouchEvent", { type: "touchStart", touchPoints: points(from) });
  for (let i = 1; i <= 10; i++) await cdp.send("Input.dispatchTouchEvent", { type: "touchMove", touchPoints: points(from + ((to - from) * i) / 10) });
  await cdp.send("Input.dispatchTouchEvent", { type: "touchEnd", touchPoints: [] });
  await page.waitForTimeout(100);
}

describe("field zoom", () => {
  it("two fingers moving apart zoom in, moving together zoom out, and no performer moves", async () => {
    const before = await editorState(page);
    const fitted = await scale();
    await pinch(60, 180);
    const zoomed = await scale();
    // The view scales by the ratio of the finger distances after the first move (72 px → 180 px).
    expect(zoomed / fitted).toBeGreaterThan(2);
    expect(zoomed / fitted).toBeLessThan(2.8);
    await pinch(180, 60);
    expect(await scale()).toBeLessThan(zoomed / 2);
    const after = await editorState(page);
    expect(after.layout).toEqual(before.layout);
    expect(after.version).toBe(before.version);
    expect(session.problems).toEqual([]);
  });

  it("the wheel zooms in and out, and Fit returns to the whole field", async () => {
    await page.getByRole("button", { name: "Fit the field" }).click();
    const fitted = await scale();
    const box = (await stage().boundingBox())!;
    await page.mouse.move(box.x + box.width / 2, box.y + box.height / 2);
    await page.mouse.wheel(0, -400);
    await expect.poll(scale).toBeGreaterThan(fitted * 1.5);
    await page.getByRole("button", { name: "Zoom out" }).click();
    await page.getByRole("button", { name: "Fit the field" }).click();
    await expect.poll(scale).toBeCloseTo(fitted, 3);
  });
});
