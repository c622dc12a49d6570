import { describe, expect, it } from "vitest";
import { OCTAVE_BANDS, groundAttenuationDb } from "@/lib/acoustics";

const at = (frequencyHz: number, groundFactor: number | null, hs: number, hr: number, dp: number) =>
  groundAttenuationDb({ frequencyHz, sourceHeightM: hs, receiverHeightM: hr, distanceM: dp, groundFactor });

describe("ground effect, ISO 9613-2:1996 7.3.1 general method, Table 3", () => {
  it("gives 17.2 dB at 250 Hz for porous ground, hs = hr = 0, large dp (via jmrplens/phonometry)", () => {
    expect(at(250, 1, 0, 0, 1e5)).toBeCloseTo(17.2, 6);
  });

  it("takes c'(h) and d'(h) from each outer region on its own: with one region hard, 500 Hz is −1.5 + (1.5 + 14 − 1.5) = 12.5 dB and 1 kHz −1.5 + (1.5 + 5 − 1.5) = 3.5 dB (Table 3 at h = 0, dp → ∞, hand calculation)", () => {
    // h = 0: c'(0) = 1.5 + 14.0, d'(0) = 1.5 + 5.0; dp → ∞: e^(−dp/50) → 0; q = 1 and G_m = 1, so A_m = 0.
    const one = (source: number, receiver: number, f: number) =>
      groundAttenuationDb({ frequencyHz: f, sourceHeightM: 0, receiverHeightM: 0, distanceM: 1e5, groundFactor: { source, middle: 1, receiver } });
    for (const [s, r] of [[0, 1], [1, 0]] as const) {
      expect(one(s, r, 500), `G_s ${s}, G_r ${r}`).toBeCloseTo(12.5, 9);
      expect(one(s, r, 1000), `G_s ${s}, G_r ${r}`).toBeCloseTo(3.5, 9);
    }
  });

  it("gives −3 dB in every band for hard ground (G = 0) with dp ≤ 30(hs + hr): −1.5 dB per region, A_m = 0", () => {
    for (const b of OCTAVE_BANDS) expect(at(b.exactHz, 0, 1.5, 1.5, 60)).toBeCloseTo(-3, 9);
  });

  it("adds A_m = −3q, q = 1 − 30(hs + hr)/dp, beyond 30(hs + hr) on hard ground (Table 3, computed: dp 180 m → −4.5 dB)", () => {
    expect(at(1000, 0, 1.5, 1.5, 180)).toBeCloseTo(-4.5, 9);
    expect(at(63, 1, 1.5, 1.5, 180)).toBeCloseTo(-4.5, 9); // 63 Hz: A_m = −3q whatever G
  });

  it("gives −1.5(1 − G) per region above 2 kHz (Table 3): porous ground 0 dB with q = 0", () => {
    expect(at(4000, 1, 1.5, 18, 40)).toBeCloseTo(0, 9);
    expect(at(8000, 0.5, 1.5, 18, 40)).toBeCloseTo(-1.5, 9);
  });

  it("is zero when the ground term is switched off (groundFactor null)", () => {
    expect(at(250, null, 1.5, 18, 40)).toBe(0);
  });

  it("attenuates more over grass than over hard ground at 250–1000 Hz for a low receiver", () => {
    for (const f of [250, 500, 1000]) expect(at(f, 1, 1.5, 1.5, 50)).toBeGreaterThan(at(f, 0, 1.5, 1.5, 50));
  });
});
