// Reading a show file: a damaged or foreign file is refused with a message that says which.
import { fieldIssues, nestsDeeper } from "@/lib/http/body";
import { MAX_JSON_DEPTH, showLimitProblem } from "@/lib/limits";
import { SHOW_FILE_FORMAT, SHOW_FILE_VERSION, showFileSchema, type ShowFile } from "./schema";

/** A refused file answers 400 (damaged or foreign) or 413 (more than a show may hold). */
export type ReadResult = { ok: true; file: ShowFile } | { ok: false; status: 400 | 413; error: string; issues?: Record<string, string[]> };

function duplicates(values: string[]): string[] {
  const seen = new Set<string>();
  return [...new Set(values.filter((v) => seen.has(v) || !seen.add(v)))];
}

/** Cross-references a schema cannot see: labels, set numbers and movements that must exist and be unique. */
function references(f: ShowFile): Record<string, string[]> {
  const issues: Record<string, string[]> = {};
  const add = (key: string, message: string) => (issues[key] ??= []).push(message);
  const labels = new Set(f.performers.map((p) => p.label));
  const numbers = new Set(f.sets.map((s) => s.number));
  const movements = new Set(f.movements.map((m) => m.number));
  const sections = new Set(f.performers.map((p) => p.section));
  for (const d of duplicates(f.performers.map((p) => p.label))) add("performers", `label ${d} appears more than once`);
  for (const d of duplicates(f.sets.map((s) => s.number))) add("sets", `set ${d} appears more than once`);
  for (const d of duplicates(f.movements.map((m) => String(m.number)))) add("movements", `movement ${d} appears more than once`);
  f.sets.forEach((s, i) => {
    if (s.movement !== null && !movements.has(s.movement)) add(`sets.${i}.movement`, `set ${s.number} names movement ${s.movement}, which the file does not have`);
    for (const d of duplicates(s.positions.map((p) => p.label))) add(`sets.${i}.positions`, `${d} has two positions in set ${s.number}`);
    for (const p of s.positions) if (!labels.has(p.label)) add(`sets.${i}.positions`, `set ${s.number} places ${p.label}, who is not on the roster`);
  });
  const order = new Map(f.sets.map((s, i) => [s.number, i]));
  f.phrases.forEach((p, i) => {
    for (const n of [p.firstSet, p.lastSet]) if (!numbers.has(n)) add(`phrases.${i}`, `phrase "${p.name}" refers to set ${n}, which the file does not have`);
    if ((order.get(p.firstSet) ?? 0) > (order.get(p.lastSet) ?? 0)) add(`phrases.${i}`, `phrase "${p.name}" ends before it starts`);
    for (const d of duplicates(p.voices.map((v) => v.section))) add(`phrases.${i}.voices`, `section ${d} has two voices in "${p.name}"`);
    for (const v of p.voices) if (!sections.has(v.section)) add(`phrases.${i}.voices`, `"${p.name}" gives a voice to ${v.section}, a section nobody is in`);
    for (const d of duplicates(p.overrides.map((o) => o.label))) add(`phrases.${i}.overrides`, `${d} has two solos in "${p.name}"`);
    for (const o of p.overrides) if (!labels.has(o.label)) add(`phrases.${i}.overrides`, `"${p.name}" has a solo for ${o.label}, who is not on the roster`);
  });
  return issues;
}

/** More performers, sets or listening points than a show may hold, counted before the contents are checked. */
function tooMany(value: Record<string, unknown>): string | null {
  const length = (key: string) => (Array.isArray(value[key]) ? (value[key] as unknown[]).length : 0);
  return showLimitProblem("performers", length("performers")) ?? showLimitProblem("sets", length("sets")) ?? showLimitProblem("listeningPoints", length("listeningPoints"));
}

export function readShowFile(text: string): ReadResult {
  if (nestsDeeper(text)) return { ok: false, status: 400, error: `This file is damaged: it nests arrays or objects more than ${MAX_JSON_DEPTH} levels deep.` };
  let value: unknown;
  try {
    value = JSON.parse(text.replace(/^\uFEFF/, ""));
  } catch {
    return { ok: false, status: 400, error: "This file is damaged: it is not valid JSON (it may be cut short or edited by hand)." };
  }
  const head = (value ?? {}) as { format?: unknown; version?: unknown };
  if (typeof value !== "object" || value === null || head.format !== SHOW_FILE_FORMAT) {
    return { ok: false, status: 400, error: "This is not a Farfield show file: export a show from Farfield and import that file." };
  }
  if (head.version !== SHOW_FILE_VERSION) {
    return {
      ok: false,
      status: 400,
      error: typeof head.version === "number" && head.version > SHOW_FILE_VERSION
        ? `This show file is version ${head.version}, newer than this Farfield reads (version ${SHOW_FILE_VERSION}).`
        : "This show file has no version this Farfield can read.",
    };
  }
  const excess = tooMany(value as Record<string, unknown>);
  if (excess) return { ok: false, status: 413, error: `This show file holds more than Farfield takes. ${excess}` };
  const parsed = showFileSchema.safeParse(value);
  if (!parsed.success) {
    const unknown = parsed.error.issues.flatMap((i) => (i.code === "unrecognized_keys" ? i.keys.map((k) => [...i.path, k].join(".")) : []));
    const error = unknown.length
      ? `This show file has contents Farfield does not know (${unknown.slice(0, 5).join(", ")}${unknown.length > 5 ? "…" : ""}): it was not written by this version of Farfield, or was edited by hand.`
      : "This show file is damaged: some of its contents are missing or not valid.";
    return { ok: false, status: 400, error, issues: fieldIssues(parsed.error) };
  }
  const issues = references(parsed.data);
  if (Object.keys(issues).length) return { ok: false, status: 400, error: "This show file is damaged: it refers to things it does not contain.", issues };
  return { ok: true, file: parsed.data };
}
