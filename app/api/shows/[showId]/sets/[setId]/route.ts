import { NextResponse } from "next/server";
import { listPositions } from "@/db/queries/sets";
import { requireSet } from "@/lib/auth/access";
import { route } from "@/lib/http/handler";

export const GET = route<{ showId: string; setId: string }>(async (_req, { showId, setId }) => {
  const { set } = await requireSet(showId, setId, "read");
  return NextResponse.json({
    set: { id: set.id, number: set.number, counts: set.counts, version: set.version },
    positions: await listPositions(setId),
  });
});
