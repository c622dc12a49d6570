// The stadium rehearsal plan through the API: worst balance first, build-up from the melody, and
// sent by e-mail to chosen staff through the fake SMTP server.
import { beforeAll, describe, expect, it } from "vitest";
import { APP_URL, DEMO, demoIds, signedIn } from "../support/api";
import { linkIn, waitForMail } from "../support/mail";

let ids: Awaited<ReturnType<typeof demoIds>>;
let options: any;
beforeAll(async () => {
  ids = await demoIds();
  options = (await ids.director.get(`/api/shows/${ids.showId}/rehearsal-plan`)).body;
});

describe("rehearsal plan", () => {
  it("orders the chosen phrases by how badly they fail, and builds up from the melody", async () => {
    const phraseIds = options.phrases.map((p: any) => p.id);
    const res = await ids.director.post(`/api/shows/${ids.showId}/rehearsal-plan`, { phraseIds, listeningPointId: ids.pressBoxId });
    expect(res.status).toBe(200);
    const items = res.body.items;
    expect(items).toHaveLength(phraseIds.length);
    for (let i = 1; i < items.length; i++) expect(items[i - 1].severity).toBeGreaterThanOrEqual(items[i].severity);
    for (const it of items) {
      const titles = it.buildUp.map((s: any) => s.title);
      // A phrase with a soloist opens with the soloist alone, then adds the melody.
      const order = ["The soloist alone", "Melody alone", "Add the melody", "Add the countermelody", "Add accompaniment and bass", "Add percussion: full ensemble"];
      expect(titles).toEqual(order.filter((t) => titles.includes(t)));
    }
    expect(res.body.listenFrom).toMatchObject({ name: "Press box", words: expect.stringMatching(/yards behind the front sideline, \d+ m up$/) });
  });

  it("gives each phrase the music page's plan: the same rows in score order, the same dynamics and the same words", async () => {
    // The clarinets' song: the demo phrase whose plan changes the most.
    const phrase = options.phrases.find((p: any) => p.name === "Clarinet song");
    const plan = (await ids.director.get(`/api/shows/${ids.showId}/phrases/${phrase.id}/plan?listeningPointId=${ids.pressBoxId}`)).body;
    const res = await ids.director.post(`/api/shows/${ids.showId}/rehearsal-plan`, { phraseIds: [phrase.id], listeningPointId: ids.pressBoxId });
    const item = res.body.items[0];
    expect(item.dynamics.map((d: any) => d.section)).toEqual(plan.entries.map((e: any) => e.section));
    const proposed = item.dynamics.filter((d: any) => d.source === "proposed");
    expect(proposed.length).toBeGreaterThan(0);
    for (const d of proposed) {
      const e = plan.entries.find((x: any) => x.section === d.section);
      expect(d).toMatchObject({ who: e.who, play: e.playedDynamic, why: e.why });
      expect(d.why).toMatch(new RegExp(`^${e.who}: play ${e.playedDynamic} where ${e.writtenDynamic} is written — .+ at the Press box`));
    }
    expect(item.unmet).toEqual(plan.unmet.map((u: any) => u.detail));
  });

  it("refuses an empty choice and ids of another show", async () => {
    expect((await ids.director.post(`/api/shows/${ids.showId}/rehearsal-plan`, { phraseIds: [] })).status).toBe(400);
    expect((await ids.director.post(`/api/shows/${ids.showId}/rehearsal-plan`, { setIds: ["00000000-0000-4000-8000-000000000000"] })).status).toBe(400);
  });

  it("a director e-mails it to chosen staff; staff may read it but not send it", async () => {
    const staffMember = options.members.find((m: any) => m.email === DEMO.staff);
    const choice = { phraseIds: [options.phrases[0].id], setIds: [options.sets[5].id] };
    const since = new Date();
    const sent = await ids.director.post(`/api/shows/${ids.showId}/rehearsal-plan/send`, { choice, userIds: [staffMember.userId] });
    expect(sent.status).toBe(200);
    expect(sent.body).toEqual({ sent: [DEMO.staff], failed: [] });
    const message = await waitForMail(DEMO.staff, { since, match: (m) => m.subject.startsWith("Stadium rehearsal plan") });
    expect(message.text).toMatch(/Step 1, melody alone: /);
    const link = linkIn(message, `/shows/${ids.showId}/rehearsal`);
    expect(link.origin).toBe(new URL(APP_URL).origin);
    expect(message.html).toContain("Open the printable plan");

    const staff = await signedIn(DEMO.staff);
    expect((await staff.post(`/api/shows/${ids.showId}/rehearsal-plan`, choice)).status).toBe(200);
    expect((await staff.post(`/api/shows/${ids.showId}/rehearsal-plan/send`, { choice, userIds: [staffMember.userId] })).status).toBe(403);
  });
});
