import { NextResponse } from "next/server";
import { listCatalogVersions } from "@/db/queries/catalog-versions";
import { DEFAULT_INSTRUMENTS } from "@/lib/acoustics/catalog";
import { catalogProvenance } from "@/lib/acoustics/provenance";
import type { InstrumentCatalog } from "@/lib/acoustics/types";
import { requireProgram } from "@/lib/auth/access";
import { route } from "@/lib/http/handler";

/** The catalog's history, newest (in force) first, with each version's carry and provenance (source, from memory or fitted; ±dB) per instrument. */
export const GET = route<{ programId: string }>(async (_req, { programId }) => {
  const { role } = await requireProgram(programId, "read");
  const versions = await listCatalogVersions(programId);
  return NextResponse.json({
    role,
    currentVersion: versions[0]?.version ?? 0,
    versions: versions.map((v) => {
      const instruments = { ...DEFAULT_INSTRUMENTS, ...(v.instruments as InstrumentCatalog) };
      return {
        version: v.version,
        note: v.note,
        createdBy: v.createdBy,
        createdAt: v.createdAt.toISOString(),
        carryDb: Object.fromEntries(Object.entries(instruments).map(([k, s]) => [k, s.carryDb])),
        provenance: catalogProvenance(instruments),
      };
    }),
  });
});
