import { NextResponse } from "next/server";
import { loadShowFile } from "@/db/queries/show-export";
import { requireShow } from "@/lib/auth/access";
import { notFound } from "@/lib/http/errors";
import { route } from "@/lib/http/handler";

const fileNameOf = (name: string) => `${name.toLowerCase().replace(/[^a-z0-9]+/g, "-").replace(/^-|-$/g, "") || "show"}.farfield.json`;

/** The whole show as one versioned JSON document (a backup, or a copy for another program). */
export const GET = route<{ showId: string }>(async (_req, { showId }) => {
  await requireShow(showId, "read");
  const file = await loadShowFile(showId);
  if (!file) throw notFound("No such show.");
  return new NextResponse(JSON.stringify(file, null, 2) + "\n", {
    headers: { "content-type": "application/json; charset=utf-8", "content-disposition": `attachment; filename="${fileNameOf(file.show.name)}"` },
  });
});
