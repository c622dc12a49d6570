// What a count is in each meter. Marching counts are beats: compound meters (6/8, 9/8, 12/8 and
// likewise over 16) count dotted beats, every other meter counts the denominator's note, so 4/4 has
// 4 counts, 2/2 has 2, 3/8 has 3 and 6/8 has 2 (common practice, no source). Pure.

/** Quarter notes in one count of the meter `beats`/`beatType`. */
export function beatQuarters(beats: number, beatType: number): number {
  const compound = beatType >= 8 && beats > 3 && beats % 3 === 0;
  return (compound ? 3 : 1) * (4 / beatType);
}

/** Quarter notes in a full measure of `beats`/`beatType`. */
export const measureQuarters = (beats: number, beatType: number) => (beats * 4) / beatType;
