// A performer as the API takes it: added by instrument (POST /api/shows/{showId}/performers) or
// changed one field at a time (PATCH …/performers/{performerId}). The same rules as the roster CSV.
import { z } from "./zod";

const text = (max: number, what: string) => z.string().trim().max(max, `${what} is longer than ${max} characters.`);

/** A performer's label as the roster accepts it (the roster CSV and the show file too). */
export const LABEL_PATTERN = /^[A-Za-z0-9][A-Za-z0-9 ._\-]{0,15}$/;
export const LABEL_RULE = "A label is 1–16 letters or digits, e.g. T4.";

const label = z.string().trim().regex(LABEL_PATTERN, LABEL_RULE);
const instrument = z.string().trim().min(1, "Choose an instrument.").max(40);
const section = text(60, "The section").min(1, "Name the section.");
const part = text(40, "The part");
const strengthDb = z
  .number({ error: "Strength must be a number of dB." })
  .min(-6, "Strength runs from −6 dB (weak) to +6 dB (strong).")
  .max(6, "Strength runs from −6 dB (weak) to +6 dB (strong).");
/** A player's name; an empty name clears it. */
const name = text(120, "The name").transform((n) => n || null).nullable();

/** Each field's rule, for every schema that holds a performer (the show file too). */
export const performerFields = { label, instrument, section, part, strengthDb };

export const addPerformersSchema = z
  .object({
    instrument,
    count: z.number().int().min(1, "Add at least one performer.").max(50, "Add at most 50 performers at a time.").default(1),
    section: section.optional(),
    part: part.default(""),
    /** Only with count 1; else labels continue the roster's (T11, T12…). */
    label: label.optional(),
    strengthDb: strengthDb.default(0),
    /** Only with count 1. */
    name: name.optional(),
  })
  .refine((b) => b.label === undefined || b.count === 1, { message: "A label can be given for one performer only.", path: ["label"] })
  .refine((b) => !b.name || b.count === 1, { message: "A name can be given for one performer only.", path: ["name"] });

export const performerPatchSchema = z
  .object({ label, instrument, section, part, strengthDb, name })
  .partial()
  .strict()
  .refine((b) => Object.keys(b).length > 0, { message: "Give a label, instrument, section, part, strength or name to change.", path: ["label"] });
export type PerformerPatch = z.infer<typeof performerPatchSchema>;
