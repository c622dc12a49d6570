// A director changes a balance threshold on the targets page and goes back to the defaults.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { APP_URL, DEMO, demoIds } from "../support/api";
import { launchBrowser, signIn, type BrowserSession } from "../support/browser";

let session: BrowserSession;
let ids: Awaited<ReturnType<typeof demoIds>>;

beforeAll(async () => {
  ids = await demoIds();
  session = await launchBrowser();
  await signIn(session.page, DEMO.director);
});
afterAll(async () => {
  await ids.director.put(`/api/shows/${ids.showId}/targets`, { reset: true });
  await session?.close();
});

describe("balance targets page", () => {
  it("saves a director's threshold (with the fractional defaults of the other fields) and resets it", async () => {
    const { page, problems } = session;
    await page.goto(`${APP_URL}/shows/${ids.showId}/targets`);
    await page.getByLabel(/Arrival spread/).fill("120");
    await page.getByRole("button", { name: "Save thresholds" }).click();
    await page.getByText("Saved.", { exact: false }).waitFor();
    expect((await ids.director.get(`/api/shows/${ids.showId}/targets`)).body.targets.arrivalSpreadMs).toBe(120);
    await page.getByRole("button", { name: "Use the defaults" }).click();
    await page.getByText("Back to the documented defaults.").waitFor();
    expect((await ids.director.get(`/api/shows/${ids.showId}/targets`)).body.custom).toBeNull();
    expect(problems).toEqual([]);
  });
});
