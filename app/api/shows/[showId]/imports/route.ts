import { NextResponse } from "next/server";
import { listUploads, storeUpload } from "@/db/queries/uploads";
import { requireShow } from "@/lib/auth/access";
import { MAX_UPLOAD_BYTES } from "@/lib/limits";
import { badRequest } from "@/lib/http/errors";
import { route } from "@/lib/http/handler";
import { readUpload } from "@/lib/http/upload";
import { planUpload, previewOf, type ImportKind } from "./plan";

const KINDS: Record<string, ImportKind> = { roster: "roster-csv", drill: "drill-csv" };

/** The show's uploads, newest first (who sent which file when, and what its confirm wrote). */
export const GET = route<{ showId: string }>(async (_req, { showId }) => {
  await requireShow(showId, "read");
  return NextResponse.json({ uploads: await listUploads(showId) });
});

/**
 * A roster or drill CSV (multipart: `kind` = roster | drill, `file`). The file is kept as sent;
 * the answer is its preview. Nothing of the show changes until the upload is confirmed.
 */
export const POST = route<{ showId: string }>(async (req, { showId }) => {
  const { show, user } = await requireShow(showId, "edit-drill");
  const upload = await readUpload(req, MAX_UPLOAD_BYTES);
  const kind = KINDS[upload.fields.kind ?? ""];
  if (!kind) throw badRequest("Say what the file holds: kind must be roster or drill.", { kind: ["Choose roster or drill."] });
  // The preview is made before the file is kept, so a file that cannot be previewed leaves nothing behind.
  const preview = previewOf(await planUpload(show, kind, upload.bytes), show);
  const stored = await storeUpload({ programId: show.programId, showId, kind, fileName: upload.fileName, content: upload.bytes, uploadedBy: user.id });
  return NextResponse.json(
    {
      upload: { id: stored.id, kind, fileName: upload.fileName, sizeBytes: upload.bytes.byteLength, uploadedAt: stored.uploadedAt, uploadedBy: user.name, confirmedAt: null },
      preview,
    },
    { status: 201 },
  );
});
