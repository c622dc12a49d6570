// The show as sheets read it: its show file and the program's name.
import "server-only";
import { findProgram } from "@/db/queries/programs";
import { loadShowFile } from "@/db/queries/show-export";
import { notFound } from "@/lib/http/errors";

export async function loadSheetSource(show: { id: string; programId: string }) {
  const [file, program] = await Promise.all([loadShowFile(show.id), findProgram(show.programId)]);
  if (!file || !program) throw notFound("No such show.");
  return { file, programName: program.name };
}

export const fileSlug = (name: string) => name.toLowerCase().replace(/[^a-z0-9]+/g, "-").replace(/^-|-$/g, "") || "show";
