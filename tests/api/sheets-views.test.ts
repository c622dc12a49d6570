// The coordinate sheets answer one view at a time: a page that opens with a performer's sheet or a
// set's need not carry the whole show (issue on speed as a person feels it: the sheets page held
// every performer's and every set's words twice over, 1.5 MB, and took about 2 s to open).
import { beforeAll, describe, expect, it } from "vitest";
import { APP_URL, demoIds } from "../support/api";

let ids: Awaited<ReturnType<typeof demoIds>>;
beforeAll(async () => {
  ids = await demoIds();
}, 60_000);

const sheets = (query: string) => ids.director.get(`/api/shows/${ids.showId}/sheets${query}`);

describe("coordinate sheets by view", () => {
  it("keeps the whole answer without a query, and each view's part with one", async () => {
    const whole = (await sheets("")).body;
    expect(whole.performers.length).toBe(ids.show.performers.length);
    expect(whole.sets[0].dots[0].sideToSide).toMatch(/yard line|On the 50/);

    const opening = await sheets("?by=performers&first=3");
    expect(opening.status).toBe(200);
    expect(opening.body.performers.map((p: { label: string }) => p.label)).toEqual(whole.performers.slice(0, 3).map((p: { label: string }) => p.label));
    expect(opening.body.performers[0]).toEqual(whole.performers[0]);
    expect(opening.body.performerCount).toBe(whole.performers.length);
    // Every set's dots for the small pictures, without the words only the per-set sheets print.
    expect(opening.body.sets.length).toBe(whole.sets.length);
    const bare = opening.body.sets[0].dots[0];
    const full = whole.sets[0].dots[0];
    expect(bare).toEqual({ label: full.label, x: full.x, y: full.y, facingDeg: full.facingDeg, spreadDeg: full.spreadDeg });

    const bySets = (await sheets("?by=sets&first=2")).body;
    expect(bySets.performers).toEqual([]);
    expect(bySets.sets).toEqual(whole.sets.slice(0, 2));
    expect(bySets.setCount).toBe(whole.sets.length);
  });

  it("gives one performer's sheet by label, in any case", async () => {
    const whole = (await sheets("")).body;
    const t1 = whole.performers.find((p: { label: string }) => p.label === "T1");
    const one = (await sheets("?by=performers&label=t1")).body;
    expect(one.performers).toEqual([t1]);
    expect((await sheets("?by=performers&label=nobody")).body.performers).toEqual([]);
  });

  it("refuses a query it cannot read with a message that says what to fix", async () => {
    const bad = await sheets("?by=performers&first=0");
    expect(bad.status).toBe(400);
    expect(bad.body.error).toMatch(/query/i);
    expect(JSON.stringify(bad.body.issues)).toMatch(/first must be at least 1/);
    expect((await sheets("?by=everyone")).status).toBe(400);
  });

  it("opens the sheets page with only its first sheets, the rest asked for by the page", async () => {
    const res = await fetch(`${APP_URL}/shows/${ids.showId}/sheets`, { headers: { cookie: ids.director.cookie! } });
    const html = await res.text();
    const shown = html.match(/<h2 id="sheet-/g)?.length ?? 0;
    expect(shown).toBeGreaterThan(0);
    expect(shown).toBeLessThan(ids.show.performers.length);
    // Before, the page carried the whole answer twice over (its HTML was 2.4 times the answer's size);
    // now its first sheets and the sets' dots, drawn once.
    const whole = JSON.stringify((await sheets("")).body);
    expect(html.length).toBeLessThan(whole.length / 2);
  });
});
