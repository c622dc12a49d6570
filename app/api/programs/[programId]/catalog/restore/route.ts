import { NextResponse } from "next/server";
import { z } from "zod";
import { addCatalogVersion, findCatalogVersion } from "@/db/queries/catalog-versions";
import { requireProgram } from "@/lib/auth/access";
import { conflict, notFound } from "@/lib/http/errors";
import { readJson } from "@/lib/http/body";
import { route } from "@/lib/http/handler";

const bodySchema = z.object({ version: z.number().int().min(1), baseVersion: z.number().int().min(0) });

/** Puts an earlier version back in force as a new version (history is never rewritten); 409 when the catalog changed since `baseVersion`. */
export const POST = route<{ programId: string }>(async (req, { programId }) => {
  const { user } = await requireProgram(programId, "adopt-plan");
  const body = await readJson(req, bodySchema);
  const old = await findCatalogVersion(programId, body.version);
  if (!old) throw notFound("No such catalog version.");
  const result = await addCatalogVersion({
    programId,
    baseVersion: body.baseVersion,
    instruments: old.instruments,
    note: `Restored version ${old.version}`,
    userId: user.id,
  });
  if (!result.ok) throw conflict("The catalog changed since you looked at it.", { currentVersion: result.currentVersion });
  return NextResponse.json({ version: result.version, restoredFrom: old.version }, { status: 201 });
});
