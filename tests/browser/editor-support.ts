// Helpers for the field editor's browser tests and bench: open a set, wait for its stored mix,
// and find a performer on the screen from its field position (the same fitted view the stage uses).
import type { Page } from "playwright-core";
import { fieldBounds, fitView, toScreen } from "@/lib/field/view";
import { APP_URL } from "../support/api";

export async function openSet(page: Page, showId: string, setId: string) {
  await page.goto(`${APP_URL}/shows/${showId}/sets/${setId}`);
  await page.waitForSelector('[data-testid="field-stage"] canvas', { timeout: 60_000 });
  await waitForStoredMix(page);
}

export async function waitForStoredMix(page: Page) {
  await page.waitForSelector('[data-testid="mix-panel"][data-source="stored"]', { timeout: 60_000 });
}

export async function waitSaved(page: Page) {
  await page.waitForSelector('[data-testid="save-status"][data-status="saved"]', { timeout: 30_000 });
}

/** Page coordinates of a field point while the stage shows the whole field (no zoom or pan). */
export async function screenOf(page: Page, listeningPoints: { x: number; y: number }[], x: number, y: number) {
  const box = (await page.locator('[data-testid="field-stage"]').boundingBox())!;
  const w = Math.max(200, Math.floor(box.width - 2)); // 1 px border each side
  const h = Math.max(200, Math.floor(box.height - 2));
  const p = toScreen(fitView(w, h, fieldBounds(listeningPoints)), x, y);
  return { x: box.x + 1 + p.x, y: box.y + 1 + p.y };
}

export async function drag(page: Page, from: { x: number; y: number }, to: { x: number; y: number }, steps = 12) {
  await page.mouse.move(from.x, from.y);
  await page.mouse.down();
  await page.mouse.move(to.x, to.y, { steps });
  await page.mouse.up();
}

export const editorState = (page: Page) =>
  page.evaluate(() => {
    const e = window.__farfieldEditor!;
    return { version: e.version(), layout: e.layout(), preview: e.previewMix(), stored: e.storedMix() };
  });

/** Performers with nobody else within `minM` metres: one click picks them and no neighbour. */
export function isolated(layout: Record<string, { x: number; y: number }>, minM = 2.2): string[] {
  const all = Object.entries(layout);
  return all.filter(([id, a]) => all.every(([other, b]) => other === id || Math.hypot(a.x - b.x, a.y - b.y) >= minM)).map(([id]) => id);
}
