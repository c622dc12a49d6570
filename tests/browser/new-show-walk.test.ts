// A brand-new show, page by page, as its new director first sees it: every page says what to do next
// (the roster, then the drill, then the music) and none shows an error. Screenshots of each go to
// .tmp/screenshots/new-show-*.png.
import { mkdir } from "node:fs/promises";
import { join } from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { APP_URL, Client, uniqueEmail } from "../support/api";
import { launchBrowser, signIn, type BrowserSession } from "../support/browser";
import { signUp } from "../support/sign-up";

const SHOTS = join(process.cwd(), ".tmp", "screenshots");
let session: BrowserSession;
const api = new Client();
let showId: string;
let firstSetId: string;

beforeAll(async () => {
  const email = uniqueEmail("new-show-walk");
  const up = await signUp(api, { name: "Morgan Ashby", email, password: "new-show-walk-pass", programName: "Walk Band" });
  const created = await api.post(`/api/programs/${up.body.programId}/shows`, { name: "First Steps" });
  showId = created.body.show.id;
  firstSetId = created.body.show.firstSetId;
  await mkdir(SHOTS, { recursive: true });
  session = await launchBrowser();
  await signIn(session.page, email, "new-show-walk-pass");
}, 120_000);
afterAll(async () => session?.close());

describe("a brand-new show", () => {
  it("says on every page what to do next: the roster, then the drill, then the music", async () => {
    const { page, problems } = session;
    const expectNext = async (path: string, words: string | RegExp, shot: string) => {
      await page.goto(`${APP_URL}/shows/${showId}${path}`);
      await page.getByText(words).first().waitFor();
      await page.screenshot({ path: join(SHOTS, `new-show-${shot}.png`), fullPage: true });
    };
    await expectNext("", "No performers yet", "overview");
    await expectNext("/music", /Add the band on the show.s overview first/, "music");
    for (const p of ["/timeline", "/compare", "/hearing", "/rehearsal", "/sheets"]) await expectNext(p, "Next: add the band", p.slice(1));
    await expectNext(`/sets/${firstSetId}`, "Not in this set", "editor");

    // With a roster but nobody on the field, the pages that need the drill ask for it.
    expect((await api.post(`/api/shows/${showId}/performers`, { instrument: "trumpet", count: 4 })).status).toBe(201);
    for (const p of ["/timeline", "/compare", "/hearing", "/sheets"]) await expectNext(p, "Next: place the band on the field", `${p.slice(1)}-roster`);
    await page.getByRole("link", { name: "Open the field editor" }).click();
    await page.waitForURL(/\/sets\//);
    expect(problems).toEqual([]);
  }, 240_000);
});
