// groupLoudness (group-loudness.ts): a member's energies, when given, are what it sums; the caller
// computes them once per player (bandEnergies) and they stand for its octave levels.
import { describe, expect, it } from "vitest";
import { bandEnergies, groupLoudness } from "@/lib/acoustics/group-loudness";

const LEVELS = [55, 60, 66, 68, 65, 60, 52, 40];

describe("groupLoudness", () => {
  it("sums a member's energies as given rather than its levels", () => {
    // Energies of levels 6 dB up in every band beside the levels themselves: the group is heard at the higher ones.
    const louder = LEVELS.map((l) => l + 6);
    const member = { bandsDb: LEVELS, bandsE: bandEnergies(louder) };
    expect(groupLoudness([member])).toEqual(groupLoudness([{ bandsDb: louder }]));
    expect(groupLoudness([member]).sone).toBeGreaterThan(groupLoudness([{ bandsDb: LEVELS }]).sone);
  });
});
