// A phrase's span of sets, checked against the show.
import "server-only";
import { setsOfShow } from "@/db/queries/music-edit";
import { badRequest } from "@/lib/http/errors";

/** Checks that both sets are the show's and in order; answers their orders. */
export async function checkSpan(showId: string, firstSetId: string, lastSetId: string) {
  const found = await setsOfShow(showId, [firstSetId, lastSetId]);
  const first = found.find((s) => s.id === firstSetId);
  const last = found.find((s) => s.id === lastSetId);
  if (!first || !last) throw badRequest("The phrase's sets must be sets of this show.", { firstSetId: first ? [] : ["Not a set of this show."], lastSetId: last ? [] : ["Not a set of this show."] });
  if (last.order < first.order) throw badRequest("The phrase must end at or after the set it starts at.", { lastSetId: ["Comes before the first set."] });
}
