import { NextResponse } from "next/server";
import { z } from "zod";
import { requireSet } from "@/lib/auth/access";
import { parseWith } from "@/lib/http/body";
import { route } from "@/lib/http/handler";
import { setHearing } from "@/lib/hearing/set-hearing";

const query = z.object({
  minutes: z.coerce
    .number({ error: "minutes must be a number." })
    .refine(Number.isFinite, "minutes must be a finite number.")
    .refine((m) => m > 0 && m <= 24 * 60, "minutes must be more than 0 and at most 1440.")
    .default(120),
});

/** Level at each performer's ears from everyone else in the set, and the dose of a rehearsal of `minutes` (NIOSH, OSHA). Estimates. */
export const GET = route<{ showId: string; setId: string }>(async (req, { showId, setId }) => {
  const { show, set } = await requireSet(showId, setId, "read");
  const { minutes } = parseWith(query, Object.fromEntries(new URL(req.url).searchParams), "The query");
  return NextResponse.json(await setHearing(show, set, minutes));
});
