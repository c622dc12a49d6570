// The kept score upload of a route's params, or 404.
import "server-only";
import { findUpload } from "@/db/queries/uploads";
import { notFound } from "@/lib/http/errors";
import { idSchema } from "@/lib/http/handler";
import { parsedScore } from "./parsed";
import { scoreOr400 } from "./preview";

export async function loadScoreUpload(showId: string, uploadId: string) {
  const upload = idSchema.safeParse(uploadId).success ? await findUpload(showId, uploadId) : null;
  if (!upload || upload.kind !== "musicxml") throw notFound("No such score upload.");
  return { upload, score: scoreOr400("file", () => parsedScore(upload.id, upload.content)) };
}
