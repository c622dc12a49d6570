// The per-performer coordinate sheets on screen: the first sheets come with the page and the rest
// follow in batches, until every performer has a sheet with one small picture per set, each showing
// the set's band (drawn once for the page, by reference) and the performer's own dot.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { APP_URL, DEMO, demoIds } from "../support/api";
import { launchBrowser, signIn, type BrowserSession } from "../support/browser";

let ids: Awaited<ReturnType<typeof demoIds>>;
let session: BrowserSession;

beforeAll(async () => {
  ids = await demoIds();
  session = await launchBrowser({ width: 1366, height: 900 });
  await signIn(session.page, DEMO.director);
}, 120_000);
afterAll(async () => session?.close());

describe("a sheet per performer", () => {
  it("ends with every performer's sheet, one picture per set, each drawing its set's band and the performer's dot", async () => {
    const { page, problems } = session;
    const sheets = (await ids.director.get(`/api/shows/${ids.showId}/sheets`)).body;
    await page.goto(`${APP_URL}/shows/${ids.showId}/sheets`);
    await page.waitForFunction((n) => document.querySelectorAll("section[aria-labelledby^='sheet-']").length === n, sheets.performers.length, { timeout: 60_000 });
    const last = sheets.performers[sheets.performers.length - 1];
    const pictures = page.locator(`ol[aria-label="Where ${last.label} stands in each set"] svg[role="img"]`);
    expect(await pictures.count()).toBe(last.rows.length);
    // Each picture's band is a symbol the page holds, and its own dot is drawn over it.
    const drawn = await pictures.evaluateAll((svgs) =>
      svgs.map((svg) => {
        const ref = svg.querySelector("use")?.getAttribute("href") ?? "";
        const band = ref ? document.getElementById(ref.slice(1)) : null;
        // The field under the band is one drawing shown by reference, not drawn again in every set.
        const field = band?.querySelector("use")?.getAttribute("href");
        // The band's dots are one path, a "M x y h0" (a round-capped dot) per player.
        const dots = band?.querySelector("path[data-dots]")?.getAttribute("d")?.match(/M[^M]+h0/g)?.length ?? 0;
        return { band: dots, own: svg.querySelectorAll("circle").length, fieldLines: band?.querySelectorAll("line").length, sharedField: !!field && !!document.getElementById(field.slice(1)) };
      }),
    );
    const placed = (set: string) => sheets.sets.find((s: { number: string }) => s.number === set).dots.length;
    expect(drawn).toEqual(last.rows.map((r: { set: string }) => ({ band: placed(r.set), own: 2, fieldLines: 0, sharedField: true })));
    expect(problems).toEqual([]);
  }, 120_000);
});

describe("a sheet per set", () => {
  it("ends with every set's sheet, each listing every dot in words", async () => {
    const { page, problems } = session;
    const sheets = (await ids.director.get(`/api/shows/${ids.showId}/sheets`)).body;
    await page.goto(`${APP_URL}/shows/${ids.showId}/sheets?by=sets`);
    await page.waitForFunction((n) => document.querySelectorAll("section[aria-labelledby^='set-']").length === n, sheets.sets.length, { timeout: 60_000 });
    const last = sheets.sets[sheets.sets.length - 1];
    const lines = page.locator(`section[aria-labelledby="set-${last.number}"] li`);
    expect(await lines.count()).toBe(last.dots.length);
    expect(await lines.first().textContent()).toContain(last.dots[0].sideToSide);
    await expect.poll(() => page.getByRole("status").filter({ hasText: "Preparing" }).count()).toBe(0);
    expect(problems).toEqual([]);
  }, 120_000);
});
