// Shared builders for the acoustics tests.
import type { Conditions, Dynamic, PerformerInput, VoiceOrTacet } from "@/lib/acoustics";

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
