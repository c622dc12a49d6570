// Coordinate sheets: per performer every set with its counts and position in the trade's words;
// per set every dot. Built from a show file, so sheets and backups read the same data. Pure.
import { describePosition } from "@/lib/field/words";
import { facingInWords } from "@/lib/field/facing-words";
import { instrumentSpreadDeg } from "@/lib/field/marks";
import { facingWords } from "@/lib/imports/facing";
import { instrumentName } from "@/lib/show/instrument-names";
import type { ShowFile } from "@/lib/show-file/schema";

export interface SheetDot {
  label: string;
  x: number;
  y: number;
  facingDeg: number;
  /** "Side 1: 2 steps outside the 35 yard line" */
  sideToSide: string;
  /** "4 steps in front of the front hash" */
  frontToBack: string;
  /** The facing as the drill CSV writes it ("front", "side 2", "30"). */
  facing: string;
  /** The facing in words: "toward the press box", "toward side 2, 30° toward the back sideline". */
  facingWords: string;
  /** How wide the performer's instrument throws its sound (the mark's wedge, lib/field/marks.ts). */
  spreadDeg: number;
}

export interface PerformerSheet {
  label: string;
  name: string | null;
  instrument: string;
  /** The instrument as people say it: "Alto saxophone". */
  instrumentName: string;
  section: string;
  part: string;
  rows: ({ set: string; counts: number } & Omit<SheetDot, "label">)[];
}

export interface SetSheet {
  number: string;
  counts: number;
  dots: SheetDot[];
}

function dot(label: string, p: { x: number; y: number; facingDeg: number }, rules: ShowFile["show"]["fieldRules"], instrument: string): SheetDot {
  const d = describePosition(p.x, p.y, rules);
  return {
    label,
    x: p.x,
    y: p.y,
    facingDeg: p.facingDeg,
    sideToSide: d.side ? `Side ${d.side}: ${d.sideToSide}` : d.sideToSide.replace(/^on/, "On"),
    frontToBack: d.frontToBack,
    facing: facingWords(p.facingDeg),
    facingWords: facingInWords(p.facingDeg),
    spreadDeg: instrumentSpreadDeg(instrument),
  };
}

/** Labels in the order a band lists them: letters, then the number (T2 before T10). */
export const byLabel = (a: { label: string }, b: { label: string }) => a.label.localeCompare(b.label, "en", { numeric: true });

/** The performers' sheets in label order; `first` keeps only that many, `label` only that performer's (any case). */
export function performerSheets(file: ShowFile, only: { first?: number; label?: string } = {}): PerformerSheet[] {
  const label = only.label?.toLowerCase();
  const chosen = label === undefined ? file.performers : file.performers.filter((p) => p.label.toLowerCase() === label);
  return [...chosen].sort(byLabel).slice(0, only.first ?? Infinity).map((p) => ({
    label: p.label,
    name: p.name,
    instrument: p.instrument,
    instrumentName: instrumentName(p.instrument),
    section: p.section,
    part: p.part,
    rows: file.sets.flatMap((s) => {
      const at = s.positions.find((q) => q.label === p.label);
      if (!at) return [];
      const { label: _l, ...rest } = dot(p.label, at, file.show.fieldRules, p.instrument);
      return [{ set: s.number, counts: s.counts, ...rest }];
    }),
  }));
}

export function setSheets(file: ShowFile): SetSheet[] {
  const instrumentOf = new Map(file.performers.map((p) => [p.label, p.instrument]));
  return file.sets.map((s) => ({
    number: s.number,
    counts: s.counts,
    dots: s.positions.map((p) => dot(p.label, p, file.show.fieldRules, instrumentOf.get(p.label) ?? "")).sort(byLabel),
  }));
}

/** A set as the performers' small pictures need it: each dot and its mark, without the words. */
export interface BareSet {
  number: string;
  counts: number;
  dots: Pick<SheetDot, "label" | "x" | "y" | "facingDeg" | "spreadDeg">[];
}

function bareSets(file: ShowFile): BareSet[] {
  const spreadOf = new Map(file.performers.map((p) => [p.label, instrumentSpreadDeg(p.instrument)]));
  return file.sets.map((s) => ({
    number: s.number,
    counts: s.counts,
    dots: s.positions.map((p) => ({ label: p.label, x: p.x, y: p.y, facingDeg: p.facingDeg, spreadDeg: spreadOf.get(p.label) ?? instrumentSpreadDeg("") })).sort(byLabel),
  }));
}

/**
 * What one view of the sheets shows, and how many sheets it has in all: per performer (with the
 * sets as bare dots for their pictures; `label` for one performer's) or per set (no performers);
 * `first` keeps that many sheets.
 */
export function sheetsFor(file: ShowFile, by: "performers" | "sets" = "performers", only: { first?: number; label?: string } = {}) {
  const counts = { performerCount: file.performers.length, setCount: file.sets.length };
  if (by === "sets") return { performers: [] as PerformerSheet[], sets: setSheets(file).slice(0, only.first ?? Infinity), ...counts };
  return { performers: performerSheets(file, only), sets: bareSets(file), ...counts };
}
