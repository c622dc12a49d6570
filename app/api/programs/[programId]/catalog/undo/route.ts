import { NextResponse } from "next/server";
import { z } from "zod";
import { addCatalogVersion, findCatalogVersion } from "@/db/queries/catalog-versions";
import { requireProgram } from "@/lib/auth/access";
import { conflict, notFound } from "@/lib/http/errors";
import { readJson } from "@/lib/http/body";
import { route } from "@/lib/http/handler";

const bodySchema = z.object({ version: z.number().int().min(1) });

/**
 * Undoes the version in force (`version`, e.g. a fit just adopted): the one before it goes back in
 * force as a new version (history is never rewritten; before version 1 that is the built-in
 * catalog). 409 when `version` is no longer the one in force.
 */
export const POST = route<{ programId: string }>(async (req, { programId }) => {
  const { user } = await requireProgram(programId, "adopt-plan");
  const body = await readJson(req, bodySchema);
  const undone = await findCatalogVersion(programId, body.version);
  if (!undone) throw notFound("No such catalog version.");
  const previous = body.version > 1 ? await findCatalogVersion(programId, body.version - 1) : null;
  const result = await addCatalogVersion({
    programId,
    baseVersion: body.version,
    instruments: previous?.instruments ?? {},
    note: `Undid version ${body.version} (${undone.note || "no note"})`,
    userId: user.id,
  });
  if (!result.ok) throw conflict(`Version ${body.version} is no longer the one in force.`, { currentVersion: result.currentVersion });
  return NextResponse.json({ version: result.version, undid: body.version, restoredFrom: body.version - 1 }, { status: 201 });
});
