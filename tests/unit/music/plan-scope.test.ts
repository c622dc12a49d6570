// A check that no section's dynamic aims at, still failing with the plan, is named with where to look
// (common practice, no source: placement and single players are the drill's and the player's business).
import { describe, expect, it } from "vitest";
import { PLANNED_CHECKS } from "@/lib/acoustics";
import { checksLeftByPlan } from "@/lib/music/plan-scope";
import { CHECK_IDS } from "@/lib/acoustics/types";

const set = (number: string, failing: string[], notApplicable: string[] = []) => ({
  number,
  after: { checks: CHECK_IDS.map((id) => ({ id, passed: !failing.includes(id), status: failing.includes(id) ? "fail" : notApplicable.includes(id) ? "not-applicable" : "pass" })) },
});

describe("checksLeftByPlan", () => {
  it("names each failing check the plan does not serve once, with its sets and where to look", () => {
    const left = checksLeftByPlan([set("12", ["depth-support", "stand-outs", "melody-forward"]), set("13", ["depth-support"])]);
    expect(left.map((l) => [l.label, l.sets])).toEqual([
      ["Depth support", ["12", "13"]],
      ["Stand-outs", ["12"]],
    ]);
    expect(left.find((l) => l.id === "stand-outs")!.where).toMatch(/one player/);
    for (const l of left) expect(l.where).not.toMatch(/-/);
  });

  it("leaves out what passes, what does not apply, and what the plan itself aims at", () => {
    expect(checksLeftByPlan([set("1", [...PLANNED_CHECKS], ["depth-support", "wide-form-edges"])])).toEqual([]);
  });

  it("has words for every check it can name", () => {
    const all = checksLeftByPlan([set("1", CHECK_IDS.filter((id) => !(PLANNED_CHECKS as readonly string[]).includes(id)))]);
    expect(all).toHaveLength(CHECK_IDS.length - PLANNED_CHECKS.length);
    for (const l of all) expect([l.id, l.where.length > 40, l.where]).toEqual([l.id, true, expect.not.stringMatching(/^not a matter of section dynamics$/)]);
  });

  it("reads a check without a status by whether it passed, and names a check it has no words for plainly", () => {
    const left = checksLeftByPlan([{ number: "4", after: { checks: [{ id: "stand-outs", passed: false }, { id: "depth-support", passed: true }, { id: "some-new-check", passed: false }] } }]);
    expect(left.map((l) => [l.label, l.sets, l.where])).toEqual([
      ["Stand-outs", ["4"], expect.stringMatching(/one player/)],
      ["some-new-check", ["4"], "not a matter of section dynamics"],
    ]);
  });
});
