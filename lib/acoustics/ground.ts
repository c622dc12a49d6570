// Ground effect, ISO 9613-2:1996 7.3.1 general method (Table 3): A_gr = A_s + A_r + A_m over
// the source region, receiver region and middle region, each with its own ground factor
// (G_s, G_r, G_m; ground-regions.ts finds them from the ground along the path).
import { BAND_COUNT, nearestBandIndex } from "./bands";
import { AcousticsInputError, requireFinite, requireInRange } from "./errors";
import type { RegionGroundFactors } from "./ground-regions";

/** Number of height-dependent terms per region (see regionTermsInto). */
export const GROUND_TERM_COUNT = 5;

/**
 * Writes the height-dependent factors of Table 3's a'(h), b'(h), c'(h), d'(h) for one region
 * height: [3.0·e^(−0.12(h−5)²), 5.7·e^(−0.09h²), 8.6·e^(−0.09h²), 14.0·e^(−0.46h²), 5.0·e^(−0.9h²)].
 * They depend on height only, so the engine computes them once per performer and per point.
 */
export function regionTermsInto(heightM: number, out: Float64Array, offset: number): void {
  const h2 = heightM * heightM;
  out[offset] = 3.0 * Math.exp(-0.12 * (heightM - 5) * (heightM - 5));
  out[offset + 1] = 5.7 * Math.exp(-0.09 * h2);
  out[offset + 2] = 8.6 * Math.exp(-0.09 * h2);
  out[offset + 3] = 14.0 * Math.exp(-0.46 * h2);
  out[offset + 4] = 5.0 * Math.exp(-0.9 * h2);
}

/**
 * Writes A_gr per octave band (63 Hz … 8 kHz) into out[0..7] for the ground factors of the
 * source, middle and receiver regions, the region terms of source (src at srcOffset) and
 * receiver (rcv at rcvOffset), heights hs + hr and the projected distance dp. Allocation-free:
 * the engine's hot loop calls it per pair.
 */
export function groundBandsInto(
  out: Float64Array,
  gs: number,
  gm: number,
  gr: number,
  src: Float64Array,
  srcOffset: number,
  rcv: Float64Array,
  rcvOffset: number,
  heightSumM: number,
  dpM: number,
): void {
  const e1 = 1 - Math.exp(-dpM / 50);
  const e2 = 1 - Math.exp(-2.8e-6 * dpM * dpM);
  const q = dpM <= 30 * heightSumM ? 0 : 1 - (30 * heightSumM) / dpM;
  const middle = -3 * q * (1 - gm);
  // Each outer region: −1.5 + G·(1.5 + term), the term being a'(h) … d'(h) less its 1.5.
  out[0] = -3 - 3 * q; // 63 Hz: −1.5 per outer region whatever its G, and A_m = −3q
  out[1] = -3 + gs * (1.5 + src[srcOffset] * e1 + src[srcOffset + 1] * e2) + gr * (1.5 + rcv[rcvOffset] * e1 + rcv[rcvOffset + 1] * e2) + middle;
  out[2] = -3 + gs * (1.5 + src[srcOffset + 2] * e1) + gr * (1.5 + rcv[rcvOffset + 2] * e1) + middle;
  out[3] = -3 + gs * (1.5 + src[srcOffset + 3] * e1) + gr * (1.5 + rcv[rcvOffset + 3] * e1) + middle;
  out[4] = -3 + gs * (1.5 + src[srcOffset + 4] * e1) + gr * (1.5 + rcv[rcvOffset + 4] * e1) + middle;
  const high = -1.5 * (1 - gs) - 1.5 * (1 - gr) + middle; // 2 kHz, 4 kHz, 8 kHz
  out[5] = high;
  out[6] = high;
  out[7] = high;
}

export interface GroundQuery {
  frequencyHz: number;
  sourceHeightM: number;
  receiverHeightM: number;
  /** Source–receiver distance projected on the ground plane (d_p), m. */
  distanceM: number;
  /** Ground factor G, 0 (hard) … 1 (porous), one for all regions or one per region; null for no ground term (0 dB). */
  groundFactor: number | RegionGroundFactors | null;
}

/** ISO 9613-2 A_gr (dB) in the octave band nearest to frequencyHz; 0 when groundFactor is null. */
export function groundAttenuationDb(query: GroundQuery): number {
  const f = requireFinite(query.frequencyHz, "frequencyHz");
  if (f <= 0) throw new AcousticsInputError("frequencyHz", "must be above 0");
  const hs = requireFinite(query.sourceHeightM, "sourceHeightM");
  const hr = requireFinite(query.receiverHeightM, "receiverHeightM");
  const dp = requireFinite(query.distanceM, "distanceM");
  if (hs < 0) throw new AcousticsInputError("sourceHeightM", "must not be negative");
  if (hr < 0) throw new AcousticsInputError("receiverHeightM", "must not be negative");
  if (dp < 0) throw new AcousticsInputError("distanceM", "must not be negative");
  if (query.groundFactor === null) return 0;
  const given = query.groundFactor;
  const one = typeof given === "number";
  // Mutation testing: given?.middle, given?.receiver and the "groundFactor" names of the middle and
  // receiver lines are equivalent mutants — an undefined or out-of-range G always fails on the
  // source line first.
  const gs = requireInRange(one ? given : given?.source, 0, 1, one ? "groundFactor" : "groundFactor.source");
  const gm = requireInRange(one ? given : given?.middle, 0, 1, one ? "groundFactor" : "groundFactor.middle");
  const gr = requireInRange(one ? given : given?.receiver, 0, 1, one ? "groundFactor" : "groundFactor.receiver");
  const terms = new Float64Array(2 * GROUND_TERM_COUNT);
  regionTermsInto(hs, terms, 0);
  regionTermsInto(hr, terms, GROUND_TERM_COUNT);
  const out = new Float64Array(BAND_COUNT);
  groundBandsInto(out, gs, gm, gr, terms, 0, terms, GROUND_TERM_COUNT, hs + hr, dp);
  return out[nearestBandIndex(f)];
}
