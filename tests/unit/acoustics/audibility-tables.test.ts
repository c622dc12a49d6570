// The tables of audibility.ts (each critical band's centre, the spreading factors, the masking
// indices) are built when the module is first loaded. A fault there can stop the module from
// loading, and the vitest runner of Stryker 9.6.1 counts a test file that cannot load as holding no
// tests rather than a failing one (stryker-js issue 6150). This file therefore imports the module
// inside its tests, where a failure to load fails the test, and nothing else of the engine at the top.
import { describe, expect, it } from "vitest";

const load = () => import("@/lib/acoustics/audibility");

describe("audibility's tables, as built when the module loads", () => {
  it("spreads a masker in the lowest critical band upward by the slope at the band's geometric centre frequency", async () => {
    const { maskedThresholdInto } = await load();
    // A noise-like masker of 60 dB in band 0 alone (25–80 Hz: third-octave centres 25.119 and
    // 79.433 Hz, geometric middle 44.668 Hz). Band 0 spans 0–0.9 Bark and band 1 0.9–1.8 Bark,
    // centres 0.45 and 1.35. Upward slope 24 + 230/44.668 − 0.2·60 = 17.149 dB per Bark, so band 1
    // receives 60 − 0.9 · 17.149 = 44.566 dB, and its threshold lies the noise masking index
    // −1.525 − 0.175 · 1.35 − 0.5 = −2.261 dB below: 42.305 dB (python by hand).
    const masker = new Array<number>(20).fill(-Infinity);
    masker[0] = 60;
    const out = new Float64Array(20);
    maskedThresholdInto(masker, out, "noise");
    expect(out[1]).toBeCloseTo(42.305, 3);
  });
});
