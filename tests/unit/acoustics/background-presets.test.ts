// The background presets are built when background.ts is first loaded. A fault there stops the
// module from loading, and the vitest runner of Stryker 9.6.1 counts a test file that cannot load as
// holding no tests rather than a failing one (stryker-js issue 6150), so such a fault would look
// unnoticed. This file therefore imports the module inside its tests, where a failure to load fails
// the test, and imports nothing else of the engine at the top.
import { describe, expect, it } from "vitest";

const load = () => import("@/lib/acoustics/background");

describe("background presets, as built when the module loads", () => {
  it("the crowd presets keep the speech spectrum of their vocal effort (ANSI S3.5-1997 Table 3)", async () => {
    const { BACKGROUND_PRESET_SPECS } = await load();
    // Spectrum levels at 800 Hz and 1 kHz: normal 28.30 and 25.01, raised 36.37 and 33.86 dB per Hz.
    // Base-10 third-octaves are 10^0.1 apart, so the 1 kHz band is 1 dB wider (10·lg 10^0.1), and
    // band 16 (1 kHz) less band 15 (800 Hz) is 25.01 − 28.30 + 1 = −2.29 dB for normal effort and
    // 33.86 − 36.37 + 1 = −1.51 dB for raised; scaling to a dBA moves every band alike.
    const crowd = BACKGROUND_PRESET_SPECS["crowd-during-performance"].thirdOctaveDb;
    const stadium = BACKGROUND_PRESET_SPECS["stadium-between-bands"].thirdOctaveDb;
    expect(crowd[16] - crowd[15]).toBeCloseTo(-2.29, 9);
    expect(stadium[16] - stadium[15]).toBeCloseTo(-1.51, 9);
  });

  it("the quiet field reads the A-weighted level of its octaves, each octave's energy kept in its thirds", async () => {
    const { BACKGROUND_PRESET_SPECS } = await load();
    const quiet = BACKGROUND_PRESET_SPECS["quiet-field"];
    // Its octaves (63 Hz … 8 kHz) are 52, 47, 43, 40, 37, 33, 28, 22 dB. A-weights of the octave
    // centres, IEC 61672-1:2013 Table 3: −26.2, −16.1, −8.6, −3.2, 0, +1.2, +1.0, −1.1 dB, giving
    // 25.8, 30.9, 34.4, 36.8, 37, 34.2, 29, 20.9 dB: 10·lg Σ 10^(L/10) = 42.48 dBA (python by
    // hand). The preset weights each third, not each octave, so allow 0.3 dB.
    expect(Math.abs(quiet.dbA - 42.48)).toBeLessThan(0.3);
    // The 1 kHz octave's thirds (bands 15, 16, 17) hold its 37 dB.
    const e = [15, 16, 17].reduce((s, i) => s + 10 ** (quiet.thirdOctaveDb[i] / 10), 0);
    expect(10 * Math.log10(e)).toBeCloseTo(37, 9);
  });
});
