import { NextResponse } from "next/server";
import { findShow } from "@/db/queries/shows";
import { updateShowSettings } from "@/db/queries/show-settings";
import { markDeleted } from "@/db/queries/show-lifecycle";
import { requireShow } from "@/lib/auth/access";
import { readJson } from "@/lib/http/body";
import { badRequest } from "@/lib/http/errors";
import { route } from "@/lib/http/handler";
import { deleteShowSchema, updateShowSchema } from "@/lib/validation/shows";
import { showAnswer } from "./show-answer";

export const GET = route<{ showId: string }>(async (_req, { showId }) => {
  const { show, role } = await requireShow(showId, "read");
  return NextResponse.json(await showAnswer(show, role));
});

/** Directors and designers change the show's name, field rules, conditions (air and ground) and movements. */
export const PATCH = route<{ showId: string }>(async (req, { showId }) => {
  const { role } = await requireShow(showId, "manage-show");
  const body = await readJson(req, updateShowSchema, 20_000);
  const result = await updateShowSettings(showId, body);
  if (!result.ok) {
    const p = result.problem;
    throw "unknownSetIds" in p
      ? badRequest("A movement starts at a set this show does not have.", { movements: [`unknown set ${p.unknownSetIds.join(", ")}`] })
      : badRequest("Two movements cannot start at the same set.", { movements: [`set ${p.sharedSetIds.join(", ")} starts more than one movement`] });
  }
  return NextResponse.json(await showAnswer((await findShow(showId))!, role));
});

/**
 * Directors delete a show by typing its name; it is hidden at once and can be restored
 * (POST …/restore) for SHOW_UNDO_DAYS days before it is removed for good.
 */
export const DELETE = route<{ showId: string }>(async (req, { showId }) => {
  const { show } = await requireShow(showId, "retire-show");
  const body = await readJson(req, deleteShowSchema, 2_000);
  if (body.name.trim() !== show.name) throw badRequest(`Type the show's name, "${show.name}", exactly to delete it.`, { name: ["does not match the show's name"] });
  return NextResponse.json({ show: await markDeleted(showId) });
});
