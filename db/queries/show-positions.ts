// Every position of a show's sets in one query, for whole-show work (sweeps, the timeline, phrase plans).
import { and, asc, eq } from "drizzle-orm";
import { db } from "../client";
import { positions, sets } from "../schema";
import { finitePosition } from "./finite-positions";

export async function listShowPositions(showId: string) {
  return db
    .select({ setId: positions.setId, performerId: positions.performerId, x: positions.x, y: positions.y, facingDeg: positions.facingDeg })
    .from(positions)
    .innerJoin(sets, eq(sets.id, positions.setId))
    .where(and(eq(sets.showId, showId), finitePosition))
    .orderBy(asc(positions.setId), asc(positions.performerId));
}
