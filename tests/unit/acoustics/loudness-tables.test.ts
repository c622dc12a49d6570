// The low-frequency reduction of ISO 532-1:2017 (Table A.3, RAP and DLL) against an independent public
// copy. The standard's test signals 1–4 (loudness.test.ts) leave most of this table unread:
// a tone or noise reaches one level range of each low band at most, so a wrong entry elsewhere passed.
// Source of the values below: ggrecow/SQAT psychoacoustic_metrics/Loudness_ISO532_1/Loudness_ISO532_1.m
// @ 069dc3217202839d8b7c363e52bcc082ec6d6478 ("WEIGHTING BELLOW 315Hz TABLE A.3", RAP and DLL), which
// its author verified against the test signals of ISO 532-1:2017. The module is imported inside the
// test, so that a fault stopping it from loading fails the test (see audibility-tables.test.ts).
import { expect, it } from "vitest";

const SQAT_RAP = [45, 55, 65, 71, 80, 90, 100, 120];
const SQAT_DLL = [
  [-32, -24, -16, -10, -5, 0, -7, -3, 0, -2, 0],
  [-29, -22, -15, -10, -4, 0, -7, -2, 0, -2, 0],
  [-27, -19, -14, -9, -4, 0, -6, -2, 0, -2, 0],
  [-25, -17, -12, -9, -3, 0, -5, -2, 0, -2, 0],
  [-23, -16, -11, -7, -3, 0, -4, -1, 0, -1, 0],
  [-20, -14, -10, -6, -3, 0, -4, -1, 0, -1, 0],
  [-18, -12, -9, -6, -2, 0, -3, -1, 0, -1, 0],
  [-15, -10, -8, -4, -2, 0, -3, -1, 0, -1, 0],
];

it("reduces the 11 bands 25–250 Hz in each of the 8 level ranges as ISO 532-1 Table A.3 does", async () => {
  const { LF_RANGE_DB, LF_REDUCTION_DB } = await import("@/lib/acoustics/loudness-tables");
  expect(Array.from(LF_RANGE_DB)).toEqual(SQAT_RAP);
  expect(LF_REDUCTION_DB.map((row) => Array.from(row))).toEqual(SQAT_DLL);
});
