// The upload of a route's params, or 404 (also for the JSON show files, which have their own route).
import "server-only";
import { findUpload } from "@/db/queries/uploads";
import { notFound } from "@/lib/http/errors";
import { idSchema } from "@/lib/http/handler";

export async function loadUpload(showId: string, uploadId: string) {
  const upload = idSchema.safeParse(uploadId).success ? await findUpload(showId, uploadId) : null;
  if (!upload || (upload.kind !== "roster-csv" && upload.kind !== "drill-csv")) throw notFound("No such upload.");
  return { ...upload, kind: upload.kind as "roster-csv" | "drill-csv" };
}
