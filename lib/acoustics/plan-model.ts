// The balance plan as numbers: sections that may change (units), the groups whose levels the
// targets compare (voices, registers of a choir, sections within a voice) and the targets as
// hinge residuals in dB. Levels are exact for whole dynamic steps (per-band source change,
// A-weighted at the point) and a uniform dB shift in between, for the continuous solve.
import { OCTAVE_BANDS, BAND_COUNT } from "./bands";
import { groupBy, soundingPlayers, type BoxPlayer } from "./box-players";
import { PYRAMID_FAMILIES, REGISTERS_LOW_TO_HIGH } from "./checks";
import { instrumentBandsInto } from "./instrument";
import type { BalanceTargets } from "./targets";
import { DYNAMICS, VOICES, type AnalysisInput, type Dynamic, type InstrumentSpec, type PointResult, type Voice } from "./types";
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
  /** Steps allowed: from pp (kMin = −base) to fff (kMax = TOP − base). */
  kMin: number;
  kMax: number;
}

export type TargetKind = "melody-lead" | "pyramid" | "blend";

export interface Residual {
  kind: TargetKind;
  /** r = max(0, c + Σ coef · L[group]). */
  terms: { group: number; coef: number }[];
  c: number;
  /** What the residual is about, for the report (same key across sets). */
  key: string;
  describe: (shortDb: number) => string;
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
  residuals: Residual[];
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

/** Per section, the most common (voice, dynamic) of its sounding players over all sets: what the section plays. */
function findUnits(sets: BoxPlayer[][]): PlanUnit[] {
  const all = sets.flat();
  const units: PlanUnit[] = [];
  for (const [section, list] of groupBy(all, (p) => p.section)) {
    const counts = groupBy(list, (p) => `${p.voice}\u0000${p.dynamic}`);
    const [, chosen] = [...counts].reduce((a, b) => (b[1].length > a[1].length ? b : a));
    const first = chosen[0]!;
    const base = DYNAMICS.indexOf(first.dynamic);
    units.push({
      section,
      voice: first.voice as Voice,
      writtenDynamic: first.dynamic,
      base,
      performerIds: [...new Set(chosen.map((p) => p.id))],
      kMin: -base,
      kMax: TOP - base,
    });
  }
  return units;
}

/** Builds the model of a plan over one or more sets (a phrase) at one listening point. */
export function buildPlanModel(
  inputs: readonly AnalysisInput[],
  points: readonly PointResult[],
  t: BalanceTargets,
  setLabels?: readonly string[],
): PlanModel {
  const sets = inputs.map((input, n) => soundingPlayers(input, points[n]!));
  const units = findUnits(sets);
  const unitOf = new Map<string, number>();
  units.forEach((u, i) => u.performerIds.forEach((id) => unitOf.set(`${u.section}\u0000${id}`, i)));

  const ratioCache = new Map<InstrumentSpec, Float64Array[][]>();
  const playerUnit: number[] = [];
  const playerBase: number[] = [];
  const playerEnergy: Float64Array[] = [];
  const groups: number[][] = [];
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
    }
    const group = (list: BoxPlayer[]) => {
      groups.push(list.map((p) => index.get(p)!));
      return groups.length - 1;
    };
    const tag = setLabels?.[n] ? ` (set ${setLabels[n]})` : inputs.length > 1 ? ` (set ${n + 1} of ${inputs.length})` : "";

    // Melody lead over every other voice.
    const byVoice = groupBy(players, (p) => p.voice);
    const melody = byVoice.get("melody");
    if (melody) {
      const gm = group(melody);
      for (const v of VOICES) {
        const list = byVoice.get(v);
        if (v === "melody" || !list) continue;
        const gv = group(list);
        residuals.push({
          kind: "melody-lead",
          terms: [{ group: gv, coef: 1 }, { group: gm, coef: -1 }],
          c: t.melodyLeadDb,
          key: `melody-lead:${v}`,
          describe: (s) => `The melody stays ${s.toFixed(1)} dB short of leading the ${v} by ${t.melodyLeadDb} dB${tag}.`,
          units: [...groupUnits(gm), ...groupUnits(gv)],
        });
      }
    }

    // Pyramid within each choir, over the harmony voices.
    for (const family of PYRAMID_FAMILIES) {
      const choir = players.filter((p) => p.family === family && (t.pyramidVoices as string[]).includes(p.voice));
      const byRegister = groupBy(choir, (p) => p.register);
      const present = REGISTERS_LOW_TO_HIGH.filter((r) => byRegister.has(r)).map((r) => ({ r, g: group(byRegister.get(r)!) }));
      for (let i = 0; i < present.length; i++) {
        for (let j = i + 1; j < present.length; j++) {
          const low = present[i]!;
          const high = present[j]!;
          residuals.push({
            kind: "pyramid",
            terms: [{ group: high.g, coef: 1 }, { group: low.g, coef: -1 }],
            c: -t.pyramidToleranceDb,
            key: `pyramid:${family}:${low.r}:${high.r}`,
            describe: (s) => `In the ${family === "brass" ? "brass" : "woodwinds"}, the ${low.r} register stays ${s.toFixed(1)} dB too far below the ${high.r}${tag}.`,
            units: [...groupUnits(low.g), ...groupUnits(high.g)],
          });
        }
      }
    }

    // Blend: sections doubling a voice stay within the tolerance of each other.
    for (const [voice, list] of byVoice) {
      const bySection = [...groupBy(list, (p) => p.section)].map(([section, l]) => ({ section, g: group(l) }));
      for (let i = 0; i < bySection.length; i++) {
        for (let j = 0; j < bySection.length; j++) {
          if (i === j) continue;
          const a = bySection[i]!;
          const b = bySection[j]!;
          residuals.push({
            kind: "blend",
            terms: [{ group: a.g, coef: 1 }, { group: b.g, coef: -1 }],
            c: -t.blendToleranceDb,
            key: `blend:${voice}:${a.section}:${b.section}`,
            describe: (s) => `In the ${voice}, the ${a.section} stay ${s.toFixed(1)} dB louder than the ${b.section} beyond the blend tolerance of ${t.blendToleranceDb} dB${tag}.`,
            units: [...groupUnits(a.g), ...groupUnits(b.g)],
          });
        }
      }
    }
  });

  const model = {
    units,
    playerUnit: Int32Array.from(playerUnit),
    playerBase: Int32Array.from(playerBase),
    playerEnergy,
    groups,
    residuals,
  };
  return { ...model, ...stepTables(model) };
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
 * Level (dB) of group g with unit u at step k[u], its energy there also scaled by factor[u] when given;
 * with `share`, also each playing unit's share of the group's energy (share[j] for groupUnits[g][j]).
 */
function groupLevel(m: PlanModel, g: number, k: ArrayLike<number>, factor?: ArrayLike<number>, share?: Float64Array): number {
  const units = m.groupUnits[g]!;
  const tables = m.stepEnergy[g]!;
  let e = m.heldEnergy[g]!;
  for (let j = 0; j < units.length; j++) {
    const u = units[j]!;
    const ej = tables[j]![k[u]! - m.units[u]!.kMin]! * (factor ? factor[u]! : 1);
    if (share) share[j] = ej;
    e += ej;
  }
  if (share) for (let j = 0; j < share.length; j++) share[j]! /= e;
  return 10 * Math.log10(e);
}

function levels(m: PlanModel, k: ArrayLike<number>, factor?: ArrayLike<number>, share?: Float64Array[]): Float64Array {
  const L = new Float64Array(m.groups.length);
  for (let g = 0; g < L.length; g++) L[g] = groupLevel(m, g, k, factor, share?.[g]);
  return L;
}

const sharesOf = (m: PlanModel) => m.groupUnits.map((units) => new Float64Array(units.length));

/** Group levels and unit shares at whole steps k per unit (exact). */
export function levelsAtSteps(m: PlanModel, k: readonly number[]) {
  const share = sharesOf(m);
  return { L: levels(m, k, undefined, share), share };
}

/** Group levels and unit shares (∂L/∂x) for a uniform dB shift x[u] from the written dynamic (the continuous relaxation). */
export function levelsAtShifts(m: PlanModel, x: readonly number[]) {
  const share = sharesOf(m);
  const written = new Array<number>(m.units.length).fill(0);
  return { L: levels(m, written, x.map((v) => 10 ** (v / 10)), share), share };
}

/** Sum of squared target residuals at the given group levels. */
function targetCost(m: PlanModel, L: ArrayLike<number>): number {
  let cost = 0;
  for (const r of m.residuals) {
    let v = r.c;
    for (const term of r.terms) v += term.coef * L[term.group]!;
    if (v > 0) cost += v * v;
  }
  return cost;
}

/**
 * Whole steps k per unit and the group levels there, for the polish's trial moves: a move of one or
 * two units re-levels only the groups those units play in, and undo() puts them back.
 */
export function stepSearch(m: PlanModel, start: readonly number[]) {
  const unitGroups = m.units.map((): number[] => []);
  m.groupUnits.forEach((units, g) => units.forEach((u) => unitGroups[u]!.push(g)));
  const k = [...start];
  const L = levels(m, k);
  const seen = new Int32Array(m.groups.length);
  let mark = 0;
  let undo: { move: readonly (readonly [number, number])[]; groups: number[]; levels: number[] } | null = null;
  return {
    k: k as readonly number[],
    targetCost: () => targetCost(m, L),
    /** Moves unit u by d steps for each [u, d], unless that leaves pp…fff (then nothing moves and it answers false). */
    move(move: readonly (readonly [number, number])[]): boolean {
      if (move.some(([u, d]) => k[u]! + d < m.units[u]!.kMin || k[u]! + d > m.units[u]!.kMax)) return false;
      for (const [u, d] of move) k[u]! += d;
      mark++;
      const groups: number[] = [];
      const before: number[] = [];
      for (const [u] of move) {
        for (const g of unitGroups[u]!) {
          if (seen[g] === mark) continue;
          seen[g] = mark;
          groups.push(g);
          before.push(L[g]!);
          L[g] = groupLevel(m, g, k);
        }
      }
      undo = { move, groups, levels: before };
      return true;
    },
    /** Takes back the last move. */
    undo() {
      if (!undo) return;
      for (const [u, d] of undo.move) k[u]! -= d;
      undo.groups.forEach((g, i) => (L[g] = undo!.levels[i]!));
      undo = null;
    },
  };
}

/** Value of each target residual (dB, ≥ 0) at the given group levels. */
export function residualValues(m: PlanModel, L: ArrayLike<number>): number[] {
  return m.residuals.map((r) => Math.max(0, r.terms.reduce((s, t) => s + t.coef * L[t.group]!, r.c)));
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
