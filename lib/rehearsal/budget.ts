// Stadium time shared among the rehearsal plan's items: each item gets minutes in proportion to
// how much it needs — a minute a build-up step to hear it assemble, plus its balance severity
// (failed checks and dB to move, lib/rehearsal/plan.ts) — in whole minutes that add up to the
// budget (largest remainders). Our own rule: common practice, no source. Pure.

export interface BudgetItem {
  severity: number;
  buildUpSteps: number;
}

/** Whole minutes per item, in the items' order, summing to `budgetMinutes`; items past what the time holds get 0. */
export function shareMinutes(items: readonly BudgetItem[], budgetMinutes: number): number[] {
  if (!Number.isInteger(budgetMinutes) || budgetMinutes < 0) throw new RangeError("the budget must be a whole number of minutes, 0 or more");
  if (!items.length) return [];
  const need = items.map((it) => Math.max(1, it.buildUpSteps) + Math.max(0, it.severity));
  const total = need.reduce((a, b) => a + b, 0);
  const exact = need.map((n) => (n / total) * budgetMinutes);
  const minutes = exact.map(Math.floor);
  let left = budgetMinutes - minutes.reduce((a, b) => a + b, 0);
  // Largest remainder first; ties go to the earlier (worse) item.
  const order = exact.map((e, i) => ({ i, rest: e - Math.floor(e) })).sort((a, b) => b.rest - a.rest || a.i - b.i);
  for (const { i } of order) {
    if (left <= 0) break;
    minutes[i]!++;
    left--;
  }
  return minutes;
}
