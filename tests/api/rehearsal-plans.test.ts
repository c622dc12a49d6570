// Kept stadium rehearsal plans: a director keeps a plan with a time budget (minutes per item adding up
// to it), everyone lists and reopens it, staff mark items done during the rehearsal; the build-up
// plays the soloist alone first in the demo's trumpet solo.
import { beforeAll, describe, expect, it } from "vitest";
import { DEMO, demoIds, signedIn, type Client } from "../support/api";

// The demo show itself (its staff are the ones who mark items done); kept plans change nothing other suites read.
let show: Awaited<ReturnType<typeof demoIds>>;
let staff: Client;
let designer: Client;
let phrases: { id: string; name: string }[];
beforeAll(async () => {
  show = await demoIds();
  staff = await signedIn(DEMO.staff);
  designer = await signedIn(DEMO.designer);
  phrases = (await show.director.get(`/api/shows/${show.showId}/rehearsal-plan`)).body.phrases;
});

describe("kept rehearsal plans", () => {
  it("keeps a plan with 45 minutes shared among its items, lists it and reopens it as it was built", async () => {
    const choice = { phraseIds: phrases.map((p) => p.id), budgetMinutes: 45 };
    const kept = await show.director.post(`/api/shows/${show.showId}/rehearsal-plans`, { name: "Thursday at the stadium", choice });
    expect(kept.status).toBe(201);
    const list = (await staff.get(`/api/shows/${show.showId}/rehearsal-plans`)).body.plans;
    expect(list[0]).toMatchObject({ id: kept.body.plan.id, name: "Thursday at the stadium", budgetMinutes: 45, items: phrases.length, done: 0 });
    const open = await staff.get(`/api/shows/${show.showId}/rehearsal-plans/${kept.body.plan.id}`);
    expect(open.status).toBe(200);
    const items = open.body.plan.items;
    expect(items.reduce((sum: number, it: any) => sum + it.minutes, 0)).toBe(45);
    // Worst first, and the worst gets at least as much time per build-up step as the calmest.
    const perStep = (it: any) => it.minutes / it.buildUp.length;
    expect(perStep(items[0])).toBeGreaterThanOrEqual(perStep(items[items.length - 1]) - 1);
    expect(new Set(items.map((it: any) => it.key)).size).toBe(items.length);
  });

  it("lets staff mark an item done and undone during the rehearsal, naming who did", async () => {
    const kept = await show.director.post(`/api/shows/${show.showId}/rehearsal-plans`, { name: "Saturday", choice: { phraseIds: [phrases[0]!.id] } });
    const id = kept.body.plan.id;
    const key = (await staff.get(`/api/shows/${show.showId}/rehearsal-plans/${id}`)).body.plan.items[0].key;
    const mark = await staff.call("PUT", `/api/shows/${show.showId}/rehearsal-plans/${id}/items/${key}`, { done: true });
    expect(mark.status).toBe(200);
    const open = (await staff.get(`/api/shows/${show.showId}/rehearsal-plans/${id}`)).body;
    expect(open.done).toEqual([expect.objectContaining({ itemKey: key, doneBy: expect.any(String) })]);
    expect((await staff.get(`/api/shows/${show.showId}/rehearsal-plans`)).body.plans.find((p: any) => p.id === id).done).toBe(1);
    await staff.call("PUT", `/api/shows/${show.showId}/rehearsal-plans/${id}/items/${key}`, { done: false });
    expect((await staff.get(`/api/shows/${show.showId}/rehearsal-plans/${id}`)).body.done).toEqual([]);
    expect((await staff.call("PUT", `/api/shows/${show.showId}/rehearsal-plans/${id}/items/item-99`, { done: true })).status).toBe(404);
  });

  it("lets only a director keep a plan, and says what to fix in a bad one", async () => {
    const body = { name: "Mine", choice: { phraseIds: [phrases[0]!.id] } };
    expect((await staff.post(`/api/shows/${show.showId}/rehearsal-plans`, body)).status).toBe(403);
    expect((await designer.post(`/api/shows/${show.showId}/rehearsal-plans`, body)).status).toBe(403);
    const zero = await show.director.post(`/api/shows/${show.showId}/rehearsal-plans`, { ...body, choice: { ...body.choice, budgetMinutes: 0 } });
    expect(zero.status).toBe(400);
    expect(zero.body.error).toContain("Give at least 1 minute of stadium time.");
    const unnamed = await show.director.post(`/api/shows/${show.showId}/rehearsal-plans`, { ...body, name: " " });
    expect(unnamed.body.error).toContain("Name the plan");
  });

  it("plays the soloist alone first in the trumpet solo", async () => {
    const solo = phrases.find((p) => p.name === "Trumpet solo")!;
    const res = await show.director.post(`/api/shows/${show.showId}/rehearsal-plan`, { phraseIds: [solo.id] });
    const [item] = res.body.items;
    expect(item.buildUp[0]).toMatchObject({ step: 1, title: "The soloist alone", sections: [expect.stringMatching(/soloist \(T1\)$/)] });
    // T1 is the whole melody here (the other trumpets rest), so the band comes in under the solo.
    expect(item.buildUp[1].title).toBe("Add accompaniment and bass");
    expect(item.buildUp.map((s: any) => s.title)).not.toContain("Melody alone");
  });
});
