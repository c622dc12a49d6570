// Plans an uploaded roster or drill CSV against the show as it is now, and shapes the preview.
import "server-only";
import { currentCatalog } from "@/db/queries/catalog";
import { loadImportContext } from "@/db/queries/uploads";
import type { Show } from "@/db/schema";
import { describePosition } from "@/lib/field/words";
import { planDrill, type DrillPlan } from "@/lib/imports/drill";
import { MAX_DRILL_ROWS, MAX_ROSTER_ROWS, showLimitProblem } from "@/lib/limits";
import { planRoster, type RosterPlan } from "@/lib/imports/roster";
import { tooLarge, unprocessable } from "@/lib/http/errors";
import { uploadText } from "@/lib/http/upload";

export type ImportKind = "roster-csv" | "drill-csv";
export type Planned = { kind: "roster-csv"; plan: RosterPlan } | { kind: "drill-csv"; plan: DrillPlan };

const PREVIEW_DOTS = 500;

export async function planUpload(show: Show, kind: ImportKind, content: Buffer): Promise<Planned> {
  const text = uploadText(content);
  const context = await loadImportContext(show.id);
  if (kind === "roster-csv") {
    const catalog = await currentCatalog(show.programId);
    const instruments = Object.entries((catalog?.instruments ?? {}) as Record<string, { name?: string }>).map(([key, spec]) => ({ key, name: spec.name ?? key }));
    const plan = planRoster(text, { existing: context.roster, instruments });
    if (plan.rows > MAX_ROSTER_ROWS) throw tooLarge(`A roster file may hold at most ${MAX_ROSTER_ROWS} rows; this one has ${plan.rows}.`);
    const full = showLimitProblem("performers", context.roster.length + plan.creates.length);
    if (full) throw unprocessable(`${full} The file adds ${plan.creates.length} to the ${context.roster.length} on the roster.`);
    return { kind, plan };
  }
  const plan = planDrill(text, { rules: show.fieldRules, performers: context.roster, sets: context.sets });
  if (plan.rows > MAX_DRILL_ROWS) throw tooLarge(`A drill file may hold at most ${MAX_DRILL_ROWS} rows; this one has ${plan.rows}.`);
  const added = plan.sets.filter((s) => s.setId === null).length;
  const full = showLimitProblem("sets", context.sets.length + added);
  if (full) throw unprocessable(`${full} The file adds ${added} sets to the ${context.sets.length} of the show.`);
  return { kind, plan };
}

export const planIsWritable = (p: Planned) => p.plan.errors.length === 0 && p.plan.rows > 0;

/** The preview as the page shows it: what will be created or changed, and every bad row. */
export function previewOf(p: Planned, show: Show) {
  const base = { kind: p.kind, rows: p.plan.rows, errors: p.plan.errors, writable: planIsWritable(p) };
  if (p.kind === "roster-csv") {
    return {
      ...base,
      roster: {
        creates: p.plan.creates,
        changes: p.plan.changes.map((c) => ({ label: c.entry.label, line: c.entry.line, fields: c.fields })),
        unchanged: p.plan.unchanged,
      },
    };
  }
  return {
    ...base,
    drill: {
      sets: p.plan.sets,
      dotCount: p.plan.dots.length,
      dots: p.plan.dots.slice(0, PREVIEW_DOTS).map((d) => ({ ...d, words: describePosition(d.x, d.y, show.fieldRules).text })),
    },
  };
}
