// Pages arrive with their main content in the first answer (components/Preloaded.tsx): the server asks
// the API's own GET handlers for the page's data, with the page's session, before it sends the HTML, so
// a person sees the content without waiting for the page's script to ask for it (issue on speed as a
// person feels it). The same session rules hold: a stranger's page carries none of the show's data.
import { beforeAll, describe, expect, it } from "vitest";
import { APP_URL, demoIds } from "../support/api";

let ids: Awaited<ReturnType<typeof demoIds>>;
beforeAll(async () => {
  ids = await demoIds();
}, 60_000);

async function html(cookie: string | null, path: string) {
  const res = await fetch(APP_URL + path, { headers: cookie ? { cookie } : {}, redirect: "manual" });
  return { status: res.status, text: await res.text() };
}

describe("a page's first answer", () => {
  it("already holds each page's main content for a member", async () => {
    const show = `/shows/${ids.showId}`;
    const pages: [string, string][] = [
      ["/programs", `href="/programs/${ids.programId}"`],
      [`/programs/${ids.programId}`, `href="/shows/${ids.showId}"`],
      [show, "<caption"],
      [`${show}/sets/${ids.setIds[3]}`, 'data-testid="mix-panel" data-source="stored"'],
      [`${show}/music`, 'id="voicing-title"'],
      [`${show}/timeline`, 'aria-label="Set 1:'],
      [`${show}/compare`, 'id="voices-title"'],
      [`${show}/readings`, 'id="record-title"'],
      [`${show}/hearing`, 'aria-label="Legend"'],
      [`${show}/sheets`, 'id="sheet-'],
      [`${show}/imports`, 'id="upload-title"'],
    ];
    for (const [path, content] of pages) {
      const page = await html(ids.director.cookie, path);
      expect(page.status, path).toBe(200);
      expect(page.text.includes(content), `${path} holds ${content}`).toBe(true);
    }
  }, 120_000);

  it("holds none of a show's data for a director of another program", async () => {
    const stranger = ids.other;
    const name = ids.show.show.name as string;
    for (const path of [`/shows/${ids.showId}`, `/shows/${ids.showId}/sets/${ids.setIds[3]}`, `/shows/${ids.showId}/sheets`]) {
      const page = await html(stranger.cookie, path);
      expect(page.status, path).toBe(200);
      expect(page.text.includes(name), `${path} names the show`).toBe(false);
      // The member's own copy of the same page does carry them, so the check above can fail.
      expect((await html(ids.director.cookie, path)).text.includes(name)).toBe(true);
    }
  }, 60_000);
});
