// The music of a show as the API takes it: phrases, per-section voices and written dynamics, per-performer overrides.
import { uniqueBy } from "./unique";
import { z } from "./zod";
import { DYNAMICS } from "@/lib/acoustics/types";

export const VOICE_OR_TACET = ["melody", "countermelody", "accompaniment", "bass", "percussion", "tacet"] as const;

const id = (what: string) => z.string().uuid(`${what} must be an id.`);
const voice = z.enum(VOICE_OR_TACET, { error: `voice must be one of ${VOICE_OR_TACET.join(", ")}.` });
const dynamic = z.enum(DYNAMICS, { error: `The dynamic must be one of ${DYNAMICS.join(", ")}.` });

export const phraseSchema = z
  .object({
    name: z.string().trim().min(1, "Name the phrase.").max(120, "That name is too long."),
    firstSetId: id("firstSetId"),
    lastSetId: id("lastSetId"),
  })
  .strict();
export const phrasePatchSchema = phraseSchema
  .partial()
  .refine((b) => Object.keys(b).length > 0, { message: "Give a new name, first set or last set.", path: ["name"] });

/** Bulk change of section rows: every listed row gets the given voice and/or written dynamic. */
export const assignmentsPatchSchema = z.object({
  rows: z
    .array(z.object({ phraseId: id("phraseId"), section: z.string().min(1).max(120) }))
    .min(1, "Select at least one row.")
    .max(2000)
    .superRefine(uniqueBy((r) => `${r.phraseId}|${r.section}`, (r) => `Section ${r.section} of phrase ${r.phraseId} is selected twice.`)),
  voice: voice.optional(),
  writtenDynamic: dynamic.optional(),
}).strict().refine((b) => b.voice !== undefined || b.writtenDynamic !== undefined, { message: "Give a voice or a written dynamic to set.", path: ["voice"] });

export const overrideSchema = z.object({
  phraseId: id("phraseId"),
  performerId: id("performerId"),
  voice,
  writtenDynamic: dynamic,
  note: z.string().max(500, "That note is too long.").default(""),
});
export const overridesPutSchema = z.object({
  overrides: z
    .array(overrideSchema)
    .min(1)
    .max(500)
    .superRefine(uniqueBy((o) => `${o.phraseId}|${o.performerId}`, (o) => `Performer ${o.performerId} has two overrides for phrase ${o.phraseId}; give one.`)),
});
export const overrideDeleteSchema = z.object({ phraseId: id("phraseId"), performerId: id("performerId") });

export const adoptPlanSchema = z.object({
  listeningPointId: id("listeningPointId"),
  entries: z.array(z.object({ section: z.string().min(1).max(120), playedDynamic: dynamic })).min(1).max(200),
});

/** A voice (or tacet) and a dynamic, as every music route takes them (the show file too). */
export { voice as voiceSchema, dynamic as dynamicSchema };
