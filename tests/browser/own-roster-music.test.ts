// A new band's roster and music made on screen: no CSV, no demo data. A new director signs up, starts a
// show, adds twelve performers by instrument, names one, and writes two phrases with voices and dynamics.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { APP_URL, Client, uniqueEmail } from "../support/api";
import { launchBrowser, signIn, type BrowserSession } from "../support/browser";
import { signUp } from "../support/sign-up";

let session: BrowserSession;
const api = new Client();
let programId: string;
const email = uniqueEmail("own-roster");
const password = "own-roster-director";

beforeAll(async () => {
  const up = await signUp(api, { name: "Casey Dunmore", email, password, programName: "Lakeside Band" });
  programId = up.body.programId;
  session = await launchBrowser();
  await signIn(session.page, email, password);
}, 120_000);
afterAll(async () => session?.close());

describe("a band's own roster and music in the browser", () => {
  it("adds twelve performers, names one, and makes phrases with voices and written dynamics", async () => {
    const { page, problems } = session;
    await page.goto(`${APP_URL}/programs/${programId}`);
    await page.getByLabel("Show name").fill("Lakeside Lights");
    await page.getByRole("button", { name: "Create the show" }).click();
    await page.waitForURL(/\/shows\/[^/]+\/sets\//);
    const showId = new URL(page.url()).pathname.split("/")[2]!;

    await page.goto(`${APP_URL}/shows/${showId}`);
    await page.getByText("No performers yet").waitFor();
    const form = page.getByRole("form", { name: "Add performers" });
    for (const [instrument, count, section] of [["Trumpet", 4, "Trumpets"], ["Clarinet", 4, "Clarinets"], ["Tuba / sousaphone", 2, "Tubas"], ["Snare line", 2, "Snares"]] as const) {
      await form.getByLabel(/^Instrument/).selectOption({ label: instrument });
      await form.getByLabel("How many").fill(String(count));
      await form.getByLabel(/^Section/).fill(section);
      await form.getByRole("button", { name: "Add to the roster" }).click();
      await page.getByText(`Added ${count} performers`).waitFor();
    }
    expect((await api.get(`/api/shows/${showId}`)).body.performers).toHaveLength(12);

    await page.getByRole("button", { name: "Edit T1" }).click();
    const edit = page.getByRole("form", { name: "Edit T1" });
    await edit.getByLabel(/^Name/).fill("Jordan Reyes");
    await edit.getByLabel(/^Strength/).fill("2");
    await edit.getByRole("button", { name: "Save T1" }).click();
    await page.getByText("Saved T1.").waitFor();
    await page.getByRole("cell", { name: "Jordan Reyes" }).waitFor();
    const t1 = (await api.get(`/api/shows/${showId}`)).body.performers.find((p: any) => p.label === "T1");
    expect(t1).toMatchObject({ name: "Jordan Reyes", strengthDb: 2, section: "Trumpets" });

    await page.goto(`${APP_URL}/shows/${showId}/music`);
    await page.getByText(/No phrases yet\. Make the first one/).waitFor();
    for (const name of ["Opening", "Ballad"]) {
      await page.getByRole("button", { name: "New phrase" }).click();
      await page.getByRole("form", { name: "New phrase" }).getByLabel("Name").fill(name);
      await page.getByRole("button", { name: "Make the phrase" }).click();
      await page.getByText(`Made ${name}.`).waitFor();
    }
    // The second phrase is chosen after it is made; give its sections their voices and dynamics.
    await page.getByLabel("Voice of Clarinets").selectOption("melody");
    await page.getByText("Saved Clarinets.").waitFor();
    await page.getByLabel("Written dynamic of Clarinets").selectOption("mf");
    await page.getByText("Saved Clarinets.").waitFor();
    await page.getByLabel("Voice of Tubas").selectOption("bass");
    await page.getByText("Saved Tubas.").waitFor();

    await page.getByRole("button", { name: "Rename, re-span or delete Ballad" }).click();
    await page.getByRole("form", { name: "Change Ballad" }).getByLabel("Name").fill("Ballad, clarinet feature");
    await page.getByRole("button", { name: "Save the phrase" }).click();
    await page.getByText("Saved Ballad, clarinet feature.").waitFor();

    await page.getByRole("button", { name: /^Opening/ }).click();
    await page.getByRole("button", { name: "Rename, re-span or delete Opening" }).click();
    await page.getByRole("button", { name: "Delete the phrase…" }).click();
    await page.getByRole("button", { name: "Yes, delete" }).click();
    await page.getByText("Deleted Opening.").waitFor();

    const music = (await api.get(`/api/shows/${showId}/music`)).body;
    expect(music.phrases.map((p: any) => p.name)).toEqual(["Ballad, clarinet feature"]);
    const voices = Object.fromEntries(music.assignments.map((a: any) => [a.section, [a.voice, a.writtenDynamic]]));
    expect(voices).toMatchObject({ Clarinets: ["melody", "mf"], Tubas: ["bass", expect.any(String)] });
    expect(problems).toEqual([]);
  }, 180_000);
});
