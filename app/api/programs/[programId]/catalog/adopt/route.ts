import { NextResponse } from "next/server";
import { z } from "zod";
import { addCatalogVersion } from "@/db/queries/catalog-versions";
import { listShowsPlaying } from "@/db/queries/shows";
import { requireProgram } from "@/lib/auth/access";
import { badRequest, conflict } from "@/lib/http/errors";
import { readJson } from "@/lib/http/body";
import { route } from "@/lib/http/handler";
import { adoptedCatalog, changedInstruments, programFit, roundedOffsets } from "@/lib/readings/program-fit";
import { fitScopeSchema } from "../fit-query";

const bodySchema = fitScopeSchema.extend({ baseVersion: z.number().int().min(0) });

/**
 * Adopts the fit (recomputed here, never taken from the client) as the catalog's next version;
 * 409 when the catalog changed since `baseVersion`. Stored box mixes recompute on their next read.
 * The answer names the shows whose mixes change; POST …/catalog/undo with the new version undoes it.
 */
export const POST = route<{ programId: string }>(async (req, { programId }) => {
  const { user } = await requireProgram(programId, "adopt-plan");
  const body = await readJson(req, bodySchema);
  const pf = await programFit(programId, body.showId);
  if (!pf.fit) throw badRequest("There are no box readings to fit.");
  if (pf.baseVersion !== body.baseVersion) throw conflict("The catalog changed since you looked at the fit.", { currentVersion: pf.baseVersion });
  const offsetsDb = roundedOffsets(pf.fit);
  const changes = Object.entries(offsetsDb)
    .filter(([, d]) => Math.abs(d) >= 0.05)
    .map(([k, d]) => `${pf.catalog[k]!.name} ${d >= 0 ? "+" : "−"}${Math.abs(d).toFixed(1)} dB`)
    .join(", ");
  const result = await addCatalogVersion({
    programId,
    baseVersion: body.baseVersion,
    instruments: adoptedCatalog(pf),
    note: `Fit to ${pf.used.length} box reading${pf.used.length === 1 ? "" : "s"}: ${changes || "no change"}`,
    userId: user.id,
  });
  if (!result.ok) throw conflict("The catalog changed since you looked at the fit.", { currentVersion: result.currentVersion });
  const affectedShows = await listShowsPlaying(programId, changedInstruments(pf));
  return NextResponse.json({ version: result.version, offsetsDb, affectedShows }, { status: 201 });
});
