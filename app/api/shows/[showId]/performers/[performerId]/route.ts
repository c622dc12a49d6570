import { NextResponse } from "next/server";
import { programInstruments } from "@/db/queries/catalog";
import { deletePerformer, updatePerformer } from "@/db/queries/performers";
import { requireShow } from "@/lib/auth/access";
import { readJson } from "@/lib/http/body";
import { badRequest, conflict, notFound } from "@/lib/http/errors";
import { idSchema, route } from "@/lib/http/handler";
import { performerPatchSchema } from "@/lib/validation/performers";

type Params = { showId: string; performerId: string };

const NO_SUCH = "No such performer on this show.";

/** Changes a performer's label, instrument, section, part, strength or name (the roster CSV's rules). */
export const PATCH = route<Params>(async (req, { showId, performerId }) => {
  const { show } = await requireShow(showId, "edit-drill");
  if (!idSchema.safeParse(performerId).success) throw notFound(NO_SUCH);
  const patch = await readJson(req, performerPatchSchema);
  if (patch.instrument) {
    const catalog = await programInstruments(show.programId);
    if (!catalog[patch.instrument]) throw badRequest(`"${patch.instrument}" is not an instrument of this program's catalog.`, { instrument: ["unknown instrument"] });
  }
  const label = patch.label?.toUpperCase();
  const result = await updatePerformer(showId, performerId, { ...patch, ...(label ? { label } : {}) });
  if (!result.ok && result.reason === "label-taken") throw conflict(`Another performer on this show is already labelled ${label}. Choose another label.`);
  if (!result.ok) throw notFound(NO_SUCH);
  return NextResponse.json({ performer: result.performer });
});

/** Removes a performer from the roster, with their dots in every set and their solos. */
export const DELETE = route<Params>(async (_req, { showId, performerId }) => {
  await requireShow(showId, "edit-drill");
  if (!idSchema.safeParse(performerId).success || !(await deletePerformer(showId, performerId))) throw notFound(NO_SUCH);
  return new NextResponse(null, { status: 204 });
});
