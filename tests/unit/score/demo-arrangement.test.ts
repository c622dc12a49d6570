// The demo's own arrangement (public/examples/lanterns-on-the-water.musicxml): read with the meter
// rule (common practice, no source: 4/4 four counts, 6/8 two dotted-quarter counts) and anchored with
// set 1 on measure 1 after the one-count pickup, it lands every rehearsal letter on the first set of a
// demo phrase, and importing it into the demo as it is proposes the demo's own phrases with the
// written dynamics they already have (so loading it leaves README's balance story as it is).
import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { HARBOR_RIDGE_SETS } from "@/db/demo/harbor-ridge-drill";
import { HARBOR_RIDGE_PHRASES } from "@/db/demo/harbor-ridge-music";
import { HARBOR_RIDGE_PERFORMERS } from "@/db/demo/harbor-ridge-roster";
import { LANTERNS_FILE, LANTERNS_PART_MAP } from "@/db/demo/lanterns-score";
import { segmentsOf, showCounts } from "@/lib/score/anchors";
import { suggestSection } from "@/lib/score/part-sections";
import { parseScore } from "@/lib/score/parse-score";
import { proposeImport } from "@/lib/score/proposal";
import { zipSync, strToU8 } from "fflate";

const bytes = readFileSync(LANTERNS_FILE);
const sets = HARBOR_RIDGE_SETS.map((s, i) => ({ id: `set-${s.number}`, number: s.number, counts: s.counts, order: i + 1 }));
const orderOf = new Map(sets.map((s) => [s.number, s.order]));
const SECTIONS = [...new Set(HARBOR_RIDGE_PERFORMERS.map((p) => p.section))];

function demoMusic() {
  const phrases = HARBOR_RIDGE_PHRASES.map((p, i) => ({ id: `ph-${i}`, name: p.name, order: i + 1, firstOrder: orderOf.get(p.firstSet)!, lastOrder: orderOf.get(p.lastSet)!, planLimits: p.planLimits ?? null }));
  const rows = HARBOR_RIDGE_PHRASES.flatMap((p, i) => Object.entries(p.sections).map(([section, v]) => ({ phraseId: `ph-${i}`, section, voice: v.voice, writtenDynamic: v.dynamic, playedDynamic: null })));
  const overrides = HARBOR_RIDGE_PHRASES.flatMap((p, i) => p.overrides.map((o) => ({ phraseId: `ph-${i}`, performerId: o.label })));
  return { phrases, rows, overrides };
}

describe("the demo arrangement", () => {
  it("has 122 measures (a pickup, 64 of 4/4, 57 of 6/8) and the show's 368 counts after the pickup", () => {
    const s = parseScore(bytes);
    expect(s.measures).toHaveLength(122);
    expect(s.measures[0]).toMatchObject({ number: "0", counts: 1 });
    expect(s.measures.filter((m) => m.beats === 6 && m.beatType === 8)).toHaveLength(57);
    const last = showCounts(sets).pop()!;
    expect(last).toBe(368);
    // The last set falls on the final measure's downbeat, which lasts one 6/8 measure more.
    expect(s.totalCounts).toBe(1 + last + 2);
  });

  it("suggests each part's demo section from its name alone", () => {
    const sections = SECTIONS.map((name) => ({ name, instruments: [...new Set(HARBOR_RIDGE_PERFORMERS.filter((p) => p.section === name).map((p) => p.instrument))] }));
    const s = parseScore(bytes);
    expect(Object.fromEntries(s.parts.map((p) => [p.id, suggestSection(p.name, sections)]))).toEqual(LANTERNS_PART_MAP);
  });

  it("proposes the demo's own phrases with their written dynamics, keeping each one's limits and overrides", () => {
    const score = parseScore(bytes);
    const segments = segmentsOf(score, [{ setId: "set-1", measure: "1", beat: 1 }], sets);
    const music = demoMusic();
    const proposal = proposeImport({ score, partMap: LANTERNS_PART_MAP, segments, setsInOrder: sets, sections: SECTIONS, ...music });
    expect(proposal.phrases.map((p) => [p.name, p.firstSetNumber, p.lastSetNumber])).toEqual(HARBOR_RIDGE_PHRASES.map((p) => [p.name, p.firstSet, p.lastSet]));
    proposal.phrases.forEach((p, i) => {
      const demo = HARBOR_RIDGE_PHRASES[i]!.sections;
      expect(Object.fromEntries(Object.entries(p.rows).map(([s, r]) => [s, [r.voice, r.writtenDynamic]])), p.name).toEqual(
        Object.fromEntries(Object.entries(demo).map(([s, v]) => [s, [v.voice, v.dynamic]])),
      );
      expect(p.keepsFrom).toBe(`ph-${i}`);
    });
    expect(proposal.replaces.limitsLost).toEqual([]);
    expect(proposal.replaces.overridesLost).toEqual([]);
    // Every set has a written dynamic for every section.
    for (const set of proposal.sets) for (const s of SECTIONS) expect(set.written[s], `set ${set.number} ${s}`).not.toBeNull();
  });

  it("reads the same from a compressed .mxl made with fflate (MusicXML 4.0 container.xml)", () => {
    const container = '<?xml version="1.0" encoding="UTF-8"?><container><rootfiles><rootfile full-path="lanterns.musicxml" media-type="application/vnd.recordare.musicxml+xml"/></rootfiles></container>';
    const mxl = zipSync({ mimetype: strToU8("application/vnd.recordare.musicxml"), "META-INF/container.xml": strToU8(container), "lanterns.musicxml": new Uint8Array(bytes) });
    expect(mxl.byteLength).toBeLessThan(bytes.byteLength / 5);
    expect(parseScore(mxl)).toEqual(parseScore(bytes));
  });

  it("sounds a B♭ trumpet's written notes a whole step lower (<transpose chromatic=\"-2\">: written to sounding)", () => {
    // The first pitch written in the first trumpet part, read from the file's text.
    const text = bytes.toString("utf8");
    const trumpet = text.slice(text.indexOf('<part id="P6">'));
    const firstPitch = /<pitch><step>([A-G])<\/step>(?:<alter>(-?\d)<\/alter>)?<octave>(\d)<\/octave>/.exec(trumpet)!;
    const written = { C: 0, D: 2, E: 4, F: 5, G: 7, A: 9, B: 11 }[firstPitch[1] as "C"] + Number(firstPitch[2] ?? 0) + 12 * (Number(firstPitch[3]) + 1);
    expect(parseScore(bytes).parts[5]!.notes[0]!.midi).toBe(written - 2);
  });
});
