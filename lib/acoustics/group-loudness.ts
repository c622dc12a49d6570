// Loudness at a listening point of a group of players (a voice, a register, a section's end), by
// ISO 532-1 (loudness.ts) on third-octaves derived from the players' summed octave levels
// (third-octaves.ts): the measure the balance checks compare, so that a tuba and a trumpet at the
// same dynamic are judged as they are heard, not through A-weighting's cut of the low bands.
import { BAND_COUNT } from "./bands";
import { loudnessIso532_1, type Loudness } from "./loudness";
import { THIRD_OCTAVE_COUNT } from "./loudness-tables";
import { thirdOctavesFromOctavesInto } from "./third-octaves";

// A module-local copy: imported names are read through a getter when this runs as CommonJS (evaluator.ts).
const B = BAND_COUNT;
const thirds = new Float64Array(THIRD_OCTAVE_COUNT);
const bands = new Float64Array(B);

/** Loudness of 8 octave levels (dB SPL, 63 Hz … 8 kHz), free field; 0 sone for silence. */
export function octaveLoudness(octaveDb: ArrayLike<number>): Loudness {
  thirdOctavesFromOctavesInto(octaveDb, thirds);
  return loudnessIso532_1(thirds);
}

/** A player's octave levels at a point (dB), with their energies 10^(L/10) when the caller has them already. */
export interface LoudnessMember {
  bandsDb: ArrayLike<number>;
  bandsE?: ArrayLike<number>;
}

/** The energies 10^(L/10) of octave levels, as groupLoudness sums them. */
export function bandEnergies(bandsDb: ArrayLike<number>): Float64Array {
  const out = new Float64Array(B);
  // Stryker disable next-line EqualityOperator: a write one past a typed array's end is ignored
  for (let b = 0; b < B; b++) out[b] = 10 ** (bandsDb[b] / 10);
  return out;
}

/**
 * Loudness of a group of players heard together (their octave levels added as energies); with
 * `perPlayer`, of one player of the group's average level (the energies divided by the count), so
 * groups of different sizes compare player for player. A member's `bandsE` is used as given.
 */
export function groupLoudness(players: readonly LoudnessMember[], perPlayer = false): Loudness {
  bands.fill(0);
  for (const p of players) {
    const e = p.bandsE;
    // Stryker disable next-line EqualityOperator: a write one past a typed array's end is ignored
    if (e) for (let b = 0; b < B; b++) bands[b] += e[b];
    // Stryker disable next-line EqualityOperator: as above
    else for (let b = 0; b < B; b++) bands[b] += 10 ** (p.bandsDb[b] / 10);
  }
  const n = perPlayer && players.length > 0 ? players.length : 1;
  // Stryker disable next-line EqualityOperator: as above
  for (let b = 0; b < B; b++) bands[b] = 10 * Math.log10(bands[b] / n);
  return octaveLoudness(bands);
}

/** groupLoudness, or a remembering stand-in for it (memoGroupLoudness). */
export type GroupLoudnessOf = (players: readonly LoudnessMember[], perPlayer?: boolean) => Loudness;

/**
 * groupLoudness that remembers every group it has computed, by the identity of the member objects
 * (and perPlayer): for many rounds of checks over mostly the same players (checkConfidence shifts
 * one instrument at a time), only the groups holding a changed player are computed again. Members
 * must not be changed in place once seen.
 */
export function memoGroupLoudness(): GroupLoudnessOf {
  const idOf = new WeakMap<object, number>();
  const seen = new Map<string, Loudness>();
  let next = 0;
  return (players, perPlayer = false) => {
    // Stryker disable next-line StringLiteral: any two different prefixes without a comma keep a group and its average player apart
    let key = perPlayer ? "p" : "g";
    for (const p of players) {
      let id = idOf.get(p);
      // Stryker disable next-line UpdateOperator: ids counted down are as distinct as ids counted up
      if (id === undefined) idOf.set(p, (id = next++));
      key += `,${id}`;
    }
    let l = seen.get(key);
    if (!l) seen.set(key, (l = groupLoudness(players, perPlayer)));
    return l;
  };
}
