import { NextResponse } from "next/server";
import { requireShow } from "@/lib/auth/access";
import { route } from "@/lib/http/handler";
import { planUpload, previewOf } from "../plan";
import { loadUpload } from "./load";

/** An upload and its preview against the show as it is now. */
export const GET = route<{ showId: string; uploadId: string }>(async (_req, { showId, uploadId }) => {
  const { show } = await requireShow(showId, "read");
  const { content, ...upload } = await loadUpload(showId, uploadId);
  return NextResponse.json({ upload, preview: previewOf(await planUpload(show, upload.kind, content), show) });
});
