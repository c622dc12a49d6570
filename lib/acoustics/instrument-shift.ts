// One instrument's players made louder or softer by a flat offset, without evaluating the set again:
// an instrument's carry is one offset added to every band of its source (evaluator.ts, `base`), and
// every later term of the path adds to it, so each of its players arrives shifted by exactly that
// offset in every band, and nothing else changes. checkConfidence's likely cases are such shifts.
import { NOISE_LIKE_FAMILIES } from "./analyze";
import { BAND_COUNT } from "./bands";
import type { BoxPlayer } from "./box-players";
import { bandEnergies } from "./group-loudness";
import { pointLoudness, type PointLoudness } from "./point-loudness";
import { VOICES } from "./types";

// A module-local copy: imported names are read through a getter when this runs as CommonJS (evaluator.ts).
const B = BAND_COUNT;
/** The players with every player of `instrument` shifted by `shiftDb` (new objects for them; the rest kept as they are). */
export function shiftInstrument(players: readonly BoxPlayer[], instrument: string, shiftDb: number): BoxPlayer[] {
  return players.map((p) => {
    if (p.instrument !== instrument) return p;
    const bandsDb = p.bandsDb.map((l) => l + shiftDb);
    return { ...p, dbA: p.dbA + shiftDb, bandsDb, bandsE: bandEnergies(bandsDb) };
  });
}

/** Octave levels (dB) of the players' summed energies, per voice, for the players `take` keeps. */
function voiceBands(players: readonly BoxPlayer[], take: (p: BoxPlayer) => boolean): Record<string, number[]> {
  const energy = new Map<string, Float64Array>();
  for (const p of players) {
    // Stryker disable next-line ConditionalExpression,StringLiteral: a tacet player's energy would sit under "tacet", which the loop over VOICES below never reads
    if (p.voice === "tacet" || !take(p)) continue;
    let e = energy.get(p.voice);
    if (!e) energy.set(p.voice, (e = new Float64Array(B)));
    // Stryker disable next-line EqualityOperator: a write one past a typed array's end is ignored
    for (let b = 0; b < B; b++) e[b] += p.bandsE[b];
  }
  const out: Record<string, number[]> = {};
  for (const v of VOICES) {
    const e = energy.get(v);
    if (e) out[v] = Array.from(e, (x) => 10 * Math.log10(x));
  }
  return out;
}

/** The point's loudness (pointLoudness) from its sounding players and its background's 28 third-octave levels. */
export function playersLoudness(players: readonly BoxPlayer[], backgroundThirdOctaveDb: ArrayLike<number>): PointLoudness {
  return pointLoudness(
    voiceBands(players, () => true),
    backgroundThirdOctaveDb,
    "free",
    voiceBands(players, (p) => NOISE_LIKE_FAMILIES.includes(p.family)),
  );
}
