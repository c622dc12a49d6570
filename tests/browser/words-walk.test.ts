// Every page of the demo show, as each role sees it, in the trade's words: no internal key (an
// instrument's "alto-sax", "high-school", a check id), no metre figure where steps belong (only a
// listening point's height is in metres), no "from memory"/"no source" (provenance has its own page),
// no clipped shorthand ("S1 1 in 35", "FH"), no "1 steps" or "Sets 6".
import { beforeAll, describe, expect, it } from "vitest";
import { DEFAULT_INSTRUMENTS } from "@/lib/acoustics/catalog";
import { APP_URL, DEMO, demoIds } from "../support/api";
import { launchBrowser, signIn, type BrowserSession } from "../support/browser";

let ids: Awaited<ReturnType<typeof demoIds>>;
beforeAll(async () => {
  ids = await demoIds();
}, 120_000);

/** Keys people never say: instrument keys with a hyphen, field-rule keys, check ids. */
function internalKeys(): string[] {
  const instruments = Object.keys(DEFAULT_INSTRUMENTS).filter((k) => k.includes("-"));
  // "Stand-outs" is also the check's English name, so its id is left out here.
  const checks = ["melody-forward", "bass-up-pyramid", "depth-support", "wide-form-edges", "arrival-spread", "battery-balance", "heard-at-box"];
  return [...instruments, "high-school", ...checks];
}

/** What a person may not read on a page, each with why. */
export function wordProblems(text: string): string[] {
  const found: string[] = [];
  // Case matters: "High-school hashes" is English, "high-school" the stored key.
  for (const key of internalKeys()) if (new RegExp(`(^|[^A-Za-z-])${key}($|[^A-Za-z-])`).test(text)) found.push(`internal key "${key}"`);
  const say = (re: RegExp, why: string) => {
    const m = re.exec(text);
    if (m) found.push(`${why}: "${text.slice(Math.max(0, m.index - 30), m.index + m[0].length + 30).replace(/\s+/g, " ")}"`);
  };
  // Metres only for a height ("18 m up", "1.7 m above the field").
  say(/\b\d+(?:\.\d+)?\s?m\b(?!\s*(?:up|above|high|²|\/s))/, "metres where steps or yards belong");
  say(/from memory/i, "provenance words");
  say(/no source/i, "provenance words");
  // "S2" alone is a snare's label; the clipped position reads "S1 1 in 35".
  say(/\bS[12]\s+\d+(?:\.\d+)?\s+(?:in|out|on)\b/, "clipped side shorthand");
  say(/\b(?:FH|BH|FSL|BSL)\b/, "clipped hash or sideline shorthand");
  say(/(?:^|[^\d.])1 (?:steps|counts|sets|performers|players|minutes|yards|sections)\b/, "plural after 1");
  say(/\bSets \d+\b(?!\s*(?:–|-|to|and|,))/, "plural for one set");
  say(/request body is not valid/i, "an error that does not say what to fix");
  say(/described in the README/i, "a pointer to the README");
  return found;
}

const SHOW_PAGES = ["", "/sets/FIRST", "/sets/LAST", "/music", "/timeline", "/compare", "/readings", "/hearing", "/rehearsal", "/sheets", "/sheets?by=sets", "/imports", "/targets", "/settings", "/performer/T1"];

async function pageText(session: BrowserSession, url: string): Promise<string> {
  const { page } = session;
  await page.goto(url);
  await page.waitForLoadState("networkidle");
  // Wait until nothing is still loading (skeletons announce "Loading…" as a status).
  await page.waitForFunction(() => ![...document.querySelectorAll('[role="status"]')].some((e) => /Loading/.test(e.textContent ?? "")), null, { timeout: 60_000 });
  return page.evaluate(() => {
    const attrs = [...document.querySelectorAll("[aria-label],[title]")].map((e) => `${e.getAttribute("aria-label") ?? ""} ${e.getAttribute("title") ?? ""}`);
    return `${document.body.innerText}\n${attrs.join("\n")}`;
  });
}

describe("the demo show in the trade's words", () => {
  it("finds no shorthand, key, metre figure or provenance note on the sign-in page", async () => {
    const session = await launchBrowser();
    try {
      const text = await pageText(session, `${APP_URL}/sign-in`);
      expect(wordProblems(text)).toEqual([]);
      expect(text).not.toMatch(/Hear your drill/i);
      // It says what the product does, and now that includes the score in and the sound out.
      expect(text).toMatch(/MusicXML/);
      expect(text).toMatch(/listen to what the press box is predicted to hear/);
    } finally {
      await session.close();
    }
  }, 90_000);

  for (const role of ["director", "designer", "staff"] as const) {
    it(`finds none on any page as the ${role}`, async () => {
      const session = await launchBrowser();
      try {
        await signIn(session.page, DEMO[role]);
        const base = `${APP_URL}/shows/${ids.showId}`;
        const urls = [
          `${APP_URL}/programs/${ids.programId}`,
          `${APP_URL}/programs/${ids.programId}/members`,
          ...SHOW_PAGES.map((p) => base + p.replace("FIRST", ids.setIds[0]).replace("LAST", ids.setIds[ids.setIds.length - 1])),
          `${APP_URL}/sources`,
        ];
        const problems: string[] = [];
        for (const url of urls) {
          const text = await pageText(session, url);
          for (const p of wordProblems(text)) problems.push(`${url.replace(APP_URL, "")}: ${p}`);
        }
        expect(problems).toEqual([]);
        // Provenance has its page, and the pages that show values link to it.
        await session.page.goto(`${APP_URL}/sources`);
        await session.page.getByRole("heading", { level: 1, name: "Where the numbers come from" }).waitFor();
        await session.page.goto(`${base}/targets`);
        await session.page.getByRole("link", { name: "Where the numbers come from" }).first().waitFor();
      } finally {
        await session.close();
      }
    }, 600_000);
  }
});
