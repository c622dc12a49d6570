// The balance checks: the rules of thumb of shared/PRODUCT.md applied to one set at one listening
// point, judged on perceived loudness (ISO 532-1 loudness levels in phon, group-loudness.ts) and on
// audibility over the rest and the background (audibility.ts). A check with nothing to judge says
// "not applicable" (status), never a pass. Thresholds and their sources are in targets.ts.
import { formatDb, groupBy, soundingPlayers, type BoxPlayer } from "./box-players";
import { groupLoudness, type GroupLoudnessOf } from "./group-loudness";
import { loudnessOfPoint } from "./analyze";
import type { PointLoudness } from "./point-loudness";
import { resolveTargets, type BalanceTargets } from "./targets";
import { VOICES, type AnalysisInput, type CheckId, type CheckResult, type Family, type PointResult, type Register } from "./types";

/** Registers from the lowest up. */
export const REGISTERS_LOW_TO_HIGH: readonly Register[] = ["bass", "tenor", "alto", "soprano"];
/** The choirs the pyramid is checked in (and the band across them). */
export const PYRAMID_FAMILIES: readonly Family[] = ["woodwind", "brass"];
/** Wind families: the voices the melody must lead, and what the battery must not cover. */
export const WIND_FAMILIES: readonly Family[] = ["woodwind", "brass"];
/** The battery: drums and cymbals. */
export const BATTERY_FAMILIES: readonly Family[] = ["percussion"];
/** depth-support: an instrument's nearer and farther players are compared only when their mean distances differ by this (m, 10 yd; common practice, no source). */
export const DEPTH_MIN_SPAN_M = 10 * 0.9144;
/** The choirs' names in the pyramid's words (only PYRAMID_FAMILIES are named). */
const CHOIR_NAMES: Partial<Record<Family, string>> = { woodwind: "woodwinds", brass: "brass" };

const ids = (players: readonly BoxPlayer[]) => players.map((p) => p.id);
const sectionsOf = (players: readonly BoxPlayer[]) => [...new Set(players.map((p) => p.section))].join(", ");
const plural = (n: number, one: string, many = `${one}s`) => `${n} ${n === 1 ? one : many}`;
const isWind = (p: BoxPlayer) => WIND_FAMILIES.includes(p.family);

/** Loudness level (phon) of a group of players, or of its average player. */
type Phon = (players: readonly BoxPlayer[], perPlayer?: boolean) => number;

const pass = (id: CheckId, detail: string): CheckResult => ({ id, passed: true, status: "pass", applicable: true, detail, performerIds: [] });
const fail = (id: CheckId, detail: string, performerIds: string[]): CheckResult => ({ id, passed: false, status: "fail", applicable: true, detail, performerIds });
const notApplicable = (id: CheckId, detail: string): CheckResult => ({ id, passed: true, status: "not-applicable", applicable: false, detail, performerIds: [] });

/** melody-forward: the melody's loudness leads every other voice's winds by targets.melodyLeadDb. */
function melodyForward(players: BoxPlayer[], t: BalanceTargets, phon: Phon): CheckResult {
  const melody = players.filter((p) => p.voice === "melody");
  if (melody.length === 0) return notApplicable("melody-forward", "No one plays the melody in this set.");
  const m = phon(melody);
  const others = VOICES.flatMap((v) => {
    const winds = players.filter((p) => p.voice === v && v !== "melody" && isWind(p));
    return winds.length ? [{ voice: v, lead: m - phon(winds), players: winds }] : [];
  });
  if (others.length === 0) return notApplicable("melody-forward", "No other wind voice plays with the melody.");
  const short = others.filter((o) => o.lead < t.melodyLeadDb).sort((a, b) => a.lead - b.lead);
  if (short.length === 0) {
    const closest = others.reduce((a, b) => (b.lead < a.lead ? b : a));
    return pass("melody-forward", `The melody leads the next loudest wind voice (${closest.voice}) by ${formatDb(closest.lead)} of loudness (target ${formatDb(t.melodyLeadDb)}).`);
  }
  const words = short.map((o) => (o.lead < 0 ? `${formatDb(o.lead)} under the ${o.voice} (${sectionsOf(o.players)})` : `only ${formatDb(o.lead)} over the ${o.voice} (${sectionsOf(o.players)})`));
  return fail(
    "melody-forward",
    `The melody (${sectionsOf(melody)}) is ${words.join(" and ")} in loudness here; it should lead every other wind voice by ${formatDb(t.melodyLeadDb)}.`,
    ids([...melody, ...short.flatMap((o) => o.players)]),
  );
}

/** battery-balance: the battery's loudness stays within targets.batteryOverWindsDb of the winds'. */
function batteryBalance(players: BoxPlayer[], t: BalanceTargets, phon: Phon): CheckResult {
  const battery = players.filter((p) => BATTERY_FAMILIES.includes(p.family));
  const winds = players.filter(isWind);
  if (battery.length === 0) return notApplicable("battery-balance", "The battery does not play in this set.");
  if (battery.some((p) => p.voice === "melody")) return notApplicable("battery-balance", "The battery carries the melody here.");
  if (winds.length === 0) return notApplicable("battery-balance", "No winds play with the battery in this set.");
  const over = phon(battery) - phon(winds);
  if (over <= t.batteryOverWindsDb) {
    return pass("battery-balance", `The battery is ${over >= 0 ? `${formatDb(over)} over` : `${formatDb(over)} under`} the winds in loudness (at most ${formatDb(t.batteryOverWindsDb)} over).`);
  }
  return fail("battery-balance", `The battery is ${formatDb(over)} over the winds in loudness here; it should be at most ${formatDb(t.batteryOverWindsDb)} over, or it covers them.`, ids(battery));
}

/** bass-up-pyramid: in each choir every register of the harmony is at least as loud as the next one up, and across the band the bass register as loud as each above it. */
function bassUpPyramid(players: BoxPlayer[], t: BalanceTargets, phon: Phon): CheckResult {
  const failures: string[] = [];
  const flagged = new Set<string>();
  let judged = false;
  const harmony = players.filter((p) => PYRAMID_FAMILIES.includes(p.family) && (t.pyramidVoices as string[]).includes(p.voice));
  const check = (scope: string, low: { register: Register; list: BoxPlayer[]; phon: number }, high: { register: Register; list: BoxPlayer[]; phon: number }) => {
    judged = true;
    const deficit = high.phon - low.phon;
    if (deficit > t.pyramidToleranceDb) {
      failures.push(`${scope}, the ${low.register} register (${sectionsOf(low.list)}) is ${formatDb(deficit)} under the ${high.register} (${sectionsOf(high.list)})`);
      for (const p of [...low.list, ...high.list]) flagged.add(p.id);
    }
  };
  const registers = (list: BoxPlayer[]) => {
    const byRegister = groupBy(list, (p) => p.register);
    return REGISTERS_LOW_TO_HIGH.filter((r) => byRegister.has(r)).map((r) => ({ register: r, list: byRegister.get(r)!, phon: phon(byRegister.get(r)!) }));
  };
  // Within a choir, each register against the next one up that plays: every layer carries the one above.
  for (const family of PYRAMID_FAMILIES) {
    const present = registers(harmony.filter((p) => p.family === family));
    for (let i = 0; i + 1 < present.length; i++) check(`in the ${CHOIR_NAMES[family]}`, present[i]!, present[i + 1]!);
  }
  // Across the band, the bass register carries every register above it.
  // Across the band only where both choirs play the harmony (else it is the one choir again).
  if (new Set(harmony.map((p) => p.family)).size > 1) {
    const band = registers(harmony);
    if (band[0]?.register === "bass") for (const high of band.slice(1)) check("across the band", band[0], high);
  }
  if (!judged) return notApplicable("bass-up-pyramid", "No two registers of winds play the harmony here.");
  if (failures.length === 0) {
    return pass("bass-up-pyramid", `Every lower register is at least as loud as the higher ones, in each choir and across the band (tolerance ${formatDb(t.pyramidToleranceDb)}).`);
  }
  const detail = failures.join("; ");
  return fail("bass-up-pyramid", `${detail[0]!.toUpperCase()}${detail.slice(1)} in loudness (tolerance ${formatDb(t.pyramidToleranceDb)}).`, [...flagged]);
}

/**
 * depth-support: per instrument, its players nearer the listening point against its farther ones,
 * player for player; the farther ones may be softer by what distance explains (20·lg of the distance
 * ratio) plus the tolerance, not more.
 */
function depthSupport(players: BoxPlayer[], t: BalanceTargets, phon: Phon): CheckResult {
  const failures: string[] = [];
  const flagged: string[] = [];
  let compared = false;
  for (const list of groupBy(players.filter(isWind), (p) => `${p.instrument}\u0000${p.dynamic}`).values()) {
    if (list.length < 2) continue;
    const sorted = [...list].sort((a, b) => a.distanceM - b.distanceM);
    const half = Math.floor(sorted.length / 2);
    const near = sorted.slice(0, half);
    const far = sorted.slice(sorted.length - half);
    const meanDistance = (l: BoxPlayer[]) => l.reduce((s, p) => s + p.distanceM, 0) / l.length;
    const dNear = meanDistance(near);
    const dFar = meanDistance(far);
    if (dFar - dNear < DEPTH_MIN_SPAN_M) continue;
    compared = true;
    const explained = 20 * Math.log10(dFar / dNear);
    const excess = phon(near, true) - phon(far, true) - explained;
    if (excess > t.depthToleranceDb) {
      failures.push(`${list[0]!.spec.name}: the ${plural(far.length, "player")} farther from the listening point are ${formatDb(excess)} thinner each than distance explains`);
      flagged.push(...ids(far));
    }
  }
  if (!compared) return notApplicable("depth-support", `No instrument has players at depths more than ${(DEPTH_MIN_SPAN_M / 0.9144).toFixed(0)} yd apart from the listening point.`);
  if (failures.length === 0) {
    return pass("depth-support", `Farther players are supported: none is thinner than distance explains by more than ${formatDb(t.depthToleranceDb)}.`);
  }
  return fail("depth-support", `${failures.join("; ")} (tolerance ${formatDb(t.depthToleranceDb)}; they need to play out, or face the box).`, flagged);
}

/** wide-form-edges: in a wind form wider than the threshold, each section's players at the ends are not louder per player than its own players at the centre. */
function wideFormEdges(players: BoxPlayer[], t: BalanceTargets, phon: Phon): CheckResult {
  const winds = players.filter(isWind);
  const yards = (m: number) => `${(m / 0.9144).toFixed(0)} yd`;
  if (winds.length < 3) return notApplicable("wide-form-edges", "Too few winds play to make a form.");
  const xs = winds.map((p) => p.x);
  const minX = Math.min(...xs);
  const maxX = Math.max(...xs);
  const width = maxX - minX;
  if (width <= t.wideFormWidthM) return notApplicable("wide-form-edges", `The winds span ${yards(width)}, not wider than ${yards(t.wideFormWidthM)}.`);
  // Outer sixths of the width are the ends, the middle third is the centre.
  const sixth = width / 6;
  const mid = (minX + maxX) / 2;
  const failures: string[] = [];
  const flagged: string[] = [];
  let compared = false;
  for (const [section, list] of groupBy(winds, (p) => `${p.section}\u0000${p.instrument}`)) {
    const centre = list.filter((p) => Math.abs(p.x - mid) <= sixth);
    const ends = list.filter((p) => p.x <= minX + sixth || p.x >= maxX - sixth);
    if (centre.length === 0 || ends.length === 0) continue;
    compared = true;
    const excess = phon(ends, true) - phon(centre, true);
    if (excess > t.edgeToleranceDb) {
      failures.push(`the ${plural(ends.length, "player")} of the ${section.split("\u0000")[0]} at the ends are ${formatDb(excess)} louder each than their section's centre`);
      flagged.push(...ids(ends));
    }
  }
  if (!compared) return notApplicable("wide-form-edges", `The form spans ${yards(width)}, but no section stands both at its ends and at its centre.`);
  if (failures.length === 0) return pass("wide-form-edges", `The form spans ${yards(width)}; no section's end players are louder than its centre by more than ${formatDb(t.edgeToleranceDb)}.`);
  return fail("wide-form-edges", `The form spans ${yards(width)}: ${failures.join("; ")} (tolerance ${formatDb(t.edgeToleranceDb)}). The end players should back off.`, flagged);
}

/** The median of `sorted` (ascending) without its element at index `skip`. */
export function medianWithout(sorted: readonly number[], skip: number): number {
  const n = sorted.length - 1;
  const at = (r: number) => sorted[r < skip ? r : r + 1]!;
  return n % 2 ? at(n >> 1) : (at(n / 2 - 1) + at(n / 2)) / 2;
}

/**
 * stand-outs: no player far above the median of the rest of its section playing the same voice on the
 * same instrument. A solo (alone on its voice in the section, or a part marked solo) is never one.
 */
function standOuts(players: BoxPlayer[], t: BalanceTargets, phon: Phon): CheckResult {
  const flagged: { id: string; section: string; excess: number }[] = [];
  let compared = false;
  for (const list of groupBy(players.filter((p) => !p.solo), (p) => `${p.section}\u0000${p.voice}\u0000${p.instrument}`).values()) {
    if (list.length < 2) continue;
    compared = true;
    const levels = list.map((p) => phon([p]));
    const sorted = [...levels].sort((a, b) => a - b);
    list.forEach((p, i) => {
      const excess = levels[i]! - medianWithout(sorted, sorted.indexOf(levels[i]!));
      if (excess > t.standOutDb) flagged.push({ id: p.id, section: p.section, excess });
    });
  }
  if (!compared) return notApplicable("stand-outs", "No section has two players on one voice here.");
  if (flagged.length === 0) return pass("stand-outs", `No player is more than ${formatDb(t.standOutDb)} above the rest of their section's voice in loudness.`);
  flagged.sort((a, b) => b.excess - a.excess);
  const words = [...groupBy(flagged, (f) => f.section)].map(([section, list]) => `${plural(list.length, "player")} of the ${section} up to ${formatDb(list[0]!.excess)}`);
  return fail(
    "stand-outs",
    `Above the rest of their section's voice by more than ${formatDb(t.standOutDb)}: ${words.join("; ")} (closeness, a strong player or a facing).`,
    flagged.map((f) => f.id),
  );
}

/** arrival-spread: among players within the level window of the loudest, the delay from first to last arrival stays under the threshold. */
function arrivalSpread(players: BoxPlayer[], t: BalanceTargets): CheckResult {
  const ms = (v: number) => `${v.toFixed(0)} ms`;
  const loudest = Math.max(...players.map((p) => p.dbA));
  const heard = players.filter((p) => p.dbA >= loudest - t.arrivalWindowDb);
  if (heard.length < 2) return notApplicable("arrival-spread", players.length === 0 ? "No one plays in this set." : `Only one player is within ${formatDb(t.arrivalWindowDb)} of the loudest.`);
  const first = Math.min(...heard.map((p) => p.arrivalMs));
  const spread = Math.max(...heard.map((p) => p.arrivalMs)) - first;
  if (spread <= t.arrivalSpreadMs) {
    return pass("arrival-spread", `The players within ${formatDb(t.arrivalWindowDb)} of the loudest arrive within ${ms(spread)} of each other (limit ${ms(t.arrivalSpreadMs)}).`);
  }
  const late = heard.filter((p) => p.arrivalMs - first > t.arrivalSpreadMs);
  return fail(
    "arrival-spread",
    `Among the players within ${formatDb(t.arrivalWindowDb)} of the loudest, the last arrive ${ms(spread)} after the first (limit ${ms(t.arrivalSpreadMs)}); ${plural(late.length, "player")} (${sectionsOf(late)}) arrive late enough to be heard as an echo.`,
    ids(late),
  );
}

/** heard-at-box: every sounding voice rises above the masking of the rest of the band and the background. */
function heardAtBox(players: BoxPlayer[], loudness: PointLoudness, t: BalanceTargets): CheckResult {
  const voices = VOICES.filter((v) => loudness.voices[v]);
  if (voices.length === 0) return notApplicable("heard-at-box", "No one plays in this set.");
  const masked = voices.filter((v) => loudness.voices[v]!.marginDb < t.heardMarginDb);
  if (masked.length === 0) return pass("heard-at-box", `Every voice that plays is heard over the rest of the band${loudness.backgroundSone > 0 ? " and the crowd" : ""}.`);
  const words = masked.map((v) => `the ${v} (${sectionsOf(players.filter((p) => p.voice === v))}, ${formatDb(loudness.voices[v]!.marginDb)} ${loudness.voices[v]!.marginDb < 0 ? "under" : "over"} its masked threshold)`);
  return fail(
    "heard-at-box",
    `Masked by the rest of the band${loudness.backgroundSone > 0 ? " and the crowd" : ""}: ${words.join("; ")}${t.heardMarginDb > 0 ? ` (margin asked: ${formatDb(t.heardMarginDb)})` : ""}.`,
    ids(players.filter((p) => masked.includes(p.voice as (typeof VOICES)[number]))),
  );
}

/** The point's loudness: the analysis's, or computed here (sweeps evaluate levels only). */
function loudnessAt(input: AnalysisInput, point: PointResult): PointLoudness {
  // Stryker disable next-line ConditionalExpression: recomputing gives the analysis's own loudness (the same loudnessOfPoint); the branch only saves the work
  if (point.loudness) return point.loudness;
  return loudnessOfPoint(input, point, input.listeningPoints.find((p) => p.id === point.listeningPointId)?.background);
}

/**
 * The balance checks of one set at one listening point, in the order of CHECK_IDS.
 * `input` is analyzeSet's input, `point` one entry of its result's points.
 */
export function checkBalance(input: AnalysisInput, point: PointResult, targets?: Partial<BalanceTargets> | null): CheckResult[] {
  return checkPlayers(soundingPlayers(input, point), loudnessAt(input, point), targets);
}

/**
 * The balance checks of the sounding players at a point and the point's loudness (checkBalance's
 * work once those are known). `loudnessOf` computes a group's loudness: groupLoudness, or a
 * memoGroupLoudness shared by rounds over mostly the same players.
 */
export function checkPlayers(
  players: BoxPlayer[],
  loudness: PointLoudness,
  targets?: Partial<BalanceTargets> | null,
  loudnessOf: GroupLoudnessOf = groupLoudness,
): CheckResult[] {
  const t = resolveTargets(targets);
  const phon: Phon = (list, perPlayer = false) => loudnessOf(list, perPlayer).phon;
  return [
    melodyForward(players, t, phon),
    bassUpPyramid(players, t, phon),
    depthSupport(players, t, phon),
    wideFormEdges(players, t, phon),
    standOuts(players, t, phon),
    arrivalSpread(players, t),
    batteryBalance(players, t, phon),
    heardAtBox(players, loudness, t),
  ];
}
