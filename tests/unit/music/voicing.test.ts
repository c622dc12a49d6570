// Who plays what in a set, from the show's phrases (lib/music): the product's rules as the music page
// states them — a phrase covers its first to its last set inclusive, a performer's own part in a phrase
// overrides its section's, a section with no part in a phrase rests (tacet), and outside every phrase
// the band plays accompaniment at mf; an adopted plan's dynamic is what is played.
import { describe, expect, it } from "vitest";
import { buildAnalysisInput, type RosterEntry } from "@/lib/music/analysis-input";
import { CHECK_LABELS, CHECK_MEANINGS } from "@/lib/music/check-labels";
import { phraseAt, UNASSIGNED, voicingOf, type AssignmentLike, type OverrideLike } from "@/lib/music/voicing";
import { CHECK_IDS } from "@/lib/acoustics/types";
import { AIR } from "../acoustics/helpers";

const phrases = [
  { id: "intro", order: 0, firstOrder: 1, lastOrder: 3 },
  { id: "ballad", order: 1, firstOrder: 4, lastOrder: 6 },
  // Overlaps the ballad's last set: the earlier phrase in phrase order wins there.
  { id: "closer", order: 2, firstOrder: 6, lastOrder: 9 },
];

describe("phraseAt", () => {
  it("covers a phrase's first and last sets, takes the first phrase in order where two overlap, and none outside", () => {
    expect([1, 3, 4, 6, 7, 9].map((s) => phraseAt(phrases, s)?.id)).toEqual(["intro", "intro", "ballad", "ballad", "closer", "closer"]);
    expect(phraseAt(phrases, 0)).toBeNull();
    expect(phraseAt(phrases, 10)).toBeNull();
  });
});

describe("voicingOf", () => {
  const assignments: AssignmentLike[] = [
    { phraseId: "ballad", section: "trumpets", voice: "melody", writtenDynamic: "p", playedDynamic: null },
    { phraseId: "ballad", section: "tubas", voice: "bass", writtenDynamic: "mp", playedDynamic: "mf" },
    { phraseId: "intro", section: "trumpets", voice: "accompaniment", writtenDynamic: "f", playedDynamic: null },
  ];
  const overrides: OverrideLike[] = [
    { phraseId: "ballad", performerId: "T2", voice: "countermelody", writtenDynamic: "mp", playedDynamic: "p" },
    { phraseId: "intro", performerId: "T1", voice: "tacet", writtenDynamic: "mf", playedDynamic: null },
  ];
  const of = (id: string, section: string, phraseId: string | null) => voicingOf({ id, section }, phraseId, assignments, overrides);

  it("a performer's own part in the phrase wins over its section's; a part for another phrase or performer does not", () => {
    expect(of("T2", "trumpets", "ballad")).toEqual({ voice: "countermelody", writtenDynamic: "mp", dynamic: "p" });
    expect(of("T1", "trumpets", "ballad")).toEqual({ voice: "melody", writtenDynamic: "p", dynamic: "p" });
    expect(of("T2", "trumpets", "intro")).toEqual({ voice: "accompaniment", writtenDynamic: "f", dynamic: "f" });
  });

  it("a section's part is matched by phrase and section, and plays an adopted dynamic over the written one", () => {
    expect(of("U1", "tubas", "ballad")).toEqual({ voice: "bass", writtenDynamic: "mp", dynamic: "mf" });
  });

  it("a section with no part in the phrase rests; outside every phrase everyone plays accompaniment at mf", () => {
    expect(of("U1", "tubas", "intro")).toEqual({ voice: "tacet", writtenDynamic: "mf", dynamic: "mf" });
    expect(of("T2", "trumpets", null)).toEqual({ voice: "accompaniment", writtenDynamic: "mf", dynamic: "mf" });
    expect(UNASSIGNED).toEqual({ voice: "accompaniment", writtenDynamic: "mf", playedDynamic: null });
  });
});

describe("buildAnalysisInput", () => {
  const roster: RosterEntry[] = [
    { id: "T1", instrument: "trumpet", section: "trumpets", strengthDb: 1.5 },
    { id: "U1", instrument: "tuba", section: "tubas", strengthDb: 0 },
    { id: "F1", instrument: "flute", section: "flutes", strengthDb: 0 },
  ];
  const music = {
    phrases,
    assignments: [{ phraseId: "ballad", section: "trumpets", voice: "melody", writtenDynamic: "p", playedDynamic: "mp" }] as AssignmentLike[],
    overrides: [] as OverrideLike[],
  };
  const point = { id: "box", x: 0, y: -25, z: 18, groundFactor: 0.5, surroundingsM: 20 };
  const build = (order: number, extra: Partial<Parameters<typeof buildAnalysisInput>[0]> = {}) =>
    buildAnalysisInput({
      roster,
      set: { order, positions: [{ performerId: "T1", x: 3, y: 10, facingDeg: 90 }, { performerId: "U1", x: -3, y: 12, facingDeg: 0 }, { performerId: "ghost", x: 0, y: 0, facingDeg: 0 }] },
      music,
      listeningPoints: [point],
      conditions: AIR,
      ...extra,
    });

  it("places the roster's performers that have a position, with the set's phrase's voicing; others are off the field", () => {
    const i = build(5);
    expect(i.performers).toEqual([
      { id: "T1", instrument: "trumpet", section: "trumpets", voice: "melody", dynamic: "mp", x: 3, y: 10, facingDeg: 90, strengthDb: 1.5 },
      { id: "U1", instrument: "tuba", section: "tubas", voice: "tacet", dynamic: "mf", x: -3, y: 12, facingDeg: 0, strengthDb: 0 },
    ]);
    expect(build(12).performers.map((p) => [p.voice, p.dynamic])).toEqual([
      ["accompaniment", "mf"],
      ["accompaniment", "mf"],
    ]);
  });

  it("passes the conditions, gives a point its background only when it has one, and a catalog only when given", () => {
    const plain = build(5);
    expect(plain.conditions).toBe(AIR);
    expect(plain.listeningPoints).toEqual([point]);
    expect("background" in plain.listeningPoints[0]!).toBe(false);
    expect("instruments" in plain).toBe(false);
    const background = { preset: "quiet-field" as const };
    const instruments = {};
    const full = build(5, { listeningPoints: [{ ...point, background }], instruments });
    expect(full.listeningPoints[0]!.background).toEqual(background);
    expect(full.instruments).toBe(instruments);
  });
});

describe("the checks' names and meanings", () => {
  it("every check has a name and a one-sentence meaning a person reads, never its id", () => {
    for (const id of CHECK_IDS) {
      expect(CHECK_LABELS[id]).toMatch(/^[A-Z][a-z]/);
      expect(CHECK_LABELS[id]).not.toBe(id);
      expect(CHECK_MEANINGS[id]).toMatch(/^[A-Z].{20,}\.$/);
    }
    expect(new Set(CHECK_IDS.map((id) => CHECK_LABELS[id])).size).toBe(CHECK_IDS.length);
  });
});
