import { NextResponse } from "next/server";
import { importShowFile } from "@/db/queries/show-export";
import { requireProgram } from "@/lib/auth/access";
import { route } from "@/lib/http/handler";
import { readShowUpload } from "./read-show-upload";

/**
 * A show file (multipart `file`, optional `name`) becomes a new show of the program. A damaged or
 * foreign file, or one with instruments the program's catalog lacks, is refused and nothing is written;
 * so is one that holds more than a show may (413, lib/limits.ts). The file is read in a worker thread.
 */
export const POST = route<{ programId: string }>(async (req, { programId }) => {
  const { user } = await requireProgram(programId, "manage-show");
  const { upload, file, name } = await readShowUpload(req, programId);
  const showId = await importShowFile(programId, file, { fileName: upload.fileName, content: upload.bytes, uploadedBy: user.id }, name);
  return NextResponse.json({ show: { id: showId, name } }, { status: 201 });
});
