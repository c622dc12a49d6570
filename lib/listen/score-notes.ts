// The score's notes as GET /api/shows/{showId}/score/notes answers them, and the notes of one span.
import { z } from "@/lib/validation/zod";

const note = z.object({ atCount: z.number().finite().min(0), lengthCounts: z.number().finite().min(0), midi: z.number().int().min(0).max(127) });

/** `{ score: null }` when the show has no score. */
export const scoreNotesSchema = z.object({
  score: z
    .object({
      tempo: z.array(z.object({ atCount: z.number().finite().min(0), bpm: z.number().finite().positive() })),
      sections: z.record(z.string(), z.object({ notes: z.array(note) })),
    })
    .nullable(),
});

export type ScoreNotes = z.infer<typeof scoreNotesSchema>;
export type ScoreNote = z.infer<typeof note>;

/** The notes sounding in [start, end) of the count line, cut to it, with atCount from the span's start. */
export function notesInSpan(notes: readonly ScoreNote[], start: number, end: number): ScoreNote[] {
  return notes.flatMap((n) => {
    const from = Math.max(n.atCount, start);
    const to = Math.min(n.atCount + n.lengthCounts, end);
    return to > from ? [{ atCount: from - start, lengthCounts: to - from, midi: n.midi }] : [];
  });
}
