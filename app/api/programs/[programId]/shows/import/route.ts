import { NextResponse } from "next/server";
import { currentCatalog } from "@/db/queries/catalog";
import { importShowFile } from "@/db/queries/show-export";
import { requireProgram } from "@/lib/auth/access";
import { runHeavy } from "@/lib/heavy/pool";
import { badRequest, HttpError } from "@/lib/http/errors";
import { route } from "@/lib/http/handler";
import { readUpload, uploadText } from "@/lib/http/upload";
import { MAX_SHOW_FILE_BYTES } from "@/lib/limits";
import { z } from "zod";

const nameSchema = z.string().trim().min(1).max(160).optional();

/**
 * A show file (multipart `file`, optional `name`) becomes a new show of the program. A damaged or
 * foreign file, or one with instruments the program's catalog lacks, is refused and nothing is written;
 * so is one that holds more than a show may (413, lib/limits.ts). The file is read in a worker thread.
 */
export const POST = route<{ programId: string }>(async (req, { programId }) => {
  const { user } = await requireProgram(programId, "manage-show");
  const upload = await readUpload(req, MAX_SHOW_FILE_BYTES);
  const read = await runHeavy("readShowFile", uploadText(upload.bytes));
  if (!read.ok) throw new HttpError(read.status, read.error, read.issues ? { issues: read.issues } : {});
  const name = nameSchema.safeParse(upload.fields.name || undefined);
  if (!name.success) throw badRequest("The new show's name is not valid.", { name: ["Use 1 to 160 characters."] });
  const catalog = (await currentCatalog(programId))?.instruments as Record<string, unknown> | undefined;
  const unknown = [...new Set(read.file.performers.map((p) => p.instrument))].filter((i) => !catalog || !(i in catalog));
  if (unknown.length) throw badRequest(`This program's instrument catalog has no ${unknown.join(", ")}; add them before importing this show.`);
  const showId = await importShowFile(programId, read.file, { fileName: upload.fileName, content: upload.bytes, uploadedBy: user.id }, name.data);
  return NextResponse.json({ show: { id: showId, name: name.data ?? read.file.show.name } }, { status: 201 });
});
