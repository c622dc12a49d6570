// Names the editor suggests: set numbers ("12", "12A") and performer labels ("T11"). Pure.

/** The next whole set number after the highest one ("12A" counts as 12). */
export function nextSetNumber(numbers: readonly string[]): string {
  const max = numbers.reduce((m, n) => Math.max(m, Number.parseInt(n, 10) || 0), 0);
  return String(max + 1);
}

/** A number for a set inserted after `base`: base + A, B, … (the trade's way of naming an added set). */
export function insertedSetNumber(base: string, numbers: readonly string[]): string {
  const taken = new Set(numbers.map((n) => n.toUpperCase()));
  const stem = base.replace(/[A-Z]+$/i, "");
  const start = /[A-Z]$/i.test(base) ? base.toUpperCase().charCodeAt(base.length - 1) - 64 : 0;
  for (let i = start + 1; i <= 26; i++) {
    const candidate = stem + String.fromCharCode(64 + i);
    if (!taken.has(candidate)) return candidate;
  }
  return nextSetNumber(numbers);
}

/** Label prefixes by instrument key, for an instrument the roster does not have yet (common practice, no source). */
const PREFIXES: Record<string, string> = {
  piccolo: "PC",
  flute: "F",
  clarinet: "C",
  "bass-clarinet": "BC",
  "alto-sax": "A",
  "tenor-sax": "TS",
  "bari-sax": "BS",
  trumpet: "T",
  mellophone: "M",
  trombone: "TB",
  baritone: "B",
  tuba: "TU",
  snare: "S",
  tenors: "TD",
  "bass-drum": "BD",
  cymbals: "CY",
  marimba: "MA",
  vibraphone: "V",
  synth: "SY",
};

/** The prefix the roster already uses for an instrument (its most common one), else the default. */
export function labelPrefix(instrument: string, roster: readonly { label: string; instrument: string }[]): string {
  const counts = new Map<string, number>();
  for (const p of roster) {
    if (p.instrument !== instrument) continue;
    const prefix = p.label.replace(/\d+$/, "");
    if (prefix) counts.set(prefix, (counts.get(prefix) ?? 0) + 1);
  }
  let best = "";
  for (const [prefix, n] of counts) if (n > (counts.get(best) ?? 0)) best = prefix;
  return best || PREFIXES[instrument] || instrument.replace(/[^a-z]/gi, "").slice(0, 2).toUpperCase() || "P";
}

/** `count` free labels prefix1, prefix2, … continuing after the highest one in use. */
export function nextLabels(prefix: string, labels: readonly string[], count: number): string[] {
  const re = new RegExp(`^${prefix.replace(/[.*+?^${}()|[\]\\]/g, "\\$&")}(\\d+)$`, "i");
  const taken = new Set(labels.map((l) => l.toUpperCase()));
  let n = labels.reduce((m, l) => Math.max(m, Number(re.exec(l)?.[1] ?? 0)), 0);
  const out: string[] = [];
  while (out.length < count) {
    n += 1;
    const label = `${prefix}${n}`;
    if (!taken.has(label.toUpperCase())) out.push(label);
  }
  return out;
}
