// The balance checks: the rules of thumb of shared/PRODUCT.md applied to one set's box mix.
// Thresholds and their sources are in targets.ts.
import { WIDTH_M } from "@/lib/validation/positions";
import { formatDb, groupBy, meanPerPlayerDb, soundingPlayers, type BoxPlayer } from "./box-players";
import { sumLevelsDb } from "./levels";
import { resolveTargets, type BalanceTargets } from "./targets";
import { VOICES, type AnalysisInput, type CheckResult, type Family, type PointResult, type Register } from "./types";

/** Registers from the lowest up. */
export const REGISTERS_LOW_TO_HIGH: readonly Register[] = ["bass", "tenor", "alto", "soprano"];
/** The choirs the pyramid is checked in. */
export const PYRAMID_FAMILIES: readonly Family[] = ["woodwind", "brass"];
const FAMILY_NAMES: Record<Family, string> = { woodwind: "woodwinds", brass: "brass", percussion: "percussion", keyboard: "keyboards", amplified: "amplified" };

const ids = (players: readonly BoxPlayer[]) => players.map((p) => p.id);
const sectionsOf = (players: readonly BoxPlayer[]) => [...new Set(players.map((p) => p.section))].join(", ");
const plural = (n: number, one: string, many = `${one}s`) => `${n} ${n === 1 ? one : many}`;

/** melody-forward: the melody leads every other voice by targets.melodyLeadDb. */
function melodyForward(point: PointResult, players: BoxPlayer[], t: BalanceTargets): CheckResult {
  const melody = point.voices.melody?.dbA;
  if (melody === undefined || !Number.isFinite(melody)) {
    return { id: "melody-forward", passed: true, detail: "No one plays the melody in this set.", performerIds: [] };
  }
  const others = VOICES.flatMap((v) => {
    const dbA = point.voices[v]?.dbA;
    return v !== "melody" && dbA !== undefined && Number.isFinite(dbA) ? [{ voice: v, lead: melody - dbA }] : [];
  });
  if (others.length === 0) return { id: "melody-forward", passed: true, detail: "The melody plays alone.", performerIds: [] };
  const short = others.filter((o) => o.lead < t.melodyLeadDb).sort((a, b) => a.lead - b.lead);
  if (short.length === 0) {
    const closest = others.reduce((a, b) => (b.lead < a.lead ? b : a));
    return {
      id: "melody-forward",
      passed: true,
      detail: `The melody leads the next loudest voice (${closest.voice}) by ${formatDb(closest.lead)} (target ${formatDb(t.melodyLeadDb)}).`,
      performerIds: [],
    };
  }
  const words = short.map((o) => (o.lead < 0 ? `${formatDb(o.lead)} below the ${o.voice}` : `only ${formatDb(o.lead)} above the ${o.voice}`));
  const crowding = new Set<string>(short.map((o) => o.voice));
  return {
    id: "melody-forward",
    passed: false,
    detail: `The melody is ${words.join(" and ")} at this listening point; it should lead every other voice by ${formatDb(t.melodyLeadDb)}.`,
    performerIds: ids(players.filter((p) => p.voice === "melody" || crowding.has(p.voice))),
  };
}

/** bass-up-pyramid: within each choir, a lower register is at least as present as each higher one. */
function bassUpPyramid(players: BoxPlayer[], t: BalanceTargets): CheckResult {
  const failures: string[] = [];
  const flagged = new Set<string>();
  let pairs = 0;
  for (const family of PYRAMID_FAMILIES) {
    const choir = players.filter((p) => p.family === family && (t.pyramidVoices as string[]).includes(p.voice));
    const byRegister = groupBy(choir, (p) => p.register);
    const present = REGISTERS_LOW_TO_HIGH.filter((r) => byRegister.has(r)).map((r) => {
      const list = byRegister.get(r)!;
      return { register: r, list, dbA: sumLevelsDb(list.map((p) => p.dbA)) };
    });
    for (let i = 0; i < present.length; i++) {
      for (let j = i + 1; j < present.length; j++) {
        pairs++;
        const low = present[i]!;
        const high = present[j]!;
        const deficit = high.dbA - low.dbA;
        if (deficit > t.pyramidToleranceDb) {
          failures.push(`in the ${FAMILY_NAMES[family]}, the ${low.register} register (${sectionsOf(low.list)}) is ${formatDb(deficit)} below the ${high.register} (${sectionsOf(high.list)})`);
          for (const p of [...low.list, ...high.list]) flagged.add(p.id);
        }
      }
    }
  }
  if (pairs === 0) return { id: "bass-up-pyramid", passed: true, detail: "No choir has two registers in the harmony here.", performerIds: [] };
  if (failures.length === 0) {
    return {
      id: "bass-up-pyramid",
      passed: true,
      detail: `In each choir every lower register is at least as present as the higher ones (tolerance ${formatDb(t.pyramidToleranceDb)}).`,
      performerIds: [],
    };
  }
  const detail = failures.join("; ");
  return {
    id: "bass-up-pyramid",
    passed: false,
    detail: `${detail[0]!.toUpperCase()}${detail.slice(1)} (tolerance ${formatDb(t.pyramidToleranceDb)}).`,
    performerIds: [...flagged],
  };
}

/** depth-support: front-third players of an instrument are not much louder per player at the box than back-third ones. */
function depthSupport(players: BoxPlayer[], t: BalanceTargets): CheckResult {
  const frontEdge = WIDTH_M / 3;
  const backEdge = (2 * WIDTH_M) / 3;
  const failures: string[] = [];
  const flagged: string[] = [];
  let compared = 0;
  for (const list of groupBy(players, (p) => p.instrument).values()) {
    const front = list.filter((p) => p.y < frontEdge);
    const back = list.filter((p) => p.y > backEdge);
    if (front.length === 0 || back.length === 0) continue;
    compared++;
    const excess = meanPerPlayerDb(front.map((p) => p.dbA)) - meanPerPlayerDb(back.map((p) => p.dbA));
    if (excess > t.depthToleranceDb) {
      failures.push(`${list[0]!.spec.name}: the ${plural(front.length, "player")} in the front third reach the box ${formatDb(excess)} louder each than the ${back.length} in the back third`);
      flagged.push(...ids(front));
    }
  }
  if (compared === 0) return { id: "depth-support", passed: true, detail: "No instrument plays in both the front and the back third of the field.", performerIds: [] };
  if (failures.length === 0) {
    return { id: "depth-support", passed: true, detail: `Players in the back third are supported: no instrument's front players are more than ${formatDb(t.depthToleranceDb)} louder each.`, performerIds: [] };
  }
  return { id: "depth-support", passed: false, detail: `${failures.join("; ")} (tolerance ${formatDb(t.depthToleranceDb)}; front players should listen back).`, performerIds: flagged };
}

/** wide-form-edges: in a form of winds wider than the threshold, the end players are not louder per player than the centre. */
function wideFormEdges(players: BoxPlayer[], t: BalanceTargets): CheckResult {
  const winds = players.filter((p) => p.family === "woodwind" || p.family === "brass");
  const yards = (m: number) => `${(m / 0.9144).toFixed(0)} yd`;
  if (winds.length < 3) return { id: "wide-form-edges", passed: true, detail: "Too few winds play to make a form.", performerIds: [] };
  const xs = winds.map((p) => p.x);
  const minX = Math.min(...xs);
  const maxX = Math.max(...xs);
  const width = maxX - minX;
  if (width <= t.wideFormWidthM) {
    return { id: "wide-form-edges", passed: true, detail: `The winds span ${yards(width)}, not wider than ${yards(t.wideFormWidthM)}.`, performerIds: [] };
  }
  // Outer sixths of the width are the ends, the middle third is the centre.
  const sixth = width / 6;
  const mid = (minX + maxX) / 2;
  const centre = winds.filter((p) => Math.abs(p.x - mid) <= sixth);
  if (centre.length === 0) {
    return { id: "wide-form-edges", passed: true, detail: `The winds span ${yards(width)} but no one stands at the centre to compare with.`, performerIds: [] };
  }
  const centreDb = meanPerPlayerDb(centre.map((p) => p.dbA));
  const ends = [
    { name: "side 1 end", list: winds.filter((p) => p.x <= minX + sixth) },
    { name: "side 2 end", list: winds.filter((p) => p.x >= maxX - sixth) },
  ];
  const failures: string[] = [];
  const flagged: string[] = [];
  for (const end of ends) {
    const excess = meanPerPlayerDb(end.list.map((p) => p.dbA)) - centreDb;
    if (excess > t.edgeToleranceDb) {
      failures.push(`the ${plural(end.list.length, "player")} at the ${end.name} reach the box ${formatDb(excess)} louder each than the centre`);
      flagged.push(...ids(end.list));
    }
  }
  if (failures.length === 0) {
    return { id: "wide-form-edges", passed: true, detail: `The form spans ${yards(width)}; its ends are not louder at the box than its centre.`, performerIds: [] };
  }
  return { id: "wide-form-edges", passed: false, detail: `The form spans ${yards(width)}: ${failures.join("; ")}. The end players should back off.`, performerIds: flagged };
}

/** The first index of `value` in `sorted` (ascending), which holds it. */
function firstIndexOf(sorted: readonly number[], value: number): number {
  let lo = 0;
  let hi = sorted.length - 1;
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    if (sorted[mid]! < value) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}

/** The median of `sorted` (ascending) without its element at index `skip`, as if that element were removed. */
function medianWithout(sorted: readonly number[], skip: number): number {
  const n = sorted.length - 1;
  const at = (r: number) => sorted[r < skip ? r : r + 1]!;
  return n % 2 ? at(n >> 1) : (at(n / 2 - 1) + at(n / 2)) / 2;
}

/**
 * stand-outs: no performer far above the median of the rest of its section at the box. Players are
 * compared with those of the same instrument in the section (a synth is not a marimba that stands out):
 * what is caught is closeness, a strong player or a facing.
 */
function standOuts(players: BoxPlayer[], t: BalanceTargets): CheckResult {
  const flagged: { id: string; section: string; excess: number }[] = [];
  for (const list of groupBy(players, (p) => `${p.section}\u0000${p.instrument}`).values()) {
    const section = list[0]!.section;
    if (list.length < 2) continue;
    // Each player against the median of the others: one sort a section, not one a player. Removing any
    // element equal to the player's level leaves the same others, so its first place in the sort will do.
    const sorted = list.map((p) => p.dbA).sort((a, b) => a - b);
    for (const p of list) {
      const excess = p.dbA - medianWithout(sorted, firstIndexOf(sorted, p.dbA));
      if (excess > t.standOutDb) flagged.push({ id: p.id, section, excess });
    }
  }
  if (flagged.length === 0) {
    return { id: "stand-outs", passed: true, detail: `No player is more than ${formatDb(t.standOutDb)} above the rest of their section at the box.`, performerIds: [] };
  }
  flagged.sort((a, b) => b.excess - a.excess);
  const bySection = groupBy(flagged, (f) => f.section);
  const words = [...bySection].map(([section, list]) => `${plural(list.length, "player")} of the ${section} up to ${formatDb(list[0]!.excess)}`);
  return {
    id: "stand-outs",
    passed: false,
    detail: `Above the rest of their section at the box by more than ${formatDb(t.standOutDb)}: ${words.join("; ")} (closeness, a strong player or a facing).`,
    performerIds: flagged.map((f) => f.id),
  };
}

/** arrival-spread: the delay between the nearest and farthest sounding players stays under the threshold. */
function arrivalSpread(players: BoxPlayer[], t: BalanceTargets): CheckResult {
  if (players.length < 2) return { id: "arrival-spread", passed: true, detail: "Fewer than two players sound.", performerIds: [] };
  const first = Math.min(...players.map((p) => p.arrivalMs));
  const spread = Math.max(...players.map((p) => p.arrivalMs)) - first;
  const ms = (v: number) => `${v.toFixed(0)} ms`;
  if (spread <= t.arrivalSpreadMs) {
    return { id: "arrival-spread", passed: true, detail: `The sound of all players arrives within ${ms(spread)} (limit ${ms(t.arrivalSpreadMs)}).`, performerIds: [] };
  }
  const late = players.filter((p) => p.arrivalMs - first > t.arrivalSpreadMs);
  return {
    id: "arrival-spread",
    passed: false,
    detail: `The farthest players arrive ${ms(spread)} after the nearest (limit ${ms(t.arrivalSpreadMs)}); ${plural(late.length, "player")} (${sectionsOf(late)}) arrive late enough to smear.`,
    performerIds: ids(late),
  };
}

/**
 * The six balance checks of one set at one listening point, in the order of CHECK_IDS.
 * `input` is analyzeSet's input, `point` one entry of its result's points.
 */
export function checkBalance(input: AnalysisInput, point: PointResult, targets?: Partial<BalanceTargets> | null): CheckResult[] {
  const t = resolveTargets(targets);
  const players = soundingPlayers(input, point);
  return [
    melodyForward(point, players, t),
    bassUpPyramid(players, t),
    depthSupport(players, t),
    wideFormEdges(players, t),
    standOuts(players, t),
    arrivalSpread(players, t),
  ];
}
