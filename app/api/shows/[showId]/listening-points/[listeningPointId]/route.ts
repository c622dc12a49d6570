import { NextResponse } from "next/server";
import { deleteListeningPoint, updateListeningPoint } from "@/db/queries/listening-points";
import { isUuid, requireShow } from "@/lib/auth/access";
import { readJson } from "@/lib/http/body";
import { conflict, notFound } from "@/lib/http/errors";
import { route } from "@/lib/http/handler";
import { updateListeningPointSchema } from "@/lib/validation/listening-points";

type Params = { showId: string; listeningPointId: string };

/** Moves, renames, or changes the ground or background of a listening point. */
export const PATCH = route<Params>(async (req, { showId, listeningPointId }) => {
  await requireShow(showId, "manage-show");
  const body = await readJson(req, updateListeningPointSchema, 20_000);
  const listeningPoint = isUuid(listeningPointId) ? await updateListeningPoint(showId, listeningPointId, body) : null;
  if (!listeningPoint) throw notFound("No such listening point.");
  return NextResponse.json({ listeningPoint });
});

/** Removes a listening point; the show's last one stays (409), and so does one with box readings (409). */
export const DELETE = route<Params>(async (_req, { showId, listeningPointId }) => {
  await requireShow(showId, "manage-show");
  const result = isUuid(listeningPointId) ? await deleteListeningPoint(showId, listeningPointId) : "unknown";
  if (result === "unknown") throw notFound("No such listening point.");
  if (result === "last") throw conflict("A show needs at least one listening point: add another before removing this one.");
  if (typeof result === "object") {
    throw conflict(`${result.readings} box reading${result.readings === 1 ? " was" : "s were"} taken at this listening point; delete ${result.readings === 1 ? "it" : "them"} on the Readings page before removing the point.`);
  }
  return new Response(null, { status: 204 });
});
