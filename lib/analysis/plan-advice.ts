// The balance plan in a director's words: who plays what, and one reason per change, e.g. "Clarinets:
// play f where p is written — clarinets carry poorly outdoors, and the melody is 6 dB under the
// accompaniment at the Press box." Pure; the music page, the rehearsal plan and its e-mail all use it.
import type { MusicalLimits } from "@/lib/acoustics/plan-limits";
import type { InstrumentSpec, PlanEntryDetail, UnmetTarget } from "@/lib/acoustics";
import { DYNAMICS } from "@/lib/acoustics/types";

/** Instruments that carry this many dB or more below the brass outdoors are said to carry poorly (catalog carry offsets). */
const POOR_CARRY_DB = -3;

export interface AdviceContext {
  /** The listening point's name, as the show calls it. */
  pointName: string;
  /** A performer's label (T1) and instrument, by id. */
  performer: (id: string) => { label: string; spec?: InstrumentSpec } | undefined;
  limits: MusicalLimits;
}

export interface AdvisedEntry extends PlanEntryDetail {
  /** The row's name: the section, or "Trumpets soloist (T1)". */
  who: string;
  /** One sentence for a change; "" where the section plays as written. */
  why: string;
}

const capital = (text: string) => text.charAt(0).toUpperCase() + text.slice(1);
const plural = (name: string) => `${name.toLowerCase()}s`;

function whoOf(e: PlanEntryDetail, ctx: AdviceContext): string {
  if (!e.solo) return e.section;
  const label = ctx.performer(e.performerIds[0]!)?.label;
  return `${e.section} soloist${label ? ` (${label})` : ""}`;
}

/** The instrument most of the section plays (a Clarinets section with one bass clarinet speaks of clarinets). */
function mainInstrument(e: PlanEntryDetail, ctx: AdviceContext): InstrumentSpec | undefined {
  const tally = new Map<string, { n: number; spec: InstrumentSpec }>();
  for (const id of e.performerIds) {
    const spec = ctx.performer(id)?.spec;
    if (!spec) continue;
    const t = tally.get(spec.name) ?? { n: 0, spec };
    t.n++;
    tally.set(spec.name, t);
  }
  let best: { n: number; spec: InstrumentSpec } | undefined;
  for (const t of tally.values()) if (!best || t.n > best.n) best = t;
  return best?.spec;
}

/** "clarinets carry poorly outdoors, and " when the section rises and its instrument carries poorly. */
function carryClause(e: PlanEntryDetail, ctx: AdviceContext): string {
  const spec = mainInstrument(e, ctx);
  if (!spec || e.changeDb <= 0 || spec.carryDb > POOR_CARRY_DB) return "";
  return `${plural(spec.name)} carry poorly outdoors, and `;
}

/** Why the section stops where it does while a target still asks for more. */
function limitClause(e: PlanEntryDetail, ctx: AdviceContext): string {
  if (!e.atLimit) return "";
  const end = e.atLimit === DYNAMICS[0] || e.atLimit === DYNAMICS[DYNAMICS.length - 1];
  if (end) return ` ${e.atLimit} is as far as it goes.`;
  const steps = e.kind === "winds" ? ctx.limits.windSteps : ctx.limits.percussionSteps;
  return ` It stops at ${e.atLimit}: the limits allow ${steps} step${steps === 1 ? "" : "s"} from ${e.writtenDynamic}${e.kind === "percussion" ? " for the battery and front ensemble" : ""}.`;
}

/** The sentence for one row. */
export function adviceFor(e: PlanEntryDetail, ctx: AdviceContext): string {
  const who = whoOf(e, ctx);
  if (e.playedDynamic === e.writtenDynamic) return e.atLimit ? `${who}: play ${e.writtenDynamic} as written.${limitClause(e, ctx)}` : "";
  const head = `${who}: play ${e.playedDynamic} where ${e.writtenDynamic} is written — `;
  const r = e.reason;
  if (!r || r.kind === "shape") return `${head}this keeps the written shape with the sections that move around it.${limitClause(e, ctx)}`;
  if (r.kind === "keep") return `${head}with the sections around it moving, this keeps what already works at the ${ctx.pointName}: ${r.aim}.${limitClause(e, ctx)}`;
  const where = `at the ${ctx.pointName}${r.set ? ` in set ${r.set}` : ""}`;
  return `${head}${carryClause(e, ctx)}${r.state} ${where}.${limitClause(e, ctx)}`;
}

/** The rows with their names and reasons (already in score order). */
export function advisePlan(entries: readonly PlanEntryDetail[], ctx: AdviceContext): AdvisedEntry[] {
  return entries.map((e) => ({ ...e, who: whoOf(e, ctx), why: adviceFor(e, ctx) }));
}

/** A target the plan cannot meet, in the same words. */
export function unmetWords(u: UnmetTarget, ctx: Pick<AdviceContext, "pointName">): string {
  return `${capital(u.state)} at the ${ctx.pointName}${u.set ? ` in set ${u.set}` : ""}; ${u.aim}.`;
}
