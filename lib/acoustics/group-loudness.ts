// Loudness at a listening point of a group of players (a voice, a register, a section's end), by
// ISO 532-1 (loudness.ts) on third-octaves derived from the players' summed octave levels
// (third-octaves.ts): the measure the balance checks compare, so that a tuba and a trumpet at the
// same dynamic are judged as they are heard, not through A-weighting's cut of the low bands.
import { BAND_COUNT } from "./bands";
import { loudnessIso532_1, type Loudness } from "./loudness";
import { THIRD_OCTAVE_COUNT } from "./loudness-tables";
import { thirdOctavesFromOctavesInto } from "./third-octaves";

const thirds = new Float64Array(THIRD_OCTAVE_COUNT);
const bands = new Float64Array(BAND_COUNT);

/** Loudness of 8 octave levels (dB SPL, 63 Hz … 8 kHz), free field; 0 sone for silence. */
export function octaveLoudness(octaveDb: ArrayLike<number>): Loudness {
  thirdOctavesFromOctavesInto(octaveDb, thirds);
  return loudnessIso532_1(thirds);
}

/**
 * Loudness of a group of players heard together (their octave levels added as energies); with
 * `perPlayer`, of one player of the group's average level (the energies divided by the count), so
 * groups of different sizes compare player for player.
 */
export function groupLoudness(players: readonly { bandsDb: ArrayLike<number> }[], perPlayer = false): Loudness {
  bands.fill(0);
  for (const p of players) for (let b = 0; b < BAND_COUNT; b++) bands[b] += 10 ** (p.bandsDb[b] / 10);
  const n = perPlayer && players.length > 0 ? players.length : 1;
  for (let b = 0; b < BAND_COUNT; b++) bands[b] = 10 * Math.log10(bands[b] / n);
  return octaveLoudness(bands);
}
