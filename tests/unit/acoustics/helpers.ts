// Shared builders for the acoustics tests.
import type { AnalysisInput, Conditions, Dynamic, InstrumentSpec, PerformerInput, VoiceOrTacet } from "@/lib/acoustics";

/** The demo press box: on the 50, 25 m behind the front sideline, 18 m up. */
export const BOX = { id: "box", x: 0, y: -25, z: 18 };

/** A mild evening; groundFactor null unless a test needs the ground term. */
export const AIR: Conditions = { temperatureC: 20, relativeHumidityPct: 50, pressureKPa: 101.325, groundFactor: null };

/** Facing (degrees, the API convention) that points a performer at (x, y) toward (tx, ty). */
export function facingToward(x: number, y: number, tx: number, ty: number): number {
  const deg = (Math.atan2(tx - x, -(ty - y)) * 180) / Math.PI;
  return (deg + 360) % 360;
}

export function performer(over: Partial<PerformerInput> & { id: string }): PerformerInput {
  return {
    instrument: "trumpet",
    section: "trumpets",
    voice: "melody" as VoiceOrTacet,
    dynamic: "mf" as Dynamic,
    x: 0,
    y: 10,
    facingDeg: 0,
    ...over,
  };
}

/**
 * A test source with a spectrum chosen by hand: band levels `bandLwDb` (dB re 1 pW) at mf, no
 * directivity, no carry offset, and every other dynamic `stepDb` per step away from mf. Lets a
 * test predict a level with pencil and paper, independent of the catalog.
 */
export function handSource(bandLwDb: readonly number[], stepDb = 6): InstrumentSpec {
  const mf = 10 * Math.log10(bandLwDb.reduce((s, l) => s + 10 ** (l / 10), 0));
  const at = (steps: number) => mf + steps * stepDb;
  return {
    name: "hand source",
    family: "brass",
    register: "tenor",
    powerDb: { pp: at(-3), p: at(-2), mp: at(-1), mf: at(0), f: at(1), ff: at(2), fff: at(3) },
    spectrumDb: bandLwDb.map((l) => l - mf),
    brightnessDbPerStep: [0, 0, 0, 0, 0, 0, 0, 0],
    directivity: { anglesDeg: [0, 180], bandsDb: bandLwDb.map(() => [0, 0]) },
    carryDb: 0,
    source: "test",
  };
}

/**
 * A value computed on first use, inside a test. Work done while vitest collects a file (in a
 * describe body) runs outside every test, so mutation testing (stryker.config.mjs) must count the
 * code it reaches as "static" and rerun every test for each of its mutants; computing lazily keeps
 * the engine's mutants tied to the tests that use them.
 */
export function lazy<T>(make: () => T): () => T {
  let value: { v: T } | null = null;
  return () => (value ??= { v: make() }).v;
}

/** A set of these performers heard at BOX in still standard air. */
export const boxInput = (performers: PerformerInput[]): AnalysisInput => ({ performers, listeningPoints: [BOX], conditions: AIR });

/** A performer standing at (x, y) and facing the box. */
export const facingBox = (over: Partial<PerformerInput> & { id: string; x: number; y: number }): PerformerInput =>
  performer({ facingDeg: facingToward(over.x, over.y, BOX.x, BOX.y), ...over });
