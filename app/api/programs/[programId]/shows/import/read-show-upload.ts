// A show file sent to a program: read in a worker thread, checked against the program's catalog and a
// new name. Shared by the import (which writes it) and its preview (which writes nothing).
import { currentCatalog } from "@/db/queries/catalog";
import { runHeavy } from "@/lib/heavy/pool";
import { badRequest, HttpError } from "@/lib/http/errors";
import { readUpload, uploadText } from "@/lib/http/upload";
import { MAX_SHOW_FILE_BYTES } from "@/lib/limits";
import { createShowSchema } from "@/lib/validation/shows";

export async function readShowUpload(req: Request, programId: string) {
  const upload = await readUpload(req, MAX_SHOW_FILE_BYTES);
  const read = await runHeavy("readShowFile", uploadText(upload.bytes));
  if (!read.ok) throw new HttpError(read.status, read.error, read.issues ? { issues: read.issues } : {});
  const name = createShowSchema.shape.name.optional().safeParse(upload.fields.name || undefined);
  if (!name.success) throw badRequest("The new show's name is not valid.", { name: ["Use 1 to 160 characters."] });
  const catalog = (await currentCatalog(programId))?.instruments as Record<string, unknown> | undefined;
  const unknown = [...new Set(read.file.performers.map((p) => p.instrument))].filter((i) => !catalog || !(i in catalog));
  if (unknown.length) throw badRequest(`This program's instrument catalog has no ${unknown.join(", ")}; add them before importing this show.`);
  return { upload, file: read.file, name: name.data ?? read.file.show.name };
}
