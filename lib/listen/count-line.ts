// Where a set sits on the show's count line: the opening set at count 0, each later set its counts after the one before.

/** The count at which the set at `index` (in show order) is reached: the counts of the sets at 1 … index. */
export function setCountOnLine(sets: readonly { counts: number }[], index: number): number {
  let total = 0;
  for (let i = 1; i <= index && i < sets.length; i++) total += sets[i]!.counts;
  return total;
}
