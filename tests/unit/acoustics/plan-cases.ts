// Seeded random bands for the balance plan's tests: 2–5 sections, some mixing registers in one section
// (trumpets and tubas together), winds and percussion, random voices, dynamics, places and limits.
import { DEFAULT_INSTRUMENTS, DYNAMICS, VOICES, type AnalysisInput, type MusicalLimits, type PerformerInput } from "@/lib/acoustics";
import { AIR, BOX, facingToward } from "./helpers";

/** mulberry32: a small seeded generator, so every run tries the same cases. */
export function generator(seed: number) {
  let s = seed;
  const next = () => {
    s = (s + 0x6d2b79f5) | 0;
    let t = Math.imul(s ^ (s >>> 15), 1 | s);
    t = (t + Math.imul(t ^ (t >>> 7), 61 | t)) ^ t;
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
  const int = (lo: number, hi: number) => lo + Math.floor(next() * (hi - lo + 1));
  const pick = <T,>(list: readonly T[]): T => list[Math.floor(next() * list.length)]!;
  return { next, int, pick };
}

const WINDS = Object.keys(DEFAULT_INSTRUMENTS).filter((k) => ["woodwind", "brass"].includes(DEFAULT_INSTRUMENTS[k]!.family));
const PERCUSSION = Object.keys(DEFAULT_INSTRUMENTS).filter((k) => !WINDS.includes(k));
/** Sections that mix registers: the case the old relaxation could not see into. */
const MIXED = [
  ["trumpet", "tuba"],
  ["clarinet", "bass-clarinet"],
  ["alto-sax", "bari-sax"],
  ["mellophone", "trombone", "tuba"],
];

export function randomCase(seed: number): { input: AnalysisInput; limits: MusicalLimits } {
  const r = generator(seed);
  const sections = r.int(2, 5);
  const performers: PerformerInput[] = [];
  for (let s = 0; s < sections; s++) {
    const kind = r.next();
    const instruments = kind < 0.3 ? r.pick(MIXED) : kind < 0.85 ? [r.pick(WINDS)] : [r.pick(PERCUSSION)];
    const voice = r.pick(VOICES);
    const dynamic = r.pick(DYNAMICS);
    const players = r.int(1, 4);
    const cx = r.next() * 60 - 30;
    const cy = r.next() * 40 + 2;
    for (let n = 0; n < players; n++) {
      const x = cx + r.next() * 8 - 4;
      const y = cy + r.next() * 6 - 3;
      performers.push({
        id: `S${s}P${n}`,
        instrument: instruments[n % instruments.length]!,
        section: `section ${s + 1}`,
        voice,
        dynamic,
        x,
        y,
        facingDeg: r.next() < 0.7 ? facingToward(x, y, BOX.x, BOX.y) : r.next() * 360,
        strengthDb: r.int(-3, 3),
      });
    }
  }
  // Mostly the full pp…fff range (7 dynamics each), some cases with the default and tighter limits.
  const limits: MusicalLimits = { windSteps: r.pick([6, 6, 6, 2, 1]), percussionSteps: r.pick([6, 6, 1, 0]), keepShape: r.next() < 0.5 };
  return { input: { performers, listeningPoints: [BOX], conditions: AIR }, limits };
}

