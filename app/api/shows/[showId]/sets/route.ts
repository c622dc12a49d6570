import { NextResponse } from "next/server";
import { createSet, findSetInShow } from "@/db/queries/sets";
import { listSets } from "@/db/queries/shows";
import { requireShow } from "@/lib/auth/access";
import { insertedSetNumber, nextSetNumber } from "@/lib/editor/naming";
import { badRequest, conflict, unprocessable } from "@/lib/http/errors";
import { readJson } from "@/lib/http/body";
import { route } from "@/lib/http/handler";
import { showLimitProblem } from "@/lib/limits";
import { createSetSchema } from "@/lib/validation/sets";

/** Counts of a new set when none are given: two bars of 4/4 (common practice, no source). */
const DEFAULT_COUNTS = 8;

/** Adds a set (empty, at the end or after a set) or duplicates one (its positions, right after it). */
export const POST = route<{ showId: string }>(async (req, { showId }) => {
  await requireShow(showId, "edit-drill");
  const body = await readJson(req, createSetSchema);
  const known = async (id: string | undefined, field: string) => {
    if (!id) return null;
    const set = await findSetInShow(showId, id);
    if (!set) throw badRequest(`${field} is not a set of this show.`, { [field]: ["unknown set"] });
    return set;
  };
  const source = await known(body.duplicateOf, "duplicateOf");
  const after = (await known(body.after, "after")) ?? source;
  const all = await listSets(showId);
  const full = showLimitProblem("sets", all.length + 1);
  if (full) throw unprocessable(full);
  const numbers = all.map((s) => s.number);
  // A set inserted between two is numbered after the one before it (12A); one added at the end gets the next number.
  const inserted = after !== null && all.some((s) => s.order > after.order);
  const number = body.number ?? (inserted ? insertedSetNumber(after.number, numbers) : nextSetNumber(numbers));
  const result = await createSet(showId, { number, counts: body.counts ?? source?.counts ?? DEFAULT_COUNTS, after, copyFromSetId: source?.id ?? null });
  if (!result.ok) throw conflict(`A set numbered ${number} already exists in this show.`);
  return NextResponse.json({ set: result.set }, { status: 201 });
});
