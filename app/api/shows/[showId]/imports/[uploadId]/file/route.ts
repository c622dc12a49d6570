import { requireShow } from "@/lib/auth/access";
import { route } from "@/lib/http/handler";
import { loadUpload } from "../load";

/** The original file, byte for byte, as it was uploaded. */
export const GET = route<{ showId: string; uploadId: string }>(async (_req, { showId, uploadId }) => {
  await requireShow(showId, "read");
  const upload = await loadUpload(showId, uploadId);
  const name = upload.fileName.replace(/[^\w.\- ]+/g, "_");
  return new Response(new Uint8Array(upload.content), {
    headers: { "content-type": "text/csv; charset=utf-8", "content-disposition": `attachment; filename="${name}"` },
  });
});
