// The balance plan in a director's words: one sentence per change naming the section, the dynamics and
// what it serves, with the level difference the engine itself predicts (common practice, no source).
import { describe, expect, it } from "vitest";
import { DEFAULT_INSTRUMENTS, analyzeSet, resolveLimits, solveBalancePlan, type AnalysisInput, type PerformerInput } from "@/lib/acoustics";
import { advisePlan, unmetWords } from "@/lib/analysis/plan-advice";
import { AIR, BOX, facingToward, performer } from "../acoustics/helpers";

const at = (over: Partial<PerformerInput> & { id: string; x: number; y: number }) => performer({ facingDeg: facingToward(over.x, over.y, BOX.x, BOX.y), ...over });
const band: AnalysisInput = {
  performers: [
    // The section's first player is its one bass clarinet: the advice speaks of what most of it plays.
    ...[-6, -3, 0, 3, 6].map((x, k) => at({ id: `C${k}`, x, y: 20, instrument: k === 0 ? "bass-clarinet" : "clarinet", section: "Clarinets", voice: "melody", dynamic: "p" })),
    ...[-6, -2, 2, 6].map((x, k) => at({ id: `T${k}`, x, y: 24, section: "Trumpets", voice: "accompaniment", dynamic: "p" })),
    // A soloist: one trumpet of a section that otherwise rests.
    at({ id: "S1", x: 0, y: 12, section: "Horns", instrument: "mellophone", voice: "countermelody", dynamic: "mp" }),
    at({ id: "S2", x: 2, y: 12, section: "Horns", instrument: "mellophone", voice: "tacet", dynamic: "mp" }),
  ],
  listeningPoints: [BOX],
  conditions: AIR,
};
const labels: Record<string, string> = { S1: "H1" };
const ctx = {
  pointName: "Press box",
  performer: (id: string) => ({ label: labels[id] ?? id, spec: DEFAULT_INSTRUMENTS[band.performers.find((p) => p.id === id)!.instrument] }),
  limits: resolveLimits(),
};

describe("advisePlan", () => {
  const plan = solveBalancePlan([band], BOX.id);
  const rows = advisePlan(plan.entries, ctx);
  const clarinets = rows.find((r) => r.section === "Clarinets")!;

  it("explains the clarinets' rise with their carry and the melody's place under the accompaniment as written, at the point", () => {
    const written = analyzeSet(band).points[0]!;
    // The plan states the gap as the checks measure it: in loudness level (phon, ISO 532-1).
    const under = written.loudness!.voices.accompaniment!.phon - written.loudness!.voices.melody!.phon;
    expect(under).toBeGreaterThan(1);
    expect(clarinets.playedDynamic).not.toBe("p");
    expect(clarinets.why).toBe(
      `Clarinets: play ${clarinets.playedDynamic} where p is written — clarinets carry poorly outdoors, and the melody is ${Math.round(under)} dB under the accompaniment in loudness at the Press box.${clarinets.atLimit ? ` It stops at ${clarinets.atLimit}: the limits allow 2 steps from p.` : ""}`,
    );
  });

  it("names a soloist by label, keeps rows in score order (woodwinds, then brass) and says nothing where nothing changes", () => {
    expect(rows.map((r) => r.who)).toEqual(["Clarinets", "Trumpets", "Horns soloist (H1)"]);
    for (const r of rows) if (r.playedDynamic === r.writtenDynamic && !r.atLimit) expect(r.why).toBe("");
  });

  it("says a change that holds a balance already met is kept, in the target's words, not as a problem", () => {
    const trumpets = plan.entries.find((e) => e.section === "Trumpets")!;
    const held = { ...trumpets, atLimit: undefined, playedDynamic: "pp" as const, reason: { kind: "keep" as const, aim: "the lower voices should be at least as present as the higher ones", set: "" } };
    expect(advisePlan([held], ctx)[0]!.why).toBe(
      "Trumpets: play pp where p is written — with the sections around it moving, this keeps what already works at the Press box: the lower voices should be at least as present as the higher ones.",
    );
  });

  it("never shows ids or check codes", () => {
    const text = [...rows.map((r) => r.why), ...plan.unmet.map((u) => unmetWords(u, ctx))].join(" ");
    expect(text).not.toMatch(/melody-lead|pyramid:|blend:|melody-forward|bass-up-pyramid|tolerance/);
  });
});
