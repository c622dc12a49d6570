import { NextResponse } from "next/server";
import { programInstruments } from "@/db/queries/catalog";
import { addPerformers, rosterLabels } from "@/db/queries/performers";
import { requireShow } from "@/lib/auth/access";
import { labelPrefix, nextLabels } from "@/lib/editor/naming";
import { badRequest, conflict, unprocessable } from "@/lib/http/errors";
import { readJson } from "@/lib/http/body";
import { route } from "@/lib/http/handler";
import { showLimitProblem } from "@/lib/limits";
import { addPerformersSchema } from "@/lib/validation/performers";

/** Adds performers to the roster by instrument; labels and section follow the roster's own when not given. */
export const POST = route<{ showId: string }>(async (req, { showId }) => {
  const { show } = await requireShow(showId, "edit-drill");
  const body = await readJson(req, addPerformersSchema);
  const catalog = await programInstruments(show.programId);
  const spec = catalog[body.instrument];
  if (!spec) throw badRequest(`"${body.instrument}" is not an instrument of this program's catalog.`, { instrument: ["unknown instrument"] });
  const roster = await rosterLabels(showId);
  const full = showLimitProblem("performers", roster.length + body.count);
  if (full) throw unprocessable(full);
  const labels = body.label ? [body.label.toUpperCase()] : nextLabels(labelPrefix(body.instrument, roster), roster.map((r) => r.label), body.count);
  const section = body.section ?? roster.find((r) => r.instrument === body.instrument)?.section ?? spec.name;
  const result = await addPerformers(
    showId,
    labels.map((label) => ({ label, instrument: body.instrument, section, part: body.part, strengthDb: body.strengthDb, name: body.name ?? null })),
  );
  if (!result.ok) throw conflict(`The label ${labels.join(", ")} is already on this show's roster.`);
  return NextResponse.json({ performers: result.performers }, { status: 201 });
});
