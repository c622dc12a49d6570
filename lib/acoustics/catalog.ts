// The default instrument catalog: every number of the source model in one table, so that
// calibration from box readings can adjust it (mostly carryDb).
//
// Columns, bands 63, 125, 250, 500, 1k, 2k, 4k, 8k Hz:
// - powerDb: overall sound power level Lw (dB re 1 pW) per written dynamic pp…fff. Where Everest,
//   Master Handbook of Acoustics, Table 5-1 lists a peak acoustic power, ff and fff stay at or
//   below it (peaks are upper bounds). Everything else is from memory (not checked): woodwinds
//   about 60–70 dB at pp and 95–105 at ff, brass ff about 110–120, a 10–30 dB pp–ff span.
// - spectrumDb: band shape at mf, relative; the engine normalises it so the bands sum to powerDb.
// - brightnessDbPerStep: extra dB per dynamic step above mf (negative below), brighter when loud.
// - directivity: dB at 0°, 45°, 90°, 135°, 180° from the facing, per band. Bells forward; brass
//   near omnidirectional below about 500 Hz, −6…−10 dB at 90° and −15…−20 dB behind at 2 kHz
//   (trumpet), trombone-size bells about half an octave lower; woodwinds within a few dB of
//   omnidirectional below 1 kHz; drums broad (from memory; see Pätynen & Lokki 2010).
// - carryDb: outdoor carry offset. Woodwinds carry poorly outdoors compared with brass
//   (common practice, no source); calibrated later from box readings.
import type { BandLevels, Family, InstrumentCatalog, InstrumentSpec, Register } from "./types";

const ANGLES = [0, 45, 90, 135, 180];
type Pattern = number[][];

/** Small bell aimed forward (trumpet, mellophone). */
const SMALL_BELL: Pattern = [
  [0, 0, -0.5, -1, -1],
  [0, 0, -0.5, -1, -1.5],
  [0, -0.5, -1, -2, -3],
  [0, -1, -3, -5, -6],
  [0, -2, -5, -9, -11],
  [0, -3, -8, -14, -17],
  [0, -4, -11, -18, -21],
  [0, -5, -14, -21, -24],
];
/** Trombone-size bell: the small-bell pattern about half an octave lower. */
const MEDIUM_BELL: Pattern = [
  [0, 0, -0.5, -1, -1],
  [0, -0.2, -0.8, -1.5, -2],
  [0, -0.7, -2, -3.5, -4.5],
  [0, -1.5, -4, -7, -8.5],
  [0, -2.5, -6.5, -11.5, -14],
  [0, -3.5, -9.5, -16, -19],
  [0, -4.5, -12.5, -19.5, -22.5],
  [0, -5, -14, -21, -24],
];
/** Large forward bell (marching tuba / sousaphone): another half octave lower. */
const LARGE_BELL: Pattern = [
  [0, 0, -0.5, -1, -1.5],
  [0, -0.5, -1.5, -2.5, -3.5],
  [0, -1, -3, -5, -6.5],
  [0, -2, -5.5, -9, -11],
  [0, -3, -8, -14, -17],
  [0, -4, -11, -18, -21],
  [0, -5, -13, -20, -23],
  [0, -5, -14, -21, -24],
];
/** Saxophones: bell and open tone holes, between woodwinds and brass. */
const SAX: Pattern = [
  [0, 0, -0.5, -1, -1],
  [0, 0, -0.5, -1, -1.5],
  [0, -0.5, -1, -1.5, -2],
  [0, -0.5, -1.5, -2.5, -3],
  [0, -1, -2.5, -4, -5],
  [0, -1.5, -4, -6, -7.5],
  [0, -2, -5, -8, -10],
  [0, -2.5, -6, -10, -12],
];
/** Flutes and clarinets: radiation mostly from tone holes, near omnidirectional. */
const WOODWIND: Pattern = [
  [0, 0, -0.5, -1, -1.5],
  [0, 0, -0.5, -1, -1.5],
  [0, 0, -0.5, -1, -1.5],
  [0, 0, -0.5, -1, -1.5],
  [0, -0.5, -1.5, -2.5, -3],
  [0, -1, -2.5, -4, -5],
  [0, -1.5, -3.5, -5, -6],
  [0, -2, -4, -6, -7],
];
/** Drums, cymbals and keyboards: broad, the player's body shading the back a little. */
const BROAD: Pattern = [
  [0, 0, 0, -0.5, -0.5],
  [0, 0, 0, -0.5, -0.5],
  [0, 0, -0.5, -1, -1],
  [0, 0, -0.5, -1, -1.5],
  [0, -0.5, -1, -1.5, -2],
  [0, -0.5, -1, -2, -2.5],
  [0, -0.5, -1.5, -2.5, -3],
  [0, -1, -2, -3, -4],
];
/** Loudspeaker cabinet facing the field: omni at the bottom, beaming above 1 kHz. */
const CABINET: Pattern = [
  [0, 0, 0, -0.5, -1],
  [0, 0, -0.5, -1.5, -2],
  [0, -0.5, -1.5, -3, -4],
  [0, -0.5, -2.5, -5, -7],
  [0, -1, -4, -8, -10],
  [0, -2, -7, -12, -15],
  [0, -3, -10, -16, -20],
  [0, -4, -13, -20, -24],
];

const WIND_BRIGHTNESS: BandLevels = [-0.5, -0.5, -0.3, 0, 0.3, 0.6, 0.9, 1.2];
const BRASS_BRIGHTNESS: BandLevels = [-1, -0.8, -0.4, 0, 0.5, 1, 1.5, 2];
const PERC_BRIGHTNESS: BandLevels = [0, 0, 0, 0, 0.2, 0.4, 0.6, 0.8];
const FLAT: BandLevels = [0, 0, 0, 0, 0, 0, 0, 0];

const EVEREST = "Everest, Master Handbook of Acoustics, Table 5-1 (peak power, bound on ff/fff); other values from memory";
const MEMORY = "from memory";

function spec(
  name: string,
  family: Family,
  register: Register,
  powerDb: [number, number, number, number, number, number, number],
  spectrumDb: BandLevels,
  brightnessDbPerStep: BandLevels,
  pattern: Pattern,
  carryDb: number,
  source: string,
): InstrumentSpec {
  const [pp, p, mp, mf, f, ff, fff] = powerDb;
  return {
    name,
    family,
    register,
    powerDb: { pp, p, mp, mf, f, ff, fff },
    spectrumDb,
    brightnessDbPerStep,
    directivity: { anglesDeg: ANGLES, bandsDb: pattern },
    carryDb,
    source,
  };
}

/** Peak acoustic power of Everest Table 5-1 as Lw (dB re 1 pW), keyed like the catalog. */
export const EVEREST_PEAK_LW_DB: Readonly<Record<string, number>> = Object.freeze({
  "bass-drum": 134.0,
  snare: 130.8,
  cymbals: 130.0,
  trombone: 127.8,
  trumpet: 114.8,
  tuba: 113.0,
  piccolo: 109.0,
  flute: 107.8,
  clarinet: 107.0,
});

/** Freezes the table so no caller can change the defaults by accident (overrides are copies). */
function deepFreeze<T>(value: T): T {
  // Stryker disable next-line ConditionalExpression,LogicalOperator: any other test recurses into a string's characters without end, so the module never loads (Stryker 9.6.1 counts that as survived)
  if (value && typeof value === "object") {
    for (const v of Object.values(value)) deepFreeze(v);
    Object.freeze(value);
  }
  return value;
}

//                                   pp   p  mp  mf   f  ff fff        63  125  250  500   1k   2k   4k   8k
/** The default instrument catalog, keyed by instrument key. */
export const DEFAULT_INSTRUMENTS: InstrumentCatalog = deepFreeze({
  piccolo: spec("Piccolo", "woodwind", "soprano", [72, 78, 83, 88, 94, 100, 104], [-45, -38, -28, -14, -5, -3, -8, -18], WIND_BRIGHTNESS, WOODWIND, -5, EVEREST),
  flute: spec("Flute", "woodwind", "soprano", [68, 74, 79, 84, 90, 96, 100], [-40, -30, -18, -6, -3, -6, -12, -22], WIND_BRIGHTNESS, WOODWIND, -6, EVEREST),
  clarinet: spec("Clarinet", "woodwind", "soprano", [67, 73, 79, 84, 90, 96, 100], [-40, -25, -10, -4, -5, -9, -15, -24], WIND_BRIGHTNESS, WOODWIND, -6, EVEREST),
  "bass-clarinet": spec("Bass clarinet", "woodwind", "bass", [66, 72, 78, 83, 89, 95, 99], [-25, -8, -4, -6, -10, -15, -21, -30], WIND_BRIGHTNESS, WOODWIND, -6, MEMORY),
  "alto-sax": spec("Alto saxophone", "woodwind", "alto", [72, 78, 84, 89, 95, 101, 105], [-35, -20, -6, -3, -5, -9, -15, -24], WIND_BRIGHTNESS, SAX, -3, MEMORY),
  "tenor-sax": spec("Tenor saxophone", "woodwind", "tenor", [72, 78, 84, 89, 95, 101, 105], [-28, -12, -4, -4, -7, -11, -17, -26], WIND_BRIGHTNESS, SAX, -3, MEMORY),
  "bari-sax": spec("Baritone saxophone", "woodwind", "bass", [72, 78, 84, 89, 95, 101, 105], [-18, -5, -3, -6, -9, -13, -19, -28], WIND_BRIGHTNESS, SAX, -3, MEMORY),
  trumpet: spec("Trumpet", "brass", "soprano", [82, 88, 94, 99, 105, 111, 114], [-40, -25, -8, -3, -3, -6, -12, -20], BRASS_BRIGHTNESS, SMALL_BELL, 0, EVEREST),
  mellophone: spec("Mellophone", "brass", "alto", [80, 86, 92, 97, 103, 109, 112], [-35, -18, -6, -3, -5, -10, -17, -26], BRASS_BRIGHTNESS, SMALL_BELL, 0, MEMORY),
  trombone: spec("Trombone", "brass", "tenor", [83, 89, 94, 99, 105, 112, 116], [-25, -8, -3, -4, -7, -11, -17, -26], BRASS_BRIGHTNESS, MEDIUM_BELL, 0, EVEREST),
  baritone: spec("Baritone / euphonium", "brass", "tenor", [81, 87, 92, 97, 103, 110, 114], [-20, -6, -3, -5, -10, -16, -23, -32], BRASS_BRIGHTNESS, MEDIUM_BELL, 0, MEMORY),
  tuba: spec("Tuba / sousaphone", "brass", "bass", [81, 87, 92, 97, 103, 110, 112.5], [-6, -3, -5, -11, -18, -25, -32, -40], BRASS_BRIGHTNESS, LARGE_BELL, 0, EVEREST),
  snare: spec("Snare line", "percussion", "soprano", [97, 103, 108, 114, 120, 126, 129], [-20, -12, -6, -4, -4, -6, -9, -13], PERC_BRIGHTNESS, BROAD, 0, EVEREST),
  tenors: spec("Tenor drums", "percussion", "alto", [95, 101, 106, 112, 118, 124, 127], [-14, -7, -4, -5, -7, -10, -14, -19], PERC_BRIGHTNESS, BROAD, 0, MEMORY),
  "bass-drum": spec("Bass drums", "percussion", "bass", [98, 104, 109, 114, 120, 127, 131], [-3, -3, -7, -14, -20, -27, -34, -42], PERC_BRIGHTNESS, BROAD, 0, EVEREST),
  cymbals: spec("Cymbals", "percussion", "soprano", [95, 100, 105, 111, 117, 124, 128], [-35, -28, -20, -12, -7, -4, -3, -4], PERC_BRIGHTNESS, BROAD, 0, EVEREST),
  marimba: spec("Marimba", "keyboard", "tenor", [78, 84, 89, 94, 99, 104, 107], [-20, -8, -4, -5, -8, -14, -22, -30], PERC_BRIGHTNESS, BROAD, -1, MEMORY),
  vibraphone: spec("Vibraphone", "keyboard", "alto", [74, 80, 85, 90, 95, 100, 103], [-30, -18, -7, -4, -6, -12, -20, -28], PERC_BRIGHTNESS, BROAD, -1, MEMORY),
  synth: spec("Synthesizer (amplified, front ensemble)", "amplified", "tenor", [85, 91, 96, 101, 106, 111, 114], [-8, -5, -4, -5, -6, -8, -12, -18], FLAT, CABINET, 0, MEMORY),
});
