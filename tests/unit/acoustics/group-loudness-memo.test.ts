// memoGroupLoudness (group-loudness.ts) remembers groups by their members, for checkConfidence's
// rounds of checks. It must give what groupLoudness gives, keep a group and its average player apart,
// and answer a group it has seen from memory. The loudness itself is checked against ISO 532-1's
// test signals in loudness.test.ts; here two equal players are the whole group or its average player.
import { describe, expect, it } from "vitest";
import { groupLoudness, memoGroupLoudness } from "@/lib/acoustics/group-loudness";

// Two players of the same octave levels (dB SPL, 63 Hz … 8 kHz): together their energies double (+3 dB in every band).
const player = () => ({ bandsDb: [55, 60, 66, 68, 65, 60, 52, 40] });

describe("memoGroupLoudness", () => {
  it("gives groupLoudness's answer for a group and for its average player, which differ", () => {
    const [a, b] = [player(), player()];
    const memo = memoGroupLoudness();
    const group = memo([a, b]);
    const average = memo([a, b], true);
    expect(group).toEqual(groupLoudness([a, b]));
    expect(average).toEqual(groupLoudness([a, b], true));
    // Doubling the energy is louder than one player alone (the average of two equal players is one of them).
    expect(average).toEqual(groupLoudness([a]));
    expect(group.sone).toBeGreaterThan(average.sone);
  });

  it("answers a group it has seen from memory, and a group with a new member afresh", () => {
    const [a, b] = [player(), player()];
    const memo = memoGroupLoudness();
    const first = memo([a, b]);
    expect(memo([a, b])).toBe(first);
    const louder = { bandsDb: player().bandsDb.map((l) => l + 6) };
    const changed = memo([a, louder]);
    expect(changed).not.toBe(first);
    expect(changed.sone).toBeGreaterThan(first.sone);
  });
});
