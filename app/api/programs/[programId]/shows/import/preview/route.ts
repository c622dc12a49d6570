import { NextResponse } from "next/server";
import { requireProgram } from "@/lib/auth/access";
import { route } from "@/lib/http/handler";
import { readShowUpload } from "../read-show-upload";

/**
 * What restoring a backup would create, checked exactly as the import checks it, with nothing written:
 * the show's name, rules and weather, and how many performers, sets, movements, phrases and listening points.
 */
export const POST = route<{ programId: string }>(async (req, { programId }) => {
  await requireProgram(programId, "manage-show");
  const { file, name } = await readShowUpload(req, programId);
  return NextResponse.json({
    preview: {
      name,
      fieldRules: file.show.fieldRules,
      conditions: file.show.conditions,
      performers: file.performers.length,
      sets: file.sets.map((s) => ({ number: s.number, counts: s.counts, placed: s.positions.length })),
      movements: file.movements.map((m) => m.name),
      phrases: file.phrases.map((p) => p.name),
      listeningPoints: file.listeningPoints.map((l) => l.name),
    },
  });
});
