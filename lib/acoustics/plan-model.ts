// The balance plan as numbers: sections that may change (units), the groups whose levels the
// targets compare (voices, registers of a choir, sections within a voice), the targets as hinge
// residuals in dB, and the musical limits (each unit's step range, the written shape). A group's level
// is its loudness level (phon, ISO 532-1, as the balance checks measure it) at the change of its
// A-weighted energy at the point when its sections play other dynamics: the group's written spectrum
// moved by that change, looked up on a curve computed once per group. Exact as written, and monotone
// in every section's step, which the branch and bound needs. Loudness level does not follow dB one
// for one: a soft, masked-sounding group gains far more than a phon per dB as it comes up, so a plan
// that moved levels one for one overshot (the brass under a soft clarinet melody taken to pp where one step down would do).
// The "heard" targets compare changes of energy instead (dB): a voice's margin over what masks it.
import { OCTAVE_BANDS, BAND_COUNT } from "./bands";
import { catalogOf, groupBy, soundingPlayers, type BoxPlayer } from "./box-players";
import { backgroundThirdOctaves, thirdOctavesDbA } from "./background";
import { BATTERY_FAMILIES, PYRAMID_FAMILIES, REGISTERS_LOW_TO_HIGH, WIND_FAMILIES } from "./checks";
import { octaveLoudness } from "./group-loudness";
import { instrumentBandsInto } from "./instrument";
import type { MusicalLimits } from "./plan-limits";
import type { PLANNED_CHECKS } from "./planned-checks";
import type { BalanceTargets } from "./targets";
import { DYNAMICS, VOICES, type AnalysisInput, type CheckId, type Dynamic, type InstrumentSpec, type PointResult, type Voice } from "./types";
import { aWeightingDb } from "./weighting";

const A_WEIGHT_ENERGY = OCTAVE_BANDS.map((b) => 10 ** (aWeightingDb(b.exactHz) / 10));
const TOP = DYNAMICS.length - 1;
const BANDS = BAND_COUNT; // a local constant: read in the inner loops

export interface PlanUnit {
  section: string;
  voice: Voice;
  writtenDynamic: Dynamic;
  /** Index of the written dynamic in pp…fff. */
  base: number;
  performerIds: string[];
  /** Battery and front ensemble (percussion, keyboards, amplified) plan within their own limits. */
  kind: "winds" | "percussion";
  /** One player of a section that otherwise rests or plays something else (a soloist). */
  solo: boolean;
  /** Steps allowed: within pp…fff and the musical limits (both 0 when nothing is to change). */
  kMin: number;
  kMax: number;
}

/** A level difference as a director reads it: whole dB, one decimal under 1 dB. */
export function dbWords(db: number): string {
  const a = Math.abs(db);
  return `${a >= 1 ? Math.round(a).toFixed(0) : a.toFixed(1)} dB`;
}

/** Families planned as the battery and front ensemble. */
const PERCUSSION_FAMILIES: readonly string[] = ["percussion", "keyboard", "amplified"];

/**
 * The written shape, between two units of the same kind: `louder` is written above `softer`.
 * hard: the melody over a harmony voice, never planned further under it than written.
 * Otherwise a soft rule: each step `softer` is planned above `louder` costs SHAPE_WEIGHT.
 */
export interface ShapePair {
  louder: number;
  softer: number;
  hard: boolean;
}

export type TargetKind = "melody-lead" | "battery" | "pyramid" | "heard";

export interface Residual {
  kind: TargetKind;
  /** r = max(0, c + Σ coef · L[group]). */
  terms: { group: number; coef: number }[];
  c: number;
  /** What the residual is about, for the report (same key across sets). */
  key: string;
  /** The set it is measured in ("" for a single unnamed set). */
  set: string;
  /** The state in a director's words at the raw value c + Σ coef · L: "the melody is 6 dB under the accompaniment in loudness". */
  state: (rawDb: number) => string;
  /** What the target asks: "it should lead every other voice by 3 dB". */
  aim: string;
  /** Units the residual involves (for notes and limits). */
  units: number[];
}

export interface PlanModel {
  units: PlanUnit[];
  /** Per sounding player: unit index (−1 held), energy (A-weighted, at the point) at each dynamic. */
  playerUnit: Int32Array;
  playerBase: Int32Array;
  playerEnergy: Float64Array[];
  /** Players of each group. */
  groups: number[][];
  /**
   * The same groups as step tables: the energy of each group's held players, the units playing in it,
   * and per such unit its summed energy in the group at each step (stepEnergy[g][j][k − kMin] for unit
   * groupUnits[g][j]). A group's level is then a sum over its units, not over its players.
   */
  heldEnergy: Float64Array;
  groupUnits: Int32Array[];
  stepEnergy: Float64Array[][];
  /** Per group, its A-weighted energy level as written (dB): where its loudness curve is read from. */
  writtenDb: Float64Array;
  /**
   * Per group, its level against its change of energy from as written: a loudness level (phon) for the
   * groups the balance compares, the change itself (dB) for a voice's margin over what masks it.
   */
  loudness: LevelCurve[];
  /** Per group: true where its level is a loudness level (phon), false where it is a change of energy (dB). */
  isLoudness: boolean[];
  residuals: Residual[];
  shape: ShapePair[];
}

/** A-weighted energy at the point of one player at every dynamic pp…fff, from its band levels at its own dynamic.
 * The ratio of each dynamic's power to the player's own, per band, depends on the instrument only: cached per spec. */
function energiesByDynamic(p: BoxPlayer, ratioCache: Map<InstrumentSpec, Float64Array[][]>): Float64Array {
  let ratios = ratioCache.get(p.spec);
  if (!ratios) {
    const power = DYNAMICS.map((d) => {
      const bands = new Float64Array(BANDS);
      instrumentBandsInto(p.spec, d, bands);
      for (let b = 0; b < BANDS; b++) bands[b] = 10 ** (bands[b]! / 10);
      return bands;
    });
    // ratios[own][d][b] = 10^((Lw(d, b) − Lw(own, b)) / 10) · A-weighting energy of band b
    ratios = power.map((own) =>
      power.map((at) => {
        const r = new Float64Array(BANDS);
        for (let b = 0; b < BANDS; b++) r[b] = (at[b]! / own[b]!) * A_WEIGHT_ENERGY[b]!;
        return r;
      }),
    );
    ratioCache.set(p.spec, ratios);
  }
  const own = ratios[DYNAMICS.indexOf(p.dynamic)]!;
  const band = new Float64Array(BANDS);
  for (let b = 0; b < BANDS; b++) band[b] = 10 ** (p.bandsDb[b]! / 10);
  const out = new Float64Array(DYNAMICS.length);
  for (let d = 0; d <= TOP; d++) {
    const r = own[d]!;
    let e = 0;
    for (let b = 0; b < BANDS; b++) e += band[b]! * r[b]!;
    out[d] = e;
  }
  return out;
}

/**
 * Per section, the most common (voice, dynamic) of its sounding players over all sets: what the section
 * plays. In score order (the catalog's order: woodwinds, brass, battery, front ensemble), then by name.
 */
function findUnits(inputs: readonly AnalysisInput[], sets: BoxPlayer[][], limits: MusicalLimits, nothingToChange: boolean): PlanUnit[] {
  const all = sets.flat();
  const score = new Map(Object.keys(catalogOf(inputs[0] ?? {})).map((key, i) => [key, i]));
  const sectionSize = new Map<string, Set<string>>();
  for (const input of inputs) for (const p of input.performers) (sectionSize.get(p.section) ?? sectionSize.set(p.section, new Set()).get(p.section)!).add(p.id);
  const units: (PlanUnit & { score: number })[] = [];
  for (const [section, list] of groupBy(all, (p) => p.section)) {
    const counts = groupBy(list, (p) => `${p.voice}\u0000${p.dynamic}`);
    const [, chosen] = [...counts].reduce((a, b) => (b[1].length > a[1].length || (b[1].length === a[1].length && b[0] < a[0]) ? b : a));
    const first = chosen[0]!;
    const base = DYNAMICS.indexOf(first.dynamic);
    const performerIds = [...new Set(chosen.map((p) => p.id))].sort();
    const kind = PERCUSSION_FAMILIES.includes(first.family) ? "percussion" : "winds";
    const steps = nothingToChange ? 0 : kind === "percussion" ? limits.percussionSteps : limits.windSteps;
    units.push({
      section,
      voice: first.voice as Voice,
      writtenDynamic: first.dynamic,
      base,
      performerIds,
      kind,
      solo: performerIds.length === 1 && (sectionSize.get(section)?.size ?? 1) > 1,
      kMin: Math.max(-base, -steps),
      kMax: Math.min(TOP - base, steps),
      score: Math.min(...chosen.map((p) => score.get(p.instrument) ?? score.size)),
    });
  }
  units.sort((a, b) => a.score - b.score || (a.section < b.section ? -1 : a.section > b.section ? 1 : 0));
  return units.map(({ score: _, ...u }) => u);
}

/** Voices the melody is never planned under (when the shape is kept). */
const UNDER_MELODY: readonly Voice[] = ["countermelody", "accompaniment", "bass"];

/** The written shape between units of the same kind (see ShapePair). */
function shapePairs(units: readonly PlanUnit[]): ShapePair[] {
  const pairs: ShapePair[] = [];
  units.forEach((a, i) =>
    units.forEach((b, j) => {
      if (i === j || a.kind !== b.kind) return;
      const hard = a.voice === "melody" && UNDER_MELODY.includes(b.voice);
      // The melody may rise over a harmony voice written louder: that is the lead the targets ask for.
      const melodyOver = b.voice === "melody" && UNDER_MELODY.includes(a.voice);
      if (hard || (a.base > b.base && !melodyOver)) pairs.push({ louder: i, softer: j, hard });
    }),
  );
  return pairs;
}

/** Builds the model of a plan over one or more sets (a phrase) at one listening point. */
export function buildPlanModel(
  inputs: readonly AnalysisInput[],
  points: readonly PointResult[],
  t: BalanceTargets,
  limits: MusicalLimits,
  nothingToChange: boolean,
  setLabels?: readonly string[],
  /** The checks that fail as written: only their targets are planned for (all when omitted). */
  failing?: ReadonlySet<CheckId>,
): PlanModel {
  const wants = (id: (typeof PLANNED_CHECKS)[number]) => !failing || failing.has(id);
  const sets = inputs.map((input, n) => soundingPlayers(input, points[n]!));
  const units = findUnits(inputs, sets, limits, nothingToChange);
  const unitOf = new Map<string, number>();
  units.forEach((u, i) => u.performerIds.forEach((id) => unitOf.set(`${u.section}\u0000${id}`, i)));

  const ratioCache = new Map<InstrumentSpec, Float64Array[][]>();
  const playerUnit: number[] = [];
  const playerBase: number[] = [];
  const playerEnergy: Float64Array[] = [];
  const playerBands: number[][] = [];
  const groups: number[][] = [];
  /** Groups whose level is their change of energy (dB), not a loudness level. */
  const energyGroups = new Set<number>();
  /** A group's energy that no section plays: the listening point's background (A-weighted, as the players'). */
  const backgroundOf = new Map<number, number>();
  const residuals: Residual[] = [];
  const unitsOfGroup: number[][] = [];
  const groupUnits = (g: number) => (unitsOfGroup[g] ??= [...new Set(groups[g]!.map((p) => playerUnit[p]!).filter((u) => u >= 0))]);

  sets.forEach((players, n) => {
    const index = new Map<BoxPlayer, number>();
    for (const p of players) {
      const unit = unitOf.get(`${p.section}\u0000${p.id}`);
      const held = unit === undefined || units[unit]!.voice !== p.voice || units[unit]!.writtenDynamic !== p.dynamic;
      index.set(p, playerUnit.length);
      playerUnit.push(held ? -1 : unit!);
      playerBase.push(DYNAMICS.indexOf(p.dynamic));
      playerEnergy.push(energiesByDynamic(p, ratioCache));
      playerBands.push(p.bandsDb);
    }
    const group = (list: BoxPlayer[]) => {
      groups.push(list.map((p) => index.get(p)!));
      return groups.length - 1;
    };
    const set = setLabels?.[n] ?? (inputs.length > 1 ? `${n + 1} of ${inputs.length}` : "");
    const byVoice = groupBy(players, (p) => p.voice);

    // Every voice heard over what masks it, as the heard-at-box check: its margin over the masked
    // threshold moves up with its own energy and down with that of its main masker, taken as the
    // loudest other voice with the background (which stays), dB for dB. The whole rest of the band as
    // the masker planned no better here and tripled the search of a 300-player phrase.
    const loudness = points[n]!.loudness;
    if (loudness && wants("heard-at-box")) {
      const crowd = loudness.backgroundSone > 0 ? " and the crowd" : "";
      const background = 10 ** (thirdOctavesDbA(backgroundThirdOctaves(inputs[n]!.listeningPoints[0]!.background)) / 10);
      for (const v of VOICES) {
        const margin = loudness.voices[v]?.marginDb;
        const list = byVoice.get(v);
        if (margin === undefined || !Number.isFinite(margin) || !list?.length) continue;
        const g = group(list);
        energyGroups.add(g);
        const terms = [{ group: g, coef: -1 }];
        const loudest = VOICES.filter((u) => u !== v && loudness.voices[u]).reduce<Voice | null>((a, u) => (a === null || loudness.voices[u]!.sone > loudness.voices[a]!.sone ? u : a), null);
        // Alone in silence, a voice is measured against the threshold of hearing: nothing else moves it.
        const others = loudest ? byVoice.get(loudest)! : [];
        const rest = others.length || background > 0 ? group(others) : -1;
        if (rest >= 0) {
          energyGroups.add(rest);
          if (background > 0) backgroundOf.set(rest, background);
          terms.push({ group: rest, coef: 1 });
        }
        residuals.push({
          kind: "heard",
          terms,
          c: t.heardMarginDb - margin,
          key: `heard:${v}`,
          set,
          // raw = margin asked − (margin as written + change)
          state: (raw) => {
            const m = t.heardMarginDb - raw;
            return m < 0 ? `the ${v} is ${dbWords(-m)} under what masks it (the rest of the band${crowd})` : `the ${v} is only ${dbWords(m)} over what masks it (the rest of the band${crowd})`;
          },
          aim: `every voice should be heard over the rest of the band${crowd}`,
          units: [...groupUnits(g), ...(rest >= 0 ? groupUnits(rest) : [])],
        });
      }
    }

    // Melody lead over every other voice.
    const melody = byVoice.get("melody");
    if (melody && wants("melody-forward")) {
      const gm = group(melody);
      // Over the other voices' winds only, as the melody-forward check: the battery has its own check.
      for (const v of VOICES) {
        const list = byVoice.get(v)?.filter((p) => WIND_FAMILIES.includes(p.family));
        if (v === "melody" || !list?.length) continue;
        const gv = group(list);
        residuals.push({
          kind: "melody-lead",
          terms: [{ group: gv, coef: 1 }, { group: gm, coef: -1 }],
          c: t.melodyLeadDb,
          key: `melody-lead:${v}`,
          set,
          // raw = lead target − (melody − voice)
          state: (raw) => {
            const lead = t.melodyLeadDb - raw;
            return lead < 0 ? `the melody is ${dbWords(-lead)} under the ${v} in loudness` : `the melody leads the ${v} by only ${dbWords(lead)} in loudness`;
          },
          aim: `the melody should lead every other wind voice by ${dbWords(t.melodyLeadDb)}`,
          units: [...groupUnits(gm), ...groupUnits(gv)],
        });
      }
    }

    // The battery does not cover the winds (unless it carries the melody), as the battery-balance check.
    const battery = players.filter((p) => BATTERY_FAMILIES.includes(p.family));
    const winds = players.filter((p) => WIND_FAMILIES.includes(p.family));
    if (wants("battery-balance") && battery.length && winds.length && !battery.some((p) => p.voice === "melody")) {
      const gb = group(battery);
      const gw = group(winds);
      residuals.push({
        kind: "battery",
        terms: [{ group: gb, coef: 1 }, { group: gw, coef: -1 }],
        c: -t.batteryOverWindsDb,
        key: "battery",
        set,
        // raw = (battery − winds) − allowance
        state: (raw) => `the battery is ${dbWords(raw + t.batteryOverWindsDb)} over the winds in loudness`,
        aim: `the battery should sit at most ${dbWords(t.batteryOverWindsDb)} over the winds`,
        units: [...groupUnits(gb), ...groupUnits(gw)],
      });
    }

    // The pyramid, as the bass-up-pyramid check: within each choir each register against the next one
    // up, and across the band the bass register against each register above it.
    if (wants("bass-up-pyramid")) {
      const harmony = players.filter((p) => PYRAMID_FAMILIES.includes(p.family) && (t.pyramidVoices as string[]).includes(p.voice));
      const registers = (list: BoxPlayer[]) => {
        const byRegister = groupBy(list, (p) => p.register);
        return REGISTERS_LOW_TO_HIGH.filter((r) => byRegister.has(r)).map((r) => ({ r, g: group(byRegister.get(r)!) }));
      };
      const pair = (scope: string, where: string, low: { r: string; g: number }, high: { r: string; g: number }) =>
        residuals.push({
          kind: "pyramid",
          terms: [{ group: high.g, coef: 1 }, { group: low.g, coef: -1 }],
          c: -t.pyramidToleranceDb,
          key: `pyramid:${scope}:${low.r}:${high.r}`,
          set,
          // raw = (high − low) − tolerance
          state: (raw) => `${where}, the ${low.r} register is ${dbWords(raw + t.pyramidToleranceDb)} under the ${high.r} in loudness`,
          aim: "the lower voices should be at least as present as the higher ones",
          units: [...groupUnits(low.g), ...groupUnits(high.g)],
        });
      for (const family of PYRAMID_FAMILIES) {
        const present = registers(harmony.filter((p) => p.family === family));
        for (let i = 0; i + 1 < present.length; i++) pair(family, `in the ${family === "brass" ? "brass" : "woodwinds"}`, present[i]!, present[i + 1]!);
      }
      // Across the band only where both choirs play the harmony (else it is the one choir again).
      const band = new Set(harmony.map((p) => p.family)).size > 1 ? registers(harmony) : [];
      if (band[0]?.r === "bass") for (const high of band.slice(1)) pair("band", "across the band", band[0], high);
    }
  });

  const model = {
    units,
    playerUnit: Int32Array.from(playerUnit),
    playerBase: Int32Array.from(playerBase),
    playerEnergy,
    groups,
    residuals,
    shape: limits.keepShape ? shapePairs(units) : [],
  };
  const tables = stepTables(model);
  for (const [g, e] of backgroundOf) tables.heldEnergy[g]! += e;
  const writtenDb = Float64Array.from(groups, (members, g) => 10 * Math.log10(members.reduce((e, p) => e + playerEnergy[p]![playerBase[p]!]!, backgroundOf.get(g) ?? 0)));
  const loudness = groups.map((members, g): LevelCurve => (energyGroups.has(g) ? ENERGY_CHANGE : new LoudnessCurve(members.map((p) => playerBands[p]!), energyRangeDb(tables, g, writtenDb[g]!))));
  return { ...model, ...tables, writtenDb, loudness, isLoudness: groups.map((_, g) => !energyGroups.has(g)) };
}

/** The loudness curves' grid step (dB); between grid points the curve is read linearly (2 dB: as close to a full evaluation as 1 dB in plan-loudness.test.ts, at about two thirds of the time for a 300-player phrase). */
const CURVE_STEP_DB = 2;

/** How far (dB, below and above its written level) group g's energy can move over every unit's range. */
function energyRangeDb(t: Pick<PlanModel, "heldEnergy" | "stepEnergy">, g: number, writtenDb: number): [number, number] {
  let lo = t.heldEnergy[g]!;
  let hi = lo;
  for (const table of t.stepEnergy[g]!) {
    lo += Math.min(...table);
    hi += Math.max(...table);
  }
  // Stryker disable next-line ArithmeticOperator: a wider range only computes more of the same curve
  return [10 * Math.log10(lo) - writtenDb, 10 * Math.log10(hi) - writtenDb];
}

/** A group's level (phon or dB) at a change of its energy from as written (dB); never falls as it rises. */
interface LevelCurve {
  read(db: number): number;
}

/** The change itself: a voice's margin over its masked threshold moves dB for dB with its own energy. */
const ENERGY_CHANGE: LevelCurve = { read: (db) => db };

const shifted = new Float64Array(BANDS); // scratch: a curve's spectrum moved to one grid point

/**
 * A group's loudness curve over [from, to] dB of change (rounded outwards to the grid): the loudness
 * level of its summed written octave levels moved as a whole, each grid point computed the first time
 * it is read. ISO 532-1 loudness never falls as every band rises (plan-loudness.test.ts), so the curve
 * is non-decreasing, which the search's bound relies on.
 */
class LoudnessCurve implements LevelCurve {
  private readonly sumDb = new Float64Array(BANDS);
  private readonly phon: Float64Array;
  private readonly fromDb: number;
  constructor(members: readonly ArrayLike<number>[], [from, to]: [number, number]) {
    // Stryker disable next-line EqualityOperator: a write one past a typed array's end is ignored
    for (const bandsDb of members) for (let b = 0; b < BANDS; b++) this.sumDb[b]! += 10 ** (bandsDb[b]! / 10);
    // Stryker disable next-line EqualityOperator: as above
    for (let b = 0; b < BANDS; b++) this.sumDb[b] = 10 * Math.log10(this.sumDb[b]!);
    // Stryker disable next-line ArithmeticOperator: a grid reaching further down holds the same points
    const start = Math.floor(from / CURVE_STEP_DB);
    this.fromDb = start * CURVE_STEP_DB;
    // Stryker disable next-line ArithmeticOperator: a grid reaching further up holds the same points
    this.phon = new Float64Array(Math.ceil(to / CURVE_STEP_DB) - start + 1).fill(NaN);
  }
  private at(i: number): number {
    let v = this.phon[i]!;
    // Stryker disable next-line ConditionalExpression: a cache; computing the point again gives the same value
    if (Number.isNaN(v)) {
      const d = this.fromDb + i * CURVE_STEP_DB;
      // Stryker disable next-line EqualityOperator: a write one past a typed array's end is ignored
      for (let b = 0; b < BANDS; b++) shifted[b] = this.sumDb[b]! + d;
      v = this.phon[i] = octaveLoudness(shifted).phon;
    }
    return v;
  }
  /** Loudness level (phon) at a change of `db` from as written, read linearly between grid points, held at the ends. */
  read(db: number): number {
    const last = this.phon.length - 1;
    const x = (db - this.fromDb) / CURVE_STEP_DB;
    if (!(x > 0)) return this.at(0);
    if (x >= last) return this.at(last);
    const i = Math.floor(x);
    const lo = this.at(i);
    return lo + (this.at(i + 1) - lo) * (x - i);
  }
}

/** Loudness level (phon) of group g at energy e (A-weighted, at the point). */
export function levelOfEnergy(m: Pick<PlanModel, "writtenDb" | "loudness">, g: number, e: number): number {
  return m.loudness[g]!.read(10 * Math.log10(e) - m.writtenDb[g]!);
}

/** Step tables of the groups (see PlanModel). */
function stepTables(m: Pick<PlanModel, "units" | "playerUnit" | "playerBase" | "playerEnergy" | "groups">) {
  const heldEnergy = new Float64Array(m.groups.length);
  const groupUnits: Int32Array[] = [];
  const stepEnergy: Float64Array[][] = [];
  m.groups.forEach((members, g) => {
    const byUnit = new Map<number, Float64Array>();
    for (const p of members) {
      const u = m.playerUnit[p]!;
      if (u < 0) {
        heldEnergy[g]! += m.playerEnergy[p]![m.playerBase[p]!]!;
        continue;
      }
      const unit = m.units[u]!;
      let table = byUnit.get(u);
      if (!table) byUnit.set(u, (table = new Float64Array(unit.kMax - unit.kMin + 1)));
      for (let k = unit.kMin; k <= unit.kMax; k++) table[k - unit.kMin]! += m.playerEnergy[p]![m.playerBase[p]! + k]!;
    }
    groupUnits.push(Int32Array.from(byUnit.keys()));
    stepEnergy.push([...byUnit.values()]);
  });
  return { heldEnergy, groupUnits, stepEnergy };
}

/**
 * Level (dB) of group g with unit u at step k[u]; with `share`, also each playing unit's share of the
 * group's energy (share[j] for groupUnits[g][j]).
 */
function groupLevel(m: PlanModel, g: number, k: ArrayLike<number>, share?: Float64Array): number {
  const units = m.groupUnits[g]!;
  const tables = m.stepEnergy[g]!;
  let e = m.heldEnergy[g]!;
  for (let j = 0; j < units.length; j++) {
    const u = units[j]!;
    const ej = tables[j]![k[u]! - m.units[u]!.kMin]!;
    if (share) share[j] = ej;
    e += ej;
  }
  if (share) for (let j = 0; j < share.length; j++) share[j]! /= e;
  return levelOfEnergy(m, g, e);
}

/** Group levels at whole steps k per unit (exact); with `share`, each playing unit's share of its groups' energy. */
export function levelsAtSteps(m: PlanModel, k: ArrayLike<number>, share?: Float64Array[]): Float64Array {
  const L = new Float64Array(m.groups.length);
  for (let g = 0; g < L.length; g++) L[g] = groupLevel(m, g, k, share?.[g]);
  return L;
}

/** Empty share arrays for levelsAtSteps. */
export const sharesOf = (m: PlanModel) => m.groupUnits.map((units) => new Float64Array(units.length));

/** Sum of squared target residuals at the given group levels. */
export function targetCost(m: PlanModel, L: ArrayLike<number>): number {
  let cost = 0;
  for (const r of m.residuals) {
    let v = r.c;
    for (const term of r.terms) v += term.coef * L[term.group]!;
    if (v > 0) cost += v * v;
  }
  return cost;
}

/** Raw value c + Σ coef · L of each target residual at the given group levels (missed where > 0). */
export function rawResiduals(m: PlanModel, L: ArrayLike<number>): number[] {
  return m.residuals.map((r) => r.terms.reduce((s, t) => s + t.coef * L[t.group]!, r.c));
}

/** Each unit's level change at the point (dB, energy over all its players and sets) at each step kMin…kMax. */
export function unitChangeDb(m: PlanModel): number[][] {
  return m.units.map((u, i) => {
    const players = [...m.playerUnit.keys()].filter((p) => m.playerUnit[p] === i);
    const at = (k: number) => players.reduce((s, p) => s + m.playerEnergy[p]![m.playerBase[p]! + k]!, 0);
    const e0 = at(0);
    const out: number[] = [];
    for (let k = u.kMin; k <= u.kMax; k++) out.push(10 * Math.log10(at(k) / e0));
    return out;
  });
}
