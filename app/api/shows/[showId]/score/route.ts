import { NextResponse } from "next/server";
import { findShowScore } from "@/db/queries/scores";
import { listSets } from "@/db/queries/shows";
import { storeUpload } from "@/db/queries/uploads";
import { requireShow } from "@/lib/auth/access";
import { route } from "@/lib/http/handler";
import { readUpload } from "@/lib/http/upload";
import { MAX_SCORE_BYTES } from "@/lib/limits";
import { parseScore } from "@/lib/score/parse-score";
import { parseJsonText, parseWith } from "@/lib/http/body";
import { badRequest } from "@/lib/http/errors";
import { scoreChoicesSchema } from "@/lib/validation/score";
import { parsedScore, rememberScore } from "./parsed";
import { planScoreImport, scoreOr400 } from "./preview";

/** The show's confirmed score: file, parts and the sections they play in, anchors, measures and tempo; `{ score: null }` without one. */
export const GET = route<{ showId: string }>(async (_req, { showId }) => {
  await requireShow(showId, "read");
  const [stored, sets] = await Promise.all([findShowScore(showId), listSets(showId)]);
  if (!stored) return NextResponse.json({ score: null });
  const score = parsedScore(stored.uploadId, stored.content);
  const numberOf = new Map(sets.map((s) => [s.id, s.number]));
  return NextResponse.json({
    score: {
      uploadId: stored.uploadId,
      fileName: stored.fileName,
      confirmedAt: stored.confirmedAt,
      title: score.title,
      measures: score.measures.length,
      counts: score.totalCounts,
      tempo: score.tempo,
      parts: score.parts.map((p) => ({ id: p.id, name: p.name, section: stored.partMap[p.id] ?? null })),
      anchors: stored.anchors.map((a) => ({ ...a, setNumber: numberOf.get(a.setId) ?? null })),
    },
  });
});

/** A text field of the form as JSON, or undefined when absent. */
function jsonField(fields: Record<string, string>, name: string): unknown {
  const text = fields[name];
  if (text === undefined || text.trim() === "") return undefined;
  const parsed = parseJsonText(text, `The field ${name}`);
  if (!parsed) throw badRequest(`The field ${name} is not JSON.`, { [name]: ["Send it as JSON."] });
  return parsed.value;
}

/**
 * A MusicXML score (multipart: `file`, optional `mapping` and `anchors` as JSON). The file is kept as
 * sent; the answer is the preview of what confirming would write. Nothing of the show changes.
 */
export const POST = route<{ showId: string }>(async (req, { showId }) => {
  const { show, user } = await requireShow(showId, "edit-music");
  const upload = await readUpload(req, MAX_SCORE_BYTES);
  const choices = parseWith(scoreChoicesSchema, { mapping: jsonField(upload.fields, "mapping"), anchors: jsonField(upload.fields, "anchors") }, "The import");
  const score = scoreOr400("file", () => parseScore(upload.bytes));
  // Planned before the file is kept, so a score that cannot be previewed leaves nothing behind.
  const planned = await planScoreImport(showId, score, choices);
  const stored = await storeUpload({ programId: show.programId, showId, kind: "musicxml", fileName: upload.fileName, content: upload.bytes, uploadedBy: user.id });
  rememberScore(stored.id, score);
  return NextResponse.json(
    {
      upload: { id: stored.id, kind: "musicxml", fileName: upload.fileName, sizeBytes: upload.bytes.byteLength, uploadedAt: stored.uploadedAt, uploadedBy: user.name, confirmedAt: null },
      preview: planned.preview,
    },
    { status: 201 },
  );
});
