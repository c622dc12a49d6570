// Bodies of the set-management routes (add, duplicate, renumber, counts, delete, remove performers).
import { z } from "./zod";

/** As the drill names a set: digits and up to two letters ("12", "12A"), stored in capitals. */
export const setNumberSchema = z
  .string()
  .trim()
  .regex(/^\d{1,4}[A-Za-z]{0,2}$/, "A set number is digits and up to two letters, e.g. 12 or 12A.")
  .transform((s) => s.toUpperCase());

/** Counts from the previous set: 0 for the opening set, at most 999. */
export const countsSchema = z.number().int("Counts must be a whole number.").min(0, "Counts cannot be negative.").max(999, "At most 999 counts.");

const versionSchema = z.number().int().min(1);

export const createSetSchema = z.object({
  number: setNumberSchema.optional(),
  counts: countsSchema.optional(),
  /** Insert after this set (default: at the end, or after the set duplicated). */
  after: z.string().uuid("after must be a set's id.").optional(),
  /** Start with this set's positions. */
  duplicateOf: z.string().uuid("duplicateOf must be a set's id.").optional(),
}).strict();

export const updateSetSchema = z
  .object({ version: versionSchema, number: setNumberSchema.optional(), counts: countsSchema.optional() })
  .strict()
  .refine((b) => b.number !== undefined || b.counts !== undefined, { message: "Give a new number or new counts.", path: ["number"] });

export const deleteSetQuery = z.object({ version: z.coerce.number().int().min(1) });

export const removeFromSetSchema = z.object({
  version: versionSchema,
  performerIds: z.array(z.string().uuid("performerIds must be performers' ids.")).min(1).max(2000),
});
