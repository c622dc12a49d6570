// What the balance plan aims at, and what it leaves to the drill or to one player: a phrase can keep
// failing a check that no section's dynamic fixes, and the plan must say so rather than stay silent. Pure.
import { PLANNED_CHECKS } from "@/lib/acoustics/planned-checks";
import type { CheckId } from "@/lib/acoustics/types";
import { CHECK_LABELS } from "./check-labels";

/** Where to look instead, for a failing check the plan does not serve. */
const ELSEWHERE: Partial<Record<CheckId, string>> = {
  "arrival-spread": "where the players stand, not how loud they play: a shallower form, or the farthest players brought in",
  "stand-outs": "one player, not a section: ask that player to blend, or set their own dynamic under Solos and players",
  "depth-support": "the back of the form: check which way its players face and whether they are the weaker ones",
  "wide-form-edges": "the ends of the wide form: ask the end players to back off, or bring the ends in",
};

/** The checks that still fail with the plan in some set and that section dynamics do not aim at, with where to look. */
export function checksLeftByPlan(sets: readonly { number: string; after: { checks: readonly { id: string; passed: boolean; status?: string }[] } }[]) {
  const left = new Map<string, string[]>();
  for (const s of sets) {
    for (const c of s.after.checks) {
      const fails = c.status ? c.status === "fail" : !c.passed;
      if (!fails || (PLANNED_CHECKS as readonly string[]).includes(c.id)) continue;
      (left.get(c.id) ?? left.set(c.id, []).get(c.id)!).push(s.number);
    }
  }
  return [...left].map(([id, sets]) => ({ id, label: CHECK_LABELS[id] ?? id, sets, where: ELSEWHERE[id as CheckId] ?? "not a matter of section dynamics" }));
}
